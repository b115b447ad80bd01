/**
 * The one place that decides how a worked-out figure is shown: its unit and its precision.
 * Every screen (Budget, report, Side by side, traces, notifications, quick check) prints
 * results through these functions, so the same kind of number reads the same everywhere.
 *
 * Rules every function keeps (property-tested):
 *   - never "NaN" or "Infinity": a missing figure is an en dash;
 *   - never "−0": a value that rounds to zero prints "0" (and a failing value shows enough
 *     digits not to round to its limit);
 *   - dimensionless numbers carry no unit (never "1");
 *   - a time is always hours and minutes ("6 h 30 min", "47 min"), seconds only below a minute;
 *   - a value that fails its limit never prints equal to it ("100.2 °C > 100 °C").
 *
 * Plain arithmetic only (no unit library): these run in the browser on every screen.
 */

export const DASH = "–";
/** The typographic minus used for negative figures. */
const MINUS = "−";

export type TemperatureUnit = "C" | "F";

export const FIGURE_KINDS = [
  "temperature",
  "temperatureDifference",
  "power",
  "thermalResistance",
  "time",
  "flux",
  "percent",
  "fraction",
  "voltage",
  "current",
  "charge",
  "energy",
  "dimensionless",
  "money",
  "length",
  "area",
  "heatTransferCoefficient",
  "conductivity",
  "resistance",
  "efficacy",
  "heatCapacity",
  "mass",
] as const;
export type FigureKind = (typeof FIGURE_KINDS)[number];

export interface FigureOptions {
  /** °C or °F for temperatures and temperature differences; °C unless told. */
  readonly temperatureUnit?: TemperatureUnit;
  /** Extra decimals beyond the kind's own precision (used to tell a value from its limit). */
  readonly extraDecimals?: number;
  /** Prefix a "+" on positive values (deltas). */
  readonly signed?: boolean;
}

/** Decimals for a value of this size: three significant figures, at most `max` decimals. */
function sigDecimals(abs: number, max: number): number {
  if (abs === 0) return 0;
  const d = 2 - Math.floor(Math.log10(abs));
  return Math.max(0, Math.min(max, d));
}

interface Rule {
  unit: (o: FigureOptions) => string;
  /** Value in the shown unit. */
  scale: (v: number, o: FigureOptions) => number;
  decimals: (abs: number) => number;
}

const fahrenheit = (o: FigureOptions) => o.temperatureUnit === "F";
const fixed = (d: number) => () => d;
const sig = (max: number) => (abs: number) => sigDecimals(abs, max);
const plain = (unit: string, decimals: (abs: number) => number): Rule => ({ unit: () => unit, scale: (v) => v, decimals });

const RULES: Record<Exclude<FigureKind, "time" | "money">, Rule> = {
  temperature: { unit: (o) => (fahrenheit(o) ? "°F" : "°C"), scale: (v, o) => (fahrenheit(o) ? v * 1.8 + 32 : v), decimals: fixed(0) },
  temperatureDifference: { unit: (o) => (fahrenheit(o) ? "°F" : "K"), scale: (v, o) => (fahrenheit(o) ? v * 1.8 : v), decimals: (a) => (a < 10 ? 1 : 0) },
  power: plain("W", sig(2)),
  thermalResistance: plain("K/W", sig(2)),
  flux: plain("lm", sig(0)),
  percent: { unit: () => "%", scale: (v) => v * 100, decimals: (a) => (a < 10 ? 1 : 0) },
  fraction: plain("", sig(3)),
  voltage: plain("V", fixed(2)),
  current: plain("A", sig(2)),
  charge: { unit: () => "mAh", scale: (v) => v / 3.6, decimals: fixed(0) },
  energy: { unit: () => "Wh", scale: (v) => v / 3600, decimals: sig(2) },
  dimensionless: plain("", sig(3)),
  length: { unit: () => "mm", scale: (v) => v * 1000, decimals: sig(2) },
  area: { unit: () => "cm²", scale: (v) => v * 1e4, decimals: sig(2) },
  heatTransferCoefficient: plain("W/(m²·K)", sig(1)),
  conductivity: plain("W/(m·K)", sig(2)),
  resistance: { unit: () => "mΩ", scale: (v) => v * 1000, decimals: sig(1) },
  efficacy: plain("lm/W", fixed(0)),
  heatCapacity: plain("J/K", sig(2)),
  mass: { unit: () => "g", scale: (v) => v * 1000, decimals: sig(1) },
};

