import type { FieldDef } from "../fields";
import type { InterfaceSpecs } from "../kind-schemas";
import type { PartNote } from "../notes";

/** A paste or pad is given either as a bulk conductivity and bond line, or as a resistance per area. */
export const INTERFACE_FIELDS = [
  { key: "specifiedAs", label: "Specified as", type: "choice", options: ["bulk", "perArea"], required: true, help: "bulk: conductivity and bond-line thickness; perArea: a resistance per unit area." },
  { key: "conductivityWPerMK", label: "Thermal conductivity", type: "quantity", quantity: "conductivity", required: true, gt: 0, max: 2000, variant: "bulk", help: "Bulk conductivity of the paste, pad or adhesive." },
  { key: "bondLineM", label: "Bond-line thickness", type: "quantity", quantity: "length", required: true, gt: 0, max: 0.01, variant: "bulk", help: "Thickness of the layer as assembled (a pad's compressed thickness)." },
  { key: "resistancePerAreaKM2PerW", label: "Resistance per area", type: "quantity", quantity: "resistancePerArea", required: true, gt: 0, max: 0.1, variant: "perArea", help: "Area-specific thermal resistance, e.g. 0.5 K·cm²/W." },
] as const satisfies readonly FieldDef[];


export function interfaceNotes(specs: InterfaceSpecs): PartNote[] {
  // Pastes and pads sit between about 0.5 and 15 W/(m·K); far above that is a solder or a typo.
  if (specs.specifiedAs === "bulk" && specs.conductivityWPerMK > 50) {
    return [{ field: "conductivityWPerMK", message: "above 50 W/(m·K) is a metal, not a paste or pad; check the unit" }];
  }
  return [];
}

export type { InterfaceSpecs };
