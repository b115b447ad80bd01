import type { Unit } from "mathjs";
import { dimensionsOf, math, normaliseUnitText, sameDimensions, tryUnit } from "./math";
import { PLAIN_QUANTITIES, QUANTITIES, QUANTITY_INFO, type Quantity, type UnitChoice } from "./quantities";

export type ParseResult = { ok: true; si: number } | { ok: false; message: string };

export interface ParseOptions {
  /** Unit a bare number is in; defaults to the quantity's `bare` unit (e.g. mm for length). */
  readonly bareUnit?: UnitChoice | string;
}

/**
 * The longest value we read ("0.000123 W/(m^2 K)" is 19 characters). Anything longer is
 * refused before any pattern or the unit reader sees it, so parsing time is bounded no
 * matter what a request carries.
 */
export const MAX_VALUE_CHARS = 64;

// Unambiguous: every character can be taken by one place of the pattern only, so a failing
// match is linear (no way to split a run of digits between two parts of the pattern).
export const BARE_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

// Quantities whose dimension names what a person typed, in the order we prefer when two
// share a dimension (temperature before temperature difference).
const NAMEABLE = QUANTITIES.filter((q) => !PLAIN_QUANTITIES.has(q) && q !== "temperatureDifference");
const DIMENSIONS: ReadonlyMap<Quantity, readonly number[]> = new Map(
  QUANTITIES.filter((q) => !PLAIN_QUANTITIES.has(q)).map((q) => [q, dimensionsOf(QUANTITY_INFO[q].storage)]),
);

function expected(quantity: Quantity): string {
  const info = QUANTITY_INFO[quantity];
  return `expected ${info.name} such as ${info.example}`;
}

function fail(message: string): ParseResult {
  return { ok: false, message };
}

function tooLong(quantity: Quantity): ParseResult {
  return fail(`${expected(quantity)}; got a value longer than ${MAX_VALUE_CHARS} characters`);
}

/** Only finite numbers leave this module: NaN and ±Infinity are errors, never values. */
function finite(value: number, quantity: Quantity): ParseResult {
  if (!Number.isFinite(value)) return fail(`${expected(quantity)}; got a value that is not a finite number`);
  return { ok: true, si: value === 0 ? 0 : value };
}

/** Unit conversion leaves binary noise (700 mA → 0.7000000000000001 A); 12 significant
 *  digits is far below any measurement and keeps stored values clean. */
function converted(value: number, quantity: Quantity): ParseResult {
  return finite(Number.isFinite(value) && value !== 0 ? Number(value.toPrecision(12)) : value, quantity);
}

/** Names the quantity of a unit that does not fit, e.g. "a power (W)". */
function describe(unit: Unit): string {
  const dims = unit.dimensions;
  const units = unit.formatUnits();
  const match = NAMEABLE.find((q) => sameDimensions(DIMENSIONS.get(q) ?? [], dims));
  if (match) return `${QUANTITY_INFO[match].name} (${units})`;
  if (dims.every((d) => d === 0)) return `a plain number (${units})`;
  return `"${units}"`;
}

function fromPlain(value: number, quantity: Quantity, bare: string): ParseResult {
  if (PLAIN_QUANTITIES.has(quantity)) return converted(bare === "%" ? value / 100 : value, quantity);
  return fromUnit(math.unit(value, bare), quantity);
}

