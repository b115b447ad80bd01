import type { BuildEvaluation } from "@/lib/retrofit";
import { scenarioWords } from "./anchors";

/**
 * What a review share link shows of the reviewed revision's results: per scenario, each
 * limited place with its temperature and verdict. A limit taken from a part's rating is shown
 * (with its headroom) only when that part is public; a private part's rating could otherwise
 * be read back as temperature + headroom. No traces, no design, no part values.
 */
export interface SharedReviewResults {
  verdict: string | null;
  scenarios: {
    label: string;
    verdict: string | null;
    limits: { place: string; kind: "max" | "min"; temperatureC: number; limitC: number | null; headroomK: number | null; verdict: string }[];
  }[];
}

/** Which limits come from a part's rating, by the design slot of that part. */
const LIMIT_SLOT: Record<string, "emitter" | "driver" | "cell" | null> = {
  junction: "emitter",
  "driver-board": "driver",
  "cells-max": "cell",
  "cells-min": "cell",
  "charger-board": null,
  touch: null,
};

export function sharedReviewResults(evaluation: Pick<BuildEvaluation, "verdict" | "scenarios">, publicSlots: ReadonlySet<"emitter" | "driver" | "cell">): SharedReviewResults {
  return {
    verdict: evaluation.verdict,
    scenarios: evaluation.scenarios.map((s) => ({
      label: scenarioWords(s),
      verdict: s.thermal?.verdict ?? null,
      limits: (s.thermal?.limits ?? []).map((l) => {
        const slot = LIMIT_SLOT[l.id] ?? null;
        const open = slot === null || publicSlots.has(slot);
        const place = l.id === "cells-max" || l.id === "cells-min" ? `${l.place} (${l.kind === "max" ? "upper" : "lower"} limit)` : l.place;
        return { place, kind: l.kind, temperatureC: l.temperatureC, limitC: open ? l.limitC : null, headroomK: open ? l.headroomK : null, verdict: l.verdict };
      }),
    })),
  };
}

/** One scenario's heat path as a review link shows it: a link through an unpublished part shows no figures (null). */
export interface SharedHeatPath {
  scenarioId: string;
  label: string;
  ambientC: number;
  thermal: {
    nodes: { id: string; place: string }[];
    links: { index: number; from: string; to: string; place: string; watts: number | null; kelvinPerWatt: number | null }[];
    temperaturesC: Record<string, number>;
  };
}

/** True when the design's subtree holds a part typed in place or a part record that is not public. */
function holdsUnpublished(subtree: unknown, isPublic: (partId: string) => boolean): boolean {
  if (Array.isArray(subtree)) return subtree.some((x) => holdsUnpublished(x, isPublic));
  if (!subtree || typeof subtree !== "object") return false;
  const o = subtree as Record<string, unknown>;
  if ("inline" in o) return true;
  if (typeof o.partId === "string" && !isPublic(o.partId)) return true;
  return Object.values(o).some((x) => holdsUnpublished(x, isPublic));
}

/** The design sections a link's figures depend on: its slot's own section; air and orientation act on the housing. */
const sectionsOf = (slot: string): string[] => {
  const top = slot.split(".")[0] ?? slot;
  return top === "environment" ? ["environment", "housing"] : top === "charger" ? ["pack"] : [top];
};

/**
 * Every scenario's heat path for a review link: places with their temperatures, links with the
 * watts they carry and their K/W — except where a link's section of the design (light engine,
 * driver, pack, housing) holds a part that is not published: there the link is drawn without
 * figures, since its K/W (or the watts beside two temperatures) would give the part's values away.
 */
export function sharedHeatPaths(evaluation: Pick<BuildEvaluation, "scenarios">, design: unknown, isPublic: (partId: string) => boolean): SharedHeatPath[] {
  const d = design && typeof design === "object" ? (design as Record<string, unknown>) : {};
  const closed = new Map<string, boolean>();
  const withheld = (slot: string) =>
    sectionsOf(slot).some((section) => {
      if (!closed.has(section)) closed.set(section, holdsUnpublished(d[section], isPublic));
      return closed.get(section)!;
    });
  return evaluation.scenarios.flatMap((s) =>
    s.thermal
      ? [
          {
            scenarioId: s.id,
            label: scenarioWords(s),
            ambientC: s.network?.ambientC ?? 25,
            thermal: {
              nodes: s.thermal.nodes.map((n) => ({ id: n.id, place: n.place })),
              links: s.thermal.links.map((l) => {
                const hide = withheld(l.slot);
                return { index: l.index, from: l.from, to: l.to, place: l.place, watts: hide ? null : l.watts, kelvinPerWatt: hide ? null : l.kelvinPerWatt };
              }),
              temperaturesC: s.thermal.temperaturesC,
            },
          },
        ]
      : [],
  );
}
