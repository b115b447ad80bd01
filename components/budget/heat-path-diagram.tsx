"use client";

import { formatFigure } from "@/lib/units/figures";
import { heatColour, type TempUnit } from "./format";
import type { Scenario } from "./types";

/**
 * The heat path as the compiler built it: nodes ordered from hottest to ambient, each link
 * drawn with the heat it carries. A plain SVG, so it prints.
 */
export function HeatPathDiagram({ scenario, ambientC, unit }: { scenario: Scenario; ambientC: number; unit: TempUnit }) {
  const t = scenario.thermal;
  if (!t) return null;
  const nodes = [...t.nodes].sort((a, b) => (t.temperaturesC[b.id] ?? 0) - (t.temperaturesC[a.id] ?? 0));
  const all = [...nodes.map((n) => ({ id: n.id, place: n.place })), { id: "ambient", place: "Ambient air" }];
  const hottest = t.temperaturesC[nodes[0]?.id ?? ""] ?? ambientC;
  const rowH = 44;
  const y = (id: string) => all.findIndex((n) => n.id === id) * rowH + 22;
  const width = 560;
  const height = all.length * rowH;
  const links = t.links.filter((l) => Math.abs(l.watts) > 1e-6);
  return (
    <svg viewBox={`0 0 ${width} ${height}`} className="w-full max-w-3xl" role="img" aria-label="Heat path diagram" data-testid="heat-path-diagram">
      {links.map((l, i) => {
        const y1 = y(l.from);
        const y2 = y(l.to);
        const x = 290 + (i % 8) * 36;
        return (
          <g key={l.index}>
            <path d={`M 260 ${y1} C ${x} ${y1}, ${x} ${y2}, 260 ${y2}`} fill="none" stroke="#c2410c" strokeOpacity={0.55} strokeWidth={Math.min(6, 1 + Math.abs(l.watts))} />
            <title>{`${l.place}: ${formatFigure(l.watts, "power")}, ${formatFigure(l.kelvinPerWatt, "thermalResistance")}`}</title>
          </g>
        );
      })}
      {all.map((n) => {
        const c = n.id === "ambient" ? ambientC : (t.temperaturesC[n.id] ?? ambientC);
        return (
          <g key={n.id}>
            <rect x={10} y={y(n.id) - 16} width={250} height={32} rx={5} fill="white" stroke={heatColour(c, ambientC, hottest)} strokeWidth={2} />
            <text x={20} y={y(n.id) + 4} fontSize={12} fill="#2b2520">{n.place}</text>
            <text x={252} y={y(n.id) + 4} fontSize={12} textAnchor="end" fill="#6b6158">{formatFigure(c, "temperature", { temperatureUnit: unit })}</text>
          </g>
        );
      })}
    </svg>
  );
}
