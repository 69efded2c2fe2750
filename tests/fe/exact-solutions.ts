/**
 * Closed-form solutions of 1D steady conduction used as references by the verification tests.
 * Source for all of them: the thermal-resistance network and the radial-conduction solutions of
 * Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, chapter 3
 * (eqs. 3.19, 3.27–3.32 for plane walls and cylinders; 3.39–3.55 for generation; §3.1–3.3).
 */
export interface PlainLayer {
  readonly thickness: number;
  readonly k: number;
  readonly contactToNext?: number;
}

/** Resistances of each piece, inner film first, for a plane wall per m² (m²K/W). */
export function planarResistances(layers: readonly PlainLayer[], hInner?: number, hOuter?: number): number[] {
  const r: number[] = [];
  if (hInner !== undefined) r.push(1 / hInner);
  layers.forEach((l) => {
    r.push(l.thickness / l.k);
    if (l.contactToNext) r.push(l.contactToNext);
  });
  if (hOuter !== undefined) r.push(1 / hOuter);
  return r;
}

/** Resistances per metre of pipe (mK/W): ln(r2/r1)/(2πk), film 1/(2πrh), contact R/(2πr). */
export function cylindricalResistances(innerRadius: number, layers: readonly PlainLayer[], hInner?: number, hOuter?: number): number[] {
  const r: number[] = [];
  if (hInner !== undefined) r.push(1 / (2 * Math.PI * innerRadius * hInner));
  let radius = innerRadius;
  layers.forEach((l) => {
    const next = radius + l.thickness;
    r.push(Math.log(next / radius) / (2 * Math.PI * l.k));
    if (l.contactToNext) r.push(l.contactToNext / (2 * Math.PI * next));
    radius = next;
  });
  if (hOuter !== undefined) r.push(1 / (2 * Math.PI * radius * hOuter));
  return r;
}

export const sum = (values: readonly number[]): number => values.reduce((a, b) => a + b, 0);

/** Temperatures after each resistance of a series network carrying flow q from tIn. */
export function temperaturesAlong(tIn: number, q: number, resistances: readonly number[]): number[] {
  const out: number[] = [];
  let t = tIn;
  for (const r of resistances) {
    t -= q * r;
    out.push(t);
  }
  return out;
}

/**
 * Centre-line and profile of a slab 0 ≤ x ≤ L at uniform θ0 whose faces are stepped to θs at t = 0:
 * θ* = (θ − θs)/(θ0 − θs) = Σ 4/((2n+1)π) sin((2n+1)πx/L) exp(−(2n+1)²π² Fo), Fo = αt/L².
 * Carslaw & Jaeger, Conduction of Heat in Solids, §3.3; Incropera ch. 5 (plane wall, eq. 5.39ff).
 */
export function slabStepResponse(x: number, length: number, fourier: number, terms = 200): number {
  let s = 0;
  for (let n = 0; n < terms; n++) {
    const m = 2 * n + 1;
    s += (4 / (m * Math.PI)) * Math.sin((m * Math.PI * x) / length) * Math.exp(-m * m * Math.PI * Math.PI * fourier);
  }
  return s;
}

/** Interpolates a finite-element field (nodes in order, element order p) at position x. */
export function interpolate(positions: readonly number[], values: readonly number[], order: 1 | 2, x: number): number {
  const elements = (positions.length - 1) / order;
  for (let e = 0; e < elements; e++) {
    const a = positions[e * order]!;
    const b = positions[(e + 1) * order]!;
    if (x < a - 1e-15 || x > b + 1e-15) continue;
    const xi = (2 * (x - a)) / (b - a) - 1;
    if (order === 1) return ((1 - xi) / 2) * values[e]! + ((1 + xi) / 2) * values[e + 1]!;
    const [t0, t1, t2] = [values[2 * e]!, values[2 * e + 1]!, values[2 * e + 2]!];
    return ((xi * (xi - 1)) / 2) * t0 + (1 - xi * xi) * t1 + ((xi * (xi + 1)) / 2) * t2;
  }
  throw new RangeError(`x = ${x} lies outside the mesh`);
}

/** Least-squares slope of log(error) against log(h). */
export function logLogSlope(h: readonly number[], error: readonly number[]): number {
  const x = h.map(Math.log);
  const y = error.map(Math.log);
  const mx = sum(x) / x.length;
  const my = sum(y) / y.length;
  let num = 0;
  let den = 0;
  for (let i = 0; i < x.length; i++) {
    num += (x[i]! - mx) * (y[i]! - my);
    den += (x[i]! - mx) ** 2;
  }
  return num / den;
}
