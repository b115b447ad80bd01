import { compileNetwork, type CompiledNetwork } from "./compile";
import { LinearLink } from "./link-models";
import { toCelsius } from "./constants";
import { ThermalInputError } from "./errors";
import { AMBIENT_ID } from "./ids";
import type { Network } from "./schema";
import { compiledSteadyTemperatures, solveSteady, type SteadyResult } from "./solve-steady";
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
/** The power search stops at 10 MW: far beyond any lamp, so reaching it means the limit is never met. */
const MAX_POWER_W = 1e7;

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

export interface Root {
  x: number | null;
  /** f at x (when x is not null). */
  fx: number;
  /** -1: f < 0 over the whole range (never reached); +1: f > 0 over it (always exceeded). */
  outside: -1 | 0 | 1;
  solves: number;
}

/**
 * The one inverse search of the engine: the root of an increasing f in [lo, hi], starting
 * from a known point (x0, f0) and a first guess x1. Secant steps (at most 4× the last step)
 * walk until the root is bracketed; Illinois (modified regula falsi) then closes in. Exact
 * in one step for a linear response, robust for the curved ones. Stops when |f| ≤ tolF,
 * when the bracket shrinks to round-off, or after maxSolves evaluations.
 */
export function monotoneRoot(f: (x: number) => number, x0: number, f0: number, x1: number, lo: number, hi: number, tolF: number, maxSolves: number): Root {
  let solves = 0;
  const ev = (x: number) => {
    solves++;
    return f(x);
  };
  let [a, fa] = [x0, f0];
  let b = Math.min(Math.max(x1, lo), hi);
  let fb = ev(b);
  while (Math.sign(fa) === Math.sign(fb) && Math.abs(fb) > tolF && solves < maxSolves) {
    if ((fb < 0 && b >= hi) || (fb > 0 && b <= lo)) return { x: null, fx: fb, outside: fb < 0 ? -1 : 1, solves };
    const slope = (fb - fa) / (b - a);
    const d = b - a;
    let next = slope > 0 && Number.isFinite(slope) ? b - fb / slope : b + (fb < 0 ? 4 : -4) * Math.abs(d);
    next = Math.min(Math.max(next, b - 4 * Math.abs(d) - 1e-12, lo), b + 4 * Math.abs(d) + 1e-12, hi);
    [a, fa] = [b, fb];
    b = next;
    fb = ev(b);
  }
  if (Math.abs(fb) <= tolF || Math.sign(fa) === Math.sign(fb)) return { x: b, fx: fb, outside: 0, solves };
  let [l, fl, h, fh] = fa < 0 ? [a, fa, b, fb] : [b, fb, a, fa];
  let side = 0;
  let x = b;
  let fx = fb;
  while (solves < maxSolves) {
    x = Number.isFinite(fh) ? (l * fh - h * fl) / (fh - fl) : 0.5 * (l + h);
    fx = ev(x);
    if (Math.abs(fx) <= tolF || Math.abs(h - l) <= 1e-12 * Math.max(1, Math.abs(h))) break;
    if (fx < 0) {
      [l, fl] = [x, fx];
      if (side === -1) fh /= 2;
      side = -1;
    } else {
      [h, fh] = [x, fx];
      if (side === 1) fl /= 2;
      side = 1;
    }
  }
  // Out of budget on the hot side: the last point known to keep the limit is the answer.
  if (fx > tolF) return { x: l, fx: fl, outside: 0, solves };
  return { x, fx, outside: 0, solves };
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
  const root = monotoneRoot(f, 0, f0, Math.max(Math.abs(present), 1), 0, MAX_POWER_W, tol, MAX_SOLVES - 1);
  if (root.outside === -1) return { watts: MAX_POWER_W, scale: present ? MAX_POWER_W / present : null, feasible: true, solves: pr.solves, converged: false, temperatureC: root.fx + options.limitC };
  const p = root.x ?? 0;
  const t = root.fx + options.limitC;
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
  const root = monotoneRoot(f, lo, flo, hi, lo, hi, tol, MAX_SOLVES - 2);
  const x = root.x ?? lo;
  const t = root.fx + options.limitC;
  return { kelvinPerWatt: Math.exp(x), presentKelvinPerWatt: present, feasible: true, solves: pr.solves, converged: Math.abs(t - options.limitC) <= Math.max(tol, 1e-9) || t < options.limitC, temperatureC: t };
}


