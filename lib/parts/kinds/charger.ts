import type { FieldDef } from "../fields";
import type { ChargerSpecs } from "../kind-schemas";
import type { PartNote } from "../notes";

export const CHARGER_FIELDS = [
  { key: "topology", label: "Type", type: "choice", options: ["linear", "switching"], required: true, help: "Linear chargers dissipate (V_in − V_bat) × I; switching ones lose P × (1/η − 1)." },
  { key: "chargeCurrentA", label: "Charge current", type: "quantity", quantity: "current", required: true, gt: 0, max: 20, help: "Constant-current phase charge current (per charger)." },
  { key: "inputVoltageV", label: "Input voltage", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 60, help: "Supply voltage, e.g. 5 V from USB." },
  { key: "efficiency", label: "Efficiency", type: "quantity", quantity: "percent", required: false, gt: 0, max: 1, help: "Switching chargers only; a linear charger's loss follows from the voltages." },
  { key: "regulationTempC", label: "Die regulation temperature", type: "quantity", quantity: "temperature", required: false, min: 60, max: 200, help: "Linear chargers only: the chip temperature at which it cuts the charge current (commonly about 120 °C; from memory of typical datasheets — check yours)." },
  { key: "parallelCount", label: "Count in parallel", type: "quantity", quantity: "count", required: false, min: 1, max: 16, help: "Number of identical chargers working in parallel on the pack (1 if not given)." },
] as const satisfies readonly FieldDef[];


export function chargerNotes(specs: ChargerSpecs): PartNote[] {
  if (specs.topology === "switching" && specs.efficiency === undefined) {
    return [{ field: "efficiency", message: "a switching charger's heat depends on its efficiency; give one (an estimate is fine)" }];
  }
  return [];
}

export type { ChargerSpecs };
