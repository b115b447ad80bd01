import { labelFor } from "@/lib/messages/plain-issues";
import { compileNetwork, formatPath, type CompiledNetwork } from "./compile";
import { NETWORK_LIMITS, toKelvin, ZERO_CELSIUS_K } from "./constants";
import { ThermalInputError } from "./errors";
import { setEntry } from "./record";
import type { Network, Threshold, TransientOptions } from "./schema";
import { solveCompiledTransient, type ResolvedTransientOptions } from "./solver/transient";
import { transientIssues } from "./validate";

export interface Crossing {
  node: string;
  limitC: number;
  /** First time the node reaches the limit, interpolated within the step; null if it never does. */
  timeS: number | null;
}

export interface TransientResult {
  timesS: number[];
  temperaturesC: Record<string, number[]>;
  crossings?: Crossing[];
  /** Every step's Newton iteration converged (a warm-up that cannot converge throws instead of answering). */
  converged: boolean;
  /** Newton corrections over the whole warm-up (the same count as `newtonIterations`). */
  iterations: number;
  /** Largest heat imbalance of the last step's equations at its answer, W. */
  residualW: number;
  /** Newton corrections and matrix factorisations used (for the curious and the benchmark). */
  newtonIterations: number;
  factorisations: number;
}

/** Numerical settings of the warm-up; the defaults suit any lamp-sized network. */
export interface TransientSolverSettings {
  toleranceK?: number;
  refreshAfter?: number;
  maxIterationsPerStep?: number;
}

/** Fills defaults and turns the caller's options into one complete object in kelvin, solver order. */
function resolveOptions(network: Network, solverIndex: Int32Array, options: TransientOptions, settings: TransientSolverSettings): ResolvedTransientOptions {
  const issue = transientIssues({ network, ...options }, { maxSteps: NETWORK_LIMITS.maxTransientSteps, maxValues: NETWORK_LIMITS.maxTransientValues })[0];
  if (issue) throw new ThermalInputError("bad_request:transient", `${labelFor(issue.path)}: ${issue.message}`, formatPath(issue.path));
  const initialK = new Float64Array(network.nodes.length);
  const init = options.initialC;
  network.nodes.forEach((node, i) => {
    const c = typeof init === "number" ? init : (init?.[node.id] ?? network.ambientC);
    initialK[solverIndex[i]!] = toKelvin(c);
  });
  return {
    durationS: options.durationS,
    stepS: options.stepS,
    initialK,
    toleranceK: settings.toleranceK ?? 1e-6,
    refreshAfter: settings.refreshAfter ?? 4,
    maxIterationsPerStep: settings.maxIterationsPerStep ?? 50,
  };
}

/** A network compiled once for several warm-up runs (the chunks of a long warm-up, each starting where the last ended). */
export interface PreparedTransient {
  solve(options: TransientOptions, settings?: TransientSolverSettings): TransientResult;
}

/** Compiles the network once; each `solve` is what `solveTransient` answers for it. */
export function prepareTransient(network: Network): PreparedTransient {
  const compiled = compileNetwork(network);
  return { solve: (options, settings = {}) => solveCompiled(network, compiled, options, settings) };
}

/**
 * Warm-up of a network from ambient (or `initialC`): temperatures at every `stepS` from 0
 * to `durationS`. Nodes without heat capacity follow their neighbours at once, t = 0 included.
 */
export function solveTransient(network: Network, options: TransientOptions, settings: TransientSolverSettings = {}): TransientResult {
  return solveCompiled(network, compileNetwork(network), options, settings);
}

function solveCompiled(network: Network, compiled: CompiledNetwork, options: TransientOptions, settings: TransientSolverSettings): TransientResult {
  const resolved = resolveOptions(network, compiled.solverIndex, options, settings);
  const solution = solveCompiledTransient(compiled, resolved);
  const temperaturesC: Record<string, number[]> = {};
  const zeroC = ZERO_CELSIUS_K;
  for (let i = 0; i < network.nodes.length; i++) {
    const id = network.nodes[i]!.id;
    // The solution's own array of each node (each node has one) becomes its answer, turned to °C in place.
    const values = solution.series[compiled.solverIndex[i]!]!;
    for (let k = 0; k < values.length; k++) {
      const v = values[k]! - zeroC;
      if (!Number.isFinite(v) || v < -zeroC) {
        throw new ThermalInputError("unprocessable:solution", `node "${id}" has no physical temperature during the warm-up`, "");
      }
      values[k] = v;
    }
    setEntry(temperaturesC, id, values);
  }
  const result: TransientResult = {
    timesS: solution.timesS,
    temperaturesC,
    converged: true,
    iterations: solution.newtonIterations,
    residualW: solution.residualW,
    newtonIterations: solution.newtonIterations,
    factorisations: solution.factorisations,
  };
  if (options.thresholds) result.crossings = options.thresholds.map((t) => crossing(t, solution.timesS, temperaturesC[t.node]!));
  return result;
}

/** First upward reach of the limit, linearly interpolated between the two samples around it. */
export function crossing(t: Threshold, times: readonly number[], values: readonly number[]): Crossing {
  if (values[0]! >= t.limitC) return { node: t.node, limitC: t.limitC, timeS: times[0]! };
  for (let k = 1; k < values.length; k++) {
    const v = values[k]!;
    if (v >= t.limitC) {
      const u = values[k - 1]!;
      const f = (t.limitC - u) / (v - u);
      return { node: t.node, limitC: t.limitC, timeS: times[k - 1]! + f * (times[k]! - times[k - 1]!) };
    }
  }
  return { node: t.node, limitC: t.limitC, timeS: null };
}
