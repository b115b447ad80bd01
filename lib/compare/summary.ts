import type { LimitResult, Verdict } from "@/lib/retrofit";
import { celsiusAgainst, euros, kelvin, lumens, mass, runtime } from "./format";
import { SIGNIFICANCE, significantlyDifferent } from "./significance";

/**
 * The summary Side by side opens with: for every scenario (each mode, and charging) which
 * limit decides each variant, which variant has the most headroom there and by how much, and
 * what choosing it costs — as a few sentences and a small table, generated from the numbers.
 * A limit that every variant meets (or misses) alike is said once, not per variant.
 * Pure: the evaluations are the engine's answers; `names` say how each column is called.
 */

type LimitLike = Pick<LimitResult, "id" | "place" | "kind" | "headroomK" | "temperatureC" | "limitC" | "verdict">;
export interface ScenarioLike {
  id: string;
  kind: "mode" | "charging";
  name: string;
  thermal: { limits: readonly LimitLike[] } | null;
  mode: { totalFluxLm: number | null; runtime: { value: number | null } | null } | null;
  warmup?: { crossings: readonly { limitId: string; timeS: number | null }[] } | null;
}
export interface EvaluationLike {
  scenarios: readonly ScenarioLike[];
  costs: { totalEur: number };
  /** Mass of the parts that give one; absent from a result worked out before masses were. */
  mass?: { totalKg: number } | null;
}

export interface DecidingLimit {
  id: string;
  /** The place in words, telling a window's two ends apart ("cells, lower limit"). */
  place: string;
  headroomK: number;
  temperatureC: number;
  limitC: number;
  kind: "max" | "min";
  verdict: Verdict;
  /** Minutes from switch-on until the limit is reached; null if not within the warm-up or unknown. */
  reachedAfterMin: number | null;
}

export interface VariantCell {
  /** The limit with the least headroom among those the variants differ on (or among all, when none differ). */
  deciding: DecidingLimit | null;
  /** The worst verdict over every limit of the scenario. */
  verdict: Verdict | null;
  fluxLm: number | null;
  runtimeH: number | null;
  winner: boolean;
}

export interface SharedLimit {
  id: string;
  place: string;
  verdict: Verdict;
  /** The lowest and the highest headroom over the variants. */
  headroomK: number;
  bestHeadroomK: number;
  /** True when the variants are within the significance of each other on it. */
  alike: boolean;
}

export interface ScenarioSummary {
  id: string;
  /** "high mode", "charging". */
  label: string;
  cells: VariantCell[];
  /** Columns with the most headroom on the limits that differ; several when they tie, all of them when nothing differs. */
  winners: number[];
  /** Headroom the winners have over the best of the rest, K; null when nothing differs or nobody else could be worked out. */
  leadK: number | null;
  /** Limits every variant has alike (within the significance) that are tight or over budget. */
  shared: SharedLimit[];
  /** One sentence: who wins and why. */
  sentence: string;
  /** What choosing the winner costs against each other column, in words; empty when nothing. */
  costs: string[];
}

export interface ComparisonSummary {
  /** The first lines: who wins where, each scenario's reason, what every variant shares (once), what the choice costs. */
  lines: string[];
  scenarios: ScenarioSummary[];
  /** Parts cost per column. */
  costsEur: number[];
  /** Mass per column, kg; null where a column has none. */
  massesKg: (number | null)[];
}

export interface SummaryInput {
  /** How each column is called in sentences ("floating free in the housing's air"). */
  names: readonly string[];
  /** Labels of the design rows the columns differ in ("Driver cooling"); empty when they are the same part for part. */
  differsIn: readonly string[];
  evaluations: readonly EvaluationLike[];
}

const limitPlace = (l: Pick<LimitLike, "id" | "place" | "kind">): string => (l.id === "cells-max" || l.id === "cells-min" ? `${l.place} (${l.kind === "max" ? "upper" : "lower"} limit)` : l.place);

const scenarioLabel = (s: Pick<ScenarioLike, "kind" | "name">): string => (s.kind === "charging" ? "charging" : `${s.name.toLowerCase()} mode`);

