import { DASH, formatAgainstLimit, formatFigure, formatHeadroom, formatInUnit, formatMoney } from "@/lib/units/figures";

/**
 * Side by side's names for the shared figure formatter (lib/units/figures): sentences, tables
 * and messages of this screen print through it, so a figure reads the same as on the Budget.
 */
export { DASH };

/** A temperature difference or a headroom (a negative headroom never prints as "0 K"). */
export const kelvin = (k: number | null | undefined): string => formatHeadroom(k);

/** A temperature rise or step (a difference of temperatures), e.g. "12 K", "3.4 K". */
export const kelvinRise = (k: number | null | undefined): string => formatFigure(k, "temperatureDifference");

export const celsius = (c: number | null | undefined): string => formatFigure(c, "temperature");

/** A temperature and its limit at one precision: a failing value never reads equal to its limit. */
export function celsiusAgainst(c: number, limitC: number, kind: "max" | "min"): { value: string; limit: string } {
  const shown = formatAgainstLimit(c, limitC, kind, "temperature");
  return { value: shown.value, limit: shown.limit };
}

export const euros = (eur: number | null | undefined): string => formatMoney(eur);

/** A mass given in kg, shown as the formatter shows masses ("412 g"). */
export const mass = (kg: number | null | undefined): string => formatInUnit(kg, "kg");

export const lumens = (lm: number | null | undefined): string => formatFigure(lm, "flux");

/** A runtime given in hours, shown as every time is ("6 h 30 min", "47 min"). */
export const runtime = (h: number | null | undefined): string => formatInUnit(h, "h");

export const watts = (w: number | null | undefined): string => formatFigure(w, "power");

export const kelvinPerWatt = (r: number | null | undefined): string => formatFigure(r, "thermalResistance");

/** A figure in its row's unit as the engine writes it ("°C", "h", "min", "€"). */
export const inUnit = (v: number | null | undefined, unit: string): string => formatInUnit(v, unit);

/** A signed delta in a row's unit ("+3.2 K", "−€1.20"); one that rounds away to nothing is "±0". */
export function signedInUnit(d: number | null | undefined, unit: string): string {
  if (d === null || d === undefined || !Number.isFinite(d)) return "";
  // A difference of temperatures is a temperature difference (K), not a temperature.
  const size = inUnit(Math.abs(d), unit === "°C" ? "K" : unit);
  if (!/[1-9]/.test(size)) return "±0";
  return `${d > 0 ? "+" : "−"}${size}`;
}
