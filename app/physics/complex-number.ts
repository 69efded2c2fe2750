/**
 * The few complex-number operations the periodic (ISO 13786) calculation needs, on plain
 * `{ re, im }` records so that a result stays JSON data. No general complex library: the
 * transfer-matrix method only adds, multiplies and divides, and reads a modulus and an argument.
 */
export interface Complex {
  readonly re: number;
  readonly im: number;
}

export const complex = (re: number, im = 0): Complex => ({ re, im });

export const ONE: Complex = complex(1);
export const ZERO: Complex = complex(0);

export function add(a: Complex, b: Complex): Complex {
  return complex(a.re + b.re, a.im + b.im);
}

export function subtract(a: Complex, b: Complex): Complex {
  return complex(a.re - b.re, a.im - b.im);
}

export function multiply(a: Complex, b: Complex): Complex {
  return complex(a.re * b.re - a.im * b.im, a.re * b.im + a.im * b.re);
}

export function scale(a: Complex, factor: number): Complex {
  return complex(a.re * factor, a.im * factor);
}

export function negate(a: Complex): Complex {
  return complex(-a.re, -a.im);
}

/**
 * a / b by Smith's algorithm (Commun. ACM 5 (1962) 435): dividing through by the larger part of b
 * keeps the intermediate products in range where the textbook (a·b̄)/|b|² would overflow, which
 * matters for the thick layers whose cosh ξ reaches 1e30 and more.
 */
export function divide(a: Complex, b: Complex): Complex {
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return complex((a.re + a.im * r) / d, (a.im - a.re * r) / d);
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return complex((a.re * r + a.im) / d, (a.im * r - a.re) / d);
}

/** |a|, by Math.hypot (no overflow of the squares). */
export function modulus(a: Complex): number {
  return Math.hypot(a.re, a.im);
}

/** The principal argument, in (−π, π]. */
export function argument(a: Complex): number {
  return Math.atan2(a.im, a.re);
}
