/**
 * The Glaser-type construction of ISO 13788 (reference notes §4): the vapour pressure profile through
 * a stack of layers, plotted against the cumulative equivalent air layer thickness s_d, is the
 * tightest polyline from the inside vapour pressure to the outside one that nowhere exceeds the
 * saturation pressure at the interfaces. Where it touches saturation, vapour condenses at the rate
 * g_c = g_in − g_out, with the flux through layer j g_j = δ₀·(p_j − p_{j+1})/s_d,j.
 *
 * Geometrically the tightest polyline under the saturation points is the lower convex hull of the
 * two end points and the saturation points between them (a taut string pushed down by pegs).
 *
 * Two extensions:
 * - wet interfaces (water stored from earlier months) are held at saturation: they act as extra
 *   fixed points of the polyline, and may show a negative g_c (evaporation);
 * - a vapour-tight layer (s_d = ∞) carries no vapour, so each side is a run with a zero-flux end.
 *   Mirroring such a run about its closed end shows that the profile follows the hull from the
 *   fixed point down to the lowest saturation point in the run and stays level beyond it.
 *   A run closed at both ends with nothing fixed in it has no defined vapour pressure (null).
 *
 * Points are numbered 0 (inside surface) … N (outside surface); point k lies between layer k−1 and
 * layer k. The construction works in Pa and m; fluxes are in kg/(m²·s).
 */

export interface GlaserInput {
  /** s_d of each layer, m, > 0; Infinity for a vapour-tight layer. */
  readonly layerSd: readonly number[];
  /** Saturation pressure at points 0 … N, Pa. */
  readonly saturation: readonly number[];
  /** Vapour pressure of the inside and outside air, Pa (surface vapour resistances neglected, as ISO 13788 does). */
  readonly insidePressure: number;
  readonly outsidePressure: number;
  /** Interior points held at saturation because they hold water (monthly procedure). */
  readonly wet?: readonly boolean[];
  /** δ₀, vapour permeability of still air, kg/(m·s·Pa). */
  readonly vapourPermeabilityOfAir: number;
}

export interface GlaserProfile {
  /** Vapour pressure at points 0 … N, Pa; null inside a run sealed on both sides. */
  readonly pressure: readonly (number | null)[];
  /** Vapour flux through each layer, outwards, kg/(m²·s) (0 through a vapour-tight layer or a sealed run). */
  readonly layerFlux: readonly number[];
  /** g_c = g_in − g_out at each point, kg/(m²·s): > 0 condensation, < 0 evaporation; 0 at the two surfaces. */
  readonly condensationRate: readonly number[];
  /** The inside or outside air is above saturation at that surface (surface condensation; the end value is held at saturation). */
  readonly surfaceCondensation: { readonly inside: boolean; readonly outside: boolean };
}

interface Peg {
  readonly k: number;
  readonly x: number;
  readonly p: number;
}

/** z-component of (b − a) × (c − a); > 0 when a → b → c turns anticlockwise (convex from below). */
function cross(a: Peg, b: Peg, c: Peg): number {
  return (b.x - a.x) * (c.p - a.p) - (b.p - a.p) * (c.x - a.x);
}

/** Lower convex hull of points[from..to] sorted by x (first and last always kept). */
function lowerHull(points: readonly Peg[], from: number, to: number): Peg[] {
  const hull: Peg[] = [];
  for (let i = from; i <= to; i++) {
    const q = points[i]!;
    while (hull.length >= 2 && cross(hull[hull.length - 2]!, hull[hull.length - 1]!, q) <= 0) hull.pop();
    hull.push(q);
  }
  return hull;
}

/**
 * Fills `out` for the points stretch[from..to] (sorted, first and last are the hull's ends) by the
 * hull. A range of indices rather than a copied slice: the monthly procedure builds two dozen
 * profiles per wall.
 */
function fillByHull(stretch: readonly Peg[], out: (number | null)[], vertex: boolean[], from: number, to: number): void {
  const hull = lowerHull(stretch, from, to);
  let h = 0;
  for (let i = from; i <= to; i++) {
    const q = stretch[i]!;
    while (h < hull.length - 2 && hull[h + 1]!.x <= q.x) h++;
    const a = hull[h]!;
    const b = hull[h + 1] ?? a;
    if (q.k === a.k || q.k === b.k) {
      out[q.k] = q.k === a.k ? a.p : b.p;
      vertex[q.k] = true;
    } else {
      out[q.k] = a.p + ((b.p - a.p) * (q.x - a.x)) / (b.x - a.x);
    }
  }
}

/**
 * A stretch from a fixed point to a closed (zero-flux) end; `towardsEnd` lists the points from the
 * fixed one (first) to the closed end (last), with x measured as distance from the fixed point.
 */
