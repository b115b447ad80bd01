import { AMBIENT_ID, breakdownRise, extend, setEntry, isThermalInputError, prepareTransient, traceLink, type Network, type SteadyResult, type Trace } from "@/lib/thermal";
import type { CompiledBuild } from "./compile";
import { calibratedTrace, scaleLink } from "./compile/calibration";
import type { LinkPlace, NodePlace } from "./compile/builder";
import { evaluateLimits, worstVerdict, type LimitDef, type LimitResult, type Verdict } from "./limits";
import { maxCommonScale, pathResistance, requiredLinkResistance } from "./inverse";
import { sinkLinks } from "./compile";
import type { ResolvedOptions } from "./options";
import type { ProblemList } from "./problems";
import { q, trace, type Traced } from "./trace";

export interface LinkResult extends LinkPlace {
  watts: number;
  kelvinPerWatt: number;
  trace: Trace;
}

export interface LadderStep {
  from: string;
  to: string;
  place: string;
  deltaK: number;
  watts: number;
  kelvinPerWatt: number;
}

export interface Warmup {
  durationS: number;
  timesS: number[];
  temperaturesC: Record<string, number[]>;
  /** When each limit is first reached; null if not within the warm-up. */
  crossings: { limitId: LimitResult["id"]; node: string; limitC: number; timeS: number | null }[];
  /** First time every node is within 1 K of its steady temperature; null if not within the warm-up. */
  steadyWithinS: number | null;
  /** Why the curve stops: the temperatures settled, the pack ran empty, the charge finished, or the 12 h cap. */
  ends: "settled" | RunEnd | "time-cap";
  /** Length of the whole run (pack empty, charge done), s; the curve may stop earlier once settled. */
  runS: number;
  /** Every step converged; Newton corrections over the run; the last step's largest heat imbalance, W. */
  converged: boolean;
  iterations: number;
  residualW: number;
}

export interface WhatItTakes {
  /** Sink-to-air resistance the build's sink has at this operating point, and the most it may have for the junction limit and for the budget (limit − margin). null where the build has no sink link or any resistance would do. */
  sinkToAir: { presentKPerW: Traced; forLimitKPerW: Traced; forBudgetKPerW: Traced } | null;
  /** Highest electrical power into the emitters before the first limit is reached, scaling every heat source with it. */
  maxDrivePowerW: Traced | null;
  bindingLimit: LimitResult["id"] | null;
}

export interface ThermalResult {
  nodes: NodePlace[];
  links: LinkResult[];
  temperaturesC: Record<string, number>;
  /** The same temperatures keyed by place name ("LED junction"). */
  byPlace: Record<string, number>;
  energyBalanceW: number;
  limits: LimitResult[];
  verdict: Verdict | null;
  ladder: { riseK: number; steps: LadderStep[]; remainderK: number } | null;
  /** How the steady solve ended: converged, Newton iterations, largest heat imbalance at any node (W). */
  solver: { converged: boolean; iterations: number; residualW: number };
}

export function thermalResult(compiled: CompiledBuild, steady: SteadyResult, defs: readonly LimitDef[], o: ResolvedOptions): ThermalResult {
  // Only links the compiler left without a trace of its own need the engine's: explaining the
  // whole network built a trace for every link and threw away those the compiler had given.
  const net = compiled.network;
  const at = (id: string) => (id === AMBIENT_ID ? net.ambientC : steady.temperaturesC[id]!);
  const engineTrace = (i: number): Trace => {
    const link = net.links[i]!;
    return traceLink(link, at(link.from), at(link.to));
  };
  // A calibrated link's trace is the model's own (of the link before its factor) inside the correction.
  const modelTrace = (l: (typeof compiled.links)[number], i: number): Trace => {
    if (!l.calibration) return l.trace ?? engineTrace(i);
    const link = net.links[i]!;
    return calibratedTrace(l.trace ?? traceLink(scaleLink(link, 1 / l.calibration.factor), at(link.from), at(link.to)), l.calibration);
  };
  const links = compiled.links.map((l, i): LinkResult => extend(l, { watts: steady.links[i]?.watts ?? 0, kelvinPerWatt: steady.links[i]?.kelvinPerWatt ?? 0, trace: modelTrace(l, i) }));
  const byPlace = Object.fromEntries(compiled.nodes.map((n) => [n.place, steady.temperaturesC[n.id] ?? 0]));
  const limits = evaluateLimits(defs, steady.temperaturesC, o.marginK);
  let ladder: ThermalResult["ladder"] = null;
  const top = compiled.has.emitter ? "junction" : compiled.has.charger ? "charger" : compiled.has.cells ? "cells" : null;
  if (top) {
    const r = breakdownRise(compiled.network, steady, top);
    ladder = { riseK: r.riseK, remainderK: r.remainderK, steps: r.steps.map((s) => ({ from: s.from, to: s.to, place: compiled.links[s.link]?.place ?? `${s.from} → ${s.to}`, deltaK: s.deltaK, watts: s.watts, kelvinPerWatt: s.kelvinPerWatt })) };
  }
  const solver = { converged: steady.converged, iterations: steady.iterations, residualW: steady.residualW };
  return { nodes: compiled.nodes, links, temperaturesC: steady.temperaturesC, byPlace, energyBalanceW: steady.energyBalanceW, limits, verdict: worstVerdict(limits.map((l) => l.verdict)), ladder, solver };
}

