/**
 * The physical quantities a part field can hold, each with the unit it is stored in and
 * the units it is shown in.
 *
 * Storage rule: every value is stored in the coherent SI unit of its quantity, with three
 * deliberate exceptions where the domain (and the thermal network JSON, `ambientC`) speaks
 * another unit and the stored key says so:
 *   - absolute temperatures are stored in °C (keys end in `C`, e.g. `maxTjC`);
 *   - angles are stored in degrees (keys end in `Deg`);
 *   - fractions and percentages are stored as a plain fraction 0…1 (80 % → 0.8).
 * Temperature differences are stored in K. Charge is stored in coulomb (1 mAh = 3.6 C),
 * so `capacity / current` is a time in seconds without a hidden factor.
 */

export const QUANTITIES = [
  "length",
  "area",
  "mass",
  "thermalResistance",
  "conductivity",
  "heatTransferCoefficient",
  "voltage",
  "current",
  "power",
  "charge",
  "energy",
  "temperature",
  "temperatureDifference",
  "time",
  "resistance",
  "dimensionless",
  "fraction",
  "percent",
  "count",
  "angle",
  "specificHeat",
  "density",
  "resistancePerArea",
  "voltageTempCoefficient",
  "luminousEfficacy",
  "heatCapacity",
] as const;

export type Quantity = (typeof QUANTITIES)[number];

/**
 * A unit as mathjs spells it and as a person reads it; `label` must parse back. `scale` is
 * how many of the quantity's storage unit one of this unit is (mm for a length: 0.001), so
 * showing a stored value needs no unit library in the browser; a unit test holds every
 * scale against mathjs. `offset` is the storage value at this unit's zero, used for absolute
 * temperatures only (0 °F is −17.78 °C; a difference of 1 °F is still 5/9 K).
 */
export interface UnitChoice {
  readonly math: string;
  readonly label: string;
  readonly scale: number;
  readonly offset?: number;
}

export interface QuantityInfo {
  /** "a length": used in error messages. */
  readonly name: string;
  /** mathjs unit the stored number is in; "" for plain numbers. */
  readonly storage: string;
  /** Example typed by a person, shown in "expected … such as …". */
  readonly example: string;
  /** Display units, smallest first; the formatter picks the largest that keeps |value| ≥ 1. */
  readonly metric: readonly UnitChoice[];
  /** Imperial display units; absent means "same as metric" (most thermal units have no
   *  imperial form a modder would recognise, so K/W stays K/W). */
  readonly imperial?: readonly UnitChoice[];
  /** Unit a bare number means when a field does not say otherwise. */
  readonly bare: UnitChoice;
}

const u = (math: string, label = math, scale = 1, offset?: number): UnitChoice =>
  offset === undefined ? { math, label, scale } : { math, label, scale, offset };
const NONE = u("", "");
const PERCENT = u("%", "%", 0.01);
const DEG_C = u("degC", "°C");
const DEG_F = u("degF", "°F", 5 / 9, -160 / 9);
const K = u("K");
const MM = u("mm", "mm", 1e-3);
const IN = u("in", "in", 0.0254);
const MA = u("mA", "mA", 1e-3);
const A = u("A");
const W = u("W");
const OHM = u("ohm", "Ω");
const MOHM = u("mohm", "mΩ", 1e-3);
const KOHM = u("kohm", "kΩ", 1e3);