/**
 * The two "what it takes" questions of the Budget and the quick check, answered with a few
 * steady solves each. The responses are monotone and nearly linear (a temperature against a
 * series resistance, or against a common scale of every source), so the search lands in 2–4
 * solves. Searches stay inside a practical range, so no solve is asked about a sink so poor
 * the parts would be thousands of kelvin hot.
 */
const PROBE_SOLVES = 24;

/**
 * Each probe only has to place a temperature within the search tolerance (0.02 K), so its
 * steady solve stops at 1e-4 K instead of the engine's 1e-6 K: one Newton correction
 * fewer per probe, and the probe moves by ~1e-11 K (Newton converges quadratically).
 */
const PROBE = { toleranceK: 1e-4 } as const;

export interface ResistanceAnswer {
  /** Largest resistance of the link keeping the node at the limit, K/W; null when any sink up to the top of the range will do; 0 when even a perfect link does not. */
  kelvinPerWatt: number | null;
  feasible: boolean;
  solves: number;
}

export const SINK_RANGE_KPERW: readonly [number, number] = [1e-3, 1e3];

/**
 * Effective resistance of a part's links taken together at a steady answer: the drop across
 * the first link over the heat all of them carry (e.g. a heatsink's convection to the air and
 * its radiation to the wall).
 */
export function pathResistance(network: Network, at: SteadyResult, links: readonly number[]): number {
  const first = network.links[links[0]!]!;
  const t = (id: string) => (id === AMBIENT_ID ? network.ambientC : (at.temperaturesC[id] ?? network.ambientC));
  const q = links.reduce((s, i) => s + (at.links[i]?.watts ?? 0), 0);
  const dt = t(first.from) - t(first.to);
  return q > 1e-12 && dt > 0 ? dt / q : (at.links[links[0]!]?.kelvinPerWatt ?? 1);
}

/**
 * Largest resistance link `index` may have for `node` to stay at or below `limitC` (sources
 * as given, steady answer `at` the present link). Links in `alsoRemove` (the same part's
 * other paths, e.g. its radiation) are taken out during the search, so the answer is for
 * the part's whole path as one resistance.
 */
export function requiredLinkResistance(network: Network, at: SteadyResult, index: number, node: string, limitC: number, tolK = 0.02, alsoRemove: readonly number[] = []): ResistanceAnswer {
  const link = network.links[index]!;
  const drop = new Set(alsoRemove);
  // The probes differ only in the resistance of one link: compiled once, with that value
  // set in place for each probe. Each starts from the last answer (the first from the
  // present one): a few Newton steps fewer.
  const probeLinks = network.links.flatMap((l, i) => (i === index ? [{ from: link.from, to: link.to, type: "resistance" as const, kelvinPerWatt: 1 }] : drop.has(i) ? [] : [l]));
  const compiled = compileNetwork({ ...network, links: probeLinks });
  const setResistance = resistanceSetter(compiled, index - alsoRemove.filter((i) => i < index).length);
  let last = at.temperaturesC;
  const f = (r: number) => {
    setResistance(r);
    last = compiledSteadyTemperatures(compiled, PROBE, last);
    return (last[node] ?? 0) - limitC;
  };
  const r0 = pathResistance(network, at, [index, ...alsoRemove]);
  const q = Math.max(Math.abs([index, ...alsoRemove].reduce((s, i) => s + (at.links[i]?.watts ?? 0), 0)), 1e-6);
  const f0 = (at.temperaturesC[node] ?? 0) - limitC;
  // In a series path the node moves by about q·ΔR: a first guess that is exact for a linear network.
  const guess = Math.max(r0 - f0 / q, SINK_RANGE_KPERW[0]);
  const root = monotoneRoot(f, r0, f0, guess, SINK_RANGE_KPERW[0], SINK_RANGE_KPERW[1], tolK, PROBE_SOLVES);
  if (root.outside === -1) return { kelvinPerWatt: null, feasible: true, solves: root.solves };
  if (root.outside === 1) return { kelvinPerWatt: 0, feasible: false, solves: root.solves };
  return { kelvinPerWatt: root.x, feasible: true, solves: root.solves };
}

