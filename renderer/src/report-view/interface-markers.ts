/**
 * A chart.js plugin of Lamina's own: thin dotted vertical lines at given x values (the interfaces
 * between layers, or a month where something starts), each numbered at the top so the caption and
 * the text alternative can name it without crowding the plot.
 */
import type { ChartType, Plugin } from 'chart.js';

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
    options.positions.forEach((value, i) => {
      const px = x.getPixelForValue(value);
      if (!Number.isFinite(px) || px < chartArea.left - 0.5 || px > chartArea.right + 0.5) return;
      ctx.beginPath();
      ctx.moveTo(px, chartArea.top);
      ctx.lineTo(px, chartArea.bottom);
      ctx.stroke();
      ctx.fillText(String(i + 1), px, chartArea.top - 2);
    });
    ctx.restore();
  },
};
