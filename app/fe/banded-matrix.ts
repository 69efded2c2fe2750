/**
 * A square band matrix and its direct solve in O(n·p²) for half-bandwidth p (O(n) for the
 * tridiagonal and pentadiagonal systems 1D elements produce). No dense matrix is ever formed.
 *
 * Storage is row-wise: entry (i, j) with |i − j| ≤ p lives at data[i·(2p+1) + (j − i + p)].
 * Elimination runs without pivoting, which is safe for the symmetric positive definite and
 * diagonally dominant systems conduction produces; a vanishing pivot is reported, not hidden.
 */
export class BandedMatrix {
  readonly data: Float64Array;
  readonly width: number;

  /** `storage`, when given, must hold size·(2·halfBandwidth + 1) values; the matrix then lives in it. */
  constructor(
    readonly size: number,
    readonly halfBandwidth: number,
    storage?: Float64Array,
  ) {
    this.width = 2 * halfBandwidth + 1;
    if (storage && storage.length !== size * this.width) throw new RangeError(`band storage must hold ${size * this.width} values; got ${storage.length}`);
    this.data = storage ?? new Float64Array(size * this.width);
  }

  private index(i: number, j: number): number {
    const offset = j - i + this.halfBandwidth;
    if (offset < 0 || offset >= this.width) throw new RangeError(`entry (${i}, ${j}) lies outside the band`);
    return i * this.width + offset;
  }

  get(i: number, j: number): number {
    const offset = j - i + this.halfBandwidth;
    return offset < 0 || offset >= this.width ? 0 : this.data[i * this.width + offset]!;
  }

  add(i: number, j: number, value: number): void {
    this.data[this.index(i, j)] += value;
  }

  set(i: number, j: number, value: number): void {
    this.data[this.index(i, j)] = value;
  }

  /** y = A·x */
  multiply(x: ArrayLike<number>): Float64Array {
    const y = new Float64Array(this.size);
    const p = this.halfBandwidth;
    for (let i = 0; i < this.size; i++) {
      let sum = 0;
      const lo = Math.max(0, i - p);
      const hi = Math.min(this.size - 1, i + p);
      for (let j = lo; j <= hi; j++) sum += this.data[i * this.width + j - i + p]! * x[j]!;
      y[i] = sum;
    }
    return y;
  }

  clone(): BandedMatrix {
    const copy = new BandedMatrix(this.size, this.halfBandwidth);
    copy.data.set(this.data);
    return copy;
  }
}

export class ZeroPivotError extends Error {
  override readonly name = 'ZeroPivotError';
  constructor(readonly row: number) {
    super(`the system is singular: pivot ${row} vanished during elimination`);
  }
}

/**
 * Solves A·x = b by banded Gaussian elimination without pivoting. A and b are left untouched.
 * A pivot smaller than `relativePivotTolerance` times the largest diagonal entry counts as zero.
 */
export function solveBanded(matrix: BandedMatrix, rhs: ArrayLike<number>, relativePivotTolerance = 1e-13): Float64Array {
  const factors = matrix.clone();
  const x = Float64Array.from(rhs as ArrayLike<number>);
  factorBanded(factors, 0, matrix.size - 1, relativePivotTolerance);
  substituteBanded(factors, x, 0, matrix.size - 1);
  return x;
}

/**
 * Factors the principal block of rows and columns first … last in place (A = LU, the multipliers
 * of L stored below the diagonal, U on and above it), without pivoting. Entries outside the block
 * are neither read nor changed, so a system whose fixed unknowns sit at either end is solved on
 * its own storage with those rows and columns simply left out. The factors serve any number of
 * right-hand sides (see substituteBanded).
 */
export function factorBanded(matrix: BandedMatrix, first: number, last: number, relativePivotTolerance = 1e-13): void {
  const p = matrix.halfBandwidth;
  const w = matrix.width;
  const a = matrix.data;
  let scale = 0;
  for (let i = first; i <= last; i++) scale = Math.max(scale, Math.abs(a[i * w + p]!));
  const tiny = scale * relativePivotTolerance;
  for (let k = first; k <= last; k++) {
    const pivot = a[k * w + p]!;
    if (!(Math.abs(pivot) > tiny)) throw new ZeroPivotError(k);
    const end = Math.min(last, k + p);
    for (let i = k + 1; i <= end; i++) {
      const factor = a[i * w + k - i + p]! / pivot;
      a[i * w + k - i + p] = factor;
      if (factor === 0) continue;
      for (let j = k + 1; j <= end; j++) a[i * w + j - i + p] -= factor * a[k * w + j - k + p]!;
    }
  }
}

/** Overwrites x[first … last] with the solution of LU·x = x for the factors factorBanded left in the matrix. */
export function substituteBanded(factors: BandedMatrix, x: Float64Array, first: number, last: number): void {
  const p = factors.halfBandwidth;
  const w = factors.width;
  const a = factors.data;
  for (let k = first; k <= last; k++) {
    const xk = x[k]!;
    if (xk === 0) continue;
    const end = Math.min(last, k + p);
    for (let i = k + 1; i <= end; i++) x[i] -= a[i * w + k - i + p]! * xk;
  }
  for (let k = last; k >= first; k--) {
    let sum = x[k]!;
    const end = Math.min(last, k + p);
    for (let j = k + 1; j <= end; j++) sum -= a[k * w + j - k + p]! * x[j]!;
    x[k] = sum / a[k * w + p]!;
  }
}