/** Prints `v` with `decimals` decimals; a result that rounds to zero is "0", never "−0". */
export function formatDecimal(v: number, decimals: number, signed = false): string {
  if (!Number.isFinite(v)) return DASH;
  const d = Math.max(0, Math.min(20, Math.floor(decimals)));
  const text = Math.abs(v).toFixed(d);
  if (Number(text) === 0) return text;
  if (v < 0) return MINUS + text;
  return signed ? `+${text}` : text;
}

/** Very large or very small plain numbers (Rayleigh numbers, tiny conductances) in scientific form. */
function scientific(v: number): string | null {
  const a = Math.abs(v);
  if (a === 0 || (a >= 1e-3 && a < 1e6)) return null;
  const [mantissa, exponent] = v.toExponential(2).split("e");
  const m = formatDecimal(Number(mantissa), 2);
  const e = Number(exponent);
  return `${m}×10${superscript(e)}`;
}

const SUPERSCRIPTS: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };
const superscript = (n: number) => String(n).split("").map((c) => SUPERSCRIPTS[c] ?? c).join("");

/** "6 h 30 min", "47 min", "45 s": one way to show every time. */
export function formatDuration(seconds: number | null | undefined): string {
  if (seconds === null || seconds === undefined || !Number.isFinite(seconds)) return DASH;
  const s = Math.abs(seconds);
  const sign = seconds < 0 && Math.round(s) > 0 ? MINUS : "";
  if (s < 59.5) return `${sign}${Math.round(s)} s`;
  const minutes = Math.round(s / 60);
  if (minutes < 60) return `${sign}${minutes} min`;
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return m === 0 ? `${sign}${h} h` : `${sign}${h} h ${m} min`;
}

export function formatMoney(eur: number | null | undefined): string {
  if (eur === null || eur === undefined || !Number.isFinite(eur)) return DASH;
  const text = formatDecimal(Math.abs(eur), 2);
  return eur < 0 && Number(text) !== 0 ? `${MINUS}€${text}` : `€${text}`;
}

/** The number alone, in the kind's unit and precision (for table cells with the unit in the header). */
export function figureNumber(value: number | null | undefined, kind: Exclude<FigureKind, "time" | "money">, options: FigureOptions = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  const rule = RULES[kind];
  const shown = rule.scale(value, options);
  if (kind === "dimensionless" || kind === "fraction") {
    const sci = scientific(shown);
    if (sci) return sci;
  }
  return formatDecimal(shown, rule.decimals(Math.abs(shown)) + (options.extraDecimals ?? 0), options.signed);
}

/** The unit a kind of figure is shown in ("" for dimensionless numbers). */
export function figureUnit(kind: FigureKind, options: FigureOptions = {}): string {
  if (kind === "time") return "h:min";
  if (kind === "money") return "€";
  return RULES[kind].unit(options);
}

/** "87 °C", "2.35 K/W", "6 h 30 min", "0.92", "€12.50"; a missing figure is "–". */
export function formatFigure(value: number | null | undefined, kind: FigureKind, options: FigureOptions = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  if (kind === "time") return formatDuration(value);
  if (kind === "money") return formatMoney(value);
  const n = figureNumber(value, kind, options);
  const unit = RULES[kind].unit(options);
  return unit === "" ? n : `${n} ${unit}`;
}

export interface AgainstLimit {
  value: string;
  limit: string;
  /** The comparison as it reads: "≤", "≥", ">" or "<". */
  relation: string;
  fails: boolean;
}

/**
 * A figure beside its limit. A value that fails its limit is shown with as many more
 * digits as it takes to differ from the limit ("100.2 °C > 100 °C"); one that fails by less
 * than the last digit shown is rounded away from the limit, so it never reads as equal.
 */
export function formatAgainstLimit(value: number | null | undefined, limit: number | null | undefined, direction: "max" | "min", kind: Exclude<FigureKind, "time" | "money">, options: FigureOptions = {}): AgainstLimit {
  const limitText = formatFigure(limit, kind, options);
  if (value === null || value === undefined || limit === null || limit === undefined || !Number.isFinite(value) || !Number.isFinite(limit)) return { value: formatFigure(value, kind, options), limit: limitText, relation: direction === "max" ? "≤" : "≥", fails: false };
  const fails = direction === "max" ? value > limit : value < limit;
  const rule = RULES[kind];
  const unit = rule.unit(options);
  const withUnit = (n: string) => (unit === "" ? n : `${n} ${unit}`);
  const v = rule.scale(value, options);
  const l = rule.scale(limit, options);
  // Both at one precision (the finer of the two), so rounding cannot reorder them.
  const base = Math.max(rule.decimals(Math.abs(v)), rule.decimals(Math.abs(l))) + (options.extraDecimals ?? 0);
  if (!fails) return { value: withUnit(formatDecimal(v, base)), limit: withUnit(formatDecimal(l, base)), relation: direction === "max" ? "≤" : "≥", fails };
  const relation = direction === "max" ? ">" : "<";
  const beyond = (a: number, b: number) => (direction === "max" ? a > b : a < b);
  for (let extra = 0; extra <= 3; extra++) {
    const vt = formatDecimal(v, base + extra);
    const lt = formatDecimal(l, base + extra);
    if (beyond(parseShown(vt), parseShown(lt))) return { value: withUnit(vt), limit: withUnit(lt), relation, fails };
  }
  // Fails by less than the finest digit shown: one step past the limit as shown.
  const d = base + 3;
  const lt = formatDecimal(l, d);
  const step = 10 ** -d;
  return { value: withUnit(formatDecimal(parseShown(lt) + (direction === "max" ? step : -step), d)), limit: withUnit(lt), relation, fails };
}

