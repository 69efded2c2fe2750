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
    case 'table':
      return interpolateTable(model.points, celsius).value;
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
    case 'table':
      return interpolateTable(model.points, celsius).slope;
  }
}

/** True when the conductivity does not vary with temperature (the linear problem needs no iteration). */
export function isConstantConductivity(model: ConductivityModel): boolean {
  if (model.kind === 'constant') return true;
  if (model.kind === 'polynomial') return model.coefficients.slice(1).every((c) => c === 0);
  return model.points.every((p) => p[1] === model.points[0]![1]);
}

function interpolateTable(points: readonly (readonly [number, number])[], x: number): { value: number; slope: number } {
  const n = points.length;
  if (x <= points[0]![0]) return { value: points[0]![1], slope: 0 };
  if (x >= points[n - 1]![0]) return { value: points[n - 1]![1], slope: 0 };
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (points[mid]![0] <= x) lo = mid;
    else hi = mid;
  }
  const [x0, y0] = points[lo]!;
  const [x1, y1] = points[hi]!;
  const slope = (y1 - y0) / (x1 - x0);
  return { value: y0 + slope * (x - x0), slope };
}
