import type { FillPattern } from "./ordering";

/**
 * LU factorisation of the dense, row-major n×n matrix of a heat network, in place.
 *
 * A network's Jacobian is a Z-matrix whose columns sum to ≥ 0 (each link takes from one
 * node what it gives the other), so Gaussian elimination needs no pivoting; the factor and
 * the triangular solves visit only the entries of the fill pattern worked out with the
 * minimum-degree order, so a sparse network costs close to its number of links, not n²
 * (the storage stays dense: the matrix is assembled and copied with single memory moves).
 * If a pivot still comes out tiny (a source that grows with temperature can break the
 * sign pattern) the caller falls back to partial pivoting, which ignores the pattern.
 */
export class NetworkLu {
  readonly n: number;
  readonly a: Float64Array;
  private readonly perm: Int32Array;
  private pivoted = false;

  constructor(
    n: number,
    /** Set anew by whoever reuses the factor for another network of the same size. */
    public pattern: FillPattern,
  ) {
    this.n = n;
    this.a = new Float64Array(n * n);
    this.perm = new Int32Array(n);
  }

  /** Factorises `a` in place; returns false when the matrix is singular. The matrix must be re-assembled before retrying. */
  factor(): boolean {
    this.pivoted = false;
    return this.factorNoPivot();
  }

  /** Partial-pivoting factorisation of a freshly assembled `a`. */
  factorPivoted(): boolean {
    this.pivoted = true;
    const { n, a, perm } = this;
    for (let i = 0; i < n; i++) perm[i] = i;
    for (let k = 0; k < n; k++) {
      let p = k;
      let best = Math.abs(a[k * n + k]!);
      for (let i = k + 1; i < n; i++) {
        const v = Math.abs(a[i * n + k]!);
        if (v > best) {
          best = v;
          p = i;
        }
      }
      if (!(best > 0) || !Number.isFinite(best)) return false;
      if (p !== k) {
        for (let j = 0; j < n; j++) {
          const t = a[k * n + j]!;
          a[k * n + j] = a[p * n + j]!;
          a[p * n + j] = t;
        }
        const t = perm[k]!;
        perm[k] = perm[p]!;
        perm[p] = t;
      }
      const piv = a[k * n + k]!;
      for (let i = k + 1; i < n; i++) {
        const l = a[i * n + k]! / piv;
        if (l === 0) continue;
        a[i * n + k] = l;
        for (let j = k + 1; j < n; j++) a[i * n + j]! -= l * a[k * n + j]!;
      }
    }
    return true;
  }

  private factorNoPivot(): boolean {
    const { n, a } = this;
    const { ptr, upper } = this.pattern;
    for (let k = 0; k < n; k++) {
      const kk = k * n;
      const piv = a[kk + k]!;
      const p0 = ptr[k]!;
      const p1 = ptr[k + 1]!;
      let scale = Math.abs(piv);
      for (let p = p0; p < p1; p++) scale = Math.max(scale, Math.abs(a[kk + upper[p]!]!));
      if (!(Math.abs(piv) > 1e-13 * scale) || !Number.isFinite(piv)) return false;
      // The pattern is symmetric: the rows below the pivot with an entry in column k are row k's columns.
      for (let q = p0; q < p1; q++) {
        const ii = upper[q]! * n;
        const v = a[ii + k]!;
        if (v === 0) continue;
        const l = v / piv;
        a[ii + k] = l;
        for (let p = p0; p < p1; p++) {
          const j = upper[p]!;
          a[ii + j]! -= l * a[kk + j]!;
        }
      }
    }
    return true;
  }

  /**
   * After an unpivoted factorisation: whether every pivot is positive. For a network's
   * Jacobian (a Z-matrix) that is exactly the test for an M-matrix, i.e. a stable
   * equilibrium; a non-positive pivot means heat runs away.
   */
  pivotsPositive(): boolean {
    if (this.pivoted) return false;
    for (let k = 0; k < this.n; k++) if (!(this.a[k * this.n + k]! > 0)) return false;
    return true;
  }

  /** Solves A·x = b with the factors; x may alias b. */
  solve(b: Float64Array, x: Float64Array): void {
    if (this.pivoted) {
      this.solvePivoted(b, x);
      return;
    }
    const { n, a } = this;
    const { ptr, upper, lowerPtr, lower } = this.pattern;
    if (x !== b) x.set(b);
    for (let i = 1; i < n; i++) {
      const ii = i * n;
      let s = x[i]!;
      for (let p = lowerPtr[i]!; p < lowerPtr[i + 1]!; p++) {
        const j = lower[p]!;
        s -= a[ii + j]! * x[j]!;
      }
      x[i] = s;
    }
    for (let i = n - 1; i >= 0; i--) {
      const ii = i * n;
      let s = x[i]!;
      for (let p = ptr[i]!; p < ptr[i + 1]!; p++) {
        const j = upper[p]!;
        s -= a[ii + j]! * x[j]!;
      }
      x[i] = s / a[ii + i]!;
    }
  }

  /** Row exchanges can move entries anywhere, so after a pivoted factorisation the solves run dense. */
  private solvePivoted(b: Float64Array, x: Float64Array): void {
    const { n, a, perm } = this;
    const t = new Float64Array(n);
    for (let i = 0; i < n; i++) t[i] = b[perm[i]!]!;
    for (let i = 0; i < n; i++) x[i] = t[i]!;
    for (let i = 1; i < n; i++) {
      const ii = i * n;
      let s = x[i]!;
      for (let j = 0; j < i; j++) {
        const l = a[ii + j]!;
        if (l !== 0) s -= l * x[j]!;
      }
      x[i] = s;
    }
    for (let i = n - 1; i >= 0; i--) {
      const ii = i * n;
      let s = x[i]!;
      for (let j = i + 1; j < n; j++) {
        const u = a[ii + j]!;
        if (u !== 0) s -= u * x[j]!;
      }
      x[i] = s / a[ii + i]!;
    }
  }
}
