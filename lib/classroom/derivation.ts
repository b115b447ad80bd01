import type { BuildEvaluation, ScenarioResult, Verdict } from "@/lib/retrofit";
import type { Trace } from "@/lib/thermal";
import { equationTex } from "./tex";

/**
 * A worked example's derivation, generated from the engine's traces in the order a student
 * works it by hand: the heat from the electrical side, each link's resistance, the network
 * solution node by node, then the limits and the verdict. Every number is the evaluation's
 * own (nothing is recomputed here), so the derivation and the Budget cannot disagree.
 */
export interface DerivationQuantity {
  symbol: string;
  name: string;
  /** null when the value is hidden from the viewer (a question for the student). */
  value: number | null;
  unit: string;
  /** The key a hidden value is listed under; values sharing a key hide together. */
  ref?: string;
  hidden?: boolean;
}

export interface DerivationStep {
  key: string;
  title: string;
  formula: string;
  equation: string;
  tex: string;
  inputs: DerivationQuantity[];
  result: DerivationQuantity;
  source: string;
  validity: { range: string; inRange: boolean } | null;
  notes: string[];
  parts: DerivationStep[];
}

export interface NodeBalance {
  key: string;
  node: string;
  place: string;
  temperature: DerivationQuantity;
  /** Heat put into the node by the scenario (the sources), W; null when it is a hidden value. */
  sourceW: number | null;
  /** Heat leaving the node along each link (negative when it arrives), W. */
  flows: { link: string; other: string; watts: number }[];
  /** Heat in minus heat out; the solver drives it to round-off. */
  residualW: number;
}

export interface LimitStep {
  key: string;
  place: string;
  kind: "max" | "min";
  limit: DerivationQuantity;
  temperature: DerivationQuantity;
  headroom: DerivationQuantity;
  verdict: Verdict | null;
  source: string;
}

export interface Derivation {
  scenarioId: string;
  scenarioName: string;
  /** The case in words: "driver mode “high”, steady state" or "charging, steady state". */
  scenarioLabel: string;
  ambientC: number | null;
  heat: DerivationStep[];
  links: DerivationStep[];
  network: NodeBalance[];
  limits: LimitStep[];
  verdict: { value: Verdict | null; hidden: boolean };
  /** The values an instructor may hide, by key, with their labels. */
  hideable: { key: string; label: string; unit: string }[];
  /** Scenarios the example could follow instead. */
  scenarios: { id: string; name: string }[];
}

const qty = (q: { symbol: string; name: string; value: number; unit: string }, ref?: string): DerivationQuantity => ({ symbol: q.symbol, name: q.name, value: q.value, unit: q.unit, ...(ref ? { ref } : {}) });

function fromTrace(key: string, title: string, t: Trace, result?: DerivationQuantity): DerivationStep {
  return {
    key,
    title,
    formula: t.formula,
    equation: t.equation,
    tex: equationTex(t.equation),
    inputs: [...t.inputs, ...t.intermediates].map((q) => qty(q)),
    result: result ?? qty(t.result, key),
    source: t.source,
    validity: t.validity ?? null,
    notes: t.notes,
    parts: t.parts.map((p, i) => fromTrace(`${key}.${i}`, p.element, p)),
  };
}

function heatSteps(s: ScenarioResult): DerivationStep[] {
  const steps: DerivationStep[] = [];
  const add = (key: string, title: string, t: Trace | null | undefined) => {
    if (t) steps.push(fromTrace(`heat:${key}`, title, t));
  };
  if (s.mode) {
    add("vf", "Forward voltage of the emitter at its junction temperature", s.mode.vf.trace);
    add("emitter-power", "Electrical power into one emitter", s.mode.emitterPower.trace);
    add("emitter-heat", "Heat at the junction of one emitter", s.mode.emitterHeat.trace);
    add("driver-loss", "Heat lost in the driver", s.mode.driverLoss.trace);
    add("cell-heat", "Heat in the cells", s.mode.cellHeat?.trace);
  }
  if (s.charging) {
    add("charger-loss", "Heat lost in the charger", s.charging.chargerLoss.trace);
    add("cell-heat", "Heat in the cells while charging", s.charging.cellHeat.trace);
  }
  return steps;
}

/** The least headroom over a scenario's limits (Infinity without limits). */
const tightest = (s: ScenarioResult) => Math.min(...(s.thermal?.limits ?? []).map((l) => l.headroomK));

/**
 * Picks the scenario: the one asked for, else the driver mode with the least headroom (the
 * case a class asks "why does it run hot" about), else the first that solved.
 */
export function pickScenario(evaluation: BuildEvaluation, scenarioId: string | null | undefined): ScenarioResult | null {
  const solved = evaluation.scenarios.filter((s) => s.thermal);
  const asked = solved.find((s) => s.id === scenarioId);
  if (asked) return asked;
  const modes = solved.filter((s) => s.kind === "mode");
  return modes.reduce<ScenarioResult | null>((hot, s) => (hot === null || tightest(s) < tightest(hot) ? s : hot), null) ?? solved[0] ?? null;
}