/** Headroom to a limit: negative headroom (a failed limit) never prints as "0 K". */
export function formatHeadroom(headroomK: number | null | undefined, options: FigureOptions = {}): string {
  if (headroomK === null || headroomK === undefined || !Number.isFinite(headroomK)) return DASH;
  if (headroomK >= 0) return formatFigure(headroomK, "temperatureDifference", options);
  return formatAgainstLimit(headroomK, 0, "min", "temperatureDifference", options).value;
}

/** Reads back a number this module printed (minus sign, no unit). */
export function parseShown(text: string): number {
  return Number(text.replace(MINUS, "-").replace(/^\+/, "").split(" ")[0]);
}

/** How a trace's unit string maps to a kind of figure. Unknown units print with 3 significant figures. */
const TRACE_UNITS: Record<string, FigureKind> = {
  "°C": "temperature",
  W: "power",
  "K/W": "thermalResistance",
  s: "time",
  h: "time",
  min: "time",
  lm: "flux",
  "%": "percent",
  V: "voltage",
  A: "current",
  C: "charge",
  mAh: "charge",
  J: "energy",
  Wh: "energy",
  "1": "dimensionless",
  "": "dimensionless",
  m: "length",
  mm: "length",
  "m²": "area",
  "m^2": "area",
  "W/(m²·K)": "heatTransferCoefficient",
  "W/(m^2 K)": "heatTransferCoefficient",
  "W/m²K": "heatTransferCoefficient",
  "W/(m·K)": "conductivity",
  "W/(m K)": "conductivity",
  "W/mK": "conductivity",
  Ω: "resistance",
  ohm: "resistance",
  "lm/W": "efficacy",
  "J/K": "heatCapacity",
  kg: "mass",
  "€": "money",
  EUR: "money",
};

/** Stored value of a trace quantity in the unit its kind expects (SI, °C, fractions). */
function toStorage(value: number, unit: string): number {
  switch (unit) {
    case "h":
      return value * 3600;
    case "min":
      return value * 60;
    case "mAh":
      return value * 3.6;
    case "Wh":
      return value * 3600;
    case "mm":
      return value / 1000;
    case "%":
      return value / 100;
    default:
      return value;
  }
}

/**
 * One quantity of a trace (input, intermediate or result), e.g. "2.351 K/W", "0.92", "1 h 12 min".
 * A trace is for checking by hand, so it shows one digit more than a table does, and keeps
 * the engine's °C and K (a trace's "K" may be an absolute temperature, as in radiation).
 */
export function formatTraceValue(value: number, unit: string): string {
  if (!Number.isFinite(value)) return DASH;
  if (unit === "K") return `${formatDecimal(value, Math.abs(value) < 10 ? 2 : 1)} K`;
  const kind = TRACE_UNITS[unit];
  if (kind) return formatFigure(toStorage(value, unit), kind, { extraDecimals: kind === "time" || kind === "money" ? 0 : 1 });
  const sci = scientific(value);
  const n = sci ?? formatDecimal(value, sigDecimals(Math.abs(value), 4));
  return `${n} ${unit}`;
}

/** A figure given in a unit as the engine writes it ("h", "C", "K/W"), at the table precision of its kind. */
export function formatInUnit(value: number | null | undefined, unit: string, options: FigureOptions = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return DASH;
  const kind = unit === "K" ? "temperatureDifference" : TRACE_UNITS[unit];
  if (kind) return formatFigure(toStorage(value, unit), kind, options);
  return formatTraceValue(value, unit);
}

/** A worked-out figure with its unit (`{ value, unit }`, as the evaluation gives them). */
export const formatTraced = (figure: { value: number | null; unit: string } | null | undefined, options: FigureOptions = {}): string =>
  figure ? formatInUnit(figure.value, figure.unit, options) : DASH;
