import { displayUnits, QUANTITY_INFO, type Quantity, type UnitChoice, type UnitPreferences } from "./quantities";

export interface DisplayValue {
  readonly value: number;
  readonly unit: UnitChoice;
}

export interface FormatOptions {
  /** Significant digits; 4 unless told (enough for 25.4 mm, not so many that noise shows). */
  readonly digits?: number;
  /** Force one unit (e.g. a table column that must not switch units between rows). */
  readonly unit?: UnitChoice;
}

/** Converts a stored value into one of its quantity's units (no unit library: see UnitChoice). */
export function fromStorage(stored: number, quantity: Quantity, unit: UnitChoice): number {
  // Only an absolute temperature has an offset; a difference of 10 K is 18 °F.
  const offset = quantity === "temperature" ? (unit.offset ?? 0) : 0;
  return (stored - offset) / unit.scale;
}

function choose(stored: number, quantity: Quantity, choices: readonly UnitChoice[]): DisplayValue {
  const first = choices[0] ?? QUANTITY_INFO[quantity].bare;
  let best: DisplayValue = { value: fromStorage(stored, quantity, first), unit: first };
  for (const choice of choices.slice(1)) {
    const value = fromStorage(stored, quantity, choice);
    if (Math.abs(value) >= 1) best = { value, unit: choice };
  }
  return best;
}

/** The value in the unit a person with these preferences expects to read it in. */
export function toDisplay(stored: number, quantity: Quantity, prefs: UnitPreferences, unit?: UnitChoice): DisplayValue {
  if (unit) return { value: fromStorage(stored, quantity, unit), unit };
  return choose(stored, quantity, displayUnits(quantity, prefs));
}

/** Rounds to significant digits and prints without a trailing ".000" or "-0". */
export function formatNumber(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return "—";
  const rounded = Number(value.toPrecision(digits));
  return rounded === 0 ? "0" : String(rounded);
}

/** "25.4 mm", "85 °C", "80 %", "0.9". A non-finite value prints "—", never "NaN". */
export function formatQuantity(stored: number, quantity: Quantity, prefs: UnitPreferences, options: FormatOptions = {}): string {
  if (!Number.isFinite(stored)) return "—";
  const { value, unit } = toDisplay(stored, quantity, prefs, options.unit);
  const number = formatNumber(value, options.digits ?? 4);
  if (unit.label === "") return number;
  // Degree signs sit against the number (120°); °C and everything else take a space.
  return unit.label === "°" ? `${number}°` : `${number} ${unit.label}`;
}
