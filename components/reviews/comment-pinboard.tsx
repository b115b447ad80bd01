"use client";

import dynamic from "next/dynamic";
import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { type TempUnit, limitLabel } from "@/components/budget/format";
import { Traceable } from "@/components/budget/trace-view";
import { formatAgainstLimit, formatHeadroom } from "@/lib/units/figures";
import { type DiagramTarget, HeatPathDiagram } from "@/components/budget/heat-path-diagram";
import type { Evaluation } from "@/components/budget/types";
import { ApiClientError } from "@/components/ui/fetch-json";
import type { CurvePin } from "@/components/budget/warmup-chart";
import { anchorLabel, curvePoint, diagramPins, curvePointKey, inScenario, scenarioWords, type AnchorKind } from "@/lib/reviews/anchors";
import type { Anchors, CommentItem } from "./types";
import { PinIcon } from "./pin-icon";
import { useComment } from "./use-reviews";

type Picked = { kind: AnchorKind; key: string };

// The Budget's warm-up chart (Chart.js), loaded when shown.
const WarmupChart = dynamic(() => import("@/components/budget/warmup-chart").then((m) => m.WarmupChart), { ssr: false });

/**
 * The reviewed revision's heat path to pin comments on: click a place or a link on the
 * diagram, or a row of the headroom table, in the scenario shown; pins are drawn where the
 * comments are. Every target is named in words ("driver board, high mode").
 */
