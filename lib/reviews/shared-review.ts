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
