import type { FieldDef } from "../fields";
import type { HeatsinkSpecs } from "../kind-schemas";
import { FINISHES } from "../materials";
import type { PartNote } from "../notes";

export const HEATSINK_RATINGS = ["declared", "geometry"] as const;

/**
 * A heatsink is either rated (a sink-to-air resistance at stated conditions, as a seller
 * or datasheet gives it) or described by its geometry so the engine works the resistance
 * out (a salvaged sink of unknown rating). `rating` picks which.
 */
export const HEATSINK_FIELDS = [
  { key: "rating", label: "Described by", type: "choice", options: HEATSINK_RATINGS, required: true, help: "declared: a stated sink-to-air resistance; geometry: base and fins measured." },
  { key: "sinkToAirKPerW", label: "Sink-to-air resistance", type: "quantity", quantity: "thermalResistance", required: true, gt: 0, max: 1000, variant: "declared", help: "The stated resistance from the base to the surrounding air." },
  { key: "ratedAirflow", label: "Rated airflow", type: "choice", options: ["natural", "forced"], required: true, variant: "declared", help: "Whether the rating assumes still air or a fan; sellers often quote forced air." },
  { key: "ratedPowerW", label: "Rated at power", type: "quantity", quantity: "power", required: false, gt: 0, max: 1000, variant: "declared", help: "Heat load the rating was measured at (natural convection improves with temperature rise)." },
  { key: "ratedDeltaK", label: "Rated at temperature rise", type: "quantity", quantity: "temperatureDifference", required: false, gt: 0, max: 200, variant: "declared", help: "Sink-to-air temperature rise the rating holds at (default: rated power × resistance if the power is given, else 75 K, a common catalogue basis — from memory)." },
  { key: "ratedAmbientC", label: "Rated at ambient", type: "quantity", quantity: "temperature", required: false, min: -60, max: 100, variant: "declared", help: "Ambient temperature of the rating." },
  { key: "baseLengthM", label: "Base length", type: "quantity", quantity: "length", required: true, gt: 0, max: 1, variant: "geometry", help: "Base length, along the fins." },
  { key: "baseWidthM", label: "Base width", type: "quantity", quantity: "length", required: true, gt: 0, max: 1, variant: "geometry", help: "Base width, across the fins." },
  { key: "baseThicknessM", label: "Base thickness", type: "quantity", quantity: "length", required: true, gt: 0, max: 0.2, variant: "geometry", help: "Thickness of the base plate under the fins." },
  { key: "finCount", label: "Fin count", type: "quantity", quantity: "count", required: true, min: 0, max: 500, variant: "geometry", help: "Number of fins; 0 for a flat plate." },
  { key: "finHeightM", label: "Fin height", type: "quantity", quantity: "length", required: false, gt: 0, max: 0.5, variant: "geometry", help: "Fin height above the base." },
  { key: "finThicknessM", label: "Fin thickness", type: "quantity", quantity: "length", required: false, gt: 0, max: 0.05, variant: "geometry", help: "Fin thickness (average, for tapered fins)." },
  { key: "finSpacingM", label: "Fin spacing", type: "quantity", quantity: "length", required: false, gt: 0, max: 0.2, variant: "geometry", help: "Clear gap between neighbouring fins. Leave it empty to have it worked out from the base width, fin count and fin thickness." },
  { key: "material", label: "Material", type: "material", required: false, help: "Heatsink material from the materials list." },
  { key: "finish", label: "Finish", type: "choice", options: FINISHES, required: false, help: "Surface finish; sets the emissivity unless one is given." },
  { key: "emissivity", label: "Emissivity", type: "quantity", quantity: "fraction", required: false, min: 0, max: 1, help: "Total emissivity of the surface (0–1); overrides the finish." },
  { key: "massKg", label: "Mass", type: "quantity", quantity: "mass", required: false, gt: 0, max: 100, help: "Mass, for warm-up time." },
  { key: "heatCapacityJPerK", label: "Heat capacity", type: "quantity", quantity: "heatCapacity", required: false, gt: 0, max: 1000000, help: "Heat it takes to warm the sink by 1 K, for warm-up time; measured on the bench or known. Used instead of mass × specific heat when given." },
] as const satisfies readonly FieldDef[];

export const FIN_FIELDS = ["finHeightM", "finThicknessM"] as const;

/**
 * The clear gap between n straight fins of thickness t spread over a base of width w:
 * (w − n·t) / (n − 1); null when there are fewer than two fins or they do not fit.
 */
export function workedOutFinGap(w: number, n: number, t: number): number | null {
  if (n < 2) return null;
  const gap = (w - n * t) / (n - 1);
  return gap > 0 ? gap : null;
}


export function heatsinkNotes(specs: HeatsinkSpecs): PartNote[] {
  const notes: PartNote[] = [];
  if (specs.rating === "declared" && specs.ratedAirflow === "forced") {
    notes.push({ field: "ratedAirflow", message: "a forced-air rating says little about a sink in still air inside a lamp" });
  }
  if (specs.rating === "geometry" && specs.finCount > 0) {
    const { finThicknessM: t, finSpacingM: s } = specs;
    // A note, not an error: people sometimes measure spacing centre to centre.
    if (t !== undefined && s !== undefined && specs.finCount * t + (specs.finCount - 1) * s > specs.baseWidthM * 1.001) {
      notes.push({ field: "finCount", message: "the fins and the gaps between them add up to more than the base width" });
    }
    if (t !== undefined && s !== undefined && t > s) {
      notes.push({ field: "finThicknessM", message: "the fins are thicker than the gaps between them; check the measurements" });
    }
    // Below about 5 mm the boundary layers of neighbouring fins merge in still air, so a
    // dense fan-cooled sink passes little heat by natural convection.
    if (s !== undefined && s < 0.005) {
      notes.push({ field: "finSpacingM", message: "fins closer than about 5 mm choke in still air; this sink was probably made for a fan" });
    }
  }
  return notes;
}

export type { HeatsinkSpecs };