function fillTowardsClosedEnd(towardsEnd: readonly Peg[], out: (number | null)[], vertex: boolean[]): void {
  let lowest = 0;
  for (let i = 1; i < towardsEnd.length; i++) if (towardsEnd[i]!.p < towardsEnd[lowest]!.p) lowest = i;
  fillByHull(towardsEnd, out, vertex, 0, lowest);
  const level = towardsEnd[lowest]!.p;
  for (let i = lowest + 1; i < towardsEnd.length; i++) out[towardsEnd[i]!.k] = level;
}

/**
 * The pressure point k is held at: the inside and outside air (at most saturation), a wet
 * interface at saturation; undefined for a point free to follow the hull. A function of its own,
 * not a closure: the monthly procedure builds the profile two dozen times per wall.
 */
function fixedValue(input: GlaserInput, k: number): number | undefined {
  const sat = input.saturation;
  const n = input.layerSd.length;
  if (k === 0) return Math.min(input.insidePressure, sat[0]!);
  if (k === n) return Math.min(input.outsidePressure, sat[n]!);
  return input.wet?.[k] ? sat[k] : undefined;
}

export function constructVapourProfile(input: GlaserInput): GlaserProfile {
  const sd = input.layerSd;
  const n = sd.length;
  const sat = input.saturation;
  const pressure: (number | null)[] = new Array(n + 1).fill(null);
  const vertex: boolean[] = new Array(n + 1).fill(false);
  const surfaceCondensation = { inside: input.insidePressure > sat[0]!, outside: input.outsidePressure > sat[n]! };

  // Runs of points joined by vapour-open layers.
  let start = 0;
  while (start <= n) {
    let end = start;
    while (end < n && Number.isFinite(sd[end]!)) end++;
    const run: Peg[] = [];
    let x = 0;
    for (let k = start; k <= end; k++) {
      if (k > start) x += sd[k - 1]!;
      run.push({ k, x, p: fixedValue(input, k) ?? sat[k]! });
    }
    const anchors: number[] = [];
    for (let i = 0; i < run.length; i++) if (fixedValue(input, run[i]!.k) !== undefined) anchors.push(i);
    if (anchors.length > 0) {
      const first = anchors[0]!;
      const last = anchors[anchors.length - 1]!;
      for (const i of anchors) {
        pressure[run[i]!.k] = run[i]!.p;
        vertex[run[i]!.k] = true;
      }
      for (let a = 0; a + 1 < anchors.length; a++) fillByHull(run, pressure, vertex, anchors[a]!, anchors[a + 1]!);
      if (first > 0) {
        const fx = run[first]!.x;
        fillTowardsClosedEnd(run.slice(0, first + 1).reverse().map((q) => ({ ...q, x: fx - q.x })), pressure, vertex);
      }
      if (last < run.length - 1) {
        const lx = run[last]!.x;
        fillTowardsClosedEnd(run.slice(last).map((q) => ({ ...q, x: q.x - lx })), pressure, vertex);
      }
    }
    start = end + 1;
  }

  const delta = input.vapourPermeabilityOfAir;
  const layerFlux = sd.map((s, j) => {
    const a = pressure[j];
    const b = pressure[j + 1];
    if (!Number.isFinite(s) || a === null || b === null) return 0;
    return (delta * (a! - b!)) / s;
  });
  const condensationRate = pressure.map((_, k) => {
    // Only hull vertices and wet points can take up or give off water; elsewhere the line is
    // straight and g_in = g_out exactly (set to 0 rather than keep rounding noise).
    if (k === 0 || k === n || !vertex[k]) return 0;
    return layerFlux[k - 1]! - layerFlux[k]!;
  });
  return { pressure, layerFlux, condensationRate, surfaceCondensation };
}

/**
 * The vapour pressure each point would have with no saturation limit (straight line in each run
 * between fixed ends; level towards a closed end); null in a run sealed on both sides. Used for
 * the reserve against condensation.
 */
export function unlimitedVapourProfile(layerSd: readonly number[], insidePressure: number, outsidePressure: number): (number | null)[] {
  const n = layerSd.length;
  const out: (number | null)[] = new Array(n + 1).fill(null);
  let start = 0;
  while (start <= n) {
    let end = start;
    while (end < n && Number.isFinite(layerSd[end]!)) end++;
    const left = start === 0 ? insidePressure : undefined;
    const right = end === n ? outsidePressure : undefined;
    let total = 0;
    for (let k = start; k < end; k++) total += layerSd[k]!;
    let x = 0;
    for (let k = start; k <= end; k++) {
      if (k > start) x += layerSd[k - 1]!;
      if (left !== undefined && right !== undefined) out[k] = total === 0 ? left : left + ((right - left) * x) / total;
      else if (left !== undefined) out[k] = left;
      else if (right !== undefined) out[k] = right;
    }
    start = end + 1;
  }
  return out;
}