/** "in high mode" / "while charging". */
const where = (label: string): string => (label === "charging" ? "while charging" : `in ${label}`);

const COUNT_WORDS = ["none", "one", "both", "all three", "all four"];
const allOf = (n: number): string => COUNT_WORDS[n] ?? `all ${n}`;

/** "a", "a and b", "a, b and c". */
export function listWords(xs: readonly string[]): string {
  if (xs.length <= 1) return xs[0] ?? "";
  return `${xs.slice(0, -1).join(", ")} and ${xs[xs.length - 1]}`;
}

const capital = (s: string): string => (s ? s[0]!.toUpperCase() + s.slice(1) : s);

const against = (l: DecidingLimit): string => {
  const shown = celsiusAgainst(l.temperatureC, l.limitC, l.kind);
  return `${shown.value} against ${l.kind === "max" ? "a limit of" : "a lowest"} ${shown.limit}`;
};

const reached = (l: DecidingLimit): string => (l.reachedAfterMin !== null ? `, reached after ${Math.max(1, Math.round(l.reachedAfterMin))} min` : "");

/** The significance in words ("1 K"), as a person states it (not a measured figure). */
const SIGNIFICANT = `${SIGNIFICANCE.kelvin} K`;

/** A housing surface over its limit is past the burn threshold for the way it is held (ISO 13732-1). */
const isTouch = (l: Pick<DecidingLimit, "id">): boolean => l.id === "touch";

/** Why a column loses: "is over budget on the driver board (…)", "has 12 K headroom on …". */
function loserPhrase(l: DecidingLimit): string {
  if (l.verdict === "over budget" && isTouch(l)) return `makes the ${l.place} too hot to touch safely (${against(l)}${reached(l)})`;
  if (l.verdict === "over budget") return `is over budget on the ${l.place} (${against(l)}${reached(l)})`;
  if (l.verdict === "tight") return `is tight on the ${l.place} (${kelvin(l.headroomK)} headroom, ${against(l)})`;
  return `has ${kelvin(l.headroomK)} headroom on the ${l.place} (${against(l)})`;
}

/** Why a column wins: its deciding limit, even when that is over budget too. */
function winnerPhrase(l: DecidingLimit): string {
  if (l.headroomK < 0 && isTouch(l)) return `the ${l.place} is too hot to touch safely, over its limit by ${kelvin(-l.headroomK)} (${against(l)}${reached(l)})`;
  if (l.headroomK < 0) return `the ${l.place} is over its limit by ${kelvin(-l.headroomK)} (${against(l)}${reached(l)})`;
  return `${kelvin(l.headroomK)} headroom on the ${l.place} (${against(l)})`;
}

function cellsFor(evals: readonly EvaluationLike[], id: string): { scenario: ScenarioLike | undefined; limits: readonly LimitLike[] | null }[] {
  return evals.map((e) => {
    const scenario = e.scenarios.find((s) => s.id === id);
    return { scenario, limits: scenario?.thermal?.limits ?? null };
  });
}

