import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

/**
 * The smallest value of a polynomial a0 + a1·x + a2·x² + ... on [low, high]. A continuous function
 * on a closed interval takes its minimum at an end or where its derivative is zero, so we evaluate
 * the ends and the real roots of the derivative inside the interval. The roots are the eigenvalues
 * of the derivative's companion matrix (a standard construction; ml-matrix does the eigenvalues).
 */
export function polynomialMinimumOn(coefficients: readonly number[], low: number, high: number): { x: number; value: number } {
  const evaluate = (x: number) => coefficients.reduceRight((acc, c) => acc * x + c, 0);
  const candidates = [low, high, ...realRootsOf(derivativeOf(coefficients)).filter((x) => x > low && x < high)];
  let best = { x: low, value: evaluate(low) };
  for (const x of candidates) {
    const value = evaluate(x);
    if (value < best.value) best = { x, value };
  }
  return best;
}

function derivativeOf(coefficients: readonly number[]): number[] {
  return coefficients.slice(1).map((c, i) => c * (i + 1));
}

function realRootsOf(coefficients: readonly number[]): number[] {
  const c = [...coefficients];
  while (c.length > 0 && c[c.length - 1] === 0) c.pop();
  const degree = c.length - 1;
  if (degree < 1) return [];
  if (degree === 1) return [-c[0]! / c[1]!];
  const lead = c[degree]!;
  const companion = Matrix.zeros(degree, degree);
  for (let i = 1; i < degree; i++) companion.set(i, i - 1, 1);
  for (let i = 0; i < degree; i++) companion.set(i, degree - 1, -c[i]! / lead);
  const eig = new EigenvalueDecomposition(companion);
  const roots: number[] = [];
  eig.realEigenvalues.forEach((re, i) => {
    const im = eig.imaginaryEigenvalues[i]!;
    if (Math.abs(im) <= 1e-9 * Math.max(1, Math.abs(re))) roots.push(re);
  });
  return roots;
}
