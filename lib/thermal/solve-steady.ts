import { compileNetwork, setCompiledSources, type CompiledNetwork } from "./compile";
import { toCelsius, toKelvin } from "./constants";
import { ThermalInputError } from "./errors";
import { setEntry } from "./record";
import type { LinkType, Network } from "./schema";
import { resolveSteadyOptions, solveCompiledSteady, type CompiledSteadySolution, type SteadyOptions } from "./solver/steady";

export interface SteadyLinkResult {
  from: string;
  to: string;
  type: LinkType;
  label?: string;
  /** Heat carried from → to, W. */
  watts: number;
  /** Effective resistance at the solution, ΔT/q (the small-signal value where no heat flows). */
  kelvinPerWatt: number;
}

export interface SteadyResult {
  converged: boolean;
  iterations: number;
  temperaturesC: Record<string, number>;
  links: SteadyLinkResult[];
  /** Heat from the sources minus heat reaching ambient, W. */
  energyBalanceW: number;
  /** Largest heat imbalance at any node at the solution, W. */
  residualW: number;
}

/** Solves the steady state of a network (parsed by `networkSchema`). Throws ThermalInputError for networks it cannot answer. */
export function solveSteady(network: Network, options?: SteadyOptions, startC?: Readonly<Record<string, number>>): SteadyResult {
  const { compiled, solution } = solveChecked(network, options, startC);
  return steadyResult(compiled, solution.t, solution.iterations, solution.residualW);
}

/**
 * The steady temperatures alone (°C by node id), with every check `solveSteady` makes: what
 * a search needs of each of its probes, without the heat of every link.
 */
export function steadyTemperatures(network: Network, options?: SteadyOptions, startC?: Readonly<Record<string, number>>): Record<string, number> {
  return compiledSteadyTemperatures(compileNetwork(network), options, startC);
}

/** The same for a network compiled already (a search changes one value in it between its probes). */
export function compiledSteadyTemperatures(compiled: CompiledNetwork, options?: SteadyOptions, startC?: Readonly<Record<string, number>>): Record<string, number> {
  const { solution } = solveCheckedCompiled(compiled, options, startC);
  assertPhysical(compiled, solution.t);
  return temperaturesOf(compiled, solution.t);
}

/**
 * `steadyTemperatures` of one heat path under sets of sources on its nodes that change
 * between calls (a search over a heat, such as a throttled charge current): compiled once,
 * the sources set in place for each solve. Each answer is the one `steadyTemperatures`
 * gives for the network with those sources.
 */
export function sourceSweep(network: Network): (sources: Network["sources"], options?: SteadyOptions, startC?: Readonly<Record<string, number>>) => Record<string, number> {
  const compiled = compileNetwork(network);
  return (sources, options, startC) => {
    setCompiledSources(compiled, sources);
    return compiledSteadyTemperatures(compiled, options, startC);
  };
}

function solveChecked(network: Network, options: SteadyOptions | undefined, startC: Readonly<Record<string, number>> | undefined): { compiled: CompiledNetwork; solution: CompiledSteadySolution } {
  return solveCheckedCompiled(compileNetwork(network), options, startC);
}

function solveCheckedCompiled(compiled: CompiledNetwork, options: SteadyOptions | undefined, startC: Readonly<Record<string, number>> | undefined): { compiled: CompiledNetwork; solution: CompiledSteadySolution } {
  const network = compiled.network;
  const resolved = resolveSteadyOptions(options);
  // A start near the answer (the last solve of a slightly different network) saves Newton
  // steps; should it not converge to a stable state, the solve starts over from its own guess.
  const start = startC ? startKelvin(compiled, startC) : undefined;
  let solution: CompiledSteadySolution | null = null;
  if (start) {
    try {
      solution = solveCompiledSteady(compiled, resolved, start);
    } catch (err) {
      if (!(err instanceof ThermalInputError)) throw err;
    }
  }
  if (!solution || !(solution.converged && solution.stable)) solution = solveCompiledSteady(compiled, resolved);
  if (!solution.converged) {
    throw new ThermalInputError(
      "unprocessable:convergence",
      `steady solve did not converge in ${solution.iterations} iterations (largest residual ${solution.residualW.toPrecision(3)} W)`,
      "",
    );
  }
  if (!solution.stable) throw runawayError(network);
  return { compiled, solution };
}

