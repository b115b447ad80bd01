import type { CompiledNetwork } from "../compile";
import { ThermalInputError } from "../errors";
import { assemble } from "./assemble";
import { returnWorkspace, takeWorkspace, type SolverWorkspace } from "./steady";

export interface ResolvedTransientOptions {
  durationS: number;
  stepS: number;
  /** Kelvin, solver order: where nodes with heat capacity start. */
  initialK: Float64Array;
  /** Newton stops within a step when the correction is below this, K. */
  toleranceK: number;
  /** Corrections per step before the step's Jacobian is refreshed, and the hard cap. */
  refreshAfter: number;
  maxIterationsPerStep: number;
}

interface StepStats {
  newton: number;
  factor: number;
  /** The `a` coefficient the current factors were built for (NaN: none reusable). */
  factoredFor: number;
}

export interface CompiledTransientSolution {
  timesS: number[];
  /** One Float64Array per solver node, kelvin. */
  series: Float64Array[];
  newtonIterations: number;
  factorisations: number;
}

/** Output instants: every stepS from 0, plus durationS itself when it is not a whole number of steps. */
export function outputTimes(durationS: number, stepS: number): number[] {
  const whole = Math.floor(durationS / stepS + 1e-9);
  const times = Array.from({ length: whole + 1 }, (_, k) => k * stepS);
  if (durationS - whole * stepS > 1e-9 * stepS) times.push(durationS);
  else times[whole] = durationS;
  return times;
}

/**
 * Variable-step BDF2 (backward Euler for the first step), solving each step's implicit
 * equations by Newton with the Jacobian re-linearised at the start of every step. L-stable,
 * so a 0.05 J/K junction beside a 50 J/K heatsink is no trouble at 1 s steps; nodes without
 * heat capacity are algebraic equations in the same system (index-1 DAE), which BDF handles.
 */
export function solveCompiledTransient(c: CompiledNetwork, o: ResolvedTransientOptions): CompiledTransientSolution {
  const n = c.n;
  const ws = takeWorkspace(n, c.pattern);
  const times = outputTimes(o.durationS, o.stepS);
  const series = Array.from({ length: n }, () => new Float64Array(times.length));
  let prev = new Float64Array(n);
  let cur = Float64Array.from(o.initialK);
  const next = new Float64Array(n);
  const stats: StepStats = { newton: 0, factor: 0, factoredFor: NaN };

  // Nodes without heat capacity follow their neighbours at once, also at t = 0.
  solveStep(c, ws, cur, cur, prev, 0, 0, 0, Infinity, o, stats, 0);
  for (let i = 0; i < n; i++) series[i]![0] = cur[i]!;

  let hPrev = 0;
  for (let k = 1; k < times.length; k++) {
    const h = times[k]! - times[k - 1]!;
    let c0: number;
    let c1: number;
    let c2: number;
    if (k === 1) {
      c0 = 1;
      c1 = -1;
      c2 = 0;
    } else {
      const w = h / hPrev;
      c0 = (1 + 2 * w) / (1 + w);
      c1 = -(1 + w);
      c2 = (w * w) / (1 + w);
    }
    // Predictor: linear extrapolation of the last two points.
    const w = k === 1 ? 0 : h / hPrev;
    for (let i = 0; i < n; i++) next[i] = cur[i]! + w * (cur[i]! - prev[i]!);
    solveStep(c, ws, next, cur, prev, c0 / h, c1 / h, c2 / h, h, o, stats, times[k]!);
    for (let i = 0; i < n; i++) series[i]![k] = next[i]!;
    [prev, cur] = [cur, prev];
    cur.set(next);
    hPrev = h;
  }
  returnWorkspace(ws);
  return { timesS: times, series, newtonIterations: stats.newton, factorisations: stats.factor };
}

/**
 * Solves C·(a·T + b·T_n + c·T_{n−1}) + F(T) = 0 for T (in place in `t`). With h = ∞
 * it instead holds nodes with heat capacity at their value and solves the others.
 */
function solveStep(
  c: CompiledNetwork,
  ws: SolverWorkspace,
  t: Float64Array,
  tn: Float64Array,
  tnm1: Float64Array,
  a: number,
  b: number,
  cc: number,
  h: number,
  o: ResolvedTransientOptions,
  stats: StepStats,
  timeS: number,
): void {
  const n = c.n;
  const cap = c.capacity;
  const hold = h === Infinity;
  const held = hold ? Float64Array.from(tn) : null;
  // A linear network's step matrix depends only on the step length: factorise it once.
  const reuse = c.linear && !hold && stats.factoredFor === a;
  let sinceRefresh = reuse ? 0 : Infinity;
  let exact = reuse;
  const f = ws.f;
  for (let it = 0; it < o.maxIterationsPerStep; it++) {
    const refresh = sinceRefresh >= o.refreshAfter;
    assemble(c, t, f, refresh ? ws.j : null, ws.out);
    if (held) {
      for (let i = 0; i < n; i++) if (cap[i] !== 0) f[i] = t[i]! - held[i]!;
    } else {
      for (let i = 0; i < n; i++) {
        const ci = cap[i]!;
        if (ci !== 0) f[i]! += ci * (a * t[i]! + b * tn[i]! + cc * tnm1[i]!);
      }
    }
    if (refresh) {
      const j = ws.j;
      for (let i = 0; i < n; i++) {
        const ci = cap[i]!;
        if (ci === 0) continue;
        if (held) {
          j.fill(0, i * n, i * n + n);
          j[i * n + i] = 1;
        } else j[i * n + i]! += ci * a;
      }
      if (!ws.factor(j)) throw new ThermalInputError("unprocessable:convergence", `warm-up met a singular system at t = ${timeS} s`, "");
      stats.factor++;
      stats.factoredFor = hold ? NaN : a;
      sinceRefresh = 0;
      exact = c.linear;
    }
    // The correction is −J⁻¹F: solve for J⁻¹F in place and subtract it, noting the largest move.
    ws.lu.solve(f, f);
    stats.newton++;
    sinceRefresh++;
    let step = 0;
    for (let i = 0; i < n; i++) {
      const v = f[i]!;
      t[i]! -= v;
      const m = Math.abs(v);
      if (m > step || m !== m) step = m !== m ? Infinity : m;
    }
    if (!Number.isFinite(step)) break;
    // For a linear network one solve with the exact matrix is the answer.
    if (step < o.toleranceK || (exact && it === 0)) return;
  }
  throw new ThermalInputError("unprocessable:convergence", `warm-up did not converge within a step at t = ${timeS} s; try a smaller stepS`, "stepS");
}
