import type { FieldDef } from "../fields";
import type { SpreaderSpecs } from "../kind-schemas";
import type { PartNote } from "../notes";

export const SPREADER_FIELDS = [
  { key: "material", label: "Material", type: "material", required: true, help: "Copper tape, aluminium plate… from the materials list." },
  { key: "thicknessM", label: "Thickness", type: "quantity", quantity: "length", required: true, gt: 0, max: 0.05, help: "Metal thickness (without the adhesive of a tape)." },
  { key: "widthM", label: "Width", type: "quantity", quantity: "length", required: true, gt: 0, max: 1, help: "Width across the heat flow." },
  { key: "lengthM", label: "Length", type: "quantity", quantity: "length", required: true, gt: 0, max: 2, help: "Length along the heat flow, between the two parts it joins." },
] as const satisfies readonly FieldDef[];


export function spreaderNotes(_specs: SpreaderSpecs): PartNote[] {
  return [];
}

export type { SpreaderSpecs };
