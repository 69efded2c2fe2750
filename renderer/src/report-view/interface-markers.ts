/**
 * A chart.js plugin of Lamina's own: thin dotted vertical lines at given x values (the interfaces
 * between layers, or a month where something starts), each numbered at the top so the caption and
 * the text alternative can name it without crowding the plot; numbers of lines close together are
 * set apart, in order.
 */
import type { ChartType, Plugin } from 'chart.js';
import { spreadLabels } from '../../../app/report/drawing/label-spread.js';

export interface InterfaceMarkerOptions {
  /** x values in the units the x axis plots (category index on a category axis). */
  readonly positions: readonly number[];
  readonly colour: string;
  readonly font: string;
}

declare module 'chart.js' {
  interface PluginOptionsByType<TType extends ChartType> {
    interfaceMarkers?: InterfaceMarkerOptions;
  }
}

export const interfaceMarkers: Plugin<'line', InterfaceMarkerOptions> = {
  id: 'interfaceMarkers',
  afterDatasetsDraw(chart, _args, options) {
    const { ctx, chartArea } = chart;
    const x = chart.scales['x'];
    if (!x || !options.positions || options.positions.length === 0) return;
    ctx.save();
    ctx.strokeStyle = options.colour;
    ctx.fillStyle = options.colour;
    ctx.lineWidth = 1;
    ctx.setLineDash([2, 3]);
    ctx.font = options.font;
    ctx.textAlign = 'center';
    ctx.textBaseline = 'bottom';
    const shown = options.positions
      .map((value, i) => ({ px: x.getPixelForValue(value), number: String(i + 1) }))
      .filter(({ px }) => Number.isFinite(px) && px >= chartArea.left - 0.5 && px <= chartArea.right + 0.5);
    for (const { px } of shown) {
      ctx.beginPath();
      ctx.moveTo(px, chartArea.top);
      ctx.lineTo(px, chartArea.bottom);
      ctx.stroke();
    }
    // Interfaces close together (a thin layer, or a foil's s_d step) keep their numbers apart.
    const gap = ctx.measureText(String(options.positions.length)).width + 5;
    // The plot keeps 8 px on its right (chart-config), room for a last number pushed past the axis.
    const at = spreadLabels(shown.map((m) => m.px), gap, chartArea.left, chartArea.right + 6);
    shown.forEach(({ number }, i) => ctx.fillText(number, at[i]!, chartArea.top - 2));
    ctx.restore();
  },
};
