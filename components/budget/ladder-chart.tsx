"use client";

import { Bar } from "react-chartjs-2";
import "./chart-setup";
import { formatFigure } from "@/lib/units/figures";
import { ladderTotalTrace } from "@/lib/retrofit/derivations";
import { heatColour } from "./format";
import { Traceable } from "./trace-view";
import type { Scenario } from "./types";

/**
 * The temperature ladder: a waterfall from ambient up to the hottest source, one floating
 * bar per link the heat crosses, so the biggest rung shows what to improve first.
 */
function short(label: string, max = 34): string {
  return label.length > max ? `${label.slice(0, max - 1)}…` : label;
}

export function LadderChart({ scenario, ambientC }: { scenario: Scenario; ambientC: number }) {
  const ladder = scenario.thermal?.ladder;
  if (!ladder || ladder.steps.length === 0) return <p className="text-sm text-ink-soft">No temperature ladder for this scenario.</p>;
  // The steps run from the hot node down to ambient; draw them bottom-up.
  const steps = [...ladder.steps].reverse();
  let base = ambientC;
  const bars = steps.map((s) => {
    const bar: [number, number] = [base, base + s.deltaK];
    base += s.deltaK;
    return bar;
  });
  const top = base;
  const hot = ladder.steps[0]?.from ?? "";
  const place = scenario.thermal?.nodes.find((n) => n.id === hot)?.place ?? "the hottest place";
  return (
    <div className="space-y-1">
    <div className="h-72" data-testid="ladder-chart">
      <Bar
        data={{
          labels: steps.map((s) => s.place),
          datasets: [
            {
              label: "Temperature rise across the link",
              data: bars,
              backgroundColor: bars.map(([, hi]) => heatColour(hi, ambientC, top)),
              borderRadius: 3,
            },
          ],
        }}
        options={{
          indexAxis: "y",
          maintainAspectRatio: false,
          plugins: {
            legend: { display: false },
            tooltip: {
              callbacks: {
                title: (items) => steps[items[0]?.dataIndex ?? 0]?.place ?? "",
                label: (ctx) => {
                  const s = steps[ctx.dataIndex];
                  return s ? `${formatFigure(s.deltaK, "temperatureDifference", { signed: true })} · ${formatFigure(s.watts, "power")} · ${formatFigure(s.kelvinPerWatt, "thermalResistance")}` : "";
                },
              },
            },
          },
          scales: {
            x: { title: { display: true, text: "°C" }, min: Math.floor(ambientC - 2) },
            // Long link names are cut at the end (the tooltip has the whole name).
            y: { ticks: { callback: (_v, i) => short(steps[i]?.place ?? "") } },
          },
        }}
      />
    </div>
      <p className="text-sm" data-testid="ladder-total">
        {place}: {formatFigure(ambientC, "temperature")} ambient + {formatFigure(ladder.riseK, "temperatureDifference")} rise ={" "}
        <Traceable label={formatFigure(ambientC + ladder.riseK, "temperature")} trace={ladderTotalTrace(ladder, place, ambientC)} />
      </p>
    </div>
  );
}
