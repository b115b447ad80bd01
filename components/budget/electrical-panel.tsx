"use client";

import { hours, num } from "./format";
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
            <dd><Traceable label={`${num(pack.nominalVoltage.value, 2)} V`} trace={pack.nominalVoltage.trace} /></dd>
            <dt className="text-ink-soft">Capacity</dt>
            <dd><Traceable label={`${num(pack.capacityMAh, 0)} mAh`} trace={pack.capacityC.trace} /></dd>
            <dt className="text-ink-soft">Energy</dt>
            <dd><Traceable label={`${num(pack.energyWh.value, 1)} Wh`} trace={pack.energyWh.trace} /></dd>
          </>
        )}
        <dt className="text-ink-soft">Peak pack current</dt>
        <dd>{peakPackCurrentA === null ? "–" : `${num(peakPackCurrentA, 2)} A`}</dd>
        <dt className="text-ink-soft">Protection trips at</dt>
        <dd className={protectionTripA !== null && peakPackCurrentA !== null && protectionTripA < peakPackCurrentA ? "text-over" : ""}>
          {protectionTripA === null ? "no protection in the build" : `${num(protectionTripA, 1)} A${peakPackCurrentA !== null && protectionTripA < peakPackCurrentA ? " — below the peak current: it will cut out" : ""}`}
        </dd>
      </dl>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Charging</dt>
        <dd>
          {charge ? `${charge.chargers} × charger, ${num(charge.currentA, 2)} A` : "no charger in the build"}
          {charge?.throttle && <span className="text-tight"> — held down from {num(charge.ratedCurrentA, 2)} A by the chips&apos; {num(charge.throttle.regulationC, 0)} °C die regulation (full in {hours(charge.throttle.ratedHours)} otherwise)</span>}
        </dd>
        {charge && (
          <>
            <dt className="text-ink-soft">Constant-current phase</dt>
            <dd><Traceable label={hours(charge.ccHours.value)} trace={charge.ccHours.trace} /></dd>
            <dt className="text-ink-soft">To full (with CV taper)</dt>
            <dd><Traceable label={hours(charge.totalHours.value)} trace={charge.totalHours.trace} /> <span className="text-xs text-ink-soft">(capacity ÷ current would say {hours(charge.capacityOverCurrentH)})</span></dd>
            <dt className="text-ink-soft">Charger heat</dt>
            <dd><Traceable label={`${num(charge.lossW.value, 2)} W`} trace={charge.lossW.trace} /></dd>
          </>
        )}
      </dl>
    </div>
  );
}
