"use client";

import { useState } from "react";
import { Line } from "react-chartjs-2";
import "@/components/budget/chart-setup";
import { SERIES_COLOURS } from "@/components/budget/chart-setup";
import type { CompareAnswer } from "./use-compare";

const columnName = (c: CompareAnswer["columns"][number]) => `${c.variantNote ?? c.title} (r${c.revision})`;

/** Warm-up of one place in one scenario, every column overlaid, with its limit line. */
export function OverlaidWarmups({ data }: { data: CompareAnswer }) {
  const options = data.warmups;
  // Start on the hottest driver curve: the place the driver-cooling variants differ most.
  const [index, setIndex] = useState(() => {
    const peak = (w: (typeof options)[number]) => Math.max(-Infinity, ...w.columns.flatMap((c) => c?.temperaturesC ?? []));
    let best = 0;
    options.forEach((w, i) => {
      const b = options[best]!;
      if ((w.node === "driver") !== (b.node === "driver") ? w.node === "driver" : peak(w) > peak(b)) best = i;
    });
    return best;
  });
  const w = options[index];
  if (!w) return <p className="text-sm text-ink-soft">No warm-up curves to overlay.</p>;
  const last = Math.max(0, ...w.columns.map((c) => c?.timesMin.at(-1) ?? 0));
  const datasets = [
    ...w.columns.flatMap((c, i) =>
      c ? [{ label: columnName(data.columns[i]!), data: c.timesMin.map((x, k) => ({ x, y: c.temperaturesC[k] ?? 0 })), borderColor: SERIES_COLOURS[i], backgroundColor: SERIES_COLOURS[i], pointRadius: 0, borderWidth: 2 }] : [],
    ),
    ...(w.limitC === null ? [] : [{ label: `limit: ${w.place}`, data: [{ x: 0, y: w.limitC }, { x: last, y: w.limitC }], borderColor: "#b42318", backgroundColor: "#b42318", borderDash: [6, 4], pointRadius: 0, borderWidth: 1 }]),
  ];
  const missing = w.columns.map((c, i) => (c ? null : columnName(data.columns[i]!))).filter((x): x is string => x !== null);
  return (
    <div className="space-y-2">
      <label className="text-sm">
        <span className="mr-2 text-ink-soft">Curve</span>
        <select value={index} onChange={(e) => setIndex(Number(e.target.value))} className="rounded border border-line bg-white px-2 py-0.5">
          {options.map((o, i) => (
            <option key={`${o.scenarioId}/${o.node}/${i}`} value={i}>{o.scenarioName} · {o.place}</option>
          ))}
        </select>
      </label>
      <div className="h-72" data-testid="compare-warmup-chart">
        <Line data={{ datasets }} options={{ maintainAspectRatio: false, parsing: false, scales: { x: { type: "linear", title: { display: true, text: "minutes from switch-on" } }, y: { title: { display: true, text: "°C" } } }, plugins: { legend: { position: "bottom", labels: { boxWidth: 12 } } } }} />
      </div>
      {missing.length > 0 && <p className="text-xs text-ink-soft">No warm-up for: {missing.join(", ")}.</p>}
    </div>
  );
}
