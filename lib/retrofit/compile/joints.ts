import { interfaceLayer, type ElementResult } from "@/lib/thermal";
import type { ProblemList } from "../problems";
import type { ResolvedPart } from "../resolved";

/**
 * A dry metal-to-metal joint with air in the gaps: R″ ≈ 2.75·10⁻⁴ m²·K/W (aluminium, 10 µm
 * roughness, 10⁵ N/m²; Incropera Table 3.1b, value from memory). Used where a joint has no
 * interface material, and said so.
 */
export const DRY_JOINT_M2K_PER_W = 2.75e-4;

/** An interface part over a contact area, or a dry joint when the slot is empty (with a problem naming it). */
export function joint(part: ResolvedPart<"interface"> | undefined, areaM2: number, field: string, problems: ProblemList): ElementResult {
  if (!part) {
    problems.add(field, "no interface material: a dry joint with air in the gaps is assumed (R″ = 2.75·10⁻⁴ m²·K/W, Incropera Table 3.1b); paste or a pad usually does 5–20× better", "warning");
    const r = interfaceLayer({ areaM2, resistancePerAreaM2KPerW: DRY_JOINT_M2K_PER_W });
    r.trace.notes.push("Dry joint assumed (no interface material in the build); value from memory of Incropera Table 3.1b.");
    return r;
  }
  const s = part.specs;
  const r =
    s.specifiedAs === "bulk"
      ? interfaceLayer({ areaM2, bondLineM: s.bondLineM, conductivityWPerMK: s.conductivityWPerMK })
      : interfaceLayer({ areaM2, resistancePerAreaM2KPerW: s.resistancePerAreaKM2PerW });
  r.trace.notes.push(`Interface: ${part.name}.`);
  return r;
}
