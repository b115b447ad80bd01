"use client";

import { formatFigure as fig } from "@/lib/units/figures";
import { limitLabel } from "./format";
import { Traceable } from "./trace-view";
import type { Scenario } from "./types";

/** "Is my heatsink enough?": the sink resistance the budget needs vs the one in the build. */
export function WhatItTakes({ scenario }: { scenario: Scenario }) {
  const w = scenario.whatItTakes;
  if (!w) return <p className="text-sm text-ink-soft">Not worked out for this scenario.</p>;
  const s = w.sinkToAir;
  // The limit that stops more power, by its place in words.
  const binding = w.bindingLimit ? scenario.thermal?.limits.find((l) => l.id === w.bindingLimit) : undefined;
  const enough = s && s.presentKPerW.value !== null && s.forBudgetKPerW.value !== null ? s.presentKPerW.value <= s.forBudgetKPerW.value : null;
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="what-it-takes">
      {s ? (
        <>
          <dt className="text-ink-soft">Heatsink to air, in this build</dt>
          <dd><Traceable label={fig(s.presentKPerW.value, "thermalResistance")} trace={s.presentKPerW.trace} /></dd>
          <dt className="text-ink-soft">Needed for the budget (10 K margin)</dt>
          <dd>
            <Traceable label={s.forBudgetKPerW.value === null ? "any sink would do" : `≤ ${fig(s.forBudgetKPerW.value, "thermalResistance")}`} trace={s.forBudgetKPerW.trace} />
            {enough !== null && <span className={`ml-2 font-medium ${enough ? "text-ok" : "text-over"}`}>{enough ? "the sink is enough" : "the sink is not enough"}</span>}
          </dd>
          <dt className="text-ink-soft">Needed to just stay under the limit</dt>
          <dd><Traceable label={s.forLimitKPerW.value === null ? "any sink would do" : `≤ ${fig(s.forLimitKPerW.value, "thermalResistance")}`} trace={s.forLimitKPerW.trace} /></dd>
        </>
      ) : (
        <>
          <dt className="text-ink-soft">Heatsink</dt>
          <dd>no sink-to-air link in this build</dd>
        </>
      )}
      <dt className="text-ink-soft">Highest drive power the build holds</dt>
      <dd>{w.maxDrivePowerW ? <Traceable label={fig(w.maxDrivePowerW.value, "power")} trace={w.maxDrivePowerW.trace} /> : "–"}{binding && <span className="ml-2 text-xs text-ink-soft">(limited by the {limitLabel(binding)})</span>}</dd>
    </dl>
  );
}