/** Start temperatures in solver order, kelvin; undefined unless every node has a finite one. */
function startKelvin(c: CompiledNetwork, startC: Readonly<Record<string, number>>): Float64Array | undefined {
  const t = new Float64Array(c.n);
  for (let k = 0; k < c.n; k++) {
    const v = startC[c.ids[k]!];
    if (v === undefined || !Number.isFinite(v)) return undefined;
    t[k] = toKelvin(v);
  }
  return t;
}

/** A steady state exists only as an unstable balance (or not at all): heat grows faster with temperature than the links remove it. */
export function runawayError(network: Network): ThermalInputError {
  const i = (network.sources ?? []).findIndex((s) => (s.wattsPerKelvin ?? 0) > 0);
  const who = i >= 0 ? `the source on "${network.sources[i]!.node}"` : "a source";
  return new ThermalInputError(
    "unprocessable:runaway",
    `no stable steady state: the heat of ${who} grows with temperature faster than the links carry it away (thermal runaway)`,
    i >= 0 ? `sources[${i}].wattsPerKelvin` : "",
  );
}

/** Builds the public answer from solver-order kelvin temperatures. */
export function steadyResult(c: CompiledNetwork, t: Float64Array, iterations: number, residualW: number): SteadyResult {
  assertPhysical(c, t);
  const out = new Float64Array(3);
  let toAmbient = 0;
  const links = c.network.links.map((link, l): SteadyLinkResult => {
    const { a, b, model } = c.links[l]!;
    const ti = a < 0 ? c.ambientK : t[a]!;
    const tj = b < 0 ? c.ambientK : t[b]!;
    model.evaluate(ti, tj, out, true);
    const q = out[0]!;
    if (b < 0) toAmbient += q;
    if (a < 0) toAmbient -= q;
    const ratio = (ti - tj) / q;
    const smallSignal = out[1]! > 0 ? 1 / out[1]! : Number.MAX_VALUE;
    const r = Math.abs(q) > 1e-12 && Number.isFinite(ratio) && ratio > 0 ? ratio : smallSignal;
    const kelvinPerWatt = Math.min(r, Number.MAX_VALUE);
    return link.label ? { from: link.from, to: link.to, type: link.type, label: link.label, watts: q, kelvinPerWatt } : { from: link.from, to: link.to, type: link.type, watts: q, kelvinPerWatt };
  });
  let sources = 0;
  for (let i = 0; i < c.n; i++) sources += c.p0[i]! + c.p1[i]! * t[i]!;
  return { converged: true, iterations, temperaturesC: temperaturesOf(c, t), links, energyBalanceW: sources - toAmbient, residualW };
}

/** Every node at a finite temperature above absolute zero, or the error naming the first that is not. */
function assertPhysical(c: CompiledNetwork, t: Float64Array): void {
  for (let i = 0; i < c.n; i++) {
    if (!Number.isFinite(t[i]!) || !(t[i]! > 0)) {
      throw new ThermalInputError("unprocessable:solution", `node "${c.ids[i]}" has no physical steady temperature (the sources remove more heat than can reach it)`, `nodes[${c.network.nodes.findIndex((x) => x.id === c.ids[i])}]`);
    }
  }
}

/** °C by node id, in the network's node order. */
function temperaturesOf(c: CompiledNetwork, t: Float64Array): Record<string, number> {
  const temperaturesC: Record<string, number> = {};
  const nodes = c.network.nodes;
  for (let i = 0; i < nodes.length; i++) setEntry(temperaturesC, nodes[i]!.id, toCelsius(t[c.solverIndex[i]!]!));
  return temperaturesC;
}

