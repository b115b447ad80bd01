"use client";

import { type FormEvent, useState } from "react";
import { Bar } from "@/components/budget/bar-chart";
import { SERIES_COLOURS } from "@/components/budget/chart-colours";
import { type DiagramTarget, HeatPathDiagram } from "@/components/budget/heat-path-diagram";
import { Traceable } from "@/components/budget/trace-view";
import { PinIcon } from "@/components/reviews/pin-icon";
import { useComment, useReviewComments } from "@/components/reviews/use-reviews";
import { ApiClientError } from "@/components/ui/fetch-json";
import { diagramPins, inScenario } from "@/lib/reviews/anchors";
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
type HeatPathColumn = NonNullable<CompareAnswer["sideBySide"][number]["heatPaths"][number]>;
/** A place or link picked in a column the viewer reviews, with its anchor key and its name in words. */
type PinPick = { column: number; reviewId: string; scenarioId: string; kind: "node" | "link"; key: string; selected: string; words: string };
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
  const [pick, setPick] = useState<PinPick | null>(null);
  const s = scenarios.find((x) => x.scenarioId === id) ?? scenarios[0];
  if (!s) return <p className="text-sm text-ink-soft">No scenario could be worked out.</p>;
  const reviewing = data.columns.some((c) => c.review);
  // What a click picked, named as the review names it ("driver board, high mode").
  const pickOf = (column: number, t: DiagramTarget, h: HeatPathColumn): PinPick | null => {
    const reviewId = data.columns[column]?.review?.id;
    if (!reviewId) return null;
    const place = t.kind === "node" ? h.nodes.find((n) => n.id === t.id)?.place : [...new Set(h.links.filter((l) => `${l.from}->${l.to}` === t.id).map((l) => l.place))].join(" + ");
    return { column, reviewId, scenarioId: s.scenarioId, kind: t.kind, key: inScenario(t.id, s.scenarioId), selected: `${t.kind}:${t.id}`, words: `${place ?? t.label}, ${s.label}` };
  };
  const cols = data.columns.length;
  return (
    <div className="space-y-4">
      <div role="tablist" aria-label="Scenario for every column" className="flex flex-wrap gap-2">
        {scenarios.map((x) => (
          <button key={x.scenarioId} type="button" role="tab" aria-selected={x.scenarioId === s.scenarioId} onClick={() => { setId(x.scenarioId); setPick(null); }} className={`rounded-full border px-3 py-0.5 text-sm ${x.scenarioId === s.scenarioId ? "border-ember bg-ember text-white" : "border-line bg-white hover:border-ember"}`}>
            {x.label}
          </button>
        ))}
      </div>
      <p className="text-xs text-ink-soft">
        Each link is labelled with the heat it carries and its resistance.
        {reviewing ? " In a column you review, click a place or a link to pin a comment to it; a number marks the comments already there." : ""}
      </p>
      <div className="grid gap-3 overflow-x-auto" style={{ gridTemplateColumns: `repeat(${cols}, minmax(320px, 1fr))` }} data-testid="compare-heat-paths">
        {s.heatPaths.map((h, i) => (
          <figure key={i} className="min-w-0 rounded border border-line bg-white/70 p-2" data-testid="compare-heat-path">
            <figcaption className="mb-1 truncate text-xs font-medium" style={{ color: SERIES_COLOURS[i] }}>
              {data.columnNames[i]}
              {data.columns[i]?.review && <span className="ml-1 font-normal text-ink-soft">· you review this</span>}
            </figcaption>
            {h ? <ColumnHeatPath heatPath={h} ambientC={ambientC[i] ?? 25} scenarioId={s.scenarioId} reviewId={data.columns[i]?.review?.id ?? null} selected={pick?.column === i ? pick.selected : null} onPick={(t) => setPick(pickOf(i, t, h))} /> : <p className="text-xs text-ink-soft">Not worked out in {s.label}.</p>}
          </figure>
        ))}
      </div>
      {pick && pick.scenarioId === s.scenarioId && <PinForm key={`${pick.column}/${pick.key}`} pick={pick} columnName={data.columnNames[pick.column] ?? ""} onDone={() => setPick(null)} />}
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
                        <LadderTotals c={c} />
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

/** Under a ladder: its total (ambient + rungs), the place's temperature against its limit, the headroom — each opens to its derivation. */
function LadderTotals({ c }: { c: LadderColumn }) {
  const shown = compareFormat.celsiusAgainst(c.temperatureC, c.limitC, "max");
  return (
    <div className={`space-x-1 text-xs ${c.headroomK < 0 ? "text-over" : c.headroomK < 10 ? "text-tight" : "text-ink-soft"}`} data-testid="ladder-totals">
      <Traceable label={`rise ${compareFormat.kelvin(c.riseK)}`} trace={c.traces.total} />
      <span>·</span>
      <Traceable label={shown.value} trace={c.traces.temperature} />
      <span>of</span>
      <Traceable label={shown.limit} trace={c.traces.limit} />
      <span>·</span>
      <Traceable label={`headroom ${compareFormat.kelvin(c.headroomK)}`} trace={c.traces.headroom} />
    </div>
  );
}

/** One column's heat path; in a column the viewer reviews, its places and links pick a pin target and the review's pins are drawn. */
function ColumnHeatPath({ heatPath, ambientC, scenarioId, reviewId, selected, onPick }: { heatPath: HeatPathColumn; ambientC: number; scenarioId: string; reviewId: string | null; selected: string | null; onPick: (t: DiagramTarget) => void }) {
  const comments = useReviewComments(reviewId);
  const pins = diagramPins(comments.data?.comments ?? [], scenarioId);
  return <HeatPathDiagram scenario={{ thermal: heatPath }} ambientC={ambientC} unit="C" compact pins={pins} selected={selected} {...(reviewId ? { onPick } : {})} />;
}

/** The comment for the picked place or link, pinned in the viewer's review of that column. */
function PinForm({ pick, columnName, onDone }: { pick: PinPick; columnName: string; onDone: () => void }) {
  const add = useComment(pick.reviewId);
  const [body, setBody] = useState("");
  const err = add.error instanceof ApiClientError ? add.error : null;
  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    add.mutate({ anchor: { kind: pick.kind, key: pick.key }, body }, { onSuccess: () => { setBody(""); onDone(); } });
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-2 rounded border border-ember/40 bg-white/80 p-3 text-sm" aria-label="Pin a comment">
      <p data-testid="pin-target">
        <PinIcon /> Pinned to: <strong>{pick.words}</strong> <span className="text-ink-soft">— in your review of {columnName}</span>
      </p>
      <label className="block">
        <span className="mb-0.5 block text-ink-soft">Comment</span>
        <textarea value={body} onChange={(e) => setBody(e.target.value)} rows={3} maxLength={4000} className="w-full rounded border border-line bg-white px-2 py-1 focus:border-ember focus:outline-none" />
      </label>
      {err && <p role="alert" className="text-over">{err.message}</p>}
      <div className="flex gap-2">
        <button type="submit" disabled={!body.trim() || add.isPending} className="rounded bg-ember px-3 py-1 font-medium text-white hover:opacity-90 disabled:opacity-50">Pin the comment</button>
        <button type="button" onClick={onDone} className="rounded border border-line px-3 py-1 hover:border-ember">Cancel</button>
      </div>
    </form>
  );
}
