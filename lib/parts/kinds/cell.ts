import type { FieldDef } from "../fields";
import type { CellSpecs } from "../kind-schemas";
import type { PartNote } from "../notes";

export const CELL_CHEMISTRIES = ["li-ion", "lifepo4", "nimh"] as const;
const MILLIOHM = { math: "mohm", label: "mΩ", scale: 1e-3 } as const;

export const CELL_FIELDS = [
  { key: "chemistry", label: "Chemistry", type: "choice", options: CELL_CHEMISTRIES, required: true, help: "li-ion (3.6–3.7 V nominal), lifepo4 (3.2 V) or nimh (1.2 V)." },
  { key: "nominalVoltageV", label: "Nominal voltage", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 5, help: "Nominal (mid-discharge) voltage." },
  { key: "chargeEndVoltageV", label: "Charge-end voltage", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 5, help: "Voltage the charger holds at the end of charge (CV phase)." },
  { key: "cutoffVoltageV", label: "Cut-off voltage", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 5, help: "Lowest voltage the cell may be discharged to." },
  { key: "capacityCoulomb", label: "Capacity", type: "quantity", quantity: "charge", required: true, gt: 0, max: 1e6, help: "Rated capacity (2000 mAh = 7200 C)." },
  { key: "internalResistanceOhm", label: "Internal resistance", type: "quantity", quantity: "resistance", required: false, gt: 0, max: 10, bareUnit: MILLIOHM, help: "DC internal resistance; a bare number is in mΩ." },
  { key: "massKg", label: "Mass", type: "quantity", quantity: "mass", required: false, gt: 0, max: 10, help: "Mass of one cell." },
  { key: "chargeTempMinC", label: "Charge temperature, min", type: "quantity", quantity: "temperature", required: false, min: -40, max: 100, help: "Lowest cell temperature for charging." },
  { key: "chargeTempMaxC", label: "Charge temperature, max", type: "quantity", quantity: "temperature", required: false, min: -40, max: 100, help: "Highest cell temperature for charging." },
  { key: "dischargeTempMinC", label: "Discharge temperature, min", type: "quantity", quantity: "temperature", required: false, min: -60, max: 100, help: "Lowest cell temperature for discharge." },
  { key: "dischargeTempMaxC", label: "Discharge temperature, max", type: "quantity", quantity: "temperature", required: false, min: -60, max: 150, help: "Highest cell temperature for discharge." },
  { key: "maxChargeCurrentA", label: "Max charge current", type: "quantity", quantity: "current", required: false, gt: 0, max: 100, help: "Maximum continuous charge current." },
  { key: "maxDischargeCurrentA", label: "Max discharge current", type: "quantity", quantity: "current", required: false, gt: 0, max: 200, help: "Maximum continuous discharge current." },
] as const satisfies readonly FieldDef[];

type Window = readonly [min: "chargeTempMinC" | "dischargeTempMinC", max: "chargeTempMaxC" | "dischargeTempMaxC"];
export const WINDOWS: readonly Window[] = [
  ["chargeTempMinC", "chargeTempMaxC"],
  ["dischargeTempMinC", "dischargeTempMaxC"],
];


export function cellNotes(specs: CellSpecs): PartNote[] {
  const notes: PartNote[] = [];
  // Charging lithium cells below freezing plates metallic lithium (a fire risk later on).
  if (specs.chemistry !== "nimh" && specs.chargeTempMinC !== undefined && specs.chargeTempMinC < 0) {
    notes.push({ field: "chargeTempMinC", message: "lithium cells must not be charged below 0 °C unless the datasheet says so explicitly" });
  }
  if (specs.chemistry === "li-ion" && specs.chargeEndVoltageV > 4.35) {
    notes.push({ field: "chargeEndVoltageV", message: "above 4.35 V is beyond any common Li-ion cell; check the value" });
  }
  return notes;
}

export type { CellSpecs };
