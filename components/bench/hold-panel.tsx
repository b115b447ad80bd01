"use client";

import Link from "next/link";
import type { BuildHold } from "@/server/bench/hold";
import { CalibratePanel } from "./calibrate-panel";
import type { ChartSeries } from "./fit-chart";
import { FitChart } from "./fit-chart-lazy";

/** A difference with its sign, never "−0.0". */
function signedK(x: number): string {
  const r = Math.round(x * 10) / 10;
  return r === 0 ? "0.0 K" : `${r > 0 ? "+" : "−"}${Math.abs(r).toFixed(1)} K`;
}

/** On the Budget: the measured warm-up of the finished lamp against the model's, place by place. */
export function HoldPanel({ hold, calibrate }: { hold: BuildHold; calibrate: { nextRevision: number } | null }) {
  // A place's readings (dots) and its prediction (line) share a colour.
  const series: ChartSeries[] = hold.result.places.flatMap((p, i) => [
    { label: `${p.place}, measured`, kind: "readings" as const, points: p.measured, colour: i },
    { label: `${p.place}, predicted`, kind: "curve" as const, points: p.predicted, colour: i },
  ]);
  return (
    <section className="space-y-2 rounded-lg border border-line bg-white/60 p-3 text-sm" data-testid="bench-overlay">
      <h2 className="font-medium">Measured against predicted</h2>
      <p>
        <span className="font-medium" data-testid="hold-verdict">{hold.result.verdict}</span>{" "}
        <span className="text-ink-soft">Bench run <Link href={`/bench/${hold.run.id}`} className="text-ember">{hold.run.title}</Link>, mode “{hold.mode}”{hold.result.ambientShiftK !== 0 ? `; the prediction is moved by ${hold.result.ambientShiftK.toFixed(1)} K for the run's ambient` : ""}.</span>
      </p>
      {series.length > 0 && <FitChart series={series} testId="overlay-chart" />}
      <table>
        <thead className="text-left text-ink-soft"><tr><th className="pr-4 font-medium">Place</th><th className="pr-4 font-medium">Readings</th><th className="pr-4 font-medium">Misfit (RMS)</th><th className="font-medium">Model − lamp at the end</th></tr></thead>
        <tbody>
          {hold.result.places.map((p) => (
            <tr key={p.nodeId}><td className="pr-4">{p.place}</td><td className="pr-4">{p.readingCount}</td><td className="pr-4">{p.rmsK.toFixed(1)} K</td><td>{signedK(p.endDiffK)}</td></tr>
          ))}
        </tbody>
      </table>
      {hold.result.unmatched.length > 0 && <p className="text-xs text-ink-soft">No place in the model for: {hold.result.unmatched.join(", ")}.</p>}
      {calibrate && <CalibratePanel runId={hold.run.id} nextRevision={calibrate.nextRevision} />}
    </section>
  );
}
