import { VERDICTS, type BuildEvaluation, type ScenarioResult, type Verdict } from "@/lib/retrofit";
import { significantlyDifferent } from "./significance";

/**
 * Every figure of two to four evaluations in aligned rows, with the delta of each column
 * against the first and whether it is better or worse. Scenarios are matched by id
 * ("mode:high", "charging"), temperatures by place, limits by id.
 */
export type Direction = "lower" | "higher" | "none";
export type Judgement = "better" | "worse" | "same" | null;

export interface FigureRow {
  key: string;
  group: string;
  label: string;
  unit: string;
  kind: "number" | "verdict" | "time";
  /** Numbers in `unit`; verdict words for kind "verdict"; null when a column cannot say. For "time", null means the limit is not reached within the warm-up. */
  values: (number | string | null)[];
  /** value − first column's value (numbers only); null for the first column or when either is missing. */
  deltas: (number | null)[];
  judgements: Judgement[];
  /** The limit that applies to this row's place, per column (°C for temperatures, null where none). */
  limits?: (number | null)[];
  /** True when a column differs from the first by the significance or more (or a verdict or time differs): the row comes first. */
  matters: boolean;
}

const MIN = 60;

/** Better / worse only when the change is significant (1 K, 2 % of the first column); else "same", shown plain. */
function judge(delta: number, direction: Direction, unit: string, reference: number | null): Judgement {
  if (!significantlyDifferent(delta, unit, reference)) return "same";
  if (direction === "none") return null;
  return (delta < 0) === (direction === "lower") ? "better" : "worse";
}

function numberRow(key: string, group: string, label: string, unit: string, values: (number | null)[], direction: Direction): FigureRow {
  const first = values[0] ?? null;
  const deltas = values.map((v, i) => (i === 0 || v === null || first === null ? null : v - first));
  const judgements = deltas.map((d) => (d === null ? null : judge(d, direction, unit, first)));
  // A row without a direction matters when a column moved by the significance; a missing value matters too.
  const moved = deltas.some((d) => d !== null && significantlyDifferent(d, unit, first)) || values.some((v, i) => i > 0 && (v === null) !== (first === null));
  return { key, group, label, unit, kind: "number", values, deltas, judgements, matters: moved };
}

/** Time to a limit: null = not reached in the warm-up, which beats any time. */
function timeRow(key: string, group: string, label: string, values: (number | null | undefined)[]): FigureRow {
  const v = values.map((x) => (x === undefined ? null : x));
  const first = v[0] ?? null;
  const reached = values.map((x) => x !== undefined);
  const judgements: Judgement[] = v.map((x, i) => {
    if (i === 0 || !reached[i] || !reached[0]) return null;
    if (x === null && first === null) return "same";
    if (x === null) return "better";
    if (first === null) return "worse";
    return judge(x - first, "higher", "min", first);
  });
  const deltas = v.map((x, i) => (i === 0 || x === null || first === null ? null : x - first));
  return { key, group, label, unit: "min", kind: "time", values: v, deltas, judgements, matters: judgements.some((j) => j === "better" || j === "worse") };
}

function verdictRow(key: string, group: string, label: string, values: (Verdict | null)[]): FigureRow {
  const first = values[0] ?? null;
  const rank = (v: Verdict) => VERDICTS.indexOf(v);
  const judgements: Judgement[] = values.map((v, i) => {
    if (i === 0 || v === null || first === null) return null;
    const d = rank(v) - rank(first);
    return d === 0 ? "same" : d < 0 ? "better" : "worse";
  });
  return { key, group, label, unit: "", kind: "verdict", values, deltas: values.map(() => null), judgements, matters: values.some((v) => v !== first) };
}

const orderedUnion = (lists: readonly (readonly string[])[]): string[] => [...new Set(lists.flat())];

function scenarioRows(evals: readonly BuildEvaluation[], id: string): FigureRow[] {
  const ss = evals.map((e) => e.scenarios.find((s) => s.id === id));
  const name = ss.find((s) => s)?.name ?? id;
  const group = id === "charging" ? "Charging" : `Mode: ${name}`;
  const k = (x: string) => `${id}/${x}`;
  const rows: FigureRow[] = [verdictRow(k("verdict"), group, "Verdict", ss.map((s) => s?.thermal?.verdict ?? null))];
  const places = orderedUnion(ss.map((s) => Object.keys(s?.thermal?.byPlace ?? {})));
  for (const p of places) {
    const row = numberRow(k(`temperature:${p}`), group, `Temperature, ${p}`, "°C", ss.map((s) => s?.thermal?.byPlace[p] ?? null), "lower");
    // The highest temperature allowed at this place, beside it (a window's upper end for the cells).
    const limitAt = (s: ScenarioResult | undefined) => s?.thermal?.limits.find((l) => l.kind === "max" && s.thermal?.nodes.find((n) => n.id === l.node)?.place === p)?.limitC ?? null;
    row.limits = ss.map(limitAt);
    rows.push(row);
  }
  const limitIds = orderedUnion(ss.map((s) => (s?.thermal?.limits ?? []).map((l) => l.id)));
  for (const lid of limitIds) {
    const place = ss.map((s) => s?.thermal?.limits.find((l) => l.id === lid)?.place).find((p) => p) ?? lid;
    const label = lid === "cells-min" ? `Headroom above the lowest temperature, ${place}` : `Headroom, ${place}`;
    rows.push(numberRow(k(`headroom:${lid}`), group, label, "K", ss.map((s) => s?.thermal?.limits.find((l) => l.id === lid)?.headroomK ?? null), "higher"));
  }
  const crossingIds = orderedUnion(ss.map((s) => (s?.warmup?.crossings ?? []).map((c) => c.limitId)));
  for (const cid of crossingIds) {
    const place = ss.map((s) => s?.thermal?.limits.find((l) => l.id === cid)?.place).find((p) => p) ?? cid;
    rows.push(
      timeRow(
        k(`time:${cid}`),
        group,
        `Time to the limit, ${place}`,
        ss.map((s) => {
          const c = s?.warmup?.crossings.find((x) => x.limitId === cid);
          if (!c) return undefined;
          return c.timeS === null ? null : c.timeS / MIN;
        }),
      ),
    );
  }
  if (id !== "charging") {
    rows.push(numberRow(k("flux"), group, "Flux at temperature", "lm", ss.map((s) => s?.mode?.totalFluxLm ?? null), "higher"));
    rows.push(numberRow(k("runtime"), group, "Runtime", "h", ss.map((s) => s?.mode?.runtime?.value ?? null), "higher"));
    rows.push(numberRow(k("drive"), group, "Drive power into the emitters", "W", ss.map((s) => s?.mode?.driveW ?? null), "none"));
  }
  return rows;
}

