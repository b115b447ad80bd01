import type { FieldDef } from "../fields";
import type { DriverSpecs } from "../kind-schemas";
import type { PartNote } from "../notes";

export const DRIVER_TOPOLOGIES = ["linear", "buck", "boost"] as const;

export const DRIVER_FIELDS = [
  { key: "topology", label: "Topology", type: "choice", options: DRIVER_TOPOLOGIES, required: true, help: "Linear (dissipates the voltage difference), buck (steps down) or boost (steps up)." },
  { key: "inputVoltageMinV", label: "Input voltage, min", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 100, help: "Lowest input voltage the driver regulates at." },
  { key: "inputVoltageMaxV", label: "Input voltage, max", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 100, help: "Highest input voltage the driver accepts." },
  { key: "modes", label: "Modes", type: "modes", required: true, help: "Each mode: a name, the output current or power, and the efficiency at that mode." },
  { key: "maxBoardTempC", label: "Max board temperature", type: "quantity", quantity: "temperature", required: false, gt: 0, max: 200, help: "Where the driver steps down or its parts are rated to." },
  { key: "boardAreaM2", label: "Board area", type: "quantity", quantity: "area", required: false, gt: 0, max: 1, help: "Area of the driver board (one side)." },
  { key: "groundPlaneAreaM2", label: "Ground-plane area", type: "quantity", quantity: "area", required: false, min: 0, max: 1, help: "Exposed ground plane that can be pressed against metal to shed heat." },
] as const satisfies readonly FieldDef[];


export function driverNotes(specs: DriverSpecs): PartNote[] {
  const notes: PartNote[] = [];
  if (specs.topology === "linear" && specs.modes.some((mode) => mode.efficiency > 0.95)) {
    notes.push({ field: "modes", message: "a linear driver's efficiency is Vf ÷ V_in; above 95 % only with a nearly empty cell" });
  }
  return notes;
}

export type { DriverSpecs };
