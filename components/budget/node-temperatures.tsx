"use client";

import { nodeBalanceTrace } from "@/lib/retrofit/derivations";
import { formatFigure } from "@/lib/units/figures";
import type { TempUnit } from "./format";
import { Traceable } from "./trace-view";
import type { Scenario } from "./types";

/** Every place's temperature, each expanding to the heat flows in and out of it. */
export function NodeTemperatures({ scenario, ambientC, unit }: { scenario: Scenario; ambientC: number; unit: TempUnit }) {
  const t = scenario.thermal;
  if (!t) return null;
  const nodes = [...t.nodes].sort((a, b) => (t.temperaturesC[b.id] ?? 0) - (t.temperaturesC[a.id] ?? 0));
  return (
    <ul className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2" data-testid="node-temperatures">
      {nodes.map((n) => (
        <li key={n.id} className="flex items-baseline justify-between gap-3 border-b border-line/40 py-0.5">
          <span className="text-ink-soft">{n.place}</span>
          <Traceable label={formatFigure(t.temperaturesC[n.id], "temperature", { temperatureUnit: unit })} trace={nodeBalanceTrace(t, n.id, ambientC)} />
        </li>
      ))}
    </ul>
  );
}
