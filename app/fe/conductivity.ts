/**
 * Thermal conductivity as a function of temperature, as data.
 *
 * Three forms cover what data sheets give: a single value; a polynomial in temperature (°C, the way
 * insulation data sheets fit conductivity against mean test temperature); or a table of
 * (temperature, conductivity) points joined by straight lines and held constant beyond the ends.
 * Temperatures in these models are Celsius because that is how the curves are published; the
 * engine converts nothing else.
 */
export type ConductivityModel =
  | { readonly kind: 'constant'; readonly value: number }
  | { readonly kind: 'polynomial'; readonly coefficients: readonly number[] }
  | { readonly kind: 'table'; readonly points: readonly (readonly [number, number])[] };

/** λ(θ) in W/(m·K) at temperature θ in °C. */
export function conductivityAt(model: ConductivityModel, celsius: number): number {
  switch (model.kind) {
    case 'constant':
      return model.value;
    case 'polynomial': {
      // Horner: a0 + θ(a1 + θ(a2 + ...)).
      let k = 0;
      for (let i = model.coefficients.length - 1; i >= 0; i--) k = k * celsius + model.coefficients[i]!;
      return k;
    }
    case 'table': {
      const points = model.points;
      const s = tableSegment(points, celsius);
      if (s < 0) return points[0]![1];
      if (s === points.length - 1) return points[s]![1];
      // Indexing, not destructuring: this runs at every Gauss point of every iteration.
      const x0 = points[s]![0];
      const y0 = points[s]![1];
      return y0 + ((points[s + 1]![1] - y0) / (points[s + 1]![0] - x0)) * (celsius - x0);
    }
  }
}

/** dλ/dθ in W/(m·K²) at θ in °C; used by Newton iteration. */
export function conductivitySlopeAt(model: ConductivityModel, celsius: number): number {
  switch (model.kind) {
    case 'constant':
      return 0;
    case 'polynomial': {
      let d = 0;
      for (let i = model.coefficients.length - 1; i >= 1; i--) d = d * celsius + i * model.coefficients[i]!;
      return d;
    }
    case 'table': {
      const points = model.points;
      const s = tableSegment(points, celsius);
      if (s < 0 || s === points.length - 1) return 0;
      return (points[s + 1]![1] - points[s]![1]) / (points[s + 1]![0] - points[s]![0]);
    }
  }
}

/** True when the conductivity does not vary with temperature (the linear problem needs no iteration). */
export function isConstantConductivity(model: ConductivityModel): boolean {
  if (model.kind === 'constant') return true;
  if (model.kind === 'polynomial') return model.coefficients.slice(1).every((c) => c === 0);
  return model.points.every((p) => p[1] === model.points[0]![1]);
}

/**
 * The table segment [points[s], points[s + 1]] that holds x: −1 at or below the first point and
 * points.length − 1 at or above the last, where the table is held constant. An index rather than
 * an object, because λ is looked up at every Gauss point of every iteration.
 */
function tableSegment(points: readonly (readonly [number, number])[], x: number): number {
  const n = points.length;
  if (x <= points[0]![0]) return -1;
  if (x >= points[n - 1]![0]) return n - 1;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (points[mid]![0] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}
