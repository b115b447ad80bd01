import type { BuildEvaluation } from "@/lib/retrofit";
import { driveTrace, limitTimeTrace, nodeBalanceTrace, partsCostTrace, savingTrace, totalFluxTrace } from "@/lib/retrofit/derivations";
import type { Trace } from "@/lib/thermal";
import type { FigureRow } from "./figures";
import type { ComparisonSummary } from "./summary";

/**
 * The derivation behind each figure of Side by side, per column: a place's temperature
 * opens to its heat flows, a headroom to its subtraction, a runtime to its division, and so on.
 * Figures nothing derives (a verdict) have none.
 */
export function figureTraces(row: Pick<FigureRow, "key">, evals: readonly BuildEvaluation[]): (Trace | null)[] {
  // "mode:high/temperature:driver board": the scenario, then what (a place may hold a "/").
  const slash = row.key.indexOf("/");
  const scope = slash < 0 ? row.key : row.key.slice(0, slash);
  const what = slash < 0 ? "" : row.key.slice(slash + 1);
  return evals.map((e) => {
    if (scope === "build") {
      const el = e.electrical;
      if (what === "capacity") return el.pack?.capacityC.trace ?? null;
      if (what === "energy") return el.pack?.energyWh.trace ?? null;
      if (what === "charge-time") return el.charge?.totalHours.trace ?? null;
      if (what === "charger-heat") return el.charge?.lossW.trace ?? null;
      if (what === "cost") return partsCostTrace(e.costs);
      if (what === "mass") return (e.mass as BuildEvaluation["mass"] | undefined)?.trace ?? null;
      if (what === "saving") return savingTrace(e.costs);
      return null;
    }
    const s = e.scenarios.find((x) => x.id === scope);
    if (!s) return null;
    const colon = what.indexOf(":");
    const kind = colon < 0 ? what : what.slice(0, colon);
    const arg = colon < 0 ? "" : what.slice(colon + 1);
    const t = s.thermal;
    switch (kind) {
      case "temperature": {
        const node = t?.nodes.find((n) => n.place === arg);
        return t && node ? nodeBalanceTrace(t, node.id, s.network?.ambientC ?? 25) : null;
      }
      case "headroom":
        return t?.limits.find((l) => l.id === arg)?.trace ?? null;
      case "time": {
        const place = t?.limits.find((l) => l.id === arg)?.place ?? arg;
        return s.warmup ? limitTimeTrace(s.warmup, arg, place) : null;
      }
      case "flux":
        return s.mode ? totalFluxTrace(s.mode) : null;
      case "runtime":
        return s.mode?.runtime?.trace ?? null;
      case "drive":
        return s.mode ? driveTrace(s.mode) : null;
      default:
        return null;
    }
  });
}

/** The derivation of the limit shown beside a temperature row, per column (the place's upper limit). */
function limitBeside(row: Pick<FigureRow, "key" | "limits">, evals: readonly BuildEvaluation[]): (Trace | null)[] | undefined {
  if (!row.limits) return undefined;
  const m = /^(.*)\/temperature:(.*)$/.exec(row.key);
  return evals.map((e) => {
    const t = m ? e.scenarios.find((x) => x.id === m[1])?.thermal : undefined;
    return t?.limits.find((l) => l.kind === "max" && t.nodes.find((n) => n.id === l.node)?.place === m![2])?.limitTrace ?? null;
  });
}

/** Every row with its derivations beside its values (and beside its limits, where it shows them). */
export function withTraces<R extends FigureRow>(rows: readonly R[], evals: readonly BuildEvaluation[]): (R & { traces: (Trace | null)[]; limitTraces?: (Trace | null)[] })[] {
  return rows.map((r) => {
    const limitTraces = limitBeside(r, evals);
    return { ...r, traces: figureTraces(r, evals), ...(limitTraces ? { limitTraces } : {}) };
  });
}

/** A limit's temperature (its place's heat balance) and headroom derivations in one scenario of one evaluation. */
export function limitTraces(e: BuildEvaluation, scenarioId: string, limitId: string): { temperature: Trace | null; headroom: Trace | null } {
  const s = e.scenarios.find((x) => x.id === scenarioId);
  const l = s?.thermal?.limits.find((x) => x.id === limitId);
  if (!s?.thermal || !l) return { temperature: null, headroom: null };
  return { temperature: nodeBalanceTrace(s.thermal, l.node, s.network?.ambientC ?? 25), headroom: l.trace };
}

/** The summary with the derivation of every figure in its table (each cell's deciding limit). */
export function summaryWithTraces(summary: ComparisonSummary, evals: readonly BuildEvaluation[]) {
  return {
    ...summary,
    scenarios: summary.scenarios.map((s) => ({
      ...s,
      cells: s.cells.map((c, i) => ({ ...c, traces: c.deciding && evals[i] ? limitTraces(evals[i], s.id, c.deciding.id) : null })),
    })),
    costTraces: evals.map((e) => partsCostTrace(e.costs)),
    massTraces: evals.map((e) => (e.mass as BuildEvaluation["mass"] | undefined)?.trace ?? null),
  };
}
