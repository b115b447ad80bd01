import { compileNetwork } from "./compile";
import { toCelsius } from "./constants";
import { ThermalInputError } from "./errors";
import { AMBIENT_ID } from "./ids";
import type { Network } from "./schema";
import { solveSteady } from "./solve-steady";
import { resolveSteadyOptions, solveCompiledSteady } from "./solver/steady";

/** Target: keep `node` at or below `limitC` in steady state. */
export interface LimitTarget {
  node: string;
  limitC: number;
  /** How close to the limit the answer lands, K (default 1e-6). */
  toleranceK?: number;
}

export interface SearchOutcome {
  /** Steady solves the search used. */
  solves: number;
  converged: boolean;
  /** The target node's temperature at the answer, °C. */
  temperatureC: number;
}

const MAX_SOLVES = 200;

function nodeIndex(network: Network, id: string, path: string): number {
  const i = network.nodes.findIndex((n) => n.id === id);
  if (i < 0) throw new ThermalInputError("bad_request:inverse", `unknown node "${id}"`, path);
  return i;
}

/** Steady temperature of one node (°C) for a network variant, warm-started from the last answer. */
function probe(target: number) {
  let last: Float64Array | undefined;
  let solves = 0;
  const opts = resolveSteadyOptions();
  return {
    get solves() {
      return solves;
    },
    at(network: Network): number {
      const c = compileNetwork(network);
      solves++;
      let s = solveCompiledSteady(c, opts, last);
      if (!s.converged && last) s = solveCompiledSteady(c, opts);
      if (!s.converged) throw new ThermalInputError("unprocessable:convergence", "a steady solve inside the search did not converge", "");
      if (!s.stable) return Infinity;
      last = s.t;
      return toCelsius(s.t[c.solverIndex[target]!]!);
    },
  };
}

/**
 * Illinois (modified regula falsi) on an increasing f between lo (f < 0) and hi (f ≥ 0).
 * Exact in one step for a linear response, robust for the curved ones.
 */
function illinois(f: (x: number) => number, lo: number, flo: number, hi: number, fhi: number, tolF: number, budget: () => boolean): number {
  let side = 0;
  for (let i = 0; i < MAX_SOLVES && budget(); i++) {
    const x = Number.isFinite(fhi) ? (lo * fhi - hi * flo) / (fhi - flo) : 0.5 * (lo + hi);
    const fx = f(x);
    if (Math.abs(fx) <= tolF) return x;
    if (hi - lo <= 1e-12 * Math.max(1, Math.abs(hi))) return fx <= 0 ? x : lo;
    if (fx < 0) {
      lo = x;
      flo = fx;
      if (side === -1) fhi /= 2;
      side = -1;
    } else {
      hi = x;
      fhi = fx;
      if (side === 1) flo /= 2;
      side = 1;
    }
  }
  return lo;
}

export interface MaxPowerOptions extends LimitTarget {
  /** Whose power to raise: the sources on one node, or every source in proportion (default). */
  sourceNode?: string;
}

export interface MaxPowerResult extends SearchOutcome {
  /** The largest total power of the chosen sources that keeps the node at the limit, W (0 if even none is too much). */
  watts: number;
  /** watts ÷ the chosen sources' present total (null when that total is 0). */
  scale: number | null;
  feasible: boolean;
}

