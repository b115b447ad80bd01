import Link from "next/link";
import type { BenchRunRow } from "@/db/queries/bench";
import type { FitResult } from "@/lib/bench/fit";
import type { SaveRunInput } from "@/lib/bench/run-schema";
import type { ChartSeries } from "./fit-chart";
import { FitChart } from "./fit-chart-lazy";

const p3 = (x: number) => x.toPrecision(3);

/** On a measured heatsink part: the bench runs it was fitted from, with their readings and fitted curve. */
export function PartEvidence({ runs }: { runs: BenchRunRow[] }) {
  return (
    <section aria-labelledby="evidence-heading" className="space-y-3" data-testid="part-evidence">
      <h2 id="evidence-heading" className="text-lg font-medium">Measured on the bench</h2>
      {runs.length === 0 && <p className="text-sm text-ink-soft">No bench run you can see is attached to this part: it was measured elsewhere, or its run is private to the person who recorded it.</p>}
      {runs.map((row) => {
        const run = row.run as SaveRunInput;
        const fit = row.fit as FitResult | null;
        const series: ChartSeries[] = [{ label: "readings at the heatsink", kind: "readings", points: run.readings.map((r) => ({ tS: r.tS, tempC: r.tempC })) }];
        if (fit) series.push({ label: "fitted warm-up", kind: "curve", points: fit.curve });
        return (
          <div key={row.id} className="space-y-2 rounded-lg border border-line bg-white/60 p-3 text-sm">
            <p>
              <Link href={`/bench/${row.id}`} className="font-medium text-ember">{row.title}</Link>
              <span className="text-ink-soft"> · recorded by {row.ownerName} on {row.createdAt.toISOString().slice(0, 10)} · {run.readings.length} readings</span>
            </p>
            {fit && (
              <p className="text-ink-soft">
                Sink-to-air {p3(fit.sinkToAirKPerW.value)} K/W (95 % interval {p3(fit.sinkToAirKPerW.low)}–{p3(fit.sinkToAirKPerW.high)} K/W), heat capacity {p3(fit.heatCapacityJPerK.value)} J/K
                {fit.heatCapacityJPerK.from === "mass" ? " (from the mass)" : ` (95 % interval ${p3(fit.heatCapacityJPerK.low)}–${p3(fit.heatCapacityJPerK.high)} J/K)`}, at {p3(fit.heatW)} W of heat and {fit.ambientC.toFixed(1)} °C ambient; RMS misfit {fit.rmsK.toFixed(2)} K.
              </p>
            )}
            <FitChart series={series} testId="evidence-chart" />
          </div>
        );
      })}
    </section>
  );
}
