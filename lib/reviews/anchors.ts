import type { BuildEvaluation } from "@/lib/retrofit";
import { formatDuration } from "@/lib/units/figures";

/**
 * What a review comment may be pinned to, each with its name in words: the nodes and links of
 * the revision's heat path (in every scenario, and over all of them), the rows of the headroom
 * table and the warm-up curves of every limited place, and the Budget's figures. The key is
 * what the API stores ("driver#mode:high", "driver->wall-driver", "mode:high/headroom/touch");
 * people only ever read the label ("driver board, high mode").
 */
export interface Anchor {
  key: string;
  label: string;
  /** The scenario the anchor belongs to; absent for the heat path over every scenario and the build's own figures. */
  scenarioId?: string;
  /** A warm-up curve: a point of it may be pinned ("…/warmup/driver-board/at/12.5", minutes from switch-on up to `untilMin`). */
  curve?: { place: string; scenario: string; untilMin: number };
}
export interface HeatPathAnchors {
  nodes: Anchor[];
  links: Anchor[];
  figures: Anchor[];
}
export type AnchorKind = "node" | "link" | "figure";

export const linkKey = (from: string, to: string): string => `${from}->${to}`;
/** A node or link in one scenario: "driver#mode:high". */
export const inScenario = (key: string, scenarioId: string): string => `${key}#${scenarioId}`;

type EvaluationLike = Pick<BuildEvaluation, "scenarios" | "verdict">;
type ScenarioLike = BuildEvaluation["scenarios"][number];

/** "high mode", "charging". */
export function scenarioWords(s: Pick<ScenarioLike, "kind" | "name">): string {
  return s.kind === "charging" ? "charging" : `${s.name.toLowerCase()} mode`;
}

const LIMIT_WORDS: Record<string, (place: string) => string> = {
  "cells-max": (p) => `${p} (upper limit)`,
  "cells-min": (p) => `${p} (lower limit)`,
};

export function heatPathAnchors(evaluation: EvaluationLike): HeatPathAnchors {
  const nodes = new Map<string, Anchor>();
  const links = new Map<string, Anchor & { places: string[] }>();
  const figures = new Map<string, Anchor>([
    ["build/verdict", { key: "build/verdict", label: "overall verdict" }],
    ["build/costs", { key: "build/costs", label: "costs" }],
    ["build/electrical", { key: "build/electrical", label: "pack, runtime and charge time" }],
  ]);
  const scoped: { nodes: Anchor[]; links: Anchor[] } = { nodes: [], links: [] };
  for (const s of evaluation.scenarios) {
    const name = scenarioWords(s);
    for (const n of s.thermal?.nodes ?? []) {
      if (!nodes.has(n.id)) nodes.set(n.id, { key: n.id, label: n.place });
      scoped.nodes.push({ key: inScenario(n.id, s.id), label: `${n.place}, ${name}`, scenarioId: s.id });
    }
    const here = new Map<string, string[]>();
    for (const l of s.thermal?.links ?? []) {
      const k = linkKey(l.from, l.to);
      const all = links.get(k) ?? { key: k, label: "", places: [] };
      if (!all.places.includes(l.place)) all.places.push(l.place);
      links.set(k, all);
      const p = here.get(k) ?? [];
      if (!p.includes(l.place)) p.push(l.place);
      here.set(k, p);
    }
    for (const [k, places] of here) scoped.links.push({ key: inScenario(k, s.id), label: `${places.join(" + ")}, ${name}`, scenarioId: s.id });
    const fig = (key: string, label: string, curve?: Anchor["curve"]) => figures.set(key, { key, label, scenarioId: s.id, ...(curve ? { curve } : {}) });
    fig(`${s.id}/headroom`, `headroom table, ${name}`);
    for (const l of s.thermal?.limits ?? []) fig(`${s.id}/headroom/${l.id}`, `headroom of the ${(LIMIT_WORDS[l.id] ?? ((p: string) => p))(l.place)}, ${name}`);
    fig(`${s.id}/ladder`, `temperature ladder, ${name}`);
    if (s.warmup) {
      fig(`${s.id}/warmup`, `warm-up curves, ${name}`);
      for (const c of s.warmup.crossings) {
        const place = s.thermal?.limits.find((l) => l.id === c.limitId)?.place ?? "limited place";
        fig(`${s.id}/warmup/${c.limitId}`, `warm-up of the ${place}, ${name}`, { place, scenario: name, untilMin: (s.warmup.timesS.at(-1) ?? 0) / 60 });
      }
    }
    if (s.whatItTakes) fig(`${s.id}/what-it-takes`, `what it takes, ${name}`);
  }
  return {
    nodes: [...nodes.values(), ...scoped.nodes],
    links: [...[...links.values()].map(({ key, places }) => ({ key, label: places.join(" + ") })), ...scoped.links],
    figures: [...figures.values()],
  };
}

