/**
 * The integral-mean conductivity between two temperatures,
 *   λ_m(a, b) = (1/(b − a)) ∫_a^b λ(θ) dθ,
 * which is what carries the steady heat flow through a layer without heat generation whatever
 * λ(θ) is (the Kirchhoff transform): q = λ_m(θ_1, θ_2)·(θ_1 − θ_2) / d for a plane layer, and the
 * same with d replaced by r_1·ln(r_2/r_1) per unit inner area for a cylinder. Written so that no
 * digits are lost when a and b are close: the polynomial as Σ a_i/(i+1)·Σ_j a^j b^(i−j), a table
 * piece by piece (within one straight piece the mean is λ at the midpoint).
 */
import { conductivityAt, type ConductivityModel } from './conductivity.js';

export function meanConductivityBetween(model: ConductivityModel, a: number, b: number): number {
  switch (model.kind) {
    case 'constant':
      return model.value;
    case 'polynomial': {
      // h_i = Σ_{j=0..i} a^j b^(i−j), built as h_i = b·h_(i−1) + a^i.
      const c = model.coefficients;
      let h = 1;
      let aPower = 1;
      let mean = c[0]!;
      for (let i = 1; i < c.length; i++) {
        aPower *= a;
        h = b * h + aPower;
        mean += (c[i]! * h) / (i + 1);
      }
      return mean;
    }
    case 'table':
      return tableMean(model, a, b);
  }
}

/**
 * Piece by piece. Takes the model as given (no object built per call) and loops by index: the
 * chart's temperature profile evaluates this dozens of times per layer.
 */
function tableMean(model: Extract<ConductivityModel, { kind: 'table' }>, a: number, b: number): number {
  const points = model.points;
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  // Breakpoints strictly inside (lo, hi): without any, λ is one straight piece there.
  let inside = false;
  for (let i = 0; i < points.length; i++) if (points[i]![0] > lo && points[i]![0] < hi) inside = true;
  if (!inside || hi === lo) return conductivityAt(model, (lo + hi) / 2);
  let integral = 0;
  let from = lo;
  for (let i = 0; i < points.length; i++) {
    const t = points[i]![0];
    if (t <= lo || t >= hi) continue;
    integral += conductivityAt(model, (from + t) / 2) * (t - from);
    from = t;
  }
  integral += conductivityAt(model, (from + hi) / 2) * (hi - from);
  return integral / (hi - lo);
}
