import type { FieldDef } from "../fields";
import type { EmitterSpecs } from "../kind-schemas";
import type { PartNote } from "../notes";

export const EMITTER_FIELDS = [
  { key: "rthJspKPerW", label: "Rth junction–solder point", type: "quantity", quantity: "thermalResistance", required: true, gt: 0, max: 1000, help: "Thermal resistance from the junction to the solder point, from the datasheet (electrical or real, say which in the note)." },
  { key: "maxTjC", label: "Max junction temperature", type: "quantity", quantity: "temperature", required: true, gt: 0, max: 250, help: "The absolute maximum junction temperature." },
  { key: "vfV", label: "Forward voltage", type: "quantity", quantity: "voltage", required: true, gt: 0, max: 100, help: "Forward voltage at the reference current and 25 °C junction unless the note says otherwise." },
  { key: "vfRefCurrentA", label: "Reference current", type: "quantity", quantity: "current", required: true, gt: 0, max: 50, help: "The current the forward voltage (and efficacy) is stated at." },
  { key: "vfTempCoeffVPerK", label: "Vf temperature coefficient", type: "quantity", quantity: "voltageTempCoefficient", required: false, min: -0.1, max: 0.1, help: "How Vf changes as the junction warms; about −2 mV/K for a white LED." },
  { key: "efficacyLmPerW", label: "Reference luminous efficacy", type: "quantity", quantity: "luminousEfficacy", required: false, gt: 0, max: 400, help: "Lumens per electrical watt at the reference current and temperature." },
  { key: "heatFraction", label: "Heat fraction", type: "quantity", quantity: "fraction", required: false, gt: 0, max: 1, help: "Share of electrical power that becomes heat; 0.6–0.8 for white phosphor LEDs." },
  { key: "beamAngleDeg", label: "Beam angle", type: "quantity", quantity: "angle", required: false, gt: 0, max: 360, help: "Full viewing angle at half intensity." },
  { key: "boardLengthM", label: "Board length", type: "quantity", quantity: "length", required: false, gt: 0, max: 1, help: "Board (MCPCB) size; for a round star board give the diameter as length and width." },
  { key: "boardWidthM", label: "Board width", type: "quantity", quantity: "length", required: false, gt: 0, max: 1, help: "Board width; equal to the length for a round or square board." },
] as const satisfies readonly FieldDef[];


export function emitterNotes(specs: EmitterSpecs): PartNote[] {
  const notes: PartNote[] = [];
  // The trade figure is 60–80 % for white phosphor LEDs; far outside it usually means the
  // optical share was typed instead of the heat share.
  if (specs.heatFraction !== undefined && (specs.heatFraction < 0.5 || specs.heatFraction > 0.9)) {
    notes.push({ field: "heatFraction", message: "white LEDs turn 60–80 % of their power into heat; check this is the heat share, not the light share" });
  }
  if (specs.vfTempCoeffVPerK !== undefined && specs.vfTempCoeffVPerK > 0) {
    notes.push({ field: "vfTempCoeffVPerK", message: "Vf normally falls as the junction warms (a negative coefficient)" });
  }
  return notes;
}

export type { EmitterSpecs };
