"use client";

import { Scatter } from "react-chartjs-2";
import "./chart-setup";
import type { Scenario } from "./types";

type Pt = { x: number; y: number };

function CurveWithPoint({ title, xLabel, yLabel, curve, point, testId }: { title: string; xLabel: string; yLabel: string; curve: readonly Pt[]; point: Pt; testId: string }) {
  return (
    <figure className="space-y-1">
      <figcaption className="text-sm font-medium">{title}</figcaption>
      <div className="h-56" data-testid={testId}>
        <Scatter
          data={{
            datasets: [
              { label: "part curve", data: [...curve], showLine: true, borderColor: "#6b6158", backgroundColor: "#6b6158", pointRadius: 2 },
              { label: "this build", data: [point], borderColor: "#c2410c", backgroundColor: "#c2410c", pointRadius: 6, pointStyle: "rectRot" },
            ],
          }}
          options={{
            maintainAspectRatio: false,
            scales: { x: { title: { display: true, text: xLabel } }, y: { title: { display: true, text: yLabel } } },
            plugins: { legend: { position: "bottom", labels: { boxWidth: 10 } } },
          }}
        />
      </div>
    </figure>
  );
}

/** The part curves with this build's operating point on them. */
export function DeratingCharts({ scenario }: { scenario: Scenario }) {
  const d = scenario.derating;
  const charts = [];
  if (d?.fluxVsTj) {
    charts.push(
      <CurveWithPoint key="flux" testId="derating-flux" title="Relative flux vs junction temperature" xLabel="Tj, °C" yLabel="relative flux" curve={d.fluxVsTj.points} point={{ x: d.fluxVsTj.operating.tjC, y: d.fluxVsTj.operating.relativeFlux }} />,
    );
  }
  for (const [key, label, c] of [
    ["emitter", "Emitter: allowed current vs temperature", d?.emitterCurrentVsTemperature],
    ["driver", "Driver: allowed current vs temperature", d?.driverCurrentVsTemperature],
  ] as const) {
    if (c) charts.push(<CurveWithPoint key={key} testId={`derating-${key}`} title={`${label}${c.ok ? "" : " — above the curve"}`} xLabel={`${c.temperatureNode}, °C`} yLabel="current, A" curve={c.points} point={{ x: c.temperatureC, y: c.currentA }} />);
  }
  if (charts.length === 0) return <p className="text-sm text-ink-soft">The parts carry no derating curves; add them on the part pages to see the operating points here.</p>;
  return <div className="grid gap-4 md:grid-cols-2">{charts}</div>;
}
