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

/** A unit as mathjs spells it and as a person reads it; `label` must parse back. */
export interface UnitChoice {
  readonly math: string;
  readonly label: string;
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

const u = (math: string, label = math): UnitChoice => ({ math, label });
const NONE = u("", "");
const PERCENT = u("%", "%");
const DEG_C = u("degC", "°C");
const DEG_F = u("degF", "°F");
const K = u("K");
const MM = u("mm");
const IN = u("in");
const MA = u("mA");
const A = u("A");
const W = u("W");
const OHM = u("ohm", "Ω");
const MOHM = u("mohm", "mΩ");
const KOHM = u("kohm", "kΩ");

export const QUANTITY_INFO: Readonly<Record<Quantity, QuantityInfo>> = {
  length: { name: "a length", storage: "m", example: "20 mm", metric: [MM, u("m")], imperial: [IN], bare: MM },
  area: {
    name: "an area",
    storage: "m^2",
    example: "12 cm²",
    metric: [u("mm^2", "mm²"), u("cm^2", "cm²"), u("m^2", "m²")],
    imperial: [u("in^2", "in²")],
    bare: u("cm^2", "cm²"),
  },
  mass: { name: "a mass", storage: "kg", example: "45 g", metric: [u("g"), u("kg")], imperial: [u("oz"), u("lb")], bare: u("g") },
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
  voltage: { name: "a voltage", storage: "V", example: "3.7 V", metric: [u("mV"), u("V")], bare: u("V") },
  current: { name: "a current", storage: "A", example: "700 mA", metric: [MA, A], bare: A },
  power: { name: "a power", storage: "W", example: "3 W", metric: [u("mW"), W], bare: W },
  charge: { name: "a charge", storage: "C", example: "2000 mAh", metric: [u("mAh"), u("Ah")], bare: u("mAh") },
  energy: { name: "an energy", storage: "J", example: "9.6 Wh", metric: [u("mWh"), u("Wh")], bare: u("Wh") },
  temperature: { name: "a temperature", storage: "degC", example: "85 °C", metric: [DEG_C], imperial: [DEG_F], bare: DEG_C },
  temperatureDifference: {
    name: "a temperature difference",
    storage: "K",
    example: "10 K",
    metric: [K],
    imperial: [DEG_F],
    bare: K,
  },
  time: { name: "a time", storage: "s", example: "30 min", metric: [u("s"), u("min"), u("h")], bare: u("s") },
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
    metric: [u("K cm^2/W", "K·cm²/W")],
    imperial: [u("K in^2/W", "K·in²/W")],
    bare: u("K cm^2/W", "K·cm²/W"),
  },
  voltageTempCoefficient: {
    name: "a temperature coefficient of voltage",
    storage: "V/K",
    example: "-2 mV/K",
    metric: [u("mV/K")],
    bare: u("mV/K"),
  },
  luminousEfficacy: { name: "a luminous efficacy", storage: "lm/W", example: "150 lm/W", metric: [u("lm/W")], bare: u("lm/W") },
  heatCapacity: { name: "a heat capacity", storage: "J/K", example: "60 J/K", metric: [u("J/K"), u("kJ/K")], bare: u("J/K") },
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
