"use client";

import { formatFigure } from "@/lib/units/figures";
import { heatColour, type TempUnit } from "./format";

/** What the diagram reads of a scenario (a Budget scenario, or one column of Side by side). */
type DiagramScenario = {
  thermal: {
    nodes: readonly { id: string; place: string }[];
    links: readonly { index: number; from: string; to: string; place: string; watts: number; kelvinPerWatt: number }[];
    temperaturesC: Record<string, number>;
  } | null;
};

/** What a click on the diagram picks: a node by its id, or a link by "from->to". */
export type DiagramTarget = { kind: "node" | "link"; id: string; label: string };

const linkId = (from: string, to: string) => `${from}->${to}`;

/**
 * The heat path as the compiler built it: nodes ordered from hottest to ambient, each link
 * drawn with the heat it carries and labelled with its watts and K/W. A plain SVG, so it
 * prints. With `onPick` the nodes and links are buttons (a reviewer pins comments on them);
 * `pins` draws a marker with the number of comments on a node or link.
 */
export function HeatPathDiagram({
  scenario,
  ambientC,
  unit,
  onPick,
  pins,
  selected,
}: {
  scenario: DiagramScenario;
  ambientC: number;
  unit: TempUnit;
  onPick?: (target: DiagramTarget) => void;
  /** Comment counts by "node:<id>" or "link:<from->to>". */
  pins?: Record<string, number>;
  /** The picked target, "node:<id>" or "link:<from->to>". */
  selected?: string | null;
}) {
  const t = scenario.thermal;
  if (!t) return null;
  const nodes = [...t.nodes].sort((a, b) => (t.temperaturesC[b.id] ?? 0) - (t.temperaturesC[a.id] ?? 0));
  const all = [...nodes.map((n) => ({ id: n.id, place: n.place })), { id: "ambient", place: "Ambient air" }];
  const hottest = t.temperaturesC[nodes[0]?.id ?? ""] ?? ambientC;
  const rowH = 44;
  const y = (id: string) => all.findIndex((n) => n.id === id) * rowH + 22;
  const width = 720;
  const height = all.length * rowH;
  const links = t.links.filter((l) => Math.abs(l.watts) > 1e-6);
  const pickable = (kind: "node" | "link", id: string, label: string) =>
    onPick
      ? {
          role: "button",
          tabIndex: 0,
          "aria-label": label,
          "data-pin-target": `${kind}:${id}`,
          style: { cursor: "pointer" },
          onClick: () => onPick({ kind, id, label }),
          onKeyDown: (e: React.KeyboardEvent) => {
            if (e.key === "Enter" || e.key === " ") {
              e.preventDefault();
              onPick({ kind, id, label });
            }
          },
        }
      : {};
  return (
    <svg viewBox={`0 0 ${width} ${height}`} className="w-full max-w-4xl" role={onPick ? "group" : "img"} aria-label="Heat path diagram" data-testid="heat-path-diagram">
      {links.map((l, i) => {
        const y1 = y(l.from);
        const y2 = y(l.to);
        const x = 250 + (i % 8) * 42;
        const id = linkId(l.from, l.to);
        const on = selected === `link:${id}`;
        const figures = `${formatFigure(l.watts, "power")} · ${formatFigure(l.kelvinPerWatt, "thermalResistance")}`;
        const pinCount = pins?.[`link:${id}`] ?? 0;
        const mx = 55 + 0.75 * x;
        const my = (y1 + y2) / 2;
        return (
          <g key={l.index} {...pickable("link", id, `${l.place}: ${figures}`)}>
            <path d={`M 220 ${y1} C ${x} ${y1}, ${x} ${y2}, 220 ${y2}`} fill="none" stroke={on ? "#9a3412" : "#c2410c"} strokeOpacity={on ? 0.95 : 0.55} strokeWidth={Math.min(6, 1 + Math.abs(l.watts)) + (on ? 2 : 0)} />
            {onPick && <path d={`M 220 ${y1} C ${x} ${y1}, ${x} ${y2}, 220 ${y2}`} fill="none" stroke="transparent" strokeWidth={12} />}
            <text x={mx + 4} y={my + 3} fontSize={9} fill="#6b6158">{figures}</text>
            {pinCount > 0 && <PinMark x={mx} y={my - 8} n={pinCount} />}
            <title>{`${l.place}: ${figures}`}</title>
          </g>
        );
      })}
      {all.map((n) => {
        const c = n.id === "ambient" ? ambientC : (t.temperaturesC[n.id] ?? ambientC);
        const on = selected === `node:${n.id}`;
        const pinCount = pins?.[`node:${n.id}`] ?? 0;
        const target = n.id === "ambient" ? {} : pickable("node", n.id, `${n.place}, ${formatFigure(c, "temperature", { temperatureUnit: unit })}`);
        return (
          <g key={n.id} {...target}>
            <rect x={10} y={y(n.id) - 16} width={210} height={32} rx={5} fill={on ? "#fdebd9" : "white"} stroke={heatColour(c, ambientC, hottest)} strokeWidth={on ? 3 : 2} />
            <text x={20} y={y(n.id) + 4} fontSize={12} fill="#2b2520">{n.place}</text>
            <text x={212} y={y(n.id) + 4} fontSize={12} textAnchor="end" fill="#6b6158">{formatFigure(c, "temperature", { temperatureUnit: unit })}</text>
            {pinCount > 0 && <PinMark x={10} y={y(n.id) - 16} n={pinCount} />}
          </g>
        );
      })}
    </svg>
  );
}

/** A pin drawn on the figure: the number of comments on that node or link. */
function PinMark({ x, y, n }: { x: number; y: number; n: number }) {
  return (
    <g data-testid="pin-mark" aria-label={`${n} comment${n > 1 ? "s" : ""}`}>
      <circle cx={x} cy={y} r={7} fill="#c2410c" />
      <text x={x} y={y + 3} fontSize={9} textAnchor="middle" fill="white">{n}</text>
    </g>
  );
}
