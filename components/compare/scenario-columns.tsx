"use client";

import { useState } from "react";
import { Bar } from "@/components/budget/bar-chart";
import { SERIES_COLOURS } from "@/components/budget/chart-colours";
import { HeatPathDiagram } from "@/components/budget/heat-path-diagram";
import { compareFormat } from "@/lib/compare";
import type { CompareAnswer } from "./use-compare";

/** A ladder's label in lines of at most `width` characters (Chart.js draws an array as lines). */
function wrapLabel(text: string, width = 26): string[] {
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(" ")) {
    if (line && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  return lines;
}

type LadderColumn = NonNullable<CompareAnswer["sideBySide"][number]["ladders"][number]["columns"][number]>;
/** Chart height in px: Chart.js gives every bar the same band, so the band fits the longest label. */
function ladderHeight(c: LadderColumn): number {
  const bars = c.steps.length + (Math.abs(c.remainderK) > 0.05 ? 1 : 0);
  const lines = Math.max(1, ...c.steps.map((st) => wrapLabel(`000 K · ${st.place}`).length));
  return Math.max(3, bars) * (lines * 12 + 10) + 70;
}

/**
 * One scenario, chosen once for every column: each variant's heat path (watts and K/W on
 * every link), then a temperature ladder for every place that has a limit, the columns side
 * by side on a shared axis so the same place can be read across.
 */
export function ScenarioColumns({ data, ambientC }: { data: CompareAnswer; ambientC: number[] }) {
  const scenarios = data.sideBySide;
  // Open on the scenario with the most spread between the columns on any limited place.
  const [id, setId] = useState(() => {
    let best = scenarios[0]?.scenarioId ?? "";
    let spread = -1;
    for (const s of scenarios) {
      for (const l of s.ladders) {
        const t = l.columns.flatMap((c) => (c ? [c.temperatureC] : []));
        const d = t.length > 1 ? Math.max(...t) - Math.min(...t) : 0;
        if (d > spread) [best, spread] = [s.scenarioId, d];
      }
    }
    return best;
  });
  const s = scenarios.find((x) => x.scenarioId === id) ?? scenarios[0];
  if (!s) return <p className="text-sm text-ink-soft">No scenario could be worked out.</p>;
  const cols = data.columns.length;
  return (
    <div className="space-y-4">
      <div role="tablist" aria-label="Scenario for every column" className="flex flex-wrap gap-2">
        {scenarios.map((x) => (
          <button key={x.scenarioId} type="button" role="tab" aria-selected={x.scenarioId === s.scenarioId} onClick={() => setId(x.scenarioId)} className={`rounded-full border px-3 py-0.5 text-sm ${x.scenarioId === s.scenarioId ? "border-ember bg-ember text-white" : "border-line bg-white hover:border-ember"}`}>
            {x.label}
          </button>
        ))}
      </div>
      <p className="text-xs text-ink-soft">Each link is labelled with the heat it carries and its resistance; click a diagram&apos;s link or place on the review page to pin a comment to it.</p>
      <div className="grid gap-3 overflow-x-auto" style={{ gridTemplateColumns: `repeat(${cols}, minmax(320px, 1fr))` }} data-testid="compare-heat-paths">
        {s.heatPaths.map((h, i) => (
          <figure key={i} className="min-w-0 rounded border border-line bg-white/70 p-2">
            <figcaption className="mb-1 truncate text-xs font-medium" style={{ color: SERIES_COLOURS[i] }}>{data.columnNames[i]}</figcaption>
            {h ? <HeatPathDiagram scenario={{ thermal: h }} ambientC={ambientC[i] ?? 25} unit="C" compact /> : <p className="text-xs text-ink-soft">Not worked out in {s.label}.</p>}
          </figure>
        ))}
      </div>
      <div className="space-y-3" data-testid="compare-place-ladders">
        {s.ladders.map((l) => {
          const max = Math.max(1, ...l.columns.map((c) => c?.riseK ?? 0));
          return (
            <section key={l.limitId} aria-label={`Ladder, ${l.place}`}>
              <h3 className="mb-1 text-sm font-medium">{l.place}: where its rise goes</h3>
              <div className="grid gap-3" style={{ gridTemplateColumns: `repeat(${cols}, minmax(0, 1fr))` }}>
                {l.columns.map((c, i) => (
                  <figure key={i} className="min-w-0 rounded border border-line bg-white/70 p-2">
                    <figcaption className="mb-1 truncate text-xs" style={{ color: SERIES_COLOURS[i] }}>{data.columnNames[i]}</figcaption>
                    {c ? (
                      <>
                        <div style={{ height: `${ladderHeight(c)}px` }}>
                          <Bar
                            data={{
                              labels: [...c.steps.map((st) => wrapLabel(`${compareFormat.kelvinRise(st.deltaK)} · ${st.place}`)), ...(Math.abs(c.remainderK) > 0.05 ? [wrapLabel(`${compareFormat.kelvinRise(c.remainderK)} · rest`)] : [])],
                              datasets: [{ label: "K", data: [...c.steps.map((st) => st.deltaK), ...(Math.abs(c.remainderK) > 0.05 ? [c.remainderK] : [])], backgroundColor: SERIES_COLOURS[i] }],
                            }}
                            options={{
                              indexAxis: "y",
                              maintainAspectRatio: false,
                              scales: { x: { min: 0, max: Math.ceil(max), title: { display: true, text: "K of the rise above ambient" } }, y: { ticks: { font: { size: 10 }, autoSkip: false } } },
                              plugins: { legend: { display: false }, tooltip: { callbacks: { label: (ctx) => { const st = c.steps[ctx.dataIndex]; return st ? `${compareFormat.kelvin(st.deltaK)} = ${compareFormat.watts(st.watts)} × ${compareFormat.kelvinPerWatt(st.kelvinPerWatt)}` : compareFormat.kelvin(c.remainderK); } } } },
                            }}
                          />
                        </div>
                        <p className={`text-xs ${c.headroomK < 0 ? "text-over" : c.headroomK < 10 ? "text-tight" : "text-ink-soft"}`}>
                          {compareFormat.celsiusAgainst(c.temperatureC, c.limitC, "max").value} of {compareFormat.celsiusAgainst(c.temperatureC, c.limitC, "max").limit} · headroom {compareFormat.kelvin(c.headroomK)}
                        </p>
                      </>
                    ) : (
                      <p className="text-xs text-ink-soft">No ladder here.</p>
                    )}
                  </figure>
                ))}
              </div>
            </section>
          );
        })}
      </div>
    </div>
  );
}