export function deriveExample(evaluation: BuildEvaluation, scenarioId?: string | null): Derivation | null {
  const s = pickScenario(evaluation, scenarioId);
  if (!s?.thermal) return null;
  const th = s.thermal;
  const placeOf = new Map(th.nodes.map((n) => [n.id, n.place]));
  placeOf.set("ambient", "surrounding air");
  const heat = heatSteps(s);
  const links = th.links.map((l) =>
    fromTrace(`link:${l.index}`, l.place, l.trace, { symbol: "R", name: `resistance, ${l.place}`, value: l.kelvinPerWatt, unit: "K/W", ref: `link:${l.index}` }),
  );
  const sources = s.network?.sources ?? [];
  const network: NodeBalance[] = th.nodes.map((n) => {
    const flows = th.links
      .filter((l) => l.from === n.id || l.to === n.id)
      .map((l) => (l.from === n.id ? { link: l.place, other: placeOf.get(l.to) ?? l.to, watts: l.watts } : { link: l.place, other: placeOf.get(l.from) ?? l.from, watts: -l.watts }));
    const sourceW = sources.filter((x) => x.node === n.id).reduce((a, x) => a + x.watts, 0);
    const out = flows.reduce((a, f) => a + f.watts, 0);
    return {
      key: `node:${n.id}`,
      node: n.id,
      place: n.place,
      temperature: { symbol: "T", name: `temperature, ${n.place}`, value: th.temperaturesC[n.id] ?? null, unit: "°C", ref: `node:${n.id}` },
      sourceW,
      flows,
      residualW: sourceW - out,
    };
  });
  const limits: LimitStep[] = th.limits.map((l) => ({
    key: `limit:${l.id}`,
    place: l.place,
    kind: l.kind,
    limit: { symbol: "T_limit", name: `limit, ${l.place}`, value: l.limitC, unit: "°C" },
    temperature: { symbol: "T", name: `temperature, ${l.place}`, value: l.temperatureC, unit: "°C", ref: `node:${l.node}` },
    headroom: { symbol: "ΔT", name: `headroom, ${l.place}`, value: l.headroomK, unit: "K", ref: `limit:${l.id}` },
    verdict: l.verdict,
    source: l.limitTrace.source,
  }));
  const hideable = [
    ...heat.map((h) => ({ key: h.key, label: h.title, unit: h.result.unit })),
    ...links.map((l) => ({ key: l.key, label: `Resistance: ${l.title}`, unit: "K/W" })),
    ...network.map((n) => ({ key: n.key, label: `Temperature: ${n.place}`, unit: "°C" })),
    ...limits.map((l) => ({ key: l.key, label: `Headroom: ${l.place}`, unit: "K" })),
  ];
  return {
    scenarioId: s.id,
    scenarioName: s.name,
    scenarioLabel: `${s.kind === "mode" ? `driver mode “${s.name}”` : s.name}, steady state`,
    ambientC: s.network?.ambientC ?? null,
    heat,
    links,
    network,
    limits,
    verdict: { value: th.verdict, hidden: false },
    hideable,
    scenarios: evaluation.scenarios.filter((x) => x.thermal).map((x) => ({ id: x.id, name: x.name })),
  };
}

/** Every quantity of the derivation, for walking (hiding, answer lookup). */
function quantities(d: Derivation): DerivationQuantity[] {
  const ofStep = (s: DerivationStep): DerivationQuantity[] => [s.result, ...s.inputs, ...s.parts.flatMap(ofStep)];
  return [...d.heat.flatMap(ofStep), ...d.links.flatMap(ofStep), ...d.network.map((n) => n.temperature), ...d.limits.flatMap((l) => [l.temperature, l.headroom])];
}

/** The value a hidden key stands for (the step's result), or null when the key names none. */
export function valueOf(d: Derivation, key: string): { value: number; unit: string } | null {
  const hit = quantities(d).find((q) => q.ref === key && q.value !== null);
  return hit && hit.value !== null ? { value: hit.value, unit: hit.unit } : null;
}

/**
 * A copy with the hidden values blanked (value null, hidden true); when any headroom is
 * hidden the verdict is too, since it would give the answer away.
 */
export function hideValues(d: Derivation, hidden: readonly string[]): Derivation {
  if (hidden.length === 0) return d;
  const set = new Set(hidden);
  const copy = structuredClone(d);
  const all = quantities(copy);
  // A hidden value also appears as an input of later steps (the junction temperature in the
  // forward-voltage trace, a node's temperature in a convection trace): the same number
  // there is blanked too, or the question would answer itself.
  const secret = new Set(all.filter((q) => q.ref && set.has(q.ref) && q.value !== null).map((q) => q.value));
  for (const q of all) {
    if ((q.ref && set.has(q.ref)) || secret.has(q.value)) {
      q.value = null;
      q.hidden = true;
    }
  }
  // A node's source is the heat of a step above (the driver's loss): blanked with it.
  for (const n of copy.network) if (secret.has(n.sourceW)) n.sourceW = null;
  if (copy.limits.some((l) => l.headroom.hidden || l.temperature.hidden)) copy.verdict = { value: null, hidden: true };
  return copy;
}
