import type { PartInput } from "@/lib/parts";
import type { FitResult } from "./fit";
import type { SaveRunInput } from "./run-schema";

const n = (x: number, digits = 3) => x.toPrecision(digits);

/** The conditions a fit was measured at, in words (shown with the value everywhere it goes). */
export function fitConditions(run: Pick<SaveRunInput, "conditions" | "air">, fit: Pick<FitResult, "heatW" | "ambientC">): string {
  return `${n(fit.heatW)} W of heat, ${fit.ambientC.toFixed(1)} °C ambient, ${run.conditions.orientation ?? "upright"}, ${run.air} air`;
}

/**
 * The heatsink part kept from a fit: a declared sink-to-air resistance with provenance
 * `measured`, rated at the run's heat and ambient in still air, its source note giving
 * the interval, the capacity and the run it came from.
 */
export function partFromFit(input: { name: string; visibility: "private" | "shared" | "public"; runTitle: string; runDate: Date; run: SaveRunInput; fit: FitResult }): PartInput {
  const { fit, run } = input;
  const r = fit.sinkToAirKPerW;
  const c = fit.heatCapacityJPerK;
  const note =
    `Measured: fitted from the bench run “${input.runTitle}” of ${input.runDate.toISOString().slice(0, 10)} at ${fitConditions(run, fit)}. ` +
    `R = ${n(r.value)} K/W (95 % interval ${n(r.low)}–${n(r.high)} K/W); heat capacity ${n(c.value)} J/K ${c.from === "mass" ? "(from the mass)" : `(95 % interval ${n(c.low)}–${n(c.high)} J/K)`}; ` +
    `time constant ${(fit.timeConstantS / 60).toFixed(1)} min; RMS misfit ${fit.rmsK.toFixed(2)} K over ${fit.readingCount} readings.`;
  return {
    kind: "heatsink",
    name: input.name,
    provenance: "measured",
    provenanceNote: note.slice(0, 1000),
    visibility: input.visibility,
    specs: {
      rating: "declared",
      sinkToAirKPerW: r.value,
      ratedAirflow: run.air === "still" ? "natural" : "forced",
      ratedPowerW: fit.heatW,
      ratedAmbientC: fit.ambientC,
      heatCapacityJPerK: c.value,
      ...(run.conditions.material !== undefined ? { material: run.conditions.material } : {}),
      ...(run.conditions.finish !== undefined ? { finish: run.conditions.finish } : {}),
      ...(run.conditions.massKg !== undefined ? { massKg: run.conditions.massKg } : {}),
    },
  };
}
