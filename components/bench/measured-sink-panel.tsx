import Link from "next/link";
import type { MeasuredSinkEffect } from "@/server/bench/sink-effect";

const p3 = (x: number) => x.toPrecision(3);

/** On the Budget: the sink is measured, and what the ends of its interval do to the junction. */
export function MeasuredSinkPanel({ effect }: { effect: MeasuredSinkEffect }) {
  const r = effect.sinkToAirKPerW;
  return (
    <section className="rounded-lg border border-line bg-white/60 p-3 text-sm" data-testid="measured-sink">
      <h2 className="font-medium">Heatsink measured on the bench</h2>
      <p className="text-ink-soft">
        {effect.partName}: {p3(r.value)} K/W (95 % interval {p3(r.low)}–{p3(r.high)} K/W), fitted from the run <Link href={`/bench/${effect.run.id}`} className="text-ember">{effect.run.title}</Link>. The junction at the two ends of the interval:
      </p>
      {effect.modes.length > 0 && (
        <table className="mt-2 text-sm">
          <thead className="text-left text-ink-soft"><tr><th className="pr-4 font-medium">Mode</th><th className="pr-4 font-medium">Junction</th><th className="pr-4 font-medium">Sink at {p3(r.low)} K/W</th><th className="pr-4 font-medium">Sink at {p3(r.high)} K/W</th><th className="font-medium">Limit</th></tr></thead>
          <tbody>
            {effect.modes.map((m) => (
              <tr key={m.name}><td className="pr-4">{m.name}</td><td className="pr-4">{m.atValueC.toFixed(1)} °C</td><td className="pr-4">{m.atLowC.toFixed(1)} °C</td><td className={`pr-4 ${m.atHighC > m.limitC ? "font-medium text-over" : ""}`}>{m.atHighC.toFixed(1)} °C</td><td>{m.limitC.toFixed(0)} °C</td></tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
