"use client";

import { formatDuration, formatFigure as fig, formatTraced } from "@/lib/units/figures";
import { enteredText, VERDICT_STYLE } from "./format";
import { driveTrace, limitTimeTrace, totalFluxTrace } from "@/lib/retrofit/derivations";
import { Traceable } from "./trace-view";
import type { Evaluation } from "./types";

/** One row per driver mode: drive, light, runtime, when the first limit is reached, verdict. */
export function ModesTable({ evaluation }: { evaluation: Evaluation }) {
  if (evaluation.modes.length === 0) return <p className="text-sm text-ink-soft">No driver modes to evaluate (add a driver with modes).</p>;
  return (
    <table className="w-full border-collapse text-sm" data-testid="modes-table">
      <thead>
        <tr className="border-b border-line text-left text-ink-soft">
          <th className="py-1.5 pr-3 font-medium">Mode</th>
          <th className="py-1.5 pr-3 font-medium" title="The mode's figure as entered, then the power the emitters get">Drive (entered → into the emitters)</th>
          <th className="py-1.5 pr-3 font-medium">Light (hot)</th>
          <th className="py-1.5 pr-3 font-medium">Runtime</th>
          <th className="py-1.5 pr-3 font-medium">First limit</th>
          <th className="py-1.5 font-medium">Verdict</th>
        </tr>
      </thead>
      <tbody>
        {evaluation.modes.map((m) => {
          const s = evaluation.scenarios.find((x) => x.kind === "mode" && x.modeIndex === m.modeIndex);
          const limit = s?.thermal?.limits.find((l) => l.id === m.firstLimit);
          return (
          <tr key={m.name} className="border-b border-line/60">
            <td className="py-1.5 pr-3 font-medium">{m.name}</td>
            <td className="py-1.5 pr-3">
              {enteredText(m.entered) && <span className="text-ink-soft">{enteredText(m.entered)} → </span>}
              {s?.mode ? <Traceable label={fig(m.driveW, "power")} trace={driveTrace(s.mode)} /> : fig(m.driveW, "power")}
            </td>
            <td className="py-1.5 pr-3">{s?.mode ? <Traceable label={fig(m.totalFluxLm, "flux")} trace={totalFluxTrace(s.mode)} /> : fig(m.totalFluxLm, "flux")}</td>
            <td className="py-1.5 pr-3">{m.runtime ? <Traceable label={formatTraced(m.runtime)} trace={m.runtime.trace} /> : "–"}</td>
            <td className="py-1.5 pr-3">{m.firstLimitS === null ? "none within the warm-up" : <Traceable label={`${limit?.place ?? m.firstLimit ?? "a limit"} after ${formatDuration(m.firstLimitS)}`} trace={s?.warmup && m.firstLimit ? limitTimeTrace(s.warmup, m.firstLimit, limit?.place ?? m.firstLimit) : null} />}</td>
            <td className="py-1.5">{m.verdict ? <span className={`rounded border px-1.5 py-0.5 text-xs ${VERDICT_STYLE[m.verdict] ?? ""}`}>{m.verdict}</span> : "–"}</td>
          </tr>
          );
        })}
      </tbody>
    </table>
  );
}
