"use client";

import { Line } from "react-chartjs-2";
import "@/components/budget/chart-setup";
import { SERIES_COLOURS } from "@/components/budget/chart-setup";

export interface ChartSeries {
  label: string;
  points: { tS: number; tempC: number }[];
  /** Readings are dots, model curves are lines. */
  kind: "readings" | "curve";
  /** Colour by this index (so a place's readings and its prediction match); by position when absent. */
  colour?: number;
}

/** Readings against time with the fitted (or predicted) warm-up drawn through them. */
export function FitChart({ series, testId = "bench-chart" }: { series: ChartSeries[]; testId?: string }) {
  const datasets = series.map((s, i) => ({
    label: s.label,
    data: s.points.map((p) => ({ x: p.tS / 60, y: p.tempC })),
    borderColor: SERIES_COLOURS[(s.colour ?? i) % SERIES_COLOURS.length],
    backgroundColor: SERIES_COLOURS[(s.colour ?? i) % SERIES_COLOURS.length],
    showLine: s.kind === "curve",
    pointRadius: s.kind === "readings" ? 2.5 : 0,
    borderWidth: s.kind === "curve" ? 2 : 0,
  }));
  return (
    <div className="h-72" data-testid={testId}>
      <Line
        data={{ datasets }}
        options={{
          maintainAspectRatio: false,
          parsing: false,
          scales: { x: { type: "linear", title: { display: true, text: "minutes from switch-on" } }, y: { title: { display: true, text: "°C" } } },
          plugins: { legend: { position: "bottom", labels: { boxWidth: 12 } } },
        }}
      />
    </div>
  );
}
