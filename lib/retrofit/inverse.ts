import { solveSteady, type Network, type SteadyResult } from "@/lib/thermal";

/**
 * Two inverse questions ("what it takes") answered with a few steady solves each. The
 * responses are monotone and nearly linear (a temperature against a series resistance, or
 * against a common scale of every source), so a secant step from the operating point,
 * safeguarded into Illinois regula falsi once the root is bracketed, lands in 2–4 solves.
 * Searches stay inside a practical range, so no solve is asked about a sink so poor the
 * parts would be thousands of kelvin hot.
 */
const MAX_SOLVES = 24;

/**
 * Each probe only has to place a temperature within the search tolerance (0.02 K), so its
 * steady solve stops at 1e-4 K instead of the engine's 1e-6 K: one Newton correction
 * fewer per probe, and the probe moves by ~1e-11 K (Newton converges quadratically).
 */
const PROBE = { toleranceK: 1e-4 } as const;

interface Root {
  x: number | null;
  /** -1: f < 0 over the whole range (never reached); +1: f > 0 over it (always exceeded). */
  outside: -1 | 0 | 1;
  solves: number;
}

/** Root of an increasing f in [lo, hi], starting from (x0, f0) and a first guess x1. */
function monotoneRoot(f: (x: number) => number, x0: number, f0: number, x1: number, lo: number, hi: number, tol: number): Root {
  let solves = 0;
  const ev = (x: number) => {
    solves++;
    return f(x);
  };
  let [a, fa] = [x0, f0];
  let b = Math.min(Math.max(x1, lo), hi);
  let fb = ev(b);
  // Walk by secant steps (at most 4× the last step) until the root is bracketed.
  while (Math.sign(fa) === Math.sign(fb) && Math.abs(fb) > tol && solves < MAX_SOLVES) {
    if ((fb < 0 && b >= hi) || (fb > 0 && b <= lo)) return { x: null, outside: fb < 0 ? -1 : 1, solves };
    const slope = (fb - fa) / (b - a);
    const d = b - a;
    let next = slope > 0 ? b - fb / slope : b + (fb < 0 ? 4 : -4) * Math.abs(d);
    next = Math.min(Math.max(next, b - 4 * Math.abs(d) - 1e-12, lo), b + 4 * Math.abs(d) + 1e-12, hi);
    [a, fa] = [b, fb];
    b = next;
    fb = ev(b);
  }
  if (Math.abs(fb) <= tol) return { x: b, outside: 0, solves };
  let [l, fl, h, fh] = fa < 0 ? [a, fa, b, fb] : [b, fb, a, fa];
  let side = 0;
  let x = b;
  while (solves < MAX_SOLVES) {
    x = (l * fh - h * fl) / (fh - fl);
    const fx = ev(x);
    if (Math.abs(fx) <= tol) break;
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
  return { x, outside: 0, solves };
}

export interface ResistanceAnswer {
  /** Largest resistance of the link keeping the node at the limit, K/W; null when any sink up to the top of the range will do; 0 when even a perfect link does not. */
  kelvinPerWatt: number | null;
  feasible: boolean;
  solves: number;
}

export const SINK_RANGE_KPERW: readonly [number, number] = [1e-3, 1e3];

/** Largest resistance link `index` may have for `node` to stay at or below `limitC` (sources as given, steady answer `at` the present link). */
export function requiredLinkResistance(network: Network, at: SteadyResult, index: number, node: string, limitC: number, tolK = 0.02): ResistanceAnswer {
  const link = network.links[index]!;
  const f = (r: number) => {
    const links = network.links.map((l, i) => (i === index ? { from: link.from, to: link.to, type: "resistance" as const, kelvinPerWatt: r } : l));
    return (solveSteady({ ...network, links }, PROBE).temperaturesC[node] ?? 0) - limitC;
  };
  const r0 = at.links[index]?.kelvinPerWatt ?? 1;
  const q = Math.max(Math.abs(at.links[index]?.watts ?? 0), 1e-6);
  const f0 = (at.temperaturesC[node] ?? 0) - limitC;
  // In a series path the node moves by about q·ΔR: a first guess that is exact for a linear network.
  const guess = Math.max(r0 - f0 / q, SINK_RANGE_KPERW[0]);
  const root = monotoneRoot(f, r0, f0, guess, SINK_RANGE_KPERW[0], SINK_RANGE_KPERW[1], tolK);
  if (root.outside === -1) return { kelvinPerWatt: null, feasible: true, solves: root.solves };
  if (root.outside === 1) return { kelvinPerWatt: 0, feasible: false, solves: root.solves };
  return { kelvinPerWatt: root.x, feasible: true, solves: root.solves };
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
  const f = (s: number) => {
    const r = excess(solveSteady({ ...network, sources: network.sources.map((x) => ({ node: x.node, watts: x.watts * s })) }, PROBE).temperaturesC);
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
  const root = monotoneRoot(f, 1, now.worst, Math.max(guess, 0), 0, MAX_SCALE, tolK);
  if (root.outside === -1) return { scale: MAX_SCALE, binding: null, solves: root.solves };
  if (root.outside === 1) return { scale: 0, binding: lastWho, solves: root.solves };
  return { scale: root.x, binding: lastWho, solves: root.solves };
}
