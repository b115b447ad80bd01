import { formatAgainstLimit, formatDuration, formatFigure as fig, formatHeadroom, formatTraced } from "@/lib/units/figures";
import { driveTrace, nodeBalanceTrace, totalFluxTrace } from "@/lib/retrofit/derivations";
import { enteredText, limitLabel, VERDICT_STYLE } from "./format";
import { Traceable } from "./trace-view";
import { problemLabel } from "@/lib/messages";
import type { Evaluation } from "./types";

/** The one-page report: every scenario's limits, the modes, the electrical side, the cautions. */
export function PrintSummary({ evaluation, title, revision, owner }: { evaluation: Evaluation; title: string; revision: number; owner: string }) {
  const e = evaluation.electrical;
  return (
    <article className="mx-auto max-w-4xl space-y-4 bg-white p-6 text-[13px] leading-snug print:p-0" data-testid="report">
      <header className="flex items-baseline gap-3 border-b border-line pb-2">
        <h1 className="text-xl font-semibold">{title}</h1>
        <span className="text-ink-soft">revision {revision} · {owner} · Sinkwise thermal budget</span>
        <span className={`ml-auto rounded border px-2 py-0.5 font-semibold ${VERDICT_STYLE[evaluation.verdict ?? ""] ?? "border-line"}`}>{evaluation.verdict ?? "not worked out"}</span>
      </header>
      <section>
        <h2 className="mb-1 font-semibold">Modes</h2>
        <table className="w-full border-collapse">
          <thead>
            <tr className="border-b border-line text-left text-ink-soft">
              <th className="pr-2 font-medium">Mode</th><th className="pr-2 font-medium">Drive</th><th className="pr-2 font-medium">Light, hot</th>
              <th className="pr-2 font-medium">Runtime</th><th className="pr-2 font-medium">First limit reached</th><th className="font-medium">Verdict</th>
            </tr>
          </thead>
          <tbody>
            {evaluation.modes.map((m) => {
              const s = evaluation.scenarios.find((x) => x.kind === "mode" && x.modeIndex === m.modeIndex);
              return (
              <tr key={m.name} className="border-b border-line/50">
                <td className="pr-2">{m.name}</td>
                <td className="pr-2">{enteredText(m.entered) && `${enteredText(m.entered)} → `}<Traceable label={fig(m.driveW, "power")} trace={s?.mode ? driveTrace(s.mode) : null} /></td>
                <td className="pr-2"><Traceable label={fig(m.totalFluxLm, "flux")} trace={s?.mode ? totalFluxTrace(s.mode) : null} /></td>
                <td className="pr-2"><Traceable label={formatTraced(m.runtime)} trace={m.runtime?.trace} /></td>
                <td className="pr-2">{m.firstLimitS === null ? "none in the warm-up" : `${m.firstLimit} after ${formatDuration(m.firstLimitS)}`}</td>
                <td>{m.verdict ?? "–"}</td>
              </tr>
              );
            })}
          </tbody>
        </table>
      </section>
      <section className="grid grid-cols-2 gap-4">
        {evaluation.scenarios.map((s) => (
          <div key={s.id}>
            <h2 className="mb-1 font-semibold">{s.kind === "charging" ? "Charging" : `Mode ${s.name}`} — {s.thermal?.verdict ?? "not worked out"}</h2>
            <table className="w-full border-collapse">
              <tbody>
                {(s.thermal?.limits ?? []).map((l) => {
                  const shown = formatAgainstLimit(l.temperatureC, l.limitC, l.kind, "temperature");
                  return (
                    <tr key={l.id} className="border-b border-line/50">
                      <td className="pr-2">{limitLabel(l)}</td>
                      <td className="pr-2"><Traceable label={shown.value} trace={s.thermal ? nodeBalanceTrace(s.thermal, l.node, s.network?.ambientC ?? 25) : null} /></td>
                      <td className="pr-2"><Traceable label={`${shown.relation} ${shown.limit}`} trace={l.limitTrace} /></td>
                      <td><Traceable label={formatHeadroom(l.headroomK)} trace={l.trace} /></td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        ))}
      </section>
      <section>
        <h2 className="mb-1 font-semibold">Electrical</h2>
        <p>
          {e.pack ? `Pack ${e.pack.series}S${e.pack.parallel}P: ${formatTraced(e.pack.nominalVoltage)}, ${formatTraced(e.pack.capacityC)}, ${formatTraced(e.pack.energyWh)}. ` : "No cells. "}
          {e.charge ? `Charging at ${fig(e.charge.currentA, "current")}: constant current ${formatTraced(e.charge.ccHours)}, full after ${formatTraced(e.charge.totalHours)}; charger heat ${formatTraced(e.charge.lossW)}. ` : "No charger. "}
          {e.protectionTripA !== null ? `Protection trips at ${fig(e.protectionTripA, "current")} (peak pack current ${fig(e.peakPackCurrentA, "current")}).` : "No protection circuit."}
        </p>
      </section>
      {evaluation.problems.filter((p) => p.severity === "error").length > 0 && (
        <section>
          <h2 className="mb-1 font-semibold">Open problems</h2>
          <ul className="list-disc pl-5">
            {evaluation.problems.filter((p) => p.severity === "error").map((p, i) => <li key={i}>{problemLabel(p.field)}: {p.message}</li>)}
          </ul>
        </section>
      )}
      <section className="border-t border-line pt-2">
        <h2 className="mb-1 font-semibold">Cautions</h2>
        <ul className="space-y-0.5">
          {evaluation.cautions.map((c) => <li key={c.id}><strong>{c.title}.</strong> {c.text}</li>)}
        </ul>
      </section>
    </article>
  );
}
