"use client";

import { CategoryScale, Chart as ChartJS, Legend, LinearScale, LineElement, PointElement, Tooltip } from "chart.js";
import { Line } from "react-chartjs-2";
import { CURVE_KIND_INFO, type CurveKind } from "@/lib/curves";
import { displayUnits, toDisplay, type UnitPreferences } from "@/lib/units";

ChartJS.register(LinearScale, CategoryScale, PointElement, LineElement, Tooltip, Legend);

// The theme's ember and ink (app/globals.css); canvas cannot read CSS variables by itself.
const EMBER = "#c2410c";
const INK_SOFT = "#6b6158";
const LINE = "#ddd3c4";

/** One curve drawn in the viewer's units: the axes say which. */
export function CurveChart({ kind, points, prefs }: { kind: CurveKind; points: { x: number; y: number }[]; prefs: UnitPreferences }) {
  const info = CURVE_KIND_INFO[kind];
  // One unit per axis for every point, so the line is not drawn in mixed units.
  const xUnit = displayUnits(info.x.quantity, prefs)[0];
  const yUnit = displayUnits(info.y.quantity, prefs)[0];
  const data = points.map((p) => ({ x: toDisplay(p.x, info.x.quantity, prefs, xUnit).value, y: toDisplay(p.y, info.y.quantity, prefs, yUnit).value }));
  const axisTitle = (label: string, unit: string | undefined) => (unit ? `${label} (${unit})` : label);
  return (
    <figure className="rounded-lg border border-line bg-white/70 p-3">
      <figcaption className="mb-2 text-sm font-medium">{info.label}</figcaption>
      <div className="h-56">
        <Line
          aria-label={`${info.label} chart`}
          role="img"
          data={{ datasets: [{ label: info.label, data, borderColor: EMBER, backgroundColor: EMBER, pointRadius: 3, tension: 0 }] }}
          options={{
            maintainAspectRatio: false,
            animation: false,
            plugins: { legend: { display: false } },
            scales: {
              x: { type: "linear", title: { display: true, text: axisTitle(info.x.label, xUnit?.label), color: INK_SOFT }, grid: { color: LINE } },
              y: { type: "linear", title: { display: true, text: axisTitle(info.y.label, yUnit?.label), color: INK_SOFT }, grid: { color: LINE } },
            },
          }}
        />
      </div>
    </figure>
  );
}
