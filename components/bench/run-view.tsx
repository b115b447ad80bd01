"use client";

import Link from "next/link";
import { type FormEvent } from "react";
import { ApiClientError } from "@/components/ui/fetch-json";
import type { RunJson } from "@/server/bench/json";
import type { ChartSeries } from "./fit-chart";
import { FitChart } from "./fit-chart-lazy";
import { FitSummary } from "./fit-summary";
import { useKeepPart } from "./use-bench";

/** A saved run: its readings (by place), the fit with its intervals, and keeping the fit as a part. */
export function RunView({ run }: { run: RunJson }) {
  const keep = useKeepPart(run.id);
  const c = run.run.conditions;
  const places = [...new Set(run.run.readings.map((r) => r.place))];
  const series: ChartSeries[] = places.map((place) => ({ label: place, kind: "readings", points: run.run.readings.filter((r) => r.place === place) }));
  if (run.fit) series.push({ label: "fitted warm-up", kind: "curve", points: run.fit.curve });
  const keptId = keep.data?.part.id ?? run.fittedPartId;
  const err = keep.error instanceof ApiClientError ? keep.error : null;

  function onKeep(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const d = new FormData(e.currentTarget);
    keep.mutate({ name: String(d.get("name") ?? "").trim(), visibility: String(d.get("visibility") ?? "private") });
  }

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_1fr]">
      <section className="space-y-3">
        <FitChart series={series} />
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="text-ink-soft">Heat input</dt>
          <dd>{c.heatW !== undefined ? `${c.heatW.toPrecision(3)} W` : `${c.volts} V × ${c.amps} A × ${((c.heatFraction ?? 0) * 100).toFixed(0)} % heat`}</dd>
          <dt className="text-ink-soft">Ambient</dt>
          <dd>{c.ambientC.toFixed(1)} °C, {c.orientation ?? "upright"}, {run.run.air === "still" ? "still air" : "a fan blowing"}</dd>
          {c.massKg !== undefined && (<><dt className="text-ink-soft">Sink mass</dt><dd>{(c.massKg * 1000).toFixed(0)} g{c.material ? ` of ${c.material}` : ""}</dd></>)}
        </dl>
      </section>
      <section className="space-y-4">
        {run.fit ? <FitSummary fit={run.fit} /> : <p className="text-sm text-ink-soft">A warm-up of a build: open the build's Budget to see it against the prediction.</p>}
        {run.fit && (
          keptId ? (
            <p className="rounded border border-ok/40 bg-ok/5 p-3 text-sm" data-testid="kept-part">Kept as a measured heatsink part: <Link href={`/parts/${keptId}`} className="font-medium text-ember">open the part</Link>. Builds that use it say their sink is measured.</p>
          ) : run.mine ? (
            <form onSubmit={onKeep} className="space-y-2 rounded-lg border border-line bg-white/60 p-3" data-testid="keep-part">
              <h2 className="text-sm font-medium">Keep it as a part</h2>
              <p className="text-xs text-ink-soft">A heatsink part with provenance “measured”: this resistance, rated at the run's heat and ambient, with the interval and this run as its evidence.</p>
              <label className="block text-sm"><span className="mb-1 block">Part name</span><input name="name" aria-label="Part name" defaultValue={run.title} className="w-full rounded border border-line bg-white px-2 py-1.5" /></label>
              <label className="block text-sm"><span className="mr-1">Visibility</span><select name="visibility" aria-label="Part visibility" defaultValue="private" className="rounded border border-line bg-white px-2 py-1 text-sm"><option value="private">private</option><option value="shared">shared</option><option value="public">public</option></select></label>
              <button type="submit" disabled={keep.isPending} className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90">{keep.isPending ? "Saving…" : "Keep as a heatsink part"}</button>
              {err && <p role="alert" className="text-sm text-over">{err.message.replace(/^name: /, "Part name: ")}</p>}
            </form>
          ) : null
        )}
      </section>
    </div>
  );
}
