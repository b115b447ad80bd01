import type { CompiledNetwork } from "./compiled";
import { ThermalInputError } from "../errors";
import { assemble, maxAbs } from "./assemble";
import { NetworkLu } from "./lu";
import type { FillPattern } from "./ordering";

export interface SteadyOptions {
  /** Temperatures are converged to this, K (default 1e-6): Newton stops when a full step is below a tenth of it. */
  toleranceK?: number;
  /** Cap on Newton iterations (default 100). */
  maxIterations?: number;
}

export interface ResolvedSteadyOptions {
  toleranceK: number;
  maxIterations: number;
}

export function resolveSteadyOptions(options: SteadyOptions = {}): ResolvedSteadyOptions {
  return { toleranceK: options.toleranceK ?? 1e-6, maxIterations: options.maxIterations ?? 100 };
}

export interface CompiledSteadySolution {
  /** Kelvin, solver order. */
  t: Float64Array;
  converged: boolean;
  iterations: number;
  residualW: number;
  /** Whether the solution is a stable equilibrium (false: thermal runaway). */
  stable: boolean;
}

/**
 * The residual a node's balance cannot get below in double precision: each link's heat
 * is G·(Ti − Tj) with Ti, Tj near 300 K, so it carries an error of about G·ulp(T).
 */
function residualFloor(c: CompiledNetwork, t: Float64Array, j: Float64Array): number {
  const n = c.n;
  let gMax = 0;
  let tMax = c.ambientK;
  let p = 1;
  for (let i = 0; i < n; i++) {
    gMax = Math.max(gMax, Math.abs(j[i * n + i]!));
    tMax = Math.max(tMax, t[i]!);
    p += Math.abs(c.p0[i]!) + Math.abs(c.p1[i]! * t[i]!);
  }
  return 1e-13 * p + 16 * Number.EPSILON * gMax * tMax;
}

/** Rise assumed for the first linearisation of temperature-dependent links. */
const GUESS_RISE_K = 20;

/** Scratch arrays of one solve, reused across iterations so the loop allocates nothing. */
export class SolverWorkspace {
  readonly lu: NetworkLu;
  readonly out = new Float64Array(3);
  f: Float64Array;
  fNew: Float64Array;
  j: Float64Array;
  jNew: Float64Array;
  readonly d: Float64Array;
  /** Trial temperatures of the line search. */
  readonly trial: Float64Array;
  constructor(readonly n: number, pattern: FillPattern) {
    this.lu = new NetworkLu(n, pattern);
    this.f = new Float64Array(n);
    this.fNew = new Float64Array(n);
    this.j = new Float64Array(n * n);
    this.jNew = new Float64Array(n * n);
    this.d = new Float64Array(n);
    this.trial = new Float64Array(n);
  }

  /** Factorises a copy of `j` (pivoting only if the cheap factorisation meets a tiny pivot). */
  factor(j: Float64Array): boolean {
    this.lu.a.set(j);
    if (this.lu.factor()) return true;
    this.lu.a.set(j);
    return this.lu.factorPivoted();
  }
}

/**
 * Networks up to this size keep their workspace for the next solve of the same size: for a
 * 20-node network its nine arrays cost more to allocate (V8 gives each typed array over
 * 64 bytes its own backing store) than a Newton iteration, and a search of the inverse
 * problems solves the same network dozens of times. Larger ones allocate afresh, so the
 * module never holds more than about 100 kB (three 64 × 64 matrices).
 */
const KEEP_WORKSPACE_UP_TO = 64;
let spare: SolverWorkspace | null = null;

/** A workspace for n nodes with this fill pattern; taken out of the spare slot, so a nested solve can never share it. */
export function takeWorkspace(n: number, pattern: FillPattern): SolverWorkspace {
  const ws = spare !== null && spare.n === n ? spare : new SolverWorkspace(n, pattern);
  if (ws === spare) spare = null;
  ws.lu.pattern = pattern;
  return ws;
}

/** Hands a workspace back once nothing refers to its arrays any more. */
export function returnWorkspace(ws: SolverWorkspace): void {
  if (ws.n <= KEEP_WORKSPACE_UP_TO) spare = ws;
}

