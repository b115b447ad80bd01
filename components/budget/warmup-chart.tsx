"use client";

import type { Chart, ChartEvent } from "chart.js";
import { Line } from "react-chartjs-2";
import "./chart-setup";
import { SERIES_COLOURS } from "./chart-setup";
import { formatDuration as duration } from "@/lib/units/figures";
import type { Scenario } from "./types";

/** A point of a curve a reviewer clicked: the limit whose place the curve is, and minutes from switch-on. */
export type CurvePoint = { limitId: string; place: string; minutes: number };
/** Comments drawn on the chart: on a point of a curve (minutes), or on the whole curve (null: drawn at its end). */
export type CurvePin = { limitId: string; minutes: number | null; count: number };

const PIN_COLOUR = "#9a3412";

/** A curve's temperature at `minutes`, read between its two nearest samples. */
function at(minutes: readonly number[], temps: readonly number[], m: number): number | null {
  if (temps.length === 0) return null;
  const k = minutes.findIndex((x) => x >= m);
  if (k <= 0) return temps[k === 0 ? 0 : temps.length - 1] ?? null;
  const [x0, x1, y0, y1] = [minutes[k - 1]!, minutes[k]!, temps[k - 1]!, temps[k]!];
  return x1 === x0 ? y1 : y0 + ((y1 - y0) * (m - x0)) / (x1 - x0);
}

/**
 * Warm-up from ambient: the nodes with a limit, the limit lines, and when each is reached.
 * With `onPick` a click on the chart picks the nearest point of the nearest curve (a reviewer
 * pins a comment there); `pins` draws the comments already pinned to the curves.
 */
export function WarmupChart({ scenario, onPick, pins = [] }: { scenario: Scenario; onPick?: (point: CurvePoint) => void; pins?: readonly CurvePin[] }) {
  const w = scenario.warmup;
  const thermal = scenario.thermal;
  if (!w || !thermal) return <p className="text-sm text-ink-soft">No warm-up for this scenario.</p>;
  const minutes = w.timesS.map((t) => t / 60);
  const limits = thermal.limits.filter((l) => l.kind === "max");
  const nodes = [...new Set(limits.map((l) => l.node))];
  const placeOf = (id: string) => thermal.nodes.find((n) => n.id === id)?.place ?? id;
  const limitOfNode = (node: string) => limits.find((l) => l.node === node);
  const curve = (node: string) => w.temperaturesC[node] ?? [];
  const end = minutes[minutes.length - 1] ?? 0;
  const marks = pins.flatMap((p) => {
    const l = limits.find((x) => x.id === p.limitId);
    const m = p.minutes ?? end;
    const y = l ? at(minutes, curve(l.node), m) : null;
    return l && y !== null ? [{ x: m, y, count: p.count, place: l.place }] : [];
  });
  const datasets = [
    ...nodes.map((node, i) => ({
      label: placeOf(node),
      data: curve(node).map((y, k) => ({ x: minutes[k] ?? 0, y })),
      borderColor: SERIES_COLOURS[i % SERIES_COLOURS.length],
      backgroundColor: SERIES_COLOURS[i % SERIES_COLOURS.length],
      pointRadius: 0,
      borderWidth: 2,
    })),
    ...limits.map((l, i) => ({
      label: `limit: ${l.place}`,
      data: [{ x: 0, y: l.limitC }, { x: end, y: l.limitC }],
      borderColor: SERIES_COLOURS[nodes.indexOf(l.node) % SERIES_COLOURS.length] ?? SERIES_COLOURS[i],
      borderDash: [6, 4],
      pointRadius: 0,
      borderWidth: 1,
    })),
    ...(marks.length > 0 ? [{ label: "pinned comments", data: marks.map(({ x, y }) => ({ x, y })), showLine: false, pointRadius: 7, pointHoverRadius: 8, borderColor: "white", borderWidth: 2, backgroundColor: PIN_COLOUR }] : []),
  ];
  // A click picks the curve closest to the pointer at that time, snapped to its nearest sample.
  const onClick = onPick
    ? (event: ChartEvent, _elements: unknown, chart: Chart) => {
        if (event.x === null || event.y === null) return;
        const mx = chart.scales.x?.getValueForPixel(event.x);
        const my = chart.scales.y?.getValueForPixel(event.y);
        if (mx === undefined || my === undefined || minutes.length === 0) return;
        let k = 0;
        minutes.forEach((m, i) => {
          if (Math.abs(m - mx) < Math.abs((minutes[k] ?? 0) - mx)) k = i;
        });
        const nearest = nodes.map((node) => ({ node, d: Math.abs((curve(node)[k] ?? Infinity) - my) })).sort((a, b) => a.d - b.d)[0];
        const l = nearest ? limitOfNode(nearest.node) : undefined;
        if (l) onPick({ limitId: l.id, place: l.place, minutes: minutes[k] ?? 0 });
      }
    : undefined;
  return (
    <div className="space-y-2">
      <div className={`h-72 ${onPick ? "cursor-crosshair" : ""}`} data-testid="warmup-chart">
        <Line
          data={{ datasets }}
          options={{
            maintainAspectRatio: false,
            parsing: false,
            ...(onClick ? { onClick } : {}),
            scales: {
              x: { type: "linear", title: { display: true, text: "minutes from switch-on" } },
              y: { title: { display: true, text: "°C" } },
            },
            plugins: { legend: { position: "bottom", labels: { boxWidth: 12 } } },
          }}
        />
      </div>
      {marks.length > 0 && (
        <ul className="text-xs text-ink-soft" data-testid="chart-pins" aria-label="Comments pinned on this chart">
          {marks.map((m, i) => (
            <li key={i}>
              <span className="mr-1 inline-block h-2.5 w-2.5 rounded-full align-middle" style={{ background: PIN_COLOUR }} />
              {m.count} comment{m.count > 1 ? "s" : ""} on the {m.place} at {duration(m.x * 60)}
            </li>
          ))}
        </ul>
      )}
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