/** A point of a warm-up curve: "<curve key>/at/<minutes>". */
const POINT = /^(.+\/warmup\/[^/]+)\/at\/(\d{1,5}(?:\.\d{1,2})?)$/;

/** The key of one point of a warm-up curve, at minutes from switch-on (to 0.1 min). */
export const curvePointKey = (curveKey: string, minutes: number): string => `${curveKey}/at/${Math.max(0, Math.round(minutes * 10) / 10)}`;

/** A point key's curve and minutes, when the curve is one of this revision's and the time within its warm-up. */
export function curvePoint(anchors: Pick<HeatPathAnchors, "figures">, key: string): { curve: Anchor & { curve: NonNullable<Anchor["curve"]> }; minutes: number } | null {
  const m = POINT.exec(key);
  if (!m) return null;
  const curve = anchors.figures.find((a) => a.key === m[1]);
  const minutes = Number(m[2]);
  if (!curve?.curve || !(minutes <= curve.curve.untilMin + 0.05)) return null;
  return { curve: curve as Anchor & { curve: NonNullable<Anchor["curve"]> }, minutes };
}

function found(anchors: HeatPathAnchors, anchor: { kind: AnchorKind; key: string }): string | null {
  const hit = anchors[`${anchor.kind}s`].find((a) => a.key === anchor.key);
  if (hit) return hit.label;
  const point = anchor.kind === "figure" ? curvePoint(anchors, anchor.key) : null;
  return point ? `warm-up of the ${point.curve.curve.place} at ${formatDuration(point.minutes * 60)}, ${point.curve.curve.scenario}` : null;
}

/** The words for a stored anchor; a key this revision no longer has still reads as words, never as an id. */
export function anchorLabel(anchors: HeatPathAnchors, anchor: { kind: AnchorKind; key: string }): string {
  const label = found(anchors, anchor);
  if (label !== null) return label;
  return anchor.kind === "node" ? "a place no longer in the heat path" : anchor.kind === "link" ? "a link no longer in the heat path" : "a figure no longer on the Budget";
}

const KIND_WORDS: Record<AnchorKind, string> = { node: "place in the heat path", link: "link in the heat path", figure: "figure of the Budget" };

/** Null when the anchor exists in this revision; otherwise a message for people (no ids). */
export function anchorProblem(anchors: HeatPathAnchors, anchor: { kind: AnchorKind; key: string }, revision?: number): string | null {
  if (found(anchors, anchor) !== null) return null;
  const list = anchors[`${anchor.kind}s`];
  const rev = revision ? `revision ${revision}` : "this revision";
  if (anchor.kind === "figure" && POINT.test(anchor.key)) return `Pinned to: that point is not on a warm-up curve of ${rev}; click a point on the curve that is shown, then pin the comment.`;
  if (list.length === 0) return `Pinned to: ${rev} has no ${KIND_WORDS[anchor.kind]} to pin a comment to (its heat path could not be worked out); pin it to a figure instead.`;
  return `Pinned to: that ${KIND_WORDS[anchor.kind]} does not exist in ${rev}; click a place, a link or a row that is shown, then pin the comment.`;
}

/**
 * Comment counts to draw on one scenario's heat-path diagram, by "node:<id>" or
 * "link:<from->to>": the comments pinned to it in that scenario and those on the heat path as a whole.
 */
export function diagramPins(comments: readonly { anchorKind: AnchorKind; anchorKey: string }[], scenarioId: string | undefined): Record<string, number> {
  const pins: Record<string, number> = {};
  for (const c of comments) {
    if (c.anchorKind === "figure") continue;
    const [target, sid] = c.anchorKey.split("#");
    if (sid && sid !== scenarioId) continue;
    const k = `${c.anchorKind}:${target}`;
    pins[k] = (pins[k] ?? 0) + 1;
  }
  return pins;
}
