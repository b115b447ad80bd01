import type { CompiledLink, CompiledNetwork, LinkGroups } from "./compiled";

export function groupLinks(links: readonly CompiledLink[]): LinkGroups {
  let lin = 0;
  let rad = 0;
  let nat = 0;
  let oth = 0;
  for (const { model } of links) {
    if (model.kind === "linear") lin++;
    else if (model.kind === "radiation") rad++;
    else if (model.kind === "natural-convection") nat++;
    else oth++;
  }
  // One buffer carved into views rather than ten arrays (see scratch.ts on what each allocation costs): the reals first, so the ints after them stay aligned.
  const buffer = new ArrayBuffer(8 * (lin + rad) + 4 * 2 * (lin + rad + nat + oth));
  const reals = new Float64Array(buffer, 0, lin + rad);
  const ints = new Int32Array(buffer, 8 * (lin + rad), 2 * (lin + rad + nat + oth));
  // Consecutive views: lin, lin, rad, rad, nat, nat, oth, oth (no closure: set-up time counts for small networks).
  const r1 = 2 * lin;
  const n1 = r1 + 2 * rad;
  const o1 = n1 + 2 * nat;
  const g: LinkGroups = {
    linA: ints.subarray(0, lin),
    linB: ints.subarray(lin, r1),
    linG: reals.subarray(0, lin),
    radA: ints.subarray(r1, r1 + rad),
    radB: ints.subarray(r1 + rad, n1),
    radC: reals.subarray(lin),
    natA: ints.subarray(n1, n1 + nat),
    natB: ints.subarray(n1 + nat, o1),
    nat: [],
    othA: ints.subarray(o1, o1 + oth),
    othB: ints.subarray(o1 + oth, o1 + 2 * oth),
    oth: [],
  };
  lin = 0;
  rad = 0;
  for (const { a, b, model } of links) {
    if (model.kind === "linear") {
      g.linA[lin] = a;
      g.linB[lin] = b;
      g.linG[lin++] = model.conductance;
    } else if (model.kind === "radiation") {
      g.radA[rad] = a;
      g.radB[rad] = b;
      g.radC[rad++] = model.c;
    } else if (model.kind === "natural-convection") {
      g.natA[g.nat.length] = a;
      g.natB[g.nat.length] = b;
      g.nat.push(model);
    } else {
      g.othA[g.oth.length] = a;
      g.othB[g.oth.length] = b;
      g.oth.push(model);
    }
  }
  return g;
}

/** Adds a link's heat q (from a to b) and its derivatives to the residual and the dense Jacobian; index −1 is ambient. */
function scatter(f: Float64Array, jac: Float64Array | null, n: number, a: number, b: number, q: number, di: number, dj: number): void {
  if (a >= 0) f[a]! += q;
  if (b >= 0) f[b]! -= q;
  if (jac === null) return;
  if (a >= 0) {
    jac[a * n + a]! += di;
    if (b >= 0) jac[a * n + b]! += dj;
  }
  if (b >= 0) {
    jac[b * n + b]! -= dj;
    if (a >= 0) jac[b * n + a]! -= di;
  }
}

/**
 * Residual F_i(T) = Σ heat leaving node i − P_i(T) and, if `jacobian` is given, its
 * Jacobian ∂F/∂T (dense, row-major, overwritten). Temperatures in kelvin, solver order.
 */
export function assemble(c: CompiledNetwork, t: Float64Array, f: Float64Array, jacobian: Float64Array | null, out: Float64Array): void {
  const n = c.n;
  const amb = c.ambientK;
  const { p0, p1, groups: g } = c;
  for (let i = 0; i < n; i++) f[i] = -(p0[i]! + p1[i]! * t[i]!);
  if (jacobian) {
    jacobian.fill(0);
    for (let i = 0; i < n; i++) jacobian[i * n + i] = -p1[i]!;
  }
  const { linA, linB, linG } = g;
  for (let l = 0; l < linA.length; l++) {
    const a = linA[l]!;
    const b = linB[l]!;
    const gl = linG[l]!;
    scatter(f, jacobian, n, a, b, gl * ((a < 0 ? amb : t[a]!) - (b < 0 ? amb : t[b]!)), gl, -gl);
  }
  const { radA, radB, radC } = g;
  for (let l = 0; l < radA.length; l++) {
    const a = radA[l]!;
    const b = radB[l]!;
    const ti = a < 0 ? amb : t[a]!;
    const tj = b < 0 ? amb : t[b]!;
    const ti2 = ti * ti;
    const tj2 = tj * tj;
    const cl = radC[l]!;
    scatter(f, jacobian, n, a, b, cl * (ti2 * ti2 - tj2 * tj2), 4 * cl * ti2 * ti, -4 * cl * tj2 * tj);
  }
  const derivatives = jacobian !== null;
  const { natA, natB, nat } = g;
  for (let l = 0; l < nat.length; l++) {
    const a = natA[l]!;
    const b = natB[l]!;
    nat[l]!.evaluate(a < 0 ? amb : t[a]!, b < 0 ? amb : t[b]!, out, derivatives);
    scatter(f, jacobian, n, a, b, out[0]!, out[1]!, out[2]!);
  }
  const { othA, othB, oth } = g;
  for (let l = 0; l < oth.length; l++) {
    const a = othA[l]!;
    const b = othB[l]!;
    oth[l]!.evaluate(a < 0 ? amb : t[a]!, b < 0 ? amb : t[b]!, out, derivatives);
    scatter(f, jacobian, n, a, b, out[0]!, out[1]!, out[2]!);
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
