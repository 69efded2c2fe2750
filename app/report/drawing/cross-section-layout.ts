/**
 * Where everything in a cross-section drawing goes, from the report's numbers alone: bands side
 * by side for a plane build-up (inside on the left), or concentric rings round the bore for a
 * pipe, to scale except for layers too thin to see (visible-spans.ts); a numbered badge above each
 * layer and the temperature below each face, spread so that none overlaps, each with a leader to
 * the place it names. Pure, so that the geometry is tested without a browser, and shared: the screen's
 * component (renderer CrossSection.svelte) and the printed report (app/report/html) only draw it.
 */
import type { QuantityName } from '../../base/quantities.js';
import type { MaterialCategory } from '../../materials/material-properties.js';
import type { ReportCrossSection } from '../report-model.js';
import { spreadLabels } from './label-spread.js';
import { visibleSpans } from './visible-spans.js';

/**
 * How the drawing writes a figure with its unit in the project's unit system ("100.0 mm", "3.94 in"):
 * the screen's and the paper's formatters both have this one method, so both lay out the same text.
 */
export interface FigureWriter {
  withUnit(value: number, quantity: QuantityName): string;
}

/** A label and the point it names. */
export interface Callout {
  readonly text: string;
  readonly x: number;
  readonly y: number;
  readonly anchorX: number;
  readonly anchorY: number;
}

export interface DrawnLayer {
  /** 1, 2, 3… inside to outside, as in the key. */
  readonly number: number;
  readonly name: string;
  readonly category: MaterialCategory;
  /** "100.0 mm" */
  readonly thickness: string;
  /** Drawn wider than to scale so that it shows. */
  readonly widened: boolean;
  /** Plane: the band's left and right edges. Cylinder: the ring's inner and outer radius. */
  readonly from: number;
  readonly to: number;
  readonly badge: Callout;
}

export interface CrossSectionLayout {
  readonly width: number;
  readonly height: number;
  readonly geometry: 'plane' | 'cylinder';
  readonly layers: readonly DrawnLayer[];
  /** Plane: top and bottom of the bands. */
  readonly bandTop: number;
  readonly bandBottom: number;
  /** Cylinder: the centre, and the bore's radius in the drawing. */
  readonly centre: { readonly x: number; readonly y: number };
  readonly bore: { readonly radius: number; readonly widened: boolean; readonly diameter: string } | null;
  readonly temperatures: readonly Callout[];
  /** The footnote where some part is drawn wider than to scale (its badge is starred); null where all is to scale. */
  readonly notToScale: string | null;
  /** The whole drawing in one sentence, for people who cannot see it. */
  readonly description: string;
}

/** Drawing units (SVG px). A layer is never drawn narrower than MINIMUM_WIDTH. */
export const MINIMUM_WIDTH = 4;
const BADGE_RADIUS = 9;
const BADGE_Y = 16;
const BADGE_GAP = 2 * BADGE_RADIUS + 3;
const TEMPERATURE_ROW_GAP = 16;
/** Estimated width of one character of an 11 px label, for spacing the temperature labels. */
const CHARACTER_WIDTH = 6.4;
const EDGE = 6;

const PLANE = { width: 560, left: 24, right: 536, top: 40, bottom: 150 };
const CYLINDER = { width: 340, radius: 112, centreX: 132, centreY: 40 + 112 };

