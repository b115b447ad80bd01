/** Display helpers: never print NaN or Infinity; a missing figure is an en dash. */
export const DASH = "–";

export type TempUnit = "C" | "F";

export function num(value: number | null | undefined, digits = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  return value.toFixed(digits);
}

export function temp(c: number | null | undefined, unit: TempUnit = "C", digits = 0): string {
  if (c === null || c === undefined || !Number.isFinite(c)) return DASH;
  return unit === "F" ? `${(c * 1.8 + 32).toFixed(digits)} °F` : `${c.toFixed(digits)} °C`;
}

/** A temperature difference (headroom, rise): K, or °F-degrees for a °F user. */
export function delta(k: number | null | undefined, unit: TempUnit = "C", digits = 0): string {
  if (k === null || k === undefined || !Number.isFinite(k)) return DASH;
  return unit === "F" ? `${(k * 1.8).toFixed(digits)} °F` : `${k.toFixed(digits)} K`;
}

export function duration(s: number | null | undefined): string {
  if (s === null || s === undefined || !Number.isFinite(s)) return DASH;
  if (s < 90) return `${Math.round(s)} s`;
  if (s < 5400) return `${Math.round(s / 60)} min`;
  return `${(s / 3600).toFixed(1)} h`;
}

export function hours(h: number | null | undefined): string {
  if (h === null || h === undefined || !Number.isFinite(h)) return DASH;
  return h < 1.5 ? `${Math.round(h * 60)} min` : `${h.toFixed(1)} h`;
}

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