export function CommentPinboard({
  reviewId,
  anchors,
  comments,
  canComment,
  evaluation,
  ambientC,
  unit,
}: {
  reviewId: string;
  anchors: Anchors;
  comments: CommentItem[];
  canComment: boolean;
  evaluation: Evaluation | null;
  ambientC: number;
  unit: TempUnit;
}) {
  const router = useRouter();
  const add = useComment(reviewId);
  const scenarios = evaluation?.scenarios.filter((s) => s.thermal) ?? [];
  // Open on the scenario closest to (or furthest past) a limit: where a reviewer looks first.
  const [scenarioId, setScenarioId] = useState(() => {
    const least = (s: (typeof scenarios)[number]) => Math.min(Infinity, ...(s.thermal?.limits ?? []).map((l) => l.headroomK));
    return [...scenarios].sort((a, b) => least(a) - least(b))[0]?.id ?? "";
  });
  const scenario = scenarios.find((s) => s.id === scenarioId) ?? scenarios[0];
  const [anchor, setAnchor] = useState<Picked | null>(null);
  const [body, setBody] = useState("");
  const err = add.error instanceof ApiClientError ? add.error : null;
  const words = (a: Picked) => anchorLabel(anchors, a);

  // Comments drawn on this scenario's diagram: those pinned to it, and those pinned to the heat path as a whole.
  const pins = diagramPins(comments, scenario?.id);
  const pick = (t: DiagramTarget) => scenario && setAnchor({ kind: t.kind, key: inScenario(t.id, scenario.id) });
  const selectedOnDiagram = anchor && anchor.kind !== "figure" && anchor.key.endsWith(`#${scenario?.id}`) ? `${anchor.kind}:${anchor.key.split("#")[0]}` : null;
  const figureCount = (key: string) => comments.filter((c) => c.anchorKind === "figure" && c.anchorKey === key).length;
  const otherFigures = anchors.figures.filter((f) => !f.scenarioId || (f.scenarioId === scenario?.id && !f.key.includes("/headroom/")));
  // Comments on this scenario's warm-up curves, drawn on the chart: at their point, or at the curve's end for a whole curve.
  const curvePins: CurvePin[] = [];
  const warmupPrefix = `${scenario?.id}/warmup/`;
  for (const c of comments) {
    if (c.anchorKind !== "figure" || !c.anchorKey.startsWith(warmupPrefix)) continue;
    const point = curvePoint(anchors, c.anchorKey);
    const limitId = (point ? point.curve.key : c.anchorKey).slice(warmupPrefix.length);
    const minutes = point ? point.minutes : null;
    const same = curvePins.find((p) => p.limitId === limitId && p.minutes === minutes);
    if (same) same.count += 1;
    else curvePins.push({ limitId, minutes, count: 1 });
  }

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (!anchor) return;
    add.mutate({ anchor, body }, { onSuccess: () => { setBody(""); router.refresh(); } });
  }

  return (
    <div className="grid gap-4 xl:grid-cols-[1fr_24rem]">
      <div className="min-w-0 space-y-3">
        {scenarios.length > 0 ? (
          <>
            <div role="tablist" aria-label="Scenario of the heat path" className="flex flex-wrap gap-2">
              {scenarios.map((s) => (
                <button key={s.id} type="button" role="tab" aria-selected={s.id === scenario?.id} onClick={() => setScenarioId(s.id)} className={`rounded-full border px-3 py-0.5 text-sm ${s.id === scenario?.id ? "border-ember bg-ember text-white" : "border-line bg-white hover:border-ember"}`}>
                  {scenarioWords(s)}
                </button>
              ))}
            </div>
            {scenario && (
              <>
                <p className="text-xs text-ink-soft">Click a place or a link to pin a comment to it in {scenarioWords(scenario)}; a number marks the comments already there.</p>
                <HeatPathDiagram scenario={scenario} ambientC={ambientC} unit={unit} onPick={pick} pins={pins} selected={selectedOnDiagram} />
                <table className="w-full text-left text-sm" aria-label="Headroom rows to pin a comment to">
                  <thead className="text-xs text-ink-soft">
                    <tr><th className="py-1 pr-3 font-medium">Limited place</th><th className="py-1 pr-3 font-medium">Temperature</th><th className="py-1 pr-3 font-medium">Limit</th><th className="py-1 pr-3 font-medium">Headroom</th></tr>
                  </thead>
                  <tbody>
                    {(scenario.thermal?.limits ?? []).map((l) => {
                      const key = `${scenario.id}/headroom/${l.id}`;
                      const on = anchor?.kind === "figure" && anchor.key === key;
                      const n = figureCount(key);
                      const shown = formatAgainstLimit(l.temperatureC, l.limitC, l.kind, "temperature", { temperatureUnit: unit });
                      return (
                        <tr key={l.id} onClick={() => setAnchor({ kind: "figure", key })} data-pin-target={`figure:${key}`} className={`cursor-pointer border-t border-line ${on ? "bg-ember-soft" : "hover:bg-paper-deep"}`}>
                          <td className="py-1 pr-3">
                            <button type="button" className="text-left" onClick={(e) => { e.stopPropagation(); setAnchor({ kind: "figure", key }); }}>{limitLabel(l)}</button>
                            {n > 0 && <span className="ml-1 rounded bg-ember px-1 text-[10px] text-white"><PinIcon /> {n}</span>}
                          </td>
                          <td className="py-1 pr-3">{shown.value}</td>
                          <td className="py-1 pr-3">{shown.limit}</td>
                          <td className={`py-1 pr-3 ${l.headroomK < 0 ? "text-over" : l.headroomK < 10 ? "text-tight" : ""}`}><Traceable label={formatHeadroom(l.headroomK, { temperatureUnit: unit })} trace={l.trace} /></td>
                        </tr>
                      );
                    })}
                  </tbody>
                </table>
                <h3 className="text-sm font-medium">Warm-up from a cold start, {scenarioWords(scenario)}</h3>
                <p className="text-xs text-ink-soft">Click a point of a curve to pin a comment to that place at that time.</p>
                <WarmupChart scenario={scenario} pins={curvePins} onPick={(p) => setAnchor({ kind: "figure", key: curvePointKey(`${scenario.id}/warmup/${p.limitId}`, p.minutes) })} />
              </>
            )}
          </>
        ) : (
          <p className="text-sm text-ink-soft">This revision's heat path could not be worked out; pin comments to a figure instead.</p>
        )}
        <div>
          <h3 className="mb-1 text-xs font-medium uppercase tracking-wide text-ink-soft">Figures</h3>
          <ul className="flex flex-wrap gap-1.5 text-sm">
            {otherFigures.map((f) => {
              const on = anchor?.kind === "figure" && anchor.key === f.key;
              const n = figureCount(f.key);
              return (
                <li key={f.key}>
                  <button type="button" onClick={() => setAnchor({ kind: "figure", key: f.key })} aria-pressed={on} className={`rounded border px-2 py-0.5 ${on ? "border-ember bg-ember-soft text-ember" : "border-line bg-white hover:border-ember"}`}>
                    {f.label}
                    {n > 0 && <span className="ml-1 rounded bg-ember px-1 text-[10px] text-white">{n}</span>}
                  </button>
                </li>
              );
            })}
          </ul>
        </div>
      </div>
      <div className="space-y-4">
        {canComment && (
          <form onSubmit={onSubmit} noValidate className="space-y-2 text-sm" aria-label="Pin a comment">
            <p className="text-ink-soft" data-testid="pin-target">
              {anchor ? <>Pinned to: <strong className="text-ink">{words(anchor)}</strong></> : "Click a place, a link, a row or a point of the warm-up chart to pin the comment to."}
            </p>
            <label className="block">
              <span className="sr-only">Comment</span>
              <textarea value={body} onChange={(e) => setBody(e.target.value)} rows={3} maxLength={4000} aria-label="Comment" className="w-full rounded border border-line bg-white px-2 py-1 focus:border-ember focus:outline-none" />
            </label>
            {err && <p role="alert" className="text-over">{err.message}</p>}
            <button type="submit" disabled={!anchor || !body.trim() || add.isPending} className="rounded bg-ember px-3 py-1 font-medium text-white hover:opacity-90 disabled:opacity-50">
              Pin the comment
            </button>
          </form>
        )}
        <section aria-label="Comments" className="space-y-2">
          <h3 className="font-medium">Comments</h3>
          {comments.length === 0 && <p className="text-sm text-ink-soft">No comments yet.</p>}
          <ol className="space-y-2">
            {comments.map((c) => (
              <li key={c.id} data-testid="review-comment" className="rounded border border-line bg-white/70 p-2 text-sm">
                <div className="mb-0.5 flex flex-wrap items-center gap-2 text-xs text-ink-soft">
                  <span className="rounded bg-paper-deep px-1.5"><PinIcon /> {c.target}</span>
                  <span className="ml-auto">{c.authorName} · {new Date(c.createdAt).toLocaleString()}</span>
                </div>
                <p className="whitespace-pre-wrap">{c.body}</p>
              </li>
            ))}
          </ol>
        </section>
      </div>
    </div>
  );
}