function summariseScenario(input: SummaryInput, id: string): ScenarioSummary {
  const cols = cellsFor(input.evaluations, id);
  const ref = cols.find((c) => c.scenario)?.scenario!;
  const label = scenarioLabel(ref);
  const worked = cols.map((c, i) => (c.limits ? i : -1)).filter((i) => i >= 0);
  const limitIds = [...new Set(cols.flatMap((c) => (c.limits ?? []).map((l) => l.id)))];

  // A limit differs when the headroom of the variants that have it spreads by the significance
  // or more. A limit every variant misses (tight or over budget in each) is a shared problem:
  // said once, and left out of the ranking when other limits tell the variants apart.
  const differing = new Set<string>();
  const shared: SharedLimit[] = [];
  for (const lid of limitIds) {
    const hs = worked.map((i) => cols[i]!.limits!.find((l) => l.id === lid)).filter((l): l is LimitLike => Boolean(l));
    if (hs.length === 0) continue;
    const values = hs.map((l) => l.headroomK);
    const spread = Math.max(...values) - Math.min(...values);
    const differs = hs.length < worked.length || significantlyDifferent(spread, "K");
    if (differs) differing.add(lid);
    const worst = hs.reduce((a, b) => (b.headroomK < a.headroomK ? b : a));
    if (worked.length > 1 && hs.length === worked.length && hs.every((l) => l.verdict !== "within budget")) {
      const verdict: Verdict = hs.every((l) => l.verdict === "over budget") ? "over budget" : "tight";
      shared.push({ id: lid, place: limitPlace(worst), verdict, headroomK: worst.headroomK, bestHeadroomK: Math.max(...values), alike: !differs });
    }
  }
  const sharedIds = new Set(shared.map((l) => l.id));
  const telling = [...differing].filter((id) => !sharedIds.has(id));
  const pool = new Set(telling.length > 0 ? telling : differing);

  const decidingOf = (i: number): DecidingLimit | null => {
    const c = cols[i]!;
    if (!c.limits || c.limits.length === 0) return null;
    const candidates = pool.size > 0 ? c.limits.filter((l) => pool.has(l.id)) : c.limits;
    if (candidates.length === 0) return null;
    const l = candidates.reduce((a, b) => (b.headroomK < a.headroomK ? b : a));
    const crossing = c.scenario?.warmup?.crossings.find((x) => x.limitId === l.id);
    return { id: l.id, place: limitPlace(l), headroomK: l.headroomK, temperatureC: l.temperatureC, limitC: l.limitC, kind: l.kind, verdict: l.verdict, reachedAfterMin: crossing && crossing.timeS !== null ? crossing.timeS / 60 : null };
  };
  const worstVerdict = (ls: readonly LimitLike[] | null): Verdict | null => {
    if (!ls || ls.length === 0) return null;
    const order: Verdict[] = ["within budget", "tight", "over budget"];
    return ls.reduce<Verdict>((w, l) => (order.indexOf(l.verdict) > order.indexOf(w) ? l.verdict : w), "within budget");
  };

  const cells: VariantCell[] = cols.map((c, i) => ({
    deciding: decidingOf(i),
    verdict: worstVerdict(c.limits),
    fluxLm: c.scenario?.mode?.totalFluxLm ?? null,
    runtimeH: c.scenario?.mode?.runtime?.value ?? null,
    winner: false,
  }));

  const ranked = worked.filter((i) => cells[i]!.deciding).sort((a, b) => cells[b]!.deciding!.headroomK - cells[a]!.deciding!.headroomK);
  const best = ranked[0] === undefined ? null : cells[ranked[0]]!.deciding!.headroomK;
  let winners: number[] = [];
  let leadK: number | null = null;
  if (best !== null) {
    winners = pool.size === 0 ? [...ranked] : ranked.filter((i) => !significantlyDifferent(best - cells[i]!.deciding!.headroomK, "K"));
    const rest = ranked.filter((i) => !winners.includes(i));
    leadK = rest.length > 0 ? Math.min(...winners.map((i) => cells[i]!.deciding!.headroomK)) - cells[rest[0]!]!.deciding!.headroomK : null;
  }
  winners.sort((a, b) => a - b);
  for (const i of winners) cells[i]!.winner = true;

  const name = (i: number) => input.names[i] ?? `column ${i + 1}`;
  const parts: string[] = [];
  const unknown = cols.map((c, i) => (c.limits ? -1 : i)).filter((i) => i >= 0);
  if (best === null) {
    parts.push(`${capital(label)}: no variant could be worked out, so nothing is compared.`);
  } else if (differing.size === 0 || winners.length === ranked.length) {
    const what = differing.size === 0 ? `the variants differ by less than ${SIGNIFICANT} on every limit` : `the variants tie within ${SIGNIFICANT}`;
    const d = cells[ranked[0]!]!.deciding!;
    const decides = sharedIds.has(d.id) ? "" : d.headroomK < 0 ? `; the ${d.place} decides, over its limit by ${kelvin(-d.headroomK)}` : `; the ${d.place} decides, with ${kelvin(d.headroomK)} headroom`;
    parts.push(`${capital(label)}: no variant wins — ${what}${decides}.`);
  } else {
    const w = winners.map(name);
    const d = cells[winners[0]!]!.deciding!;
    const rest = ranked.filter((i) => !winners.includes(i));
    const runnerUp = rest[0]!;
    // When even the best is over a limit, it is the least over budget, not a winner.
    const over = d.headroomK < 0;
    const head = winners.length === 1 ? (over ? `${capital(w[0]!)} is the least over budget ${where(label)}` : `${capital(w[0]!)} wins ${where(label)}`) : `${capital(listWords(w))} tie ${where(label)} (within ${SIGNIFICANT})`;
    const why = over ? `${winnerPhrase(d)}, ${kelvin(leadK)} less over than ${name(runnerUp)}` : `${winnerPhrase(d)}, ${kelvin(leadK)} more than ${name(runnerUp)}`;
    const losers = rest.map((i) => `${name(i)} ${loserPhrase(cells[i]!.deciding!)}`);
    parts.push(`${head}: ${why}; ${listWords(losers)}.`);
  }
  if (unknown.length > 0) parts.push(`${capital(listWords(unknown.map(name)))} could not be worked out ${where(label)}.`);

  // What choosing the winner costs in this scenario against each other column: light and runtime (parts cost is said once for the build).
  const costs: string[] = [];
  if (winners.length === 1 && best !== null && pool.size > 0) {
    const wi = winners[0]!;
    const wc = cells[wi]!;
    for (const i of worked) {
      if (i === wi) continue;
      const c = cells[i]!;
      const bits: string[] = [];
      if (wc.fluxLm !== null && c.fluxLm !== null && significantlyDifferent(wc.fluxLm - c.fluxLm, "lm", c.fluxLm)) bits.push(wc.fluxLm < c.fluxLm ? `${lumens(c.fluxLm - wc.fluxLm)} less light` : `${lumens(wc.fluxLm - c.fluxLm)} more light`);
      if (wc.runtimeH !== null && c.runtimeH !== null && significantlyDifferent(wc.runtimeH - c.runtimeH, "h", c.runtimeH)) bits.push(wc.runtimeH < c.runtimeH ? `${runtime(c.runtimeH - wc.runtimeH)} less runtime` : `${runtime(wc.runtimeH - c.runtimeH)} more runtime`);
      if (bits.length > 0) costs.push(`${listWords(bits)} than ${name(i)}`);
    }
  }
  return { id, label, cells, winners, leadK, shared, sentence: parts.join(" "), costs };
}

