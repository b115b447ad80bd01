"use client";

import { useState } from "react";
import { HeatPathDiagram } from "@/components/budget/heat-path-diagram";
import type { SharedHeatPath } from "@/lib/reviews/shared-review";

/** A review link's heat paths, one scenario at a time, with the reviewer's pins drawn on them. */
export function SharedHeatPaths({ heatPaths }: { heatPaths: readonly (SharedHeatPath & { pins: Record<string, number> })[] }) {
  // Open on the scenario with the most pins: where the reviewer's comments are.
  const pinned = (h: (typeof heatPaths)[number]) => Object.values(h.pins).reduce((a, b) => a + b, 0);
  const [id, setId] = useState(() => [...heatPaths].sort((a, b) => pinned(b) - pinned(a))[0]?.scenarioId ?? "");
  const h = heatPaths.find((x) => x.scenarioId === id) ?? heatPaths[0];
  if (!h) return <p className="text-sm text-ink-soft">The heat path of this revision could not be worked out.</p>;
  const withheld = h.thermal.links.some((l) => l.watts === null);
  return (
    <div className="space-y-2">
      <div role="tablist" aria-label="Scenario of the heat path" className="flex flex-wrap gap-2">
        {heatPaths.map((x) => (
          <button key={x.scenarioId} type="button" role="tab" aria-selected={x.scenarioId === h.scenarioId} onClick={() => setId(x.scenarioId)} className={`rounded-full border px-3 py-0.5 text-sm ${x.scenarioId === h.scenarioId ? "border-ember bg-ember text-white" : "border-line bg-white hover:border-ember"}`}>
            {x.label}
            {pinned(x) > 0 && <span className="ml-1 opacity-80">· {pinned(x)} pinned</span>}
          </button>
        ))}
      </div>
      <p className="text-xs text-ink-soft">
        Each place with its temperature; each link with the heat it carries and its resistance; a numbered marker shows the comments pinned there.
        {withheld ? " Links through the owner's own parts are drawn without figures: those parts are not published." : ""}
      </p>
      <HeatPathDiagram scenario={{ thermal: h.thermal }} ambientC={h.ambientC} unit="C" pins={h.pins} />
    </div>
  );
}