/**
 * Sets the resistance of a compiled plain-resistance link (index in `c.links`) in place:
 * its model, and its conductance where the assembly loop reads it.
 */
function resistanceSetter(c: CompiledNetwork, index: number): (kelvinPerWatt: number) => void {
  const at = c.links[index]!;
  if (at.model.kind !== "linear") throw new Error("resistanceSetter: not a plain resistance");
  // Linear links keep their order in the assembly group.
  let slot = 0;
  for (let l = 0; l < index; l++) if (c.links[l]!.model.kind === "linear") slot++;
  return (kelvinPerWatt) => {
    const model = new LinearLink(1 / kelvinPerWatt);
    c.links[index] = { a: at.a, b: at.b, model };
    c.groups.linG[slot] = model.conductance;
  };
}

export interface ScaleAnswer {
  /** Largest factor on every source keeping every limit; null when no source heats anything. */
  scale: number | null;
  /** The limit (index into `limits`) that binds at that scale; null when none is reached in the range. */
  binding: number | null;
  solves: number;
}

const MAX_SCALE = 1e3;

/** Largest common scale of all sources with every `limits[i]` node at or below its limit: one search on the worst excess. */
export function maxCommonScale(network: Network, at: SteadyResult, limits: readonly { node: string; limitC: number }[], tolK = 0.02): ScaleAnswer {
  if (limits.length === 0 || !network.sources.some((s) => s.watts > 0)) return { scale: null, binding: null, solves: 0 };
  const excess = (t: Record<string, number>) => {
    let worst = -Infinity;
    let who = 0;
    limits.forEach((l, i) => {
      const e = (t[l.node] ?? 0) - l.limitC;
      if (e > worst) [worst, who] = [e, i];
    });
    return { worst, who };
  };
  let lastWho = 0;
  let last = at.temperaturesC;
  // The probes differ only in the scale of the sources: compiled once (sources as plain
  // watts), the scale applied to the compiled heat for each probe.
  const compiled = compileNetwork({ ...network, sources: network.sources.map((x) => ({ node: x.node, watts: x.watts })) });
  const heat = Float64Array.from(compiled.p0);
  const f = (s: number) => {
    for (let k = 0; k < heat.length; k++) compiled.p0[k] = heat[k]! * s;
    last = compiledSteadyTemperatures(compiled, PROBE, last);
    const r = excess(last);
    lastWho = r.who;
    return r.worst;
  };
  const now = excess(at.temperaturesC);
  // Rises scale about linearly with power: the first guess is where the tightest limit would be met.
  const ta = network.ambientC;
  let guess = MAX_SCALE;
  for (const l of limits) {
    const rise = (at.temperaturesC[l.node] ?? ta) - ta;
    if (rise > 1e-9) guess = Math.min(guess, (l.limitC - ta) / rise);
  }
  if (ta > Math.min(...limits.map((l) => l.limitC))) return { scale: 0, binding: now.who, solves: 0 };
  const root = monotoneRoot(f, 1, now.worst, Math.max(guess, 0), 0, MAX_SCALE, tolK, PROBE_SOLVES);
  if (root.outside === -1) return { scale: MAX_SCALE, binding: null, solves: root.solves };
  if (root.outside === 1) return { scale: 0, binding: lastWho, solves: root.solves };
  return { scale: root.x, binding: lastWho, solves: root.solves };
}