export function figureRows(evals: readonly BuildEvaluation[]): FigureRow[] {
  const overall = "Whole build";
  const rows: FigureRow[] = [
    verdictRow("build/verdict", overall, "Verdict (worst scenario)", evals.map((e) => e.verdict)),
    numberRow("build/cost", overall, "Parts cost", "€", evals.map((e) => e.costs.totalEur), "lower"),
    // An evaluation cached before masses were worked out has none (null, never NaN).
    numberRow("build/mass", overall, "Mass", "kg", evals.map((e) => (e.mass as BuildEvaluation["mass"] | undefined)?.totalKg ?? null), "lower"),
    numberRow("build/saving", overall, "Saving against a new light", "€", evals.map((e) => e.costs.savingEur), "higher"),
    numberRow("build/capacity", overall, "Pack capacity", "mAh", evals.map((e) => e.electrical.pack?.capacityMAh ?? null), "higher"),
    numberRow("build/energy", overall, "Pack energy", "Wh", evals.map((e) => e.electrical.pack?.energyWh.value ?? null), "higher"),
    numberRow("build/charge-time", overall, "Charge time to full", "h", evals.map((e) => e.electrical.charge?.totalHours.value ?? null), "lower"),
    numberRow("build/charger-heat", overall, "Charger heat", "W", evals.map((e) => e.electrical.charge?.lossW.value ?? null), "lower"),
  ];
  const ids = orderedUnion(evals.map((e) => e.scenarios.map((s) => s.id)));
  for (const id of ids) rows.push(...scenarioRows(evals, id));
  return rows;
}

/** Warm-up curves of the nodes that carry a limit, thinned to at most `points` per curve. */
export interface WarmupSeries {
  scenarioId: string;
  scenarioName: string;
  node: string;
  place: string;
  limitC: number | null;
  columns: ({ timesMin: number[]; temperaturesC: number[] } | null)[];
}

function thin<T>(xs: readonly T[], points: number): T[] {
  if (xs.length <= points) return [...xs];
  const step = (xs.length - 1) / (points - 1);
  return Array.from({ length: points }, (_, i) => xs[Math.round(i * step)]!);
}

export function warmupSeries(evals: readonly BuildEvaluation[], points = 61): WarmupSeries[] {
  const out: WarmupSeries[] = [];
  const ids = orderedUnion(evals.map((e) => e.scenarios.map((s) => s.id)));
  for (const id of ids) {
    const ss: (ScenarioResult | undefined)[] = evals.map((e) => e.scenarios.find((s) => s.id === id));
    const limits = orderedUnion(ss.map((s) => (s?.thermal?.limits ?? []).filter((l) => l.kind === "max").map((l) => l.id)));
    for (const lid of limits) {
      const ref = ss.map((s) => s?.thermal?.limits.find((l) => l.id === lid)).find((l) => l);
      if (!ref) continue;
      out.push({
        scenarioId: id,
        scenarioName: ss.find((s) => s)?.name ?? id,
        node: ref.node,
        place: ref.place,
        limitC: ref.limitC,
        columns: ss.map((s) => {
          const node = s?.thermal?.limits.find((l) => l.id === lid)?.node;
          const temps = node ? s?.warmup?.temperaturesC[node] : undefined;
          if (!s?.warmup || !temps) return null;
          const idx = thin(s.warmup.timesS.map((_, i) => i), points);
          return { timesMin: idx.map((i) => (s.warmup!.timesS[i] ?? 0) / MIN), temperaturesC: idx.map((i) => temps[i] ?? 0) };
        }),
      });
    }
  }
  return out;
}

/** The temperature ladder of one scenario per column: where the rise above ambient goes. */
export interface LadderColumn {
  riseK: number;
  remainderK: number;
  steps: { place: string; deltaK: number }[];
}

export function ladders(evals: readonly BuildEvaluation[], scenarioId: string): (LadderColumn | null)[] {
  return evals.map((e) => {
    const l = e.scenarios.find((s) => s.id === scenarioId)?.thermal?.ladder;
    return l ? { riseK: l.riseK, remainderK: l.remainderK, steps: l.steps.map((s) => ({ place: s.place, deltaK: s.deltaK })) } : null;
  });
}