/** Linear network with each link replaced by its secant conductance at a guessed rise: exact for linear networks, a safe start otherwise. */
function initialGuess(c: CompiledNetwork, ws: SolverWorkspace): Float64Array {
  const n = c.n;
  const j = ws.j;
  const rhs = ws.fNew;
  j.fill(0);
  for (let i = 0; i < n; i++) {
    j[i * n + i] = -c.p1[i]!;
    rhs[i] = c.p0[i]!;
  }
  const hot = c.ambientK + GUESS_RISE_K;
  for (const link of c.links) {
    link.model.evaluate(hot, c.ambientK, ws.out, false);
    const g = ws.out[0]! / GUESS_RISE_K;
    const { a, b } = link;
    if (a >= 0) j[a * n + a]! += g;
    if (b >= 0) j[b * n + b]! += g;
    if (a >= 0 && b >= 0) {
      j[a * n + b]! -= g;
      j[b * n + a]! -= g;
    } else {
      rhs[a >= 0 ? a : b]! += g * c.ambientK;
    }
  }
  const t = new Float64Array(n);
  if (!ws.factor(j)) throw new ThermalInputError("unprocessable:network", "the network's conductance matrix is singular", "");
  ws.lu.solve(rhs, t);
  for (let i = 0; i < n; i++) if (!(t[i]! > 1) || !Number.isFinite(t[i]!)) t[i] = hot;
  return t;
}

/**
 * Damped Newton on F(T) = 0 with a backtracking line search on the largest residual.
 * Converged when a full step moves no node by more than the tolerance.
 */
export function solveCompiledSteady(c: CompiledNetwork, options: ResolvedSteadyOptions, start?: Float64Array): CompiledSteadySolution {
  const n = c.n;
  const ws = takeWorkspace(n, c.pattern);
  // `owned` is handed to the caller; the line search alternates it with the workspace's `trial`.
  const owned: Float64Array = start ? Float64Array.from(start) : initialGuess(c, ws);
  let t = owned;
  let tNew = ws.trial;
  assemble(c, t, ws.f, ws.j, ws.out);
  let nf = maxAbs(ws.f);
  let converged = false;
  let iterations = 0;
  while (iterations < options.maxIterations) {
    iterations++;
    if (!ws.factor(ws.j)) throw new ThermalInputError("unprocessable:convergence", "the steady solve met a singular Jacobian (a source that grows with temperature faster than the links can carry it away?)", "");
    for (let i = 0; i < n; i++) ws.d[i] = -ws.f[i]!;
    ws.lu.solve(ws.d, ws.d);
    const fullStep = maxAbs(ws.d);
    if (fullStep < 0.1 * options.toleranceK) {
      // Newton's own termination. Near ΔT = 0 a power-law link (h ∝ ΔT^¼) makes Newton
      // converge only linearly, so stop a decade below the tolerance to keep the error under it.
      for (let i = 0; i < n; i++) t[i]! += ws.d[i]!;
      assemble(c, t, ws.f, ws.j, ws.out);
      nf = maxAbs(ws.f);
      converged = true;
      break;
    }
    const noise = residualFloor(c, t, ws.j);
    let lambda = 1;
    let accepted = false;
    for (let tries = 0; tries < 40; tries++) {
      let positive = true;
      for (let i = 0; i < n; i++) {
        const v = t[i]! + lambda * ws.d[i]!;
        tNew[i] = v;
        if (!(v > 0)) positive = false;
      }
      if (positive) {
        assemble(c, tNew, ws.fNew, ws.jNew, ws.out);
        const nfNew = maxAbs(ws.fNew);
        if (nfNew <= (1 - 1e-4 * lambda) * nf || nfNew <= noise) {
          nf = nfNew;
          accepted = true;
          break;
        }
      }
      lambda *= 0.5;
    }
    if (!accepted) break;
    [t, tNew] = [tNew, t];
    [ws.f, ws.fNew] = [ws.fNew, ws.f];
    [ws.j, ws.jNew] = [ws.jNew, ws.j];
  }
  ws.lu.a.set(ws.j);
  const stable = converged && ws.lu.factor() && ws.lu.pivotsPositive();
  if (t !== owned) {
    owned.set(t);
    t = owned;
  }
  returnWorkspace(ws);
  return { t, converged, iterations, residualW: nf, stable };
}
