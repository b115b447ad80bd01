"use client";

import { formatAgainstLimit, formatHeadroom } from "@/lib/units/figures";
import { limitLabel, type TempUnit, VERDICT_STYLE } from "./format";
import { nodeBalanceTrace } from "@/lib/retrofit/derivations";
import { Traceable } from "./trace-view";
import type { Scenario } from "./types";

/** Every limit of one scenario: temperature, limit, headroom and the verdict word. */
export function HeadroomTable({ scenario, unit, ambientC }: { scenario: Scenario; unit: TempUnit; ambientC: number }) {
  const limits = scenario.thermal?.limits ?? [];
  if (limits.length === 0) return <p className="text-sm text-ink-soft">No limits could be checked for this scenario.</p>;
  return (
    <table className="w-full border-collapse text-sm" data-testid="headroom-table">
      <thead>
        <tr className="border-b border-line text-left text-ink-soft">
          <th className="py-1.5 pr-3 font-medium">Limit</th>
          <th className="py-1.5 pr-3 font-medium">Temperature</th>
          <th className="py-1.5 pr-3 font-medium">Limit</th>
          <th className="py-1.5 pr-3 font-medium">Headroom</th>
          <th className="py-1.5 font-medium">Verdict</th>
        </tr>
      </thead>
      <tbody>
        {limits.map((l) => {
          const shown = formatAgainstLimit(l.temperatureC, l.limitC, l.kind, "temperature", { temperatureUnit: unit });
          return (
          <tr key={l.id} className="border-b border-line/60 align-top">
            <td className="py-1.5 pr-3">{limitLabel(l)}</td>
            <td className="py-1.5 pr-3"><Traceable label={shown.value} trace={scenario.thermal ? nodeBalanceTrace(scenario.thermal, l.node, ambientC) : null} /></td>
            <td className="py-1.5 pr-3"><Traceable label={`${shown.relation} ${shown.limit}`} trace={l.limitTrace} /></td>
            <td className="py-1.5 pr-3 font-mono"><Traceable label={formatHeadroom(l.headroomK, { temperatureUnit: unit })} trace={l.trace} /></td>
            <td className="py-1.5">
              <span className={`rounded border px-1.5 py-0.5 text-xs ${VERDICT_STYLE[l.verdict] ?? ""}`}>{l.verdict}</span>
            </td>
          </tr>
          );
        })}
      </tbody>
    </table>
  );
}
