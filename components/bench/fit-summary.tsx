"use client";

import { TraceView } from "@/components/budget/trace-view";
import type { FitResult } from "@/lib/bench/fit";

const p3 = (x: number) => x.toPrecision(3);
const minutes = (s: number) => (s >= 120 ? `${(s / 60).toFixed(1)} min` : `${s.toFixed(0)} s`);

/** The fitted figures with their 95 % intervals, the warnings in words, and the trace. */
export function FitSummary({ fit }: { fit: FitResult }) {
  const r = fit.sinkToAirKPerW;
  const c = fit.heatCapacityJPerK;
  return (
    <div className="space-y-3" data-testid="fit-summary">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Sink-to-air resistance</dt>
        <dd className="font-medium" data-testid="fit-r">{p3(r.value)} K/W <span className="font-normal text-ink-soft">(95 % interval {p3(r.low)}–{p3(r.high)} K/W)</span></dd>
        <dt className="text-ink-soft">Heat capacity</dt>
        <dd>{p3(c.value)} J/K {c.from === "mass" ? <span className="text-ink-soft">(from the mass, not fitted)</span> : <span className="text-ink-soft">(95 % interval {p3(c.low)}–{p3(c.high)} J/K)</span>}</dd>
        <dt className="text-ink-soft">Time constant</dt>
        <dd>{minutes(fit.timeConstantS)}</dd>
        <dt className="text-ink-soft">Would settle at</dt>
        <dd>{(fit.ambientC + fit.steadyRiseK).toFixed(1)} °C ({fit.steadyRiseK.toFixed(1)} K above {fit.ambientC.toFixed(1)} °C at {fit.heatW.toPrecision(3)} W)</dd>
        <dt className="text-ink-soft">Misfit (RMS)</dt>
        <dd>{fit.rmsK.toFixed(2)} K over {fit.readingCount} reading{fit.readingCount === 1 ? "" : "s"}</dd>
      </dl>
      {fit.warnings.length > 0 && (
        <ul className="space-y-1 rounded border border-tight/40 bg-tight/5 p-3 text-sm" data-testid="fit-warnings">
          {fit.warnings.map((w, i) => <li key={i}>{w}</li>)}
        </ul>
      )}
      <details className="rounded border border-line bg-white p-3">
        <summary className="cursor-pointer text-sm font-medium">How these numbers were worked out</summary>
        <div className="mt-2"><TraceView trace={fit.trace} /></div>
      </details>
      <p className="text-xs text-ink-soft">A heatsink at this temperature burns on touch: let it cool before handling it. The figure holds for the conditions measured; in a closed housing the sink runs hotter.</p>
    </div>
  );
}
