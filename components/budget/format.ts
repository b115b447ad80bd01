/**
 * Budget-screen helpers that are not number formatting (verdict colours, the heat scale,
 * limit labels). Every figure is printed by lib/units/figures, the one formatter.
 */
import type { ModeDrive } from "@/lib/parts";
import { formatFigure, type TemperatureUnit } from "@/lib/units/figures";

export type TempUnit = TemperatureUnit;

export const VERDICT_STYLE: Record<string, string> = {
  "within budget": "bg-ok/10 text-ok border-ok/40",
  tight: "bg-tight/10 text-tight border-tight/40",
  "over budget": "bg-over/10 text-over border-over/40",
};

/** Blue → red scale position for a temperature between ambient and a limit. */
export function heatColour(c: number, ambientC: number, limitC: number): string {
  const t = Math.max(0, Math.min(1, (c - ambientC) / Math.max(1, limitC - ambientC)));
  const stops = [
    [37, 99, 235],
    [14, 165, 233],
    [234, 179, 8],
    [249, 115, 22],
    [220, 38, 38],
  ];
  const x = t * (stops.length - 1);
  const i = Math.min(stops.length - 2, Math.floor(x));
  const f = x - i;
  const a = stops[i]!;
  const b = stops[i + 1]!;
  const mix = a.map((v, k) => Math.round(v + (b[k]! - v) * f));
  return `rgb(${mix.join(",")})`;
}

/** A limit's place, telling a window's two ends apart ("cells, upper limit"). */
export function limitLabel(l: { place: string; id: string; kind: "max" | "min" }): string {
  if (l.id === "cells-max" || l.id === "cells-min") return `${l.place}, ${l.kind === "max" ? "upper" : "lower"} limit`;
  return l.place;
}

/** A mode's figure as the maker entered it, for the Drive column: "2.8 A out", "9 W from the battery". */
export function enteredText(e: ModeDrive | null | undefined): string | null {
  if (!e) return null;
  return `${formatFigure(e.value, e.quantity)} ${e.side === "battery" ? "from the battery" : "out"}`;
}
