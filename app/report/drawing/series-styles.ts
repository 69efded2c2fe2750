/**
 * How each series of a chart is drawn so that it reads in greyscale and on a monochrome printer:
 * every series of a chart gets its own dash pattern and point shape, not only its own colour.
 * Ordinary series start solid; reference lines (saturation, dew point, a limit) are always dashed,
 * from patterns no ordinary series uses. The colours are Lamina's own, dark enough on white and
 * apart in lightness. Shared by the screen's charts (chart.js) and the printed report's SVG charts.
 */
export type PointShape = 'circle' | 'rect' | 'triangle' | 'rectRot' | 'crossRot' | 'star';

export interface SeriesStyle {
  readonly colour: string;
  /** Line dash, in px (a canvas line dash, an SVG stroke-dasharray): [] is solid. */
  readonly dash: readonly number[];
  readonly point: PointShape;
  readonly width: number;
}

const COLOURS = ['#1d4f60', '#a4471f', '#5a4a8a', '#3d6b2f', '#7a2f5b', '#44474b'];
const SERIES_DASHES: readonly (readonly number[])[] = [[], [10, 4], [2, 3], [12, 3, 2, 3]];
const REFERENCE_DASHES: readonly (readonly number[])[] = [[6, 4], [4, 2, 1, 2], [14, 6], [1, 4]];
const POINTS: readonly PointShape[] = ['circle', 'rect', 'triangle', 'rectRot', 'crossRot', 'star'];

/** Styles for the series of one chart, in their order. */
export function seriesStyles(series: readonly { readonly reference?: boolean }[]): SeriesStyle[] {
  let ordinary = 0;
  let reference = 0;
  return series.map((s, i) => {
    const dash = s.reference ? REFERENCE_DASHES[reference++ % REFERENCE_DASHES.length]! : SERIES_DASHES[ordinary++ % SERIES_DASHES.length]!;
    return { colour: COLOURS[i % COLOURS.length]!, dash, point: POINTS[i % POINTS.length]!, width: s.reference ? 1.5 : 2 };
  });
}
