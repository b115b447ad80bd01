import type { FieldDef } from "../fields";
import type { ProtectionSpecs } from "../kind-schemas";
import type { PartNote } from "../notes";

export const PROTECTION_FIELDS = [
  { key: "overCurrentTripA", label: "Over-current trip", type: "quantity", quantity: "current", required: true, gt: 0, max: 200, help: "Discharge current at which the circuit cuts off." },
  { key: "overChargeCutoffV", label: "Over-charge cut-off", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 5, help: "Cell voltage at which charging is cut off." },
  { key: "overDischargeCutoffV", label: "Over-discharge cut-off", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 5, help: "Cell voltage at which discharge is cut off." },
] as const satisfies readonly FieldDef[];


export function protectionNotes(_specs: ProtectionSpecs): PartNote[] {
  return [];
}

export type { ProtectionSpecs };