function fromUnit(unit: Unit, quantity: Quantity): ParseResult {
  const info = QUANTITY_INFO[quantity];
  const dims = unit.dimensions;
  if (PLAIN_QUANTITIES.has(quantity)) {
    if (dims.every((d) => d === 0)) return finite(unit.toNumber(), quantity);
    return fail(`${expected(quantity)}; got ${describe(unit)}`);
  }
  if (!sameDimensions(DIMENSIONS.get(quantity) ?? [], dims)) {
    // "85 C" is the commonest slip: C is the coulomb, so say how to write degrees.
    const hint = quantity === "temperature" && unit.formatUnits() === "C" ? "; write °C or degC for degrees" : "";
    return fail(`${expected(quantity)}; got ${describe(unit)}${hint}`);
  }
  // A difference has no zero offset: 18 °F of difference is 10 K, not −7.8 °C. mathjs keeps
  // the scaled value without the offset in `value`, which is exactly the difference.
  if (quantity === "temperatureDifference") {
    if (unit.units.length !== 1 || unit.value === null) return fail(`${expected(quantity)}; got ${describe(unit)}`);
    return converted(unit.value, quantity);
  }
  const value = unit.toNumber(info.storage);
  if (quantity === "temperature" && value < -273.15 - 1e-9) return fail("must not be below absolute zero (−273.15 °C)");
  return converted(value, quantity);
}

/**
 * Parses what a person typed (or a number already in the storage unit) into the storage
 * unit of `quantity` (see quantities.ts). A bare number string ("20") is read in the bare
 * unit: the option, or the quantity's default (mm for a length, °C for a temperature, % for a
 * percentage, a plain fraction for a fraction). A JS number is taken as already stored.
 */
export function parseQuantity(input: string | number, quantity: Quantity, options: ParseOptions = {}): ParseResult {
  if (typeof input === "number") return finite(input, quantity);
  if (input.length > MAX_VALUE_CHARS * 4) return tooLong(quantity);
  const text = input.trim();
  if (text === "") return fail("required");
  if (text.length > MAX_VALUE_CHARS) return tooLong(quantity);
  const bareOption = options.bareUnit ?? QUANTITY_INFO[quantity].bare;
  // Bare units come from headers people type too ("[°F]"), so they get the same respelling.
  const bare = normaliseUnitText(typeof bareOption === "string" ? bareOption : bareOption.math);

  if (BARE_NUMBER.test(text)) {
    const value = Number(text);
    if (!Number.isFinite(value)) return fail(`${expected(quantity)}; got a value that is not a finite number`);
    return fromPlain(value, quantity, bare);
  }

  if (text.endsWith("%")) {
    const head = text.slice(0, -1).trimEnd();
    if (!BARE_NUMBER.test(head)) return fail(`${expected(quantity)}; got "${text}"`);
    if (!PLAIN_QUANTITIES.has(quantity)) return fail(`${expected(quantity)}; got a percentage (%)`);
    return converted(Number(head) / 100, quantity);
  }

  const parsed = tryUnit(normaliseUnitText(text));
  if (!parsed.ok) {
    const unknown = /^Unit "(.+)" not found/.exec(parsed.message);
    if (unknown && /^[+-]?[\d.]/.test(text)) return fail(`unknown unit "${unknown[1]}"; ${expected(quantity)}`);
    return fail(`${expected(quantity)}; got "${text}"`);
  }
  if (parsed.unit.value === null) return fail(`${expected(quantity)} (a number before the unit); got "${text}"`);
  return fromUnit(parsed.unit, quantity);
}

/**
 * The unit a person named in text (a CSV header's "[°F]") as a UnitChoice of `quantity`, its
 * scale and offset read by the parser itself; null when it is not a unit of that quantity.
 */
export function unitChoiceOf(text: string, quantity: Quantity): UnitChoice | null {
  if (text === "" || text === "%") {
    if (!PLAIN_QUANTITIES.has(quantity)) return null;
    return text === "%" ? { math: "%", label: "%", scale: 0.01 } : { math: "", label: "", scale: 1 };
  }
  const zero = parseQuantity(`0 ${text}`, quantity);
  const one = parseQuantity(`1 ${text}`, quantity);
  if (!zero.ok || !one.ok || one.si === zero.si) return null;
  const scale = one.si - zero.si;
  return zero.si === 0 ? { math: text, label: text, scale } : { math: text, label: text, scale, offset: zero.si };
}
