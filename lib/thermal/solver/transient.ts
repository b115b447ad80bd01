import type { CompiledNetwork } from "./compiled";
import { ThermalInputError } from "../errors";
import { assemble, maxAbs } from "./assemble";
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
  /** One array per solver node, kelvin at each output instant. */
  series: number[][];
  newtonIterations: number;
  factorisations: number;
  /** Internal steps rejected and retried shorter (internal: the public answer keeps its shape). */
  rejectedSteps: number;
  /** Largest heat imbalance of the last step's equations at its accepted temperatures, W. */
  residualW: number;
}

/** Output instants: every stepS from 0, plus durationS itself when it is not a whole number of steps. */
export function outputTimes(durationS: number, stepS: number): number[] {
  const whole = Math.floor(durationS / stepS + 1e-9);
  const times: number[] = [];
  for (let k = 0; k <= whole; k++) times.push(k * stepS);
  if (durationS - whole * stepS > 1e-9 * stepS) times.push(durationS);
  else times[whole] = durationS;
  return times;
}

/**
 * Largest move of any node in one Newton correction of a non-linear network, K. Starting
 * from a stale Jacobian, a node without heat capacity whose natural-convection links sit
 * near ΔT = 0 (where h ∝ ΔT^¼ makes the slope tiny) can be thrown hundreds of kelvin —
 * below absolute zero, where the air properties turn NaN and the next Jacobian is singular.
 * A step that really moves a node further just takes a few more corrections (the
 * convergence test is on the full correction, so the answer is the same).
 */
const MAX_MOVE_K = 50;
/** A correction may take a node at most this fraction of the way to 0 K, so temperatures stay physical. */
const MAX_DROP_FRACTION = 0.5;
/**
 * A correction larger than this fraction of the previous one means Newton is barely
 * contracting, as on a Jacobian reused from temperatures the network has left (a healthy
 * iteration contracts by far more): refresh it at once instead of after `refreshAfter`.
 */
const POOR_CONTRACTION = 0.5;
/** A failed step is halved at most this often (down to 1/1024 of the output step) before the warm-up gives up. */
const MAX_HALVINGS = 10;

/** How a step's Newton iteration ended. */
const STEP_OK = 0;
const STEP_SINGULAR = 1;
const STEP_NO_CONVERGENCE = 2;
type StepOutcome = typeof STEP_OK | typeof STEP_SINGULAR | typeof STEP_NO_CONVERGENCE;

function stepError(outcome: StepOutcome, timeS: number): ThermalInputError {
  return outcome === STEP_SINGULAR
    ? new ThermalInputError("unprocessable:convergence", `warm-up met a singular system at t = ${timeS} s`, "")
    : new ThermalInputError("unprocessable:convergence", `warm-up did not converge within a step at t = ${timeS} s; try a smaller stepS`, "stepS");
}

/**
 * Variable-step BDF2 (backward Euler for the first step), solving each step's implicit
 * equations by Newton started from a parabola through the last three points. The factored
 * Jacobian is kept from step to step while the step length stays the same (a simplified
 * Newton: the answer is the same to the tolerance, since the test is on the full
 * correction) and re-linearised when a correction contracts poorly, after `refreshAfter`
 * corrections, or when the step length changes. L-stable,
 * so a 0.05 J/K junction beside a 50 J/K heatsink is no trouble at 1 s steps; nodes without
 * heat capacity are algebraic equations in the same system (index-1 DAE), which BDF handles.
 *
 * Normally one step per output interval. A step whose Newton iteration fails is rejected and
 * retried at half the length (the history is untouched until a step is accepted, so a
 * rejection costs no copies), then the step doubles back after each success; internal
 * steps always land on the output instants, and the step ratio stays ≤ 2, inside the
 * range where variable-step BDF2 is zero-stable (< 1 + √2).
 */
