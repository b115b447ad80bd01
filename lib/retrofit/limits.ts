import type { SteadyResult } from "@/lib/thermal";
import type { CompiledBuild } from "./compile";
import type { ProblemList } from "./problems";
import type { ResolvedBuild } from "./resolved";
import { touchLimit } from "./touch";
import { q, SOURCES, trace, type Traced } from "./trace";

export const VERDICTS = ["within budget", "tight", "over budget"] as const;
export type Verdict = (typeof VERDICTS)[number];

/** PRODUCT.md: within budget ≥ margin (10 K) on every limit; tight 0…margin; over budget when a limit is exceeded. */
export function verdictFor(headroomK: number, marginK: number): Verdict {
  if (headroomK < 0) return "over budget";
  return headroomK >= marginK ? "within budget" : "tight";
}

export function worstVerdict(verdicts: readonly (Verdict | null)[]): Verdict | null {
  let worst: Verdict | null = null;
  for (const v of verdicts) {
    if (v === null) continue;
    if (worst === null || VERDICTS.indexOf(v) > VERDICTS.indexOf(worst)) worst = v;
  }
  return worst;
}

export interface LimitDef {
  id: "junction" | "driver-board" | "charger-board" | "cells-max" | "cells-min" | "touch";
  place: string;
  /** The node whose temperature is compared (for touch: the hottest wall node). */
  node: string;
  kind: "max" | "min";
  limit: Traced;
  field: string;
}

export interface LimitResult extends Omit<LimitDef, "limit"> {
  limitC: number;
  limitTrace: Traced["trace"];
  temperatureC: number;
  headroomK: number;
  verdict: Verdict;
  trace: Traced["trace"];
}

const declared = (value: number, what: string, partName: string): Traced => ({
  value,
  unit: "°C",
  trace: trace({ element: "limit", formula: what, equation: "T_limit = part rating", inputs: [], result: q("T_limit", what, value, "°C"), source: `${SOURCES.datasheet}: ${partName}` }),
});

/**
 * Small Li-ion charger chips fold back their current (thermal regulation) at a junction of
 * roughly 110–120 °C; keeping the board at or below 100 °C leaves them that room. The part
 * record has no rating field, so this common-practice figure stands in for one.
 */
const CHARGER_BOARD_LIMIT: Traced = {
  value: 100,
  unit: "°C",
  trace: trace({
    element: "limit",
    formula: "charger board limit (assumed)",
    equation: "T_limit = 100 °C",
    inputs: [],
    result: q("T_limit", "highest charger board temperature", 100, "°C"),
    source: SOURCES.trade,
    notes: ["charger chips throttle the charge current near 110–120 °C junction; a board above 100 °C charges slowly or stops, and heats the cells beside it"],
  }),
};

/** The limits that apply in a scenario, from the parts' ratings and the way the light is held. */
export function limitsFor(build: ResolvedBuild, compiled: CompiledBuild, steady: SteadyResult, charging: boolean, problems: ProblemList): LimitDef[] {
  const out: LimitDef[] = [];
  const e = build.lightEngine.emitter;
  if (compiled.has.emitter && e && !charging) out.push({ id: "junction", place: "LED junction", node: "junction", kind: "max", limit: declared(e.specs.maxTjC, "maximum junction temperature", e.name), field: "lightEngine.emitter.maxTjC" });
  const d = build.driver.part;
  if (compiled.has.driver && d && !charging) {
    if (d.specs.maxBoardTempC !== undefined) out.push({ id: "driver-board", place: "driver board", node: "driver", kind: "max", limit: declared(d.specs.maxBoardTempC, "maximum driver board temperature", d.name), field: "driver.part.maxBoardTempC" });
    else problems.add("driver.part.maxBoardTempC", "the driver has no maximum board temperature: its headroom cannot be checked", "warning");
  }
  const c = build.pack.cell;
  if (compiled.has.cells && c) {
    const max = charging ? c.specs.chargeTempMaxC : c.specs.dischargeTempMaxC;
    const min = charging ? c.specs.chargeTempMinC : c.specs.dischargeTempMinC;
    const what = charging ? "charge" : "discharge";
    if (max !== undefined) out.push({ id: "cells-max", place: "cells", node: "cells", kind: "max", limit: declared(max, `highest ${what} temperature`, c.name), field: `pack.cell.${charging ? "chargeTempMaxC" : "dischargeTempMaxC"}` });
    else problems.add(`pack.cell.${charging ? "chargeTempMaxC" : "dischargeTempMaxC"}`, `the cell has no ${what} temperature window: its headroom cannot be checked`, "warning");
    if (min !== undefined) out.push({ id: "cells-min", place: "cells", node: "cells", kind: "min", limit: declared(min, `lowest ${what} temperature`, c.name), field: `pack.cell.${charging ? "chargeTempMinC" : "dischargeTempMinC"}` });
  }
  const ch = build.pack.charger;
  if (charging && compiled.has.charger && ch) {
    out.push({ id: "charger-board", place: "charger board", node: "charger", kind: "max", limit: CHARGER_BOARD_LIMIT, field: "pack.charger" });
    problems.add("pack.charger", `the charger part has no temperature rating: its board is held to ${CHARGER_BOARD_LIMIT.value} °C (common practice)`, "info");
  }
  const walls = compiled.network.nodes.filter((n) => n.id.startsWith("wall")).map((n) => n.id);
  const hottest = walls.reduce((a, b) => ((steady.temperaturesC[b] ?? -Infinity) > (steady.temperaturesC[a] ?? -Infinity) ? b : a), walls[0] ?? "wall");
  out.push({ id: "touch", place: "housing surface", node: hottest, kind: "max", limit: touchLimit(build.environment.contact), field: "environment.contact" });
  return out;
}

export function evaluateLimits(defs: readonly LimitDef[], temperaturesC: Record<string, number>, marginK: number): LimitResult[] {
  return defs.map((d) => {
    const t = temperaturesC[d.node] ?? 0;
    const limitC = d.limit.value ?? 0;
    const headroom = d.kind === "max" ? limitC - t : t - limitC;
    const verdict = verdictFor(headroom, marginK);
    return {
      id: d.id,
      place: d.place,
      node: d.node,
      kind: d.kind,
      field: d.field,
      limitC,
      limitTrace: d.limit.trace,
      temperatureC: t,
      headroomK: headroom,
      verdict,
      trace: trace({
        element: "headroom",
        formula: d.kind === "max" ? "Headroom below a maximum" : "Headroom above a minimum",
        equation: d.kind === "max" ? "ΔT = T_limit − T" : "ΔT = T − T_limit",
        inputs: [q("T_limit", "limit", limitC, "°C"), q("T", `${d.place} temperature`, t, "°C")],
        result: q("ΔT", "headroom", headroom, "K"),
        source: `common practice (a ${marginK} K margin below each rating, as set in the evaluation's options)`,
        notes: [`${verdict}: ≥ ${marginK} K is within budget, 0–${marginK} K tight, below 0 over budget.`],
      }),
    };
  });
}