/** The summary of two to four evaluations; scenarios in the order the columns list them. */
export function summarise(input: SummaryInput): ComparisonSummary {
  const n = input.evaluations.length;
  const ids = [...new Set(input.evaluations.flatMap((e) => e.scenarios.map((s) => s.id)))];
  const scenarios = ids.map((id) => summariseScenario(input, id));
  const name = (i: number) => input.names[i] ?? `column ${i + 1}`;
  const lines: string[] = [];

  // Who wins where, in one line.
  const decided = scenarios.filter((s) => s.winners.length === 1 && s.leadK !== null);
  if (decided.length > 0) {
    // A winner over budget there is "the least over budget", said after the real wins.
    const leastOver = (s: ScenarioSummary) => (s.cells[s.winners[0]!]?.deciding?.headroomK ?? 0) < 0;
    const group = (list: readonly ScenarioSummary[]) => {
      const byWinner = new Map<number, string[]>();
      for (const s of list) byWinner.set(s.winners[0]!, [...(byWinner.get(s.winners[0]!) ?? []), s.label]);
      return [...byWinner];
    };
    const wins = [
      ...group(decided.filter((s) => !leastOver(s))).map(([i, labels]) => `${name(i)} wins ${whereList(labels)}`),
      ...group(decided.filter(leastOver)).map(([i, labels]) => `${name(i)} is the least over budget ${whereList(labels)}`),
    ];
    const undecided = scenarios.filter((s) => !decided.includes(s)).map((s) => s.label);
    lines.push(`${capital(listWords(wins))}${undecided.length > 0 ? `; no single winner ${whereList(undecided)}` : ""}.`);
  } else if (scenarios.length > 0) {
    lines.push(`No variant wins any scenario by ${SIGNIFICANT} or more of headroom.`);
  }
  for (const s of scenarios) lines.push(s.sentence);

  // Limits every variant misses, once, grouped over the scenarios they appear in.
  const sharedGroups = new Map<string, { place: string; verdict: Verdict; labels: string[]; worst: number; best: number; alike: boolean }>();
  for (const s of scenarios) {
    for (const l of s.shared) {
      const key = `${l.id}|${l.verdict}`;
      const g = sharedGroups.get(key) ?? { place: l.place, verdict: l.verdict, labels: [], worst: Infinity, best: -Infinity, alike: true };
      g.labels.push(s.label);
      g.worst = Math.min(g.worst, l.headroomK);
      g.best = Math.max(g.best, l.bestHeadroomK);
      g.alike &&= l.alike;
      sharedGroups.set(key, g);
    }
  }
  const what = listWords(input.differsIn.map((d) => d.toLowerCase()));
  for (const g of sharedGroups.values()) {
    const range = (a: number, b: number) => (significantlyDifferent(b - a, "K") ? `${kelvin(a).replace(" K", "")}–${kelvin(b)}` : kelvin(a));
    const amount = g.verdict === "over budget" ? ` (over by ${range(-g.best, -g.worst)})` : ` (${range(g.worst, g.best)} headroom)`;
    const because = input.differsIn.length === 0 ? "" : g.alike ? `: it is the same in every variant, so the ${what} is not what limits it` : `: the ${what} moves it, but none of them clears it`;
    lines.push(`${capital(allOf(n))} are ${g.verdict} on the ${g.place} ${whereList(g.labels)}${amount}${because}.`);
  }

  // The hot-surface caution wherever a variant takes the housing past its burn threshold.
  const hot = scenarios.flatMap((s) => s.cells.map((c, i) => ({ s, c, i }))).filter(({ c }) => c.deciding !== null && isTouch(c.deciding) && c.deciding.headroomK < 0);
  if (hot.length > 0) {
    const who = [...new Set(hot.map(({ i }) => i))].map(name);
    const when = [...new Set(hot.map(({ s }) => s.label))];
    lines.push(`Caution, hot surface: ${listWords(who)} ${who.length === 1 ? "takes" : "take"} the housing past the burn threshold for the way it is held ${whereList(when)}; add a warning, a handle or a time limit on that mode.`);
  }

  const costsEur = input.evaluations.map((e) => e.costs.totalEur);
  for (const s of scenarios) if (s.costs.length > 0) lines.push(`${capital(where(s.label))}, ${name(s.winners[0]!)} gives ${s.costs.join("; ")}.`);
  const cheapest = Math.min(...costsEur);
  if (costsEur.some((c) => significantlyDifferent(c - cheapest, "€", cheapest))) lines.push(`Parts cost: ${listWords(costsEur.map((c, i) => `${name(i)} ${euros(c)}`))}.`);
  else if (n > 1) lines.push(`Parts cost: ${euros(costsEur[0])} for ${allOf(n)} (within ${SIGNIFICANCE.relative * 100} %).`);
  const massesKg = input.evaluations.map((e) => (e.mass && e.mass.totalKg > 0 ? e.mass.totalKg : null));
  const weighed = massesKg.filter((m): m is number => m !== null);
  if (weighed.length === n && n > 0) {
    const lightest = Math.min(...weighed);
    if (weighed.some((m) => significantlyDifferent(m - lightest, "kg", lightest))) lines.push(`Mass: ${listWords(weighed.map((m, i) => `${name(i)} ${mass(m)}`))}.`);
    else if (n > 1) lines.push(`Mass: ${mass(weighed[0])} for ${allOf(n)} (within ${SIGNIFICANCE.relative * 100} %).`);
  }
  return { lines, scenarios, costsEur, massesKg };
}

/** "in high and mid mode and while charging". */
function whereList(labels: readonly string[]): string {
  const modes = labels.filter((l) => l !== "charging").map((l) => l.replace(/ mode$/, ""));
  const out: string[] = [];
  if (modes.length > 0) out.push(`in ${listWords(modes)} mode`);
  if (labels.includes("charging")) out.push("while charging");
  return out.join(" and ");
}
