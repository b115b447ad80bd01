"use client";

import { formatDuration, formatFigure as fig, formatTraced } from "@/lib/units/figures";
import { enteredTrace, peakPackCurrentTrace } from "@/lib/retrofit/derivations";
import { Traceable } from "./trace-view";
import type { Evaluation } from "./types";

/** Pack, runtime per mode, charging and protection: the electrical side of the budget. */
export function ElectricalPanel({ evaluation }: { evaluation: Evaluation }) {
  const { pack, charge, peakPackCurrentA, protectionTripA } = evaluation.electrical;
  return (
    <div className="grid gap-4 md:grid-cols-2" data-testid="electrical-panel">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Pack</dt>
        <dd>{pack ? `${pack.series}S${pack.parallel}P, ${pack.cells} cell${pack.cells === 1 ? "" : "s"}` : "no cells in the build"}</dd>
        {pack && (
          <>
            <dt className="text-ink-soft">Nominal voltage</dt>
            <dd><Traceable label={formatTraced(pack.nominalVoltage)} trace={pack.nominalVoltage.trace} /></dd>
            <dt className="text-ink-soft">Capacity</dt>
            <dd><Traceable label={formatTraced(pack.capacityC)} trace={pack.capacityC.trace} /></dd>
            <dt className="text-ink-soft">Energy</dt>
            <dd><Traceable label={formatTraced(pack.energyWh)} trace={pack.energyWh.trace} /></dd>
          </>
        )}
        <dt className="text-ink-soft">Peak pack current</dt>
        <dd><Traceable label={fig(peakPackCurrentA, "current")} trace={peakPackCurrentTrace(evaluation.modes)} /></dd>
        <dt className="text-ink-soft">Protection trips at</dt>
        <dd className={protectionTripA !== null && peakPackCurrentA !== null && protectionTripA < peakPackCurrentA ? "text-over" : ""}>
          {protectionTripA === null ? (
            "no protection in the build"
          ) : (
            <>
              <Traceable label={fig(protectionTripA, "current")} trace={enteredTrace("over-current trip", "the protection circuit", protectionTripA, "A")} />
              {peakPackCurrentA !== null && protectionTripA < peakPackCurrentA ? " — below the peak current: it will cut out" : ""}
            </>
          )}
        </dd>
      </dl>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Charging</dt>
        <dd>
          {charge ? `${charge.chargers} × charger, ${fig(charge.currentA, "current")}` : "no charger in the build"}
          {charge?.throttle && <span className="text-tight">{` — held down from ${fig(charge.ratedCurrentA, "current")} by the chips' ${fig(charge.throttle.regulationC, "temperature")} die regulation (full in ${formatDuration(charge.throttle.ratedHours * 3600)} otherwise)`}</span>}
        </dd>
        {charge && (
          <>
            <dt className="text-ink-soft">Constant-current phase</dt>
            <dd><Traceable label={formatTraced(charge.ccHours)} trace={charge.ccHours.trace} /></dd>
            <dt className="text-ink-soft">To full (with CV taper)</dt>
            <dd><Traceable label={formatTraced(charge.totalHours)} trace={charge.totalHours.trace} /> <span className="text-xs text-ink-soft">(capacity ÷ current would say {formatDuration(charge.capacityOverCurrentH * 3600)})</span></dd>
            <dt className="text-ink-soft">Charger heat</dt>
            <dd><Traceable label={formatTraced(charge.lossW)} trace={charge.lossW.trace} /></dd>
          </>
        )}
      </dl>
    </div>
  );
}
