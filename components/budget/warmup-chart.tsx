"use client";

import { Line } from "react-chartjs-2";
import "./chart-setup";
import { SERIES_COLOURS } from "./chart-setup";
import { formatDuration as duration } from "@/lib/units/figures";
import type { Scenario } from "./types";

/** Warm-up from ambient: the nodes with a limit, the limit lines, and when each is reached. */
export function WarmupChart({ scenario }: { scenario: Scenario }) {
  const w = scenario.warmup;
  const thermal = scenario.thermal;
  if (!w || !thermal) return <p className="text-sm text-ink-soft">No warm-up for this scenario.</p>;
  const minutes = w.timesS.map((t) => t / 60);
  const limits = thermal.limits.filter((l) => l.kind === "max");
  const nodes = [...new Set(limits.map((l) => l.node))];
  const placeOf = (id: string) => thermal.nodes.find((n) => n.id === id)?.place ?? id;
  const datasets = [
    ...nodes.map((node, i) => ({
      label: placeOf(node),
      data: (w.temperaturesC[node] ?? []).map((y, k) => ({ x: minutes[k] ?? 0, y })),
      borderColor: SERIES_COLOURS[i % SERIES_COLOURS.length],
      backgroundColor: SERIES_COLOURS[i % SERIES_COLOURS.length],
      pointRadius: 0,
      borderWidth: 2,
    })),
    ...limits.map((l, i) => ({
      label: `limit: ${l.place}`,
      data: [{ x: 0, y: l.limitC }, { x: minutes[minutes.length - 1] ?? 0, y: l.limitC }],
      borderColor: SERIES_COLOURS[nodes.indexOf(l.node) % SERIES_COLOURS.length] ?? SERIES_COLOURS[i],
      borderDash: [6, 4],
      pointRadius: 0,
      borderWidth: 1,
    })),
  ];
  return (
    <div className="space-y-2">
      <div className="h-72" data-testid="warmup-chart">
        <Line
          data={{ datasets }}
          options={{
            maintainAspectRatio: false,
            parsing: false,
            scales: {
              x: { type: "linear", title: { display: true, text: "minutes from switch-on" } },
              y: { title: { display: true, text: "°C" } },
            },
            plugins: { legend: { position: "bottom", labels: { boxWidth: 12 } } },
          }}
        />
      </div>
      <ul className="text-sm">
        {w.crossings.map((c) => {
          const l = limits.find((x) => x.id === c.limitId);
          return (
            <li key={c.limitId}>
              {l?.place ?? c.limitId}:{" "}
              {c.timeS === null ? <span className="text-ok">{w.ends === "pack-empty" ? `not reached before the pack is empty (${duration(w.durationS)})` : w.ends === "charge-done" ? `not reached before the charge is done (${duration(w.durationS)})` : `not reached; settled within ${duration(w.durationS)}`}</span> : <span className="font-medium text-over">limit reached after {duration(c.timeS)}</span>}
            </li>
          );
        })}
        {w.steadyWithinS !== null && <li className="text-ink-soft">Within 1 K of steady state after {duration(w.steadyWithinS)}.</li>}
      </ul>
    </div>
  );
}
