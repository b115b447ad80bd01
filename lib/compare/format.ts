/**
 * How Side by side prints its figures in sentences, tables and messages: the one place that
 * decides digits and units for this screen, so it can move to the shared quantity formatter
 * in one step. Never prints NaN, Infinity or "-0".
 */
export const DASH = "–";

function fixed(x: number, digits: number): string {
  const s = x.toFixed(digits);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

/** A temperature difference: one decimal under 10 K, whole kelvin above. */
export function kelvin(k: number | null | undefined): string {
  if (k === null || k === undefined || !Number.isFinite(k)) return DASH;
  return `${fixed(k, Math.abs(k) < 9.95 ? 1 : 0)} K`;
}

/** A temperature in °C, whole degrees (as the Budget's ladder and headroom table). */
export function celsius(c: number | null | undefined): string {
  if (c === null || c === undefined || !Number.isFinite(c)) return DASH;
  return `${fixed(c, 0)} °C`;
}

export function euros(eur: number | null | undefined): string {
  if (eur === null || eur === undefined || !Number.isFinite(eur)) return DASH;
  return `€${fixed(eur, 2)}`;
}

export function lumens(lm: number | null | undefined): string {
  if (lm === null || lm === undefined || !Number.isFinite(lm)) return DASH;
  return `${fixed(lm, 0)} lm`;
}

/** Hours as "45 min" under 1.5 h, else "2.3 h". */
export function runtime(h: number | null | undefined): string {
  if (h === null || h === undefined || !Number.isFinite(h)) return DASH;
  return h < 1.5 ? `${fixed(h * 60, 0)} min` : `${fixed(h, 1)} h`;
}

export function watts(w: number | null | undefined): string {
  if (w === null || w === undefined || !Number.isFinite(w)) return DASH;
  return `${fixed(w, Math.abs(w) < 10 ? 2 : 1)} W`;
}

export function kelvinPerWatt(r: number | null | undefined): string {
  if (r === null || r === undefined || !Number.isFinite(r)) return DASH;
  return `${fixed(r, Math.abs(r) < 10 ? 2 : 1)} K/W`;
}

/** A figure in its row's unit, with the digits the unit asks for. */
export function inUnit(v: number | null | undefined, unit: string): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return DASH;
  switch (unit) {
    case "°C":
      return `${fixed(v, 1)} °C`;
    case "K":
      return `${fixed(v, 1)} K`;
    case "€":
      return euros(v);
    case "lm":
    case "mAh":
    case "min":
      return `${fixed(v, 0)} ${unit}`;
    case "W":
      return `${fixed(v, 2)} W`;
    default:
      return `${fixed(v, 1)} ${unit}`.trim();
  }
}

/** A signed delta in a row's unit ("+3.2 K", "−€1.20", "±0"). */
export function signedInUnit(d: number | null | undefined, unit: string): string {
  if (d === null || d === undefined || !Number.isFinite(d)) return "";
  const text = inUnit(Math.abs(d), unit);
  if (/^€?0(\.0+)?( |$)/.test(text)) return "±0";
  return `${d > 0 ? "+" : "−"}${text}`;
}
