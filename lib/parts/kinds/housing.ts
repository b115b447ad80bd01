import type { FieldDef } from "../fields";
import type { HousingSpecs } from "../kind-schemas";
import type { PartNote } from "../notes";

export const HOUSING_FIELDS = [
  { key: "material", label: "Material", type: "material", required: true, help: "Housing wall material from the materials list." },
  { key: "wallThicknessM", label: "Wall thickness", type: "quantity", quantity: "length", required: true, gt: 0, max: 0.05, help: "Typical wall thickness." },
  { key: "outerAreaM2", label: "Outer area", type: "quantity", quantity: "area", required: true, gt: 0, max: 10, help: "Outside surface exposed to air (what sheds the heat)." },
  { key: "innerAreaM2", label: "Inner area", type: "quantity", quantity: "area", required: false, gt: 0, max: 10, help: "Inside surface facing the parts." },
  { key: "emissivity", label: "Emissivity", type: "quantity", quantity: "fraction", required: false, min: 0, max: 1, help: "Emissivity of the outer surface (0–1): painted ≈ 0.9, bare polished brass ≈ 0.05." },
  { key: "secondMaterial", label: "Second material", type: "material", required: false, help: "For a housing of two materials (a metal tube with a plastic head): the other part's material." },
  { key: "secondAreaM2", label: "Second material's outer area", type: "quantity", quantity: "area", required: false, gt: 0, max: 10, help: "Outside area made of the second material; part of the outer area, so less than it." },
  { key: "secondWallThicknessM", label: "Second material's wall thickness", type: "quantity", quantity: "length", required: false, gt: 0, max: 0.05, help: "Wall thickness of the second material (default: the wall thickness)." },
  { key: "enclosure", label: "Enclosure", type: "choice", options: ["sealed", "vented"], required: true, help: "Sealed (closed against weather: heat must cross the wall) or vented." },
  { key: "massKg", label: "Mass", type: "quantity", quantity: "mass", required: false, gt: 0, max: 100, help: "Mass of the housing, for warm-up time." },
] as const satisfies readonly FieldDef[];


export function housingNotes(specs: HousingSpecs): PartNote[] {
  if (specs.emissivity === undefined) {
    return [{ field: "emissivity", message: "no emissivity: radiation is as large as convection for a painted case, so give one" }];
  }
  return [];
}

export type { HousingSpecs };
