import type { CompiledNetwork } from "../compile";

/**
 * Residual F_i(T) = Σ heat leaving node i − P_i(T) and, if `jacobian` is given, its
 * Jacobian ∂F/∂T (dense, row-major, overwritten). Temperatures in kelvin, solver order.
 */
export function assemble(c: CompiledNetwork, t: Float64Array, f: Float64Array, jacobian: Float64Array | null, out: Float64Array): void {
  const n = c.n;
  const amb = c.ambientK;
  for (let i = 0; i < n; i++) f[i] = -(c.p0[i]! + c.p1[i]! * t[i]!);
  if (jacobian) {
    jacobian.fill(0);
    for (let i = 0; i < n; i++) jacobian[i * n + i] = -c.p1[i]!;
  }
  const derivatives = jacobian !== null;
  const links = c.links;
  for (let l = 0; l < links.length; l++) {
    const link = links[l]!;
    const a = link.a;
    const b = link.b;
    link.model.evaluate(a < 0 ? amb : t[a]!, b < 0 ? amb : t[b]!, out, derivatives);
    const q = out[0]!;
    if (a >= 0) f[a]! += q;
    if (b >= 0) f[b]! -= q;
    if (jacobian) {
      const di = out[1]!;
      const dj = out[2]!;
      if (a >= 0) {
        jacobian[a * n + a]! += di;
        if (b >= 0) jacobian[a * n + b]! += dj;
      }
      if (b >= 0) {
        jacobian[b * n + b]! -= dj;
        if (a >= 0) jacobian[b * n + a]! -= di;
      }
    }
  }
}

/** Largest absolute entry. */
export function maxAbs(v: Float64Array): number {
  let m = 0;
  for (let i = 0; i < v.length; i++) {
    const x = Math.abs(v[i]!);
    if (x > m || x !== x) m = x !== x ? Infinity : x;
  }
  return m;
}