/**
 * Warm-up to the end of the run: in chunks until every node is within 1 K of its steady
 * temperature (and every limit the steady state exceeds has been reached), or the run ends
 * (the pack is empty, the charge is done), or twelve hours have passed. The first hour goes
 * in 15-minute chunks at the options' step (30 s by default); after it, where only the slow
 * housing still moves, in one-hour chunks at four times the step.
 */
const CHUNK_S = 900;
const LATE_AFTER_S = 3600;
const LATE_CHUNK_S = 3600;
const LATE_STEP_FACTOR = 4;
/** Longest warm-up worked out, s: twelve hours. */
export const MAX_RUN_S = 12 * 3600;
const STEADY_BAND_K = 1;
/**
 * Newton tolerance within a warm-up step, K. The curves are shown to 0.1 K and the steady
 * band is 1 K; the engine's default (1e-6 K) costs about one more correction per step for
 * digits nobody reads. At 1e-3 K (a hundredth of the shown digit) a fifth of the corrections
 * of 1e-4 K go, and no sample of the demo builds moves by more than 0.5 mK, no limit time by
 * more than 0.02 s.
 */
const WARMUP_SETTINGS = { toleranceK: 1e-3 } as const;

export type RunEnd = "pack-empty" | "charge-done";

/** `horizonS`: when the run ends (pack empty, charge done); `ends` says which. */
export function warmup(network: Network, steady: SteadyResult, limits: readonly LimitResult[], horizonS: number, ends: RunEnd, o: ResolvedOptions, field: string, problems: ProblemList): Warmup | null {
  const maxLimits = limits.filter((l) => l.kind === "max");
  const thresholds = maxLimits.map((l) => ({ node: l.node, limitC: l.limitC }));
  const horizon = Math.min(Math.max(horizonS, CHUNK_S / 30), MAX_RUN_S);
  const stepS = Math.min(o.warmupS / o.warmupIntervals, horizon);
  const timesS: number[] = [];
  const temps: Record<string, number[]> = Object.fromEntries(network.nodes.map((n) => [n.id, [] as number[]]));
  const crossings: (number | null)[] = maxLimits.map(() => null);
  // Limits the steady state is at or above are reached some time: the run goes on until they are.
  const pending = maxLimits.map((l) => (steady.temperaturesC[l.node] ?? -Infinity) >= l.limitC);
  let steadyAt: number | null = null;
  let settled = false;
  let initialC: Record<string, number> | undefined;
  let iterations = 0;
  let residualW = 0;
  let t0 = 0;
  try {
    // One compilation for every chunk: they differ only in where they start.
    const run = prepareTransient(network);
    // Per node, in the network's order: where its samples go and its steady temperature.
    const ids = network.nodes.map((n) => n.id);
    const dest = ids.map((id) => temps[id]!);
    const steadyC = ids.map((id) => steady.temperaturesC[id]);
    while (t0 < horizon - 1e-6 && !settled) {
      const late = t0 >= LATE_AFTER_S - 1e-6;
      const chunk = Math.min(late ? LATE_CHUNK_S : CHUNK_S, horizon - t0);
      const step = Math.min(late ? LATE_STEP_FACTOR * stepS : stepS, chunk);
      const r = run.solve({ durationS: chunk, stepS: step, thresholds, ...(initialC ? { initialC } : {}) }, WARMUP_SETTINGS);
      iterations += r.iterations;
      residualW = r.residualW;
      // Each chunk after the first starts where the last ended: skip its repeated first sample.
      const src = ids.map((id) => r.temperaturesC[id]!);
      const first = t0 === 0 ? 0 : 1;
      for (let j = 0; j < ids.length; j++) {
        const from = src[j]!;
        const to = dest[j]!;
        for (let k = first; k < from.length; k++) to.push(from[k]!);
      }
      for (let k = first; k < r.timesS.length; k++) {
        const t = t0 + r.timesS[k]!;
        timesS.push(t);
        // Once one sample is in the band, the later ones need no look.
        if (steadyAt === null && !src.some((from, j) => Math.abs(from[k]! - (steadyC[j] ?? from[k]!)) > STEADY_BAND_K)) steadyAt = t;
      }
      r.crossings?.forEach((x, i) => {
        if (crossings[i] === null && x.timeS !== null) crossings[i] = t0 + x.timeS;
      });
      settled = steadyAt !== null && pending.every((p, i) => !p || crossings[i] !== null);
      t0 += chunk;
      initialC = {};
      for (let j = 0; j < ids.length; j++) setEntry(initialC, ids[j]!, dest[j]![dest[j]!.length - 1]!);
    }
    const end = timesS[timesS.length - 1] ?? 0;
    return {
      durationS: end,
      timesS,
      temperaturesC: temps,
      crossings: maxLimits.map((l, i) => ({ limitId: l.id, node: l.node, limitC: l.limitC, timeS: crossings[i] ?? null })),
      steadyWithinS: steadyAt,
      ends: settled ? "settled" : horizon >= horizonS - 1e-6 ? ends : "time-cap",
      runS: horizonS,
      converged: true,
      iterations,
      residualW,
    };
  } catch (err) {
    if (!isThermalInputError(err)) throw err;
    problems.add(field, `warm-up could not be worked out: ${err.message}`, "warning");
    return null;
  }
}