export function crossSectionLayout(section: ReportCrossSection, text: FigureWriter): CrossSectionLayout {
  const cylinder = section.geometry === 'cylinder';
  const width = cylinder ? CYLINDER.width : PLANE.width;
  const thicknesses = section.layers.map((l) => l.thickness);
  // The bore is the first length along the radius, to scale with the layers.
  const spans = cylinder
    ? visibleSpans([section.innerRadius, ...thicknesses], CYLINDER.radius, MINIMUM_WIDTH)
    : visibleSpans(thicknesses, PLANE.right - PLANE.left, MINIMUM_WIDTH);
  const layerSpans = cylinder ? spans.slice(1) : spans;
  const origin = cylinder ? CYLINDER.centreX : PLANE.left;
  const bandTop = cylinder ? CYLINDER.centreY - CYLINDER.radius : PLANE.top;
  const bandBottom = cylinder ? CYLINDER.centreY + CYLINDER.radius : PLANE.bottom;
  // Leaders start on the band's edge (plane) or on the horizontal radius (cylinder).
  const badgeAnchorY = cylinder ? CYLINDER.centreY : PLANE.top;
  const temperatureAnchorY = cylinder ? CYLINDER.centreY : PLANE.bottom;

  const middles = layerSpans.map((s) => origin + (s.start + s.end) / 2);
  const badgeXs = spreadLabels(middles, BADGE_GAP, cylinder ? origin : EDGE + BADGE_RADIUS, width - EDGE - BADGE_RADIUS);
  const layers: DrawnLayer[] = section.layers.map((l, i) => {
    const s = layerSpans[i]!;
    return {
      number: i + 1,
      name: l.name,
      category: l.category,
      thickness: text.withUnit(l.thickness, 'thickness'),
      widened: s.widened,
      from: cylinder ? s.start : origin + s.start,
      to: cylinder ? s.end : origin + s.end,
      badge: { text: `${i + 1}${s.widened ? '*' : ''}`, x: badgeXs[i]!, y: BADGE_Y, anchorX: middles[i]!, anchorY: badgeAnchorY },
    };
  });

  const faces = [layerSpans[0]!.start, ...layerSpans.map((s) => s.end)].map((at) => origin + at);
  const labelled = section.temperatures.flatMap((t, i) => (t === null ? [] : [{ text: text.withUnit(t, 'temperature'), at: faces[i]! }]));
  const widest = Math.max(0, ...labelled.map((l) => l.text.length * CHARACTER_WIDTH));
  // Alternate rows: neighbours need half a label apart, labels in the same row a whole one.
  const xs = spreadLabels(
    labelled.map((l) => l.at),
    widest / 2 + 4,
    EDGE + widest / 2,
    width - EDGE - widest / 2,
  );
  const firstRow = bandBottom + 20;
  const temperatures: Callout[] = labelled.map((l, i) => ({
    text: l.text,
    x: xs[i]!,
    y: firstRow + (i % 2) * TEMPERATURE_ROW_GAP,
    anchorX: l.at,
    anchorY: temperatureAnchorY,
  }));

  const bore = cylinder ? { radius: spans[0]!.end, widened: spans[0]!.widened, diameter: text.withUnit(2 * section.innerRadius, 'diameter') } : null;
  const widenedNames = [...(bore?.widened ? ['the bore'] : []), ...layers.filter((l) => l.widened).map((l) => `layer ${l.number} (${l.thickness})`)];
  // Short enough for the narrow pipe drawing; the key and the description name the parts.
  const notToScale = widenedNames.length === 0 ? null : `* Not to scale: drawn wider so that ${widenedNames.length === 1 ? 'it shows' : 'they show'}.`;
  const lastRow = firstRow + (labelled.length > 1 ? TEMPERATURE_ROW_GAP : 0);
  const height = lastRow + (notToScale ? 26 : 10);

  return {
    width,
    height,
    geometry: section.geometry,
    layers,
    bandTop,
    bandBottom,
    centre: { x: CYLINDER.centreX, y: CYLINDER.centreY },
    bore,
    temperatures,
    notToScale,
    description: describe(section, layers, bore, labelled.map((l) => l.text), widenedNames),
  };
}

function describe(
  section: ReportCrossSection,
  layers: readonly DrawnLayer[],
  bore: CrossSectionLayout['bore'],
  temperatures: readonly string[],
  widened: readonly string[],
): string {
  const shape = bore ? `Rings round a bore ${bore.diameter} across` : 'Bands, inside on the left';
  const list = layers.map((l) => `${l.number} ${l.name}, ${l.thickness}`).join('; ');
  const faces = temperatures.length > 0 ? ` Temperatures from the inside out: ${temperatures.join(', ')}.` : '';
  const scale = widened.length === 0 ? ' Drawn to scale.' : ` Drawn to scale except ${joinWords(widened)}, drawn wider so that ${widened.length === 1 ? 'it shows' : 'they show'}.`;
  return `${section.title}. ${shape}: ${list}.${faces}${scale}`;
}

function joinWords(items: readonly string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
