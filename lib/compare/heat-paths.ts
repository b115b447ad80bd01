import { breakdownRise, isThermalInputError, type SteadyResult, type Trace } from "@/lib/thermal";
import type { BuildEvaluation } from "@/lib/retrofit";
import { ladderTotalTrace, nodeBalanceTrace } from "@/lib/retrofit/derivations";

/**
 * Side by side, one scenario at a time: each column's heat path (nodes with temperatures,
 * links with watts and K/W) and a temperature ladder for every place that has a limit —
 * the driver board, the cells, the housing surface, not only the emitter's chain. Pure: the
 * ladders are walked on the solved network the evaluation carries.
 */
export interface HeatPathColumn {
  nodes: { id: string; place: string }[];
  links: { index: number; from: string; to: string; place: string; watts: number; kelvinPerWatt: number }[];
  temperaturesC: Record<string, number>;
}

export interface PlaceLadder {
  /** The limited place in words ("driver board", "cells (upper limit)"). */
  place: string;
  limitId: string;
  columns: ({
    temperatureC: number;
    limitC: number;
    headroomK: number;
    riseK: number;
    remainderK: number;
    steps: { place: string; deltaK: number; watts: number; kelvinPerWatt: number }[];
    /** Derivations of the ladder's total (ambient + rungs), of the place's temperature (its heat balance), of the limit and of the headroom. */
    traces: { total: Trace; temperature: Trace | null; limit: Trace | null; headroom: Trace };
  } | null)[];
}

export interface ScenarioSideBySide {
  scenarioId: string;
  /** "high mode", "charging". */
  label: string;
  heatPaths: (HeatPathColumn | null)[];
  ladders: PlaceLadder[];
}

type Scenario = BuildEvaluation["scenarios"][number];

function ladderFor(s: Scenario | undefined, limitId: string): PlaceLadder["columns"][number] {
  const t = s?.thermal;
  const net = s?.network;
  const limit = t?.limits.find((l) => l.id === limitId);
  if (!t || !net || !limit || limit.kind !== "max") return null;
  // The solved network as the engine answered it, rebuilt from the evaluation (same link order).
  const steady: SteadyResult = {
    converged: s.converged,
    iterations: s.iterations,
    temperaturesC: t.temperaturesC,
    links: t.links.map((l, i) => ({ from: l.from, to: l.to, type: net.links[i]?.type ?? "resistance", watts: l.watts, kelvinPerWatt: l.kelvinPerWatt })),
    energyBalanceW: t.energyBalanceW,
    residualW: 0,
  };
  try {
    const r = breakdownRise(net, steady, limit.node);
    const steps = r.steps.map((st) => ({ place: t.links[st.link]?.place ?? `${st.from} → ${st.to}`, deltaK: st.deltaK, watts: st.watts, kelvinPerWatt: st.kelvinPerWatt }));
    return {
      temperatureC: limit.temperatureC,
      limitC: limit.limitC,
      headroomK: limit.headroomK,
      riseK: r.riseK,
      remainderK: r.remainderK,
      steps,
      traces: {
        total: ladderTotalTrace({ riseK: r.riseK, remainderK: r.remainderK, steps }, limit.place, net.ambientC),
        temperature: nodeBalanceTrace(t, limit.node, net.ambientC),
        limit: limit.limitTrace ?? null,
        headroom: limit.trace,
      },
    };
  } catch (error) {
    if (isThermalInputError(error)) return null;
    throw error;
  }
}

const placeWords = (l: { id: string; place: string; kind: "max" | "min" }) => (l.id === "cells-max" ? `${l.place} (upper limit)` : l.place);

export function sideBySide(evals: readonly Pick<BuildEvaluation, "scenarios">[]): ScenarioSideBySide[] {
  const ids = [...new Set(evals.flatMap((e) => e.scenarios.map((s) => s.id)))];
  return ids.map((id) => {
    const ss = evals.map((e) => e.scenarios.find((s) => s.id === id));
    const ref = ss.find((s) => s)!;
    const limits = new Map<string, string>();
    for (const s of ss) for (const l of s?.thermal?.limits ?? []) if (l.kind === "max" && !limits.has(l.id)) limits.set(l.id, placeWords(l));
    return {
      scenarioId: id,
      label: ref.kind === "charging" ? "charging" : `${ref.name.toLowerCase()} mode`,
      heatPaths: ss.map((s) =>
        s?.thermal
          ? {
              nodes: s.thermal.nodes.map((n) => ({ id: n.id, place: n.place })),
              links: s.thermal.links.map((l) => ({ index: l.index, from: l.from, to: l.to, place: l.place, watts: l.watts, kelvinPerWatt: l.kelvinPerWatt })),
              temperaturesC: s.thermal.temperaturesC,
            }
          : null,
      ),
      ladders: [...limits].map(([limitId, place]) => ({ place, limitId, columns: ss.map((s) => ladderFor(s, limitId)) })),
    };
  });
}
