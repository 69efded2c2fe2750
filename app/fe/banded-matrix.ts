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

  constructor(
    readonly size: number,
    readonly halfBandwidth: number,
  ) {
    this.width = 2 * halfBandwidth + 1;
    this.data = new Float64Array(size * this.width);
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
  const n = matrix.size;
  const p = matrix.halfBandwidth;
  const w = matrix.width;
  const a = Float64Array.from(matrix.data);
  const x = Float64Array.from(rhs as ArrayLike<number>);
  let scale = 0;
  for (let i = 0; i < n; i++) scale = Math.max(scale, Math.abs(a[i * w + p]!));
  const tiny = scale * relativePivotTolerance;

  for (let k = 0; k < n; k++) {
    const pivot = a[k * w + p]!;
    if (!(Math.abs(pivot) > tiny)) throw new ZeroPivotError(k);
    const last = Math.min(n - 1, k + p);
    for (let i = k + 1; i <= last; i++) {
      const factor = a[i * w + k - i + p]! / pivot;
      if (factor === 0) continue;
      for (let j = k; j <= last; j++) a[i * w + j - i + p] -= factor * a[k * w + j - k + p]!;
      x[i] -= factor * x[k]!;
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let sum = x[k]!;
    const last = Math.min(n - 1, k + p);
    for (let j = k + 1; j <= last; j++) sum -= a[k * w + j - k + p]! * x[j]!;
    x[k] = sum / a[k * w + p]!;
  }
  return x;
}
