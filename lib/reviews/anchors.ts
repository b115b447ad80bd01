import type { BuildEvaluation } from "@/lib/retrofit";

/**
 * What a review comment may be pinned to: the nodes and links of the revision's heat path
 * (over every scenario: charging adds the charger), and the Budget's figures. A link's key
 * is "from->to"; parallel links between the same nodes (convection and radiation) share it.
 */
export interface HeatPathAnchors {
  nodes: { key: string; label: string }[];
  links: { key: string; label: string }[];
  figures: { key: string; label: string }[];
}

export const linkKey = (from: string, to: string): string => `${from}->${to}`;

export function heatPathAnchors(evaluation: Pick<BuildEvaluation, "scenarios" | "verdict">): HeatPathAnchors {
  const nodes = new Map<string, string>();
  const links = new Map<string, string[]>();
  const figures = new Map<string, string>([["build/verdict", "Overall verdict"], ["build/costs", "Costs"], ["build/electrical", "Pack, runtime and charge time"]]);
  for (const s of evaluation.scenarios) {
    for (const n of s.thermal?.nodes ?? []) if (!nodes.has(n.id)) nodes.set(n.id, n.place);
    for (const l of s.thermal?.links ?? []) {
      const k = linkKey(l.from, l.to);
      const places = links.get(k) ?? [];
      if (!places.includes(l.place)) places.push(l.place);
      links.set(k, places);
    }
    const name = s.kind === "charging" ? "charging" : `mode ${s.name}`;
    figures.set(`${s.id}/headroom`, `Headroom table, ${name}`);
    figures.set(`${s.id}/ladder`, `Temperature ladder, ${name}`);
    if (s.warmup) figures.set(`${s.id}/warmup`, `Warm-up curves, ${name}`);
    if (s.whatItTakes) figures.set(`${s.id}/what-it-takes`, `What it takes, ${name}`);
  }
  return {
    nodes: [...nodes].map(([key, label]) => ({ key, label })),
    links: [...links].map(([key, places]) => ({ key, label: places.join(" + ") })),
    figures: [...figures].map(([key, label]) => ({ key, label })),
  };
}

/** Null when the anchor exists in this heat path; otherwise the message naming what is allowed. */
export function anchorProblem(anchors: HeatPathAnchors, anchor: { kind: "node" | "link" | "figure"; key: string }): string | null {
  const list = anchor.kind === "node" ? anchors.nodes : anchor.kind === "link" ? anchors.links : anchors.figures;
  if (list.some((a) => a.key === anchor.key)) return null;
  if (list.length === 0) return `This revision has no ${anchor.kind}s to pin a comment to (its heat path could not be worked out); pin it to a figure instead.`;
  const some = list.slice(0, 12).map((a) => a.key).join(", ");
  return `"${anchor.key}" is not a ${anchor.kind} of this revision's heat path; choose one of: ${some}${list.length > 12 ? ", …" : ""}.`;
}
