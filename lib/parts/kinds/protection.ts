import { z } from "zod";
import { buildSpecsSchema, type FieldDef } from "../fields";
import type { PartNote } from "../notes";

export const PROTECTION_FIELDS = [
  { key: "overCurrentTripA", label: "Over-current trip", type: "quantity", quantity: "current", required: true, gt: 0, max: 200, help: "Discharge current at which the circuit cuts off." },
  { key: "overChargeCutoffV", label: "Over-charge cut-off", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 5, help: "Cell voltage at which charging is cut off." },
  { key: "overDischargeCutoffV", label: "Over-discharge cut-off", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 5, help: "Cell voltage at which discharge is cut off." },
] as const satisfies readonly FieldDef[];

export const protectionSpecsSchema = buildSpecsSchema(PROTECTION_FIELDS).superRefine((specs, ctx) => {
  if (!(specs.overDischargeCutoffV < specs.overChargeCutoffV)) {
    ctx.addIssue({ code: "custom", path: ["overChargeCutoffV"], message: "must be above the over-discharge cut-off" });
  }
});
export type ProtectionSpecs = z.output<typeof protectionSpecsSchema>;

export function protectionNotes(_specs: ProtectionSpecs): PartNote[] {
  return [];
}
