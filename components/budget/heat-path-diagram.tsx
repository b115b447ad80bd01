"use client";

import { formatFigure } from "@/lib/units/figures";
import { heatColour, type TempUnit } from "./format";

/** What the diagram reads of a scenario (a Budget scenario, or one column of Side by side). */
type DiagramScenario = {
  thermal: {
    nodes: readonly { id: string; place: string }[];
    /** null figures: withheld (a link through a part a share link does not publish), drawn without labels of value. */
    links: readonly { index: number; from: string; to: string; place: string; watts: number | null; kelvinPerWatt: number | null }[];
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
  compact = false,
}: {
  scenario: DiagramScenario;
  ambientC: number;
  unit: TempUnit;
  onPick?: (target: DiagramTarget) => void;
  /** Comment counts by "node:<id>" or "link:<from->to>". */
  pins?: Record<string, number>;
  /** The picked target, "node:<id>" or "link:<from->to>". */
  selected?: string | null;
  /** A narrower drawing for a column of Side by side (same content, tighter spacing). */
  compact?: boolean;
}) {
  const t = scenario.thermal;
  if (!t) return null;
  const nodes = [...t.nodes].sort((a, b) => (t.temperaturesC[b.id] ?? 0) - (t.temperaturesC[a.id] ?? 0));
  const all = [...nodes.map((n) => ({ id: n.id, place: n.place })), { id: "ambient", place: "Ambient air" }];
  const hottest = t.temperaturesC[nodes[0]?.id ?? ""] ?? ambientC;
  // Layout: node boxes on the left, the links as loops to their right, and each link's watts
  // and K/W in a column of labels beyond the loops (pushed apart so none overlaps another).
  const L = compact
    ? { rowH: 34, boxW: 196, boxH: 26, nodeFont: 11, loopFrom: 226, loopStep: 15, labelX: 346, labelFont: 10, labelGap: 12, width: 470 }
    : { rowH: 44, boxW: 250, boxH: 32, nodeFont: 12, loopFrom: 290, loopStep: 26, labelX: 520, labelFont: 10, labelGap: 13, width: 720 };
  // Room for a place's name beside its temperature; a longer name is drawn narrower to fit.
  const nameRoom = L.boxW - 8 - 6.2 * L.nodeFont * 0.55 - 10;
  const fits = (name: string) => name.length * L.nodeFont * 0.55 <= nameRoom;
  const y = (id: string) => all.findIndex((n) => n.id === id) * L.rowH + L.rowH / 2;
  const edge = L.boxW + 10;
  const links = t.links.filter((l) => l.watts === null || Math.abs(l.watts) > 1e-6);
  const placed = links.map((l, i) => {
    const y1 = y(l.from);
    const y2 = y(l.to);
    const x = L.loopFrom + (i % 8) * L.loopStep;
    // The loop's farthest point (the Bézier's middle): where its label's leader starts.
    return { l, i, y1, y2, x, ax: 0.25 * edge + 0.75 * x, ay: (y1 + y2) / 2, ly: (y1 + y2) / 2 };
  });
  const byY = [...placed].sort((a, b) => a.ay - b.ay);
  for (let k = 1; k < byY.length; k++) byY[k]!.ly = Math.max(byY[k]!.ay, byY[k - 1]!.ly + L.labelGap);
  const height = Math.max(all.length * L.rowH, (byY.at(-1)?.ly ?? 0) + L.labelGap);
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
    <svg viewBox={`0 0 ${L.width} ${height}`} className={compact ? "w-full" : "w-full max-w-4xl"} role={onPick ? "group" : "img"} aria-label="Heat path diagram" data-testid="heat-path-diagram">
      {placed.map(({ l, y1, y2, x, ax, ay, ly }) => {
        const id = linkId(l.from, l.to);
        const on = selected === `link:${id}`;
        const figures = l.watts === null || l.kelvinPerWatt === null ? "figures not published" : `${formatFigure(l.watts, "power")} · ${formatFigure(l.kelvinPerWatt, "thermalResistance")}`;
        const pinCount = pins?.[`link:${id}`] ?? 0;
        const d = `M ${edge} ${y1} C ${x} ${y1}, ${x} ${y2}, ${edge} ${y2}`;
        return (
          <g key={l.index} {...pickable("link", id, `${l.place}: ${figures}`)} data-link={id}>
            <path d={d} fill="none" stroke={on ? "#9a3412" : "#c2410c"} strokeOpacity={on ? 0.95 : 0.55} strokeWidth={Math.min(6, 1 + Math.abs(l.watts ?? 0.5)) + (on ? 2 : 0)} />
            {onPick && <path d={d} fill="none" stroke="transparent" strokeWidth={12} />}
            <path d={`M ${ax} ${ay} L ${L.labelX - 4} ${ly}`} fill="none" stroke="#d6cfc7" strokeWidth={0.8} />
            <text x={L.labelX} y={ly + 3.5} fontSize={L.labelFont} fill={on ? "#9a3412" : "#6b6158"}>{figures}</text>
            {pinCount > 0 && <PinMark x={ax} y={ay} n={pinCount} />}
            <title>{`${l.place}: ${figures}`}</title>
          </g>
        );
      })}
      {all.map((n) => {
        const c = n.id === "ambient" ? ambientC : (t.temperaturesC[n.id] ?? ambientC);
        const on = selected === `node:${n.id}`;
        const pinCount = pins?.[`node:${n.id}`] ?? 0;
        const shown = formatFigure(c, "temperature", { temperatureUnit: unit });
        const target = n.id === "ambient" ? {} : pickable("node", n.id, `${n.place}, ${shown}`);
        return (
          <g key={n.id} {...target}>
            <rect x={10} y={y(n.id) - L.boxH / 2} width={L.boxW} height={L.boxH} rx={5} fill={on ? "#fdebd9" : "white"} stroke={heatColour(c, ambientC, hottest)} strokeWidth={on ? 3 : 2} />
            <text x={18} y={y(n.id) + 4} fontSize={L.nodeFont} fill="#2b2520" {...(fits(n.place) ? {} : { textLength: nameRoom, lengthAdjust: "spacingAndGlyphs" })}>{n.place}</text>
            <text x={L.boxW + 2} y={y(n.id) + 4} fontSize={L.nodeFont} textAnchor="end" fill="#6b6158">{shown}</text>
            {pinCount > 0 && <PinMark x={10} y={y(n.id) - L.boxH / 2} n={pinCount} />}
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
