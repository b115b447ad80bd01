import { z } from "zod";
import { MATERIALS, type Finish } from "@/lib/thermal";
import { unitField } from "@/lib/units";

/** Most readings one run may hold; a logger file longer than this is refused with a clear message. */
export const MAX_READINGS = 99_999;

/**
 * The largest body a route taking a run's readings reads: room for MAX_READINGS readings
 * written out with units and places (about 80 bytes each), so a run one reading too long
 * is refused by count, naming the readings, rather than by size.
 */
export const READINGS_BODY_LIMIT = {
  maxBodyBytes: 8_000_000,
  tooLarge: { field: "readings", message: `The readings are over 8 MB as sent: a run takes at most ${MAX_READINGS.toLocaleString("en-GB")} readings. Keep every tenth row, or split the run.` },
} as const;

const FINISH_IDS = ["polished", "as-supplied", "oxidised", "anodised", "black-anodised", "painted"] as const satisfies readonly Finish[];
const MATERIAL_IDS = MATERIALS.map((m) => m.id) as [string, ...string[]];

export const readingSchema = z.strictObject({
  tS: unitField("time", { min: 0, max: 7 * 24 * 3600 }),
  tempC: unitField("temperature", { min: -60, max: 400 }),
});

/** The electrical input and the conditions of a warm-up: the same fields for a fit and for a saved run. */
const conditionsShape = {
  ambientC: unitField("temperature", { min: -40, max: 80 }),
  heatW: unitField("power", { gt: 0, max: 500, required: false }),
  volts: unitField("voltage", { gt: 0, max: 100, required: false }),
  amps: unitField("current", { gt: 0, max: 50, required: false }),
  heatFraction: unitField("fraction", { gt: 0, max: 1, required: false }),
  massKg: unitField("mass", { gt: 0, max: 100, required: false }),
  material: z.enum(MATERIAL_IDS, { error: "unknown material" }).optional(),
  finish: z.enum(FINISH_IDS, { error: `must be one of: ${FINISH_IDS.join(", ")}` }).optional(),
  orientation: z.enum(["upright", "lying"], { error: "must be upright or lying" }).optional(),
};

/** The heat is watts, or volts and amps (with the heat fraction, unless a part will give it). */
function heatRule(needFraction: boolean) {
  return (v: { heatW?: number; volts?: number; amps?: number; heatFraction?: number }, ctx: z.RefinementCtx) => {
    if (v.heatW !== undefined) {
      if (v.volts !== undefined || v.amps !== undefined) ctx.addIssue({ code: "custom", path: ["heatW"], message: "give the heat in watts or as volts and amps, not both" });
      return;
    }
    for (const key of needFraction ? (["volts", "amps", "heatFraction"] as const) : (["volts", "amps"] as const)) {
      if (v[key] === undefined) ctx.addIssue({ code: "custom", path: [key], message: "required when the heat is not given in watts" });
    }
  };
}

export const fitConditionsSchema = z.strictObject(conditionsShape).superRefine(heatRule(false));

/**
 * The body of POST /api/v1/bench/fit: a warm-up of a heatsink with a known heat input.
 * The heat is given as watts, or as volts × amps with the emitter's heat fraction.
 */
export const fitInputSchema = z
  .strictObject({
    ...conditionsShape,
    readings: z
      .array(readingSchema, { error: "expected a list of readings" })
      .min(1, "at least one reading is needed")
      .max(MAX_READINGS, `at most ${MAX_READINGS.toLocaleString("en-GB")} readings in one run`),
  })
  .superRefine(heatRule(true));

export type FitInput = z.output<typeof fitInputSchema>;
export type FitInputRaw = z.input<typeof fitInputSchema>;
export type FitConditions = z.output<typeof fitConditionsSchema>;
export type Reading = z.output<typeof readingSchema>;
