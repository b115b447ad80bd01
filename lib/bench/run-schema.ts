import { z } from "zod";
import { unitField } from "@/lib/units";
import { fitConditionsSchema, MAX_READINGS } from "./schema";

/** Where a reading was taken; a sink run has only the heatsink. */
export const DEFAULT_PLACE = "heatsink";

const placeSchema = z
  .string({ error: "expected the name of a place" })
  .trim()
  .min(1, "name the place the reading was taken")
  .max(60, "at most 60 characters")
  .default(DEFAULT_PLACE);

export const runReadingSchema = z.strictObject({
  tS: unitField("time", { min: 0, max: 7 * 24 * 3600 }),
  tempC: unitField("temperature", { min: -60, max: 400 }),
  place: placeSchema,
});

const poweredSchema = z.discriminatedUnion(
  "kind",
  [
    z.strictObject({ kind: z.literal("none") }),
    z.strictObject({ kind: z.literal("part"), partId: z.string().min(1).max(40) }),
    z.strictObject({ kind: z.literal("build"), buildId: z.string().min(1).max(40), revision: z.number().int().min(1).optional(), mode: z.string().trim().max(60).optional() }),
  ],
  { error: "must say what was powered: none, a part or a build" },
);

/**
 * The body of POST /api/v1/bench/runs: what was powered, the electrical input and the
 * conditions (the same fields as a fit), and the readings at their places.
 */
export const saveRunSchema = z.strictObject({
  title: z.string({ error: "required" }).trim().min(1, "give the run a title").max(160, "at most 160 characters"),
  visibility: z.enum(["private", "shared"], { error: "must be private or shared" }).default("private"),
  powered: poweredSchema.default({ kind: "none" }),
  air: z.enum(["still", "fan"], { error: "must be still or fan" }).default("still"),
  notes: z.string().max(2000, "at most 2,000 characters").optional(),
  conditions: fitConditionsSchema,
  readings: z
    .array(runReadingSchema, { error: "expected a list of readings" })
    .min(1, "at least one reading is needed")
    .max(MAX_READINGS, `at most ${MAX_READINGS.toLocaleString("en-GB")} readings in one run`),
});

export type SaveRunInput = z.output<typeof saveRunSchema>;
export type SaveRunInputRaw = z.input<typeof saveRunSchema>;
export type RunReading = z.output<typeof runReadingSchema>;

/** The body of POST /api/v1/bench/runs/[id]/part: the name of the heatsink part kept from the fit. */
export const keepPartSchema = z.strictObject({
  name: z.string({ error: "required" }).trim().min(1, "give the part a name").max(120, "at most 120 characters"),
  visibility: z.enum(["private", "shared", "public"], { error: "must be private, shared or public" }).default("private"),
});

/** The body of POST /api/v1/bench/runs/[id]/calibration. */
export const calibrationRequestSchema = z.strictObject({
  /** false (the default): work the calibration out and show it; true: save it as a new revision of the build. */
  save: z.boolean({ error: "must be true or false" }).default(false),
});
