import { VERDICT_STYLE } from "@/components/budget/format";
import { Traceable } from "@/components/budget/trace-view";
import { compareFormat } from "@/lib/compare";
import type { CompareAnswer } from "./use-compare";

/**
 * The first thing Side by side says: who wins in each scenario and why, the limits every
 * variant shares (said once), what the choice costs, and a small table of the deciding limit
 * of each variant per scenario. Every word comes from the numbers (lib/compare/summary).
 */
export function CompareSummary({ data }: { data: CompareAnswer }) {
  const { summary, columnNames } = data;
  // Light and runtime open to the same derivations as their rows under "Every figure".
  const traceOf = (key: string, column: number) => data.figures.find((f) => f.key === key)?.traces[column] ?? null;
  return (
    <section aria-label="Summary" data-testid="compare-summary" className="space-y-3 rounded-lg border border-ember/40 bg-white/70 p-4">
      <h2 className="font-semibold">Summary</h2>
      <ul className="space-y-1 text-sm" data-testid="compare-summary-lines">
        {summary.lines.map((line, i) => (
          <li key={i} className={i === 0 ? "font-medium" : ""}>{line}</li>
        ))}
      </ul>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm" data-testid="compare-summary-table">
          <caption className="pb-1 text-left text-xs text-ink-soft">The limit with the least headroom among those the variants differ on; ★ has the most headroom in that scenario.</caption>
          <thead className="text-xs text-ink-soft">
            <tr>
              <th className="py-1 pr-3 font-medium">Scenario</th>
              {columnNames.map((n, i) => (
                <th key={i} className="py-1 pr-3 font-medium">{n}</th>
              ))}
            </tr>
          </thead>
          <tbody>
            {summary.scenarios.map((s) => (
              <tr key={s.id} className="border-t border-line align-top">
                <th className="py-1 pr-3 font-medium">{s.label}</th>
                {s.cells.map((c, i) => {
                  const shown = c.deciding ? compareFormat.celsiusAgainst(c.deciding.temperatureC, c.deciding.limitC, c.deciding.kind) : null;
                  return (
                    <td key={i} className={`py-1 pr-3 ${c.winner && s.winners.length < s.cells.length ? "bg-ok/10" : ""}`} data-winner={c.winner || undefined}>
                      {c.deciding && shown ? (
                        <>
                          <div>
                            {c.winner && s.winners.length < s.cells.length && <span aria-label="most headroom">★ </span>}
                            {c.deciding.place}: <Traceable label={`${compareFormat.kelvin(c.deciding.headroomK)} headroom`} trace={c.traces?.headroom} />
                            {c.verdict && <span className={`ml-1.5 rounded border px-1 text-[11px] ${VERDICT_STYLE[c.verdict] ?? ""}`}>{c.verdict}</span>}
                          </div>
                          <div className="text-xs text-ink-soft">
                            <Traceable label={shown.value} trace={c.traces?.temperature} /> of {shown.limit}
                            {c.fluxLm !== null && <> · <Traceable label={compareFormat.lumens(c.fluxLm)} trace={traceOf(`${s.id}/flux`, i)} /></>}
                            {c.runtimeH !== null && <> · <Traceable label={compareFormat.runtime(c.runtimeH)} trace={traceOf(`${s.id}/runtime`, i)} /></>}
                          </div>
                        </>
                      ) : (
                        <span className="text-ink-soft">not worked out</span>
                      )}
                    </td>
                  );
                })}
              </tr>
            ))}
            <tr className="border-t border-line">
              <th className="py-1 pr-3 font-medium">parts cost</th>
              {summary.costsEur.map((c, i) => (
                <td key={i} className="py-1 pr-3"><Traceable label={compareFormat.euros(c)} trace={summary.costTraces[i]} /></td>
              ))}
            </tr>
            {summary.massesKg.some((m) => m !== null) && (
              <tr className="border-t border-line">
                <th className="py-1 pr-3 font-medium">mass</th>
                {summary.massesKg.map((m, i) => (
                  <td key={i} className="py-1 pr-3"><Traceable label={compareFormat.mass(m)} trace={summary.massTraces[i]} /></td>
                ))}
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </section>
  );
}