export const QUANTITY_INFO: Readonly<Record<Quantity, QuantityInfo>> = {
  length: { name: "a length", storage: "m", example: "20 mm", metric: [MM, u("m")], imperial: [IN], bare: MM },
  area: {
    name: "an area",
    storage: "m^2",
    example: "12 cm²",
    metric: [u("mm^2", "mm²", 1e-6), u("cm^2", "cm²", 1e-4), u("m^2", "m²")],
    imperial: [u("in^2", "in²", 0.00064516)],
    bare: u("cm^2", "cm²", 1e-4),
  },
  mass: { name: "a mass", storage: "kg", example: "45 g", metric: [u("g", "g", 1e-3), u("kg")], imperial: [u("oz", "oz", 0.028349523125), u("lb", "lb", 0.45359237)], bare: u("g", "g", 1e-3) },
  thermalResistance: { name: "a thermal resistance", storage: "K/W", example: "2.5 K/W", metric: [u("K/W")], bare: u("K/W") },
  conductivity: {
    name: "a thermal conductivity",
    storage: "W/(m K)",
    example: "1.2 W/(m K)",
    metric: [u("W/(m K)", "W/(m·K)")],
    bare: u("W/(m K)", "W/(m·K)"),
  },
  heatTransferCoefficient: {
    name: "a heat transfer coefficient",
    storage: "W/(m^2 K)",
    example: "5 W/(m^2 K)",
    metric: [u("W/(m^2 K)", "W/(m²·K)")],
    bare: u("W/(m^2 K)", "W/(m²·K)"),
  },
  voltage: { name: "a voltage", storage: "V", example: "3.7 V", metric: [u("mV", "mV", 1e-3), u("V")], bare: u("V") },
  current: { name: "a current", storage: "A", example: "700 mA", metric: [MA, A], bare: A },
  power: { name: "a power", storage: "W", example: "3 W", metric: [u("mW", "mW", 1e-3), W], bare: W },
  charge: { name: "a charge", storage: "C", example: "2000 mAh", metric: [u("mAh", "mAh", 3.6), u("Ah", "Ah", 3600)], bare: u("mAh", "mAh", 3.6) },
  energy: { name: "an energy", storage: "J", example: "9.6 Wh", metric: [u("mWh", "mWh", 3.6), u("Wh", "Wh", 3600)], bare: u("Wh", "Wh", 3600) },
  temperature: { name: "a temperature", storage: "degC", example: "85 °C", metric: [DEG_C], imperial: [DEG_F], bare: DEG_C },
  temperatureDifference: {
    name: "a temperature difference",
    storage: "K",
    example: "10 K",
    metric: [K],
    imperial: [DEG_F],
    bare: K,
  },
  time: { name: "a time", storage: "s", example: "30 min", metric: [u("s"), u("min", "min", 60), u("h", "h", 3600)], bare: u("s") },
  resistance: { name: "an electrical resistance", storage: "ohm", example: "40 mΩ", metric: [MOHM, OHM, KOHM], bare: OHM },
  dimensionless: { name: "a plain number", storage: "", example: "0.9", metric: [NONE], bare: NONE },
  fraction: { name: "a fraction", storage: "", example: "0.9", metric: [NONE], bare: NONE },
  percent: { name: "a percentage", storage: "", example: "80 %", metric: [PERCENT], bare: PERCENT },
  count: { name: "a whole number", storage: "", example: "12", metric: [NONE], bare: NONE },
  angle: { name: "an angle", storage: "deg", example: "120°", metric: [u("deg", "°")], bare: u("deg", "°") },
  specificHeat: {
    name: "a specific heat",
    storage: "J/(kg K)",
    example: "900 J/(kg K)",
    metric: [u("J/(kg K)", "J/(kg·K)")],
    bare: u("J/(kg K)", "J/(kg·K)"),
  },
  density: { name: "a density", storage: "kg/m^3", example: "2700 kg/m^3", metric: [u("kg/m^3", "kg/m³")], bare: u("kg/m^3", "kg/m³") },
  resistancePerArea: {
    name: "a resistance per area",
    storage: "K m^2/W",
    example: "0.5 K cm^2/W",
    metric: [u("K cm^2/W", "K·cm²/W", 1e-4)],
    imperial: [u("K in^2/W", "K·in²/W", 0.00064516)],
    bare: u("K cm^2/W", "K·cm²/W", 1e-4),
  },
  voltageTempCoefficient: {
    name: "a temperature coefficient of voltage",
    storage: "V/K",
    example: "-2 mV/K",
    metric: [u("mV/K", "mV/K", 1e-3)],
    bare: u("mV/K", "mV/K", 1e-3),
  },
  luminousEfficacy: { name: "a luminous efficacy", storage: "lm/W", example: "150 lm/W", metric: [u("lm/W")], bare: u("lm/W") },
  heatCapacity: { name: "a heat capacity", storage: "J/K", example: "60 J/K", metric: [u("J/K"), u("kJ/K", "kJ/K", 1e3)], bare: u("J/K") },
};

/** Quantities stored as plain numbers (no mathjs unit). */
export const PLAIN_QUANTITIES: ReadonlySet<Quantity> = new Set(["dimensionless", "fraction", "percent", "count"]);

export interface UnitPreferences {
  readonly length: "metric" | "imperial";
  readonly temperature: "C" | "F";
}

export const METRIC_PREFERENCES: UnitPreferences = { length: "metric", temperature: "C" };

/** The display units for a quantity under the given preferences, smallest first. */
export function displayUnits(quantity: Quantity, prefs: UnitPreferences): readonly UnitChoice[] {
  const info = QUANTITY_INFO[quantity];
  // Temperatures follow the °C/°F preference; every other quantity follows the length system.
  const imperial =
    quantity === "temperature" || quantity === "temperatureDifference"
      ? prefs.temperature === "F"
      : prefs.length === "imperial";
  return imperial && info.imperial ? info.imperial : info.metric;
}