/** The largest source power that keeps a chosen node under a limit in steady state. */
export function maxSourcePower(network: Network, options: MaxPowerOptions): MaxPowerResult {
  const target = nodeIndex(network, options.node, "node");
  if (options.sourceNode !== undefined && options.sourceNode !== AMBIENT_ID) nodeIndex(network, options.sourceNode, "sourceNode");
  const tol = options.toleranceK ?? 1e-6;
  const chosen = (s: { node: string }) => options.sourceNode === undefined || s.node === options.sourceNode;
  const present = network.sources.filter(chosen).reduce((sum, s) => sum + s.watts, 0);
  const withPower = (p: number): Network => {
    const others = network.sources.filter((s) => !chosen(s));
    const mine = network.sources.filter(chosen);
    const sources =
      mine.length === 0
        ? [...others, { node: options.sourceNode!, watts: p }]
        : [...others, ...mine.map((s) => ({ ...s, watts: present !== 0 ? (s.watts * p) / present : p / mine.length }))];
    return { ...network, sources };
  };
  if (options.sourceNode === undefined && network.sources.length === 0) {
    throw new ThermalInputError("bad_request:inverse", "the network has no sources to scale; name a sourceNode", "sourceNode");
  }
  const pr = probe(target);
  const f = (p: number) => pr.at(withPower(p)) - options.limitC;
  const f0 = f(0);
  if (f0 > 0) return { watts: 0, scale: present ? 0 : null, feasible: false, solves: pr.solves, converged: true, temperatureC: f0 + options.limitC };
  let lo = 0;
  let flo = f0;
  let hi = Math.max(Math.abs(present), 1);
  let fhi = f(hi);
  while (fhi < 0 && hi < 1e7) {
    lo = hi;
    flo = fhi;
    hi = Math.min(hi * 4, 1e7);
    fhi = f(hi);
  }
  if (fhi < 0) return { watts: hi, scale: present ? hi / present : null, feasible: true, solves: pr.solves, converged: false, temperatureC: fhi + options.limitC };
  const p = illinois(f, lo, flo, hi, fhi, tol, () => pr.solves < MAX_SOLVES);
  const t = f(p) + options.limitC;
  return { watts: p, scale: present ? p / present : null, feasible: true, solves: pr.solves, converged: Math.abs(t - options.limitC) <= Math.max(tol, 1e-9) || t < options.limitC, temperatureC: t };
}

export interface MaxResistanceOptions extends LimitTarget {
  /** Index in `network.links` of the link whose resistance is asked for (e.g. the sink-to-air link). */
  link: number;
}

export interface MaxResistanceResult extends SearchOutcome {
  /** Largest resistance the link may have, K/W; null when any resistance keeps the node under the limit. */
  kelvinPerWatt: number | null;
  /** The link's effective resistance in the network as given, K/W. */
  presentKelvinPerWatt: number;
  feasible: boolean;
}

/**
 * The largest resistance a chosen link may have and still keep a node under a limit: the
 * "is my heatsink enough?" answer (required sink-to-air K/W next to the present one).
 * The link is replaced by a plain resistance during the search.
 */
export function maxLinkResistance(network: Network, options: MaxResistanceOptions): MaxResistanceResult {
  const target = nodeIndex(network, options.node, "node");
  const link = network.links[options.link];
  if (!Number.isInteger(options.link) || !link) throw new ThermalInputError("bad_request:inverse", `no link at index ${options.link}`, "link");
  const tol = options.toleranceK ?? 1e-6;
  const present = solveSteady(network).links[options.link]!.kelvinPerWatt;
  const withR = (logR: number): Network => ({
    ...network,
    links: network.links.map((l, i) => (i === options.link ? { from: l.from, to: l.to, type: "resistance" as const, kelvinPerWatt: Math.exp(logR) } : l)),
  });
  const pr = probe(target);
  const f = (logR: number) => pr.at(withR(logR)) - options.limitC;
  const lo = Math.log(1e-9);
  const hi = Math.log(1e9);
  const flo = f(lo);
  if (flo > 0) return { kelvinPerWatt: 0, presentKelvinPerWatt: present, feasible: false, solves: pr.solves, converged: true, temperatureC: flo + options.limitC };
  const fhi = f(hi);
  if (fhi <= 0) return { kelvinPerWatt: null, presentKelvinPerWatt: present, feasible: true, solves: pr.solves, converged: true, temperatureC: fhi + options.limitC };
  const x = illinois(f, lo, flo, hi, fhi, tol, () => pr.solves < MAX_SOLVES);
  const t = f(x) + options.limitC;
  return { kelvinPerWatt: Math.exp(x), presentKelvinPerWatt: present, feasible: true, solves: pr.solves, converged: Math.abs(t - options.limitC) <= Math.max(tol, 1e-9) || t < options.limitC, temperatureC: t };
}

