import type { ResolvedBuild } from "./resolved";

export interface Caution {
  id: "li-ion-charging" | "li-ion-cells" | "parallel-cells" | "no-protection" | "hot-surface" | "eye-safety" | "mains" | "estimate";
  title: string;
  text: string;
}

/** Drive power above which an emitter is treated as high-power for eye safety (≈ 1 W of light; common practice). */
const EYE_SAFETY_DRIVE_W = 3;
/** Above extra-low voltage (50 V a.c. / 120 V d.c. in IEC 61140 terms; 50 V taken): mains or near-mains wiring. */
const MAINS_V = 50;

export interface CautionFacts {
  maxDriveW: number;
  hotSurface: boolean;
}

/** The cautions that apply to this build (PRODUCT.md lists them); each has a stable id for the screen. */
export function cautionsFor(build: ResolvedBuild, facts: CautionFacts): Caution[] {
  const out: Caution[] = [];
  const chem = build.pack.cell?.specs.chemistry;
  const lithium = chem === "li-ion" || chem === "lifepo4";
  if (lithium) {
    out.push({ id: "li-ion-cells", title: "Lithium cells", text: "Use only undamaged cells (no dents, torn wraps or swelling). Join cells by spot-welded nickel strip, not solder: soldering heats the cell. A protection circuit against over-charge, over-discharge and over-current is required." });
    if (build.pack.charger) out.push({ id: "li-ion-charging", title: "Charging lithium cells", text: "Never charge unattended or near anything that burns. Stop if a cell gets hot, smells or swells. Do not charge below 0 °C." });
    if (!build.pack.protection) out.push({ id: "no-protection", title: "No protection circuit in the build", text: "The pack has no protection board: add one (or use protected cells) before the first charge." });
  }
  if (build.pack.parallel > 1) out.push({ id: "parallel-cells", title: "Cells in parallel", text: "Bring every cell to the same voltage (within about 0.05 V) before joining them in parallel; a large difference drives a heavy current from one cell into the other." });
  if (facts.hotSurface) out.push({ id: "hot-surface", title: "Hot surface", text: "The housing gets close to or above the burn threshold for the way it is held: add a warning, a handle, or a time-limited high mode." });
  if (facts.maxDriveW >= EYE_SAFETY_DRIVE_W) out.push({ id: "eye-safety", title: "Eye safety", text: "A high-power emitter can injure eyes at close range: never look into the beam, and do not shine it at people or animals." });
  const vIn = Math.max(build.driver.part?.specs.inputVoltageMaxV ?? 0, build.pack.charger?.specs.inputVoltageV ?? 0);
  if (vIn > MAINS_V) out.push({ id: "mains", title: "Mains and high voltage", text: "Wiring above extra-low voltage follows local electrical codes and belongs to licensed practice; this tool does not assess it." });
  out.push({ id: "estimate", title: "These are estimates", text: "Every number here is a model. A thermocouple on the real build, at each mode, is the final word." });
  return out;
}