const kpw = (value: number | null, what: string, equation: string, inputs: Trace["inputs"], notes: string[], source: string): Traced => ({
  value,
  unit: "K/W",
  trace: trace({ element: "inverse", formula: what, equation, inputs, result: q("R", what, value ?? 0, "K/W"), source, notes }),
});

/** The search is a method, not a source: what it leans on is the steady model, whose links cite their own sources. */
const SEARCH = "the steady heat-path model above, solved repeatedly (secant steps, then the Illinois variant of regula falsi) until the limit is met within 0.02 K; each link cites its own source";

/** "What it takes": required sink resistance and the highest drive power, at frozen sources. */
export function whatItTakes(compiled: CompiledBuild, steady: SteadyResult, limits: readonly LimitResult[], driveW: number, o: ResolvedOptions, field: string, problems: ProblemList): WhatItTakes | null {
  // For scaling, sources are frozen at the operating point (a slope scaled with the power would mean nothing).
  const frozen: Network = { ...compiled.network, sources: compiled.network.sources.map((s) => ({ node: s.node, watts: s.watts + (s.wattsPerKelvin ?? 0) * ((steady.temperaturesC[s.node] ?? 0) - (s.referenceC ?? compiled.network.ambientC)) })) };
  try {
    let sinkToAir: WhatItTakes["sinkToAir"] = null;
    const j = limits.find((l) => l.id === "junction");
    if (compiled.sinkLink !== null && j) {
      const others = sinkLinks(compiled).slice(1);
      const present = pathResistance(compiled.network, steady, sinkLinks(compiled));
      const lim = requiredLinkResistance(compiled.network, steady, compiled.sinkLink, "junction", j.limitC, 0.02, others);
      const bud = requiredLinkResistance(compiled.network, steady, compiled.sinkLink, "junction", j.limitC - o.marginK, 0.02, others);
      const inputs = [q("T_j,max", "junction limit", j.limitC, "°C"), q("margin", "budget margin", o.marginK, "K"), q("P_j", "heat at the junction at this operating point", frozen.sources.find((s) => s.node === "junction")?.watts ?? 0, "W")];
      const notes = ["The emitter's heat follows Vf(Tj) during the search (linearised at this operating point); driver and cell heat held; the sink's own links (convection to the air, and radiation to what it sees) replaced by one plain resistance to the air during the search; searched over 0.001–1000 K/W (null: any sink in that range will do)."];
      const infeasible = (f: boolean) => (f ? [] : ["Even a perfect sink does not do it: the rest of the heat path is too hot."]);
      sinkToAir = {
        presentKPerW: kpw(present, "sink-to-air resistance in the build (at this operating point)", "R = ΔT/(q_convection + q_radiation) from the sink to the air around it", [], [], "the steady heat-path model (effective resistance ΔT/q of the sink's link at the solution; the link's own trace cites its source)"),
        forLimitKPerW: kpw(lim.kelvinPerWatt, "largest sink-to-air resistance for Tj = T_j,max", "find R: Tj(R) = T_j,max", inputs, [...notes, ...infeasible(lim.feasible)], SEARCH),
        forBudgetKPerW: kpw(bud.kelvinPerWatt, "largest sink-to-air resistance for Tj = T_j,max − margin", "find R: Tj(R) = T_j,max − margin", inputs, [...notes, ...infeasible(bud.feasible)], SEARCH),
      };
    }
    const maxLimits = limits.filter((x) => x.kind === "max");
    const sc = maxCommonScale(frozen, steady, maxLimits);
    const binding = sc.binding !== null ? (maxLimits[sc.binding]?.id ?? null) : null;
    const maxDrive: Traced | null =
      sc.scale === null
        ? null
        : {
            value: sc.scale * driveW,
            unit: "W",
            trace: trace({
              element: "inverse",
              formula: "Highest drive power before the first limit",
              equation: "P_max = s·P_drive, s = largest common scale of every heat source that keeps every limit",
              inputs: [q("P_drive", "electrical power into the emitters now", driveW, "W"), q("s", binding ? `scale at which the ${binding} limit is reached` : "scale (no limit reached up to 1000×)", sc.scale, "1")],
              result: q("P_max", "highest drive power", sc.scale * driveW, "W"),
              source: SEARCH,
              notes: ["Every heat source (emitter, driver, cells) is scaled together, as turning the drive up would; Vf, heat fraction and efficiency held at this operating point."],
            }),
          };
    return { sinkToAir, maxDrivePowerW: maxDrive, bindingLimit: binding };
  } catch (err) {
    if (!isThermalInputError(err)) throw err;
    problems.add(field, `"what it takes" could not be worked out: ${err.message}`, "warning");
    return null;
  }
}