export function solveCompiledTransient(c: CompiledNetwork, o: ResolvedTransientOptions): CompiledTransientSolution {
  const n = c.n;
  const ws = takeWorkspace(n, c.pattern);
  const times = outputTimes(o.durationS, o.stepS);
  // The samples go into plain arrays (the form the answer takes, so the caller need not
  // copy them) and the four working vectors are views of one buffer: a typed array of its
  // own costs more to allocate (see scratch.ts), and a long warm-up runs in several chunks,
  // each a solve of its own.
  const series: number[][] = [];
  for (let i = 0; i < n; i++) series.push([]);
  const work = new Float64Array(4 * n);
  let prev = work.subarray(0, n);
  // The point before `prev`, for the predictor only.
  let prev2 = work.subarray(n, 2 * n);
  let cur = work.subarray(2 * n, 3 * n);
  cur.set(o.initialK);
  const next = work.subarray(3 * n);
  const stats: StepStats = { newton: 0, factor: 0, factoredFor: NaN };

  // Nodes without heat capacity follow their neighbours at once, also at t = 0.
  const start = solveStep(c, ws, cur, cur, prev, 0, 0, 0, Infinity, o, stats);
  if (start !== STEP_OK) {
    returnWorkspace(ws);
    throw stepError(start, 0);
  }
  for (let i = 0; i < n; i++) series[i]!.push(cur[i]!);

  const minStepS = o.stepS / 2 ** MAX_HALVINGS;
  // Length of the previous accepted step (0: none yet, so the next is backward Euler).
  let hPrev = 0;
  // The step before that (0: none yet).
  let hPrev2 = 0;
  // Longest internal step allowed after a rejection; Infinity: the whole output interval.
  let hMax = Infinity;
  let rejected = 0;
  let residualW = 0;
  for (let k = 1; k < times.length; k++) {
    const end = times[k]!;
    let at = times[k - 1]!;
    while (at < end) {
      const remaining = end - at;
      // Equal parts of what is left, so no sliver step (and no huge ratio after it) is left over.
      const parts = remaining <= hMax ? 1 : Math.ceil(remaining / hMax - 1e-9);
      const h = remaining / parts;
      let c0 = 1;
      let c1 = -1;
      let c2 = 0;
      const w = hPrev === 0 ? 0 : h / hPrev;
      if (hPrev !== 0) {
        c0 = (1 + 2 * w) / (1 + w);
        c1 = -(1 + w);
        c2 = (w * w) / (1 + w);
      }
      if (hPrev2 !== 0) {
        // Predictor: the parabola through the last three points, which lands close enough
        // that most steps need one correction fewer than from a straight line.
        const h1 = hPrev;
        const h2 = hPrev2;
        const l0 = ((h + h1) * (h + h1 + h2)) / (h1 * (h1 + h2));
        const l1 = -(h * (h + h1 + h2)) / (h1 * h2);
        const l2 = (h * (h + h1)) / ((h1 + h2) * h2);
        for (let i = 0; i < n; i++) next[i] = l0 * cur[i]! + l1 * prev[i]! + l2 * prev2[i]!;
      } else {
        // Predictor: linear extrapolation of the last two points.
        for (let i = 0; i < n; i++) next[i] = cur[i]! + w * (cur[i]! - prev[i]!);
      }
      const outcome = solveStep(c, ws, next, cur, prev, c0 / h, c1 / h, c2 / h, h, o, stats);
      if (outcome !== STEP_OK) {
        if (h / 2 < minStepS) {
          returnWorkspace(ws);
          throw stepError(outcome, end);
        }
        hMax = h / 2;
        rejected++;
        continue;
      }
      if (k === times.length - 1 && parts === 1) residualW = stepResidual(c, ws, next, cur, prev, c0 / h, c1 / h, c2 / h);
      [prev2, prev, cur] = [prev, cur, prev2];
      cur.set(next);
      hPrev2 = hPrev;
      hPrev = h;
      at = parts === 1 ? end : at + h;
      // Grow back; once a doubled step covers an output interval the normal path resumes.
      if (hMax !== Infinity) hMax = 2 * h >= o.stepS ? Infinity : 2 * h;
    }
    for (let i = 0; i < n; i++) series[i]!.push(cur[i]!);
  }
  returnWorkspace(ws);
  return { timesS: times, series, newtonIterations: stats.newton, factorisations: stats.factor, rejectedSteps: rejected, residualW };
}

/** max |C·(a·T + b·T_n + c·T_{n−1}) + F(T)|, W: how well a step's equations hold at its answer. */
function stepResidual(c: CompiledNetwork, ws: SolverWorkspace, t: Float64Array, tn: Float64Array, tnm1: Float64Array, a: number, b: number, cc: number): number {
  const f = ws.fNew;
  assemble(c, t, f, null, ws.out);
  for (let i = 0; i < c.n; i++) {
    const ci = c.capacity[i]!;
    if (ci !== 0) f[i]! += ci * (a * t[i]! + b * tn[i]! + cc * tnm1[i]!);
  }
  return maxAbs(f);
}

/**
 * Solves C·(a·T + b·T_n + c·T_{n−1}) + F(T) = 0 for T (in place in `t`). With h = ∞
 * it instead holds nodes with heat capacity at their value and solves the others.
 * Returns how the iteration ended; on failure `t` holds no answer.
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
): StepOutcome {
  const n = c.n;
  const cap = c.capacity;
  const hold = h === Infinity;
  const held = hold ? Float64Array.from(tn) : null;
  // The step matrix of a linear network depends only on the step length: factorised once, it
  // is exact. A non-linear network's factors from an earlier step of the same length serve
  // as a simplified Newton's until a correction contracts poorly.
  const reuse = !hold && stats.factoredFor === a;
  let sinceRefresh = reuse ? 0 : Infinity;
  let exact = reuse && c.linear;
  let lastStep = Infinity;
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
      // Whatever the factor holds after a failure is no use to the next step either.
      stats.factoredFor = NaN;
      if (!ws.factor(j)) return STEP_SINGULAR;
      stats.factor++;
      stats.factoredFor = hold ? NaN : a;
      sinceRefresh = 0;
      exact = c.linear;
    }
    // The correction is −J⁻¹F: solve for J⁻¹F in place, then find the largest move and how far it may go.
    ws.lu.solve(f, f);
    stats.newton++;
    sinceRefresh++;
    let step = 0;
    let drop = 1;
    for (let i = 0; i < n; i++) {
      const v = f[i]!;
      const m = Math.abs(v);
      if (m > step || m !== m) step = m !== m ? Infinity : m;
      if (v > MAX_DROP_FRACTION * t[i]!) drop = Math.min(drop, (MAX_DROP_FRACTION * t[i]!) / v);
    }
    if (!Number.isFinite(step)) return STEP_SINGULAR;
    // A linear network's correction is exact (and its answer is checked for 0 K afterwards): limiting it would only cost iterations.
    const scale = c.linear ? 1 : Math.min(drop, step > MAX_MOVE_K ? MAX_MOVE_K / step : 1);
    for (let i = 0; i < n; i++) t[i]! -= scale * f[i]!;
    // For a linear network one solve with the exact matrix is the answer.
    if (step < o.toleranceK || (exact && it === 0)) return STEP_OK;
    if (step > POOR_CONTRACTION * lastStep) sinceRefresh = Infinity;
    lastStep = step;
  }
  return STEP_NO_CONVERGENCE;
}
