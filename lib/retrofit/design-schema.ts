import { z } from "zod";
import { curvesSchema } from "@/lib/curves";
import { KIND_DEFINITIONS, KIND_SCHEMAS, isMaterialId, MATERIAL_IDS, type PartKind } from "@/lib/parts";
import { unitField } from "@/lib/units";
import { FIN_DIRECTIONS, type FinDirection } from "@/lib/thermal/correlations";
import { FIN_DIRECTION_CHOICES, finDirectionOf } from "./design-labels";

export { FIN_DIRECTION_CHOICES, finDirectionOf };

/**
 * What a saved build revision stores. Each part slot is either a reference to a part in
 * the Parts bin (`{ partId }`) or the part's specs typed in place (`{ inline }`, validated
 * by that kind's own schema so an inline heatsink obeys the same rules as a catalogued one).
 * Numbers accept a value with a unit ("16 mm") and are stored in SI (lib/units).
 */

function slot<const K extends PartKind>(kind: K) {
  const def = KIND_DEFINITIONS[kind];
  return z.union([
    z.strictObject({ partId: z.string().trim().min(1, "required").max(100) }),
    z.strictObject({
      inline: KIND_SCHEMAS[kind] as (typeof KIND_SCHEMAS)[K],
      name: z.string().trim().min(1).max(120).optional(),
      curves: curvesSchema(def.curveKinds as (typeof KIND_DEFINITIONS)[K]["curveKinds"]).optional(),
      costEur: z.number().min(0).max(1e6).optional(),
    }),
  ]);
}

export const SLOT_KINDS = ["emitter", "driver", "heatsink", "interface", "spreader", "housing", "cell", "charger", "protection"] as const;

const material = z
  .string()
  .trim()
  .refine(isMaterialId, { message: `unknown material; choose one of: ${MATERIAL_IDS.join(", ")}` });
const length = (max: number) => unitField("length", { gt: 0, max });
const optLength = (max: number) => unitField("length", { gt: 0, max, required: false });
const area = (max: number) => unitField("area", { gt: 0, max });
const optArea = (max: number) => unitField("area", { gt: 0, max, required: false });
const count = (min: number, max: number) => z.number().int().min(min).max(max);

/** MCPCB / star board under the emitters: the plate heat spreads through before the interface. */
export const boardSchema = z.strictObject({
  areaM2: area(0.1),
  thicknessM: length(0.01),
  material,
  /** The dielectric layer under the copper of an aluminium MCPCB (optional; none for copper-core DTP boards). */
  dielectricThicknessM: optLength(0.001),
  dielectricConductivityWPerMK: unitField("conductivity", { gt: 0, max: 50, required: false }),
});

export const reflectorSchema = z.strictObject({
  material,
  thicknessM: length(0.01),
  /** Path length from the sink to where the reflector rim meets the housing. */
  lengthM: length(0.5),
  /** Mean circumference of the reflector cone: the width the heat flows through. */
  meanCircumferenceM: length(2),
  rimContactAreaM2: area(0.1),
});

export const mountSchema = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("in-housing-air") }),
  z.strictObject({ kind: z.literal("pressed-to-wall"), interface: slot("interface").optional(), contactAreaM2: optArea(0.1) }),
  z.strictObject({ kind: z.literal("through-reflector"), reflector: reflectorSchema, interface: slot("interface").optional() }),
]);

export const lightEngineSchema = z.strictObject({
  emitter: slot("emitter").optional(),
  count: count(1, 64).default(1),
  wiring: z.enum(["series", "parallel"]).default("series"),
  /** Solder footprint of one emitter package; default 3.5 mm × 3.5 mm (see compile/light-engine.ts). */
  footprintM2: optArea(0.001),
  /** Absolute maximum current of one emitter (the part record has no field for it yet). */
  maxCurrentA: unitField("current", { gt: 0, max: 50, required: false }),
  board: boardSchema.optional(),
  /** Between the emitter board (or the emitter, without one) and the heatsink. */
  interface: slot("interface").optional(),
  heatsink: slot("heatsink").optional(),
  /**
   * How the heatsink's fins stand in use; absent: along the lamp's axis, so vertical when
   * the lamp is held upright and level when it lies (see `finDirectionOf`).
   */
  finDirection: z.enum(FIN_DIRECTIONS, { error: "choose how the fins stand: vertical, level, pointing up or hanging down" }).optional(),
  mount: mountSchema.default({ kind: "in-housing-air" }),
});

export const driverCoolingSchema = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("floating") }),
  z.strictObject({ kind: z.literal("ground-plane-to-wall"), interface: slot("interface").optional() }),
  z.strictObject({
    kind: z.literal("strapped"),
    spreader: slot("spreader"),
    adhesive: slot("interface").optional(),
    /** Length of strap bonded at each end; default 10 mm. */
    overlapM: optLength(0.2),
  }),
]);

export const driverSlotSchema = z.strictObject({
  part: slot("driver").optional(),
  cooling: driverCoolingSchema.default({ kind: "floating" }),
  /** Names of the driver's modes to evaluate; absent: every mode of the part. */
  selectedModes: z.array(z.string().trim().min(1).max(40)).max(12).optional(),
  massKg: unitField("mass", { gt: 0, max: 1, required: false }),
});

export const packSchema = z.strictObject({
  cell: slot("cell").optional(),
  series: count(1, 16).default(1),
  parallel: count(1, 32).default(1),
  protection: slot("protection").optional(),
  charger: slot("charger").optional(),
  /** Chargers working in parallel; overrides the charger part's own count. */
  chargerCount: count(1, 16).optional(),
  /** Cell size for convection from the cells; default an 18650 (18.4 mm × 65 mm). */
  cellDiameterM: optLength(0.1),
  cellLengthM: optLength(0.3),
  chargerBoardAreaM2: optArea(0.01),
});

export const CONTACT_CLASSES = ["touch-1s", "grip-10s", "hold-1min", "hold-10min", "hold-8h"] as const;
export type ContactClass = (typeof CONTACT_CLASSES)[number];

export const environmentSchema = z.strictObject({
  ambientC: unitField("temperature", { min: -40, max: 60 }).default(25),
  orientation: z.enum(["upright", "lying"]).default("upright"),
  air: z
    .discriminatedUnion("kind", [
      z.strictObject({ kind: z.literal("still") }),
      z.strictObject({ kind: z.literal("breeze"), speedMPerS: z.number().gt(0).max(30) }),
    ])
    .default({ kind: "still" }),
  /** How long a hand stays on the housing: picks the ISO 13732-1 burn threshold. */
  contact: z.enum(CONTACT_CLASSES).default("hold-1min"),
});

export const housingShapeSchema = z.strictObject({
  form: z.enum(["box", "tube"]).default("box"),
  /** Box: side height; tube: outer diameter. Default: from the outer area as a cube. */
  characteristicLengthM: optLength(2),
});

export const costsSchema = z.strictObject({
  extras: z.array(z.strictObject({ label: z.string().trim().min(1).max(80), costEur: z.number().min(0).max(1e6) })).max(50).default([]),
  comparableNewLightEur: z.number().min(0).max(1e6).optional(),
});

/**
 * Which figure of the model a measured warm-up corrects: the heatsink's declared rating, the
 * convection to and from the air inside a sealed housing, or the housing's convection to the
 * air outside. Each is a factor on the conductance of the links it names.
 */
export const CALIBRATION_PARAMETERS = ["sink-rating", "inside-air", "outside-air"] as const;
export type CalibrationParameter = (typeof CALIBRATION_PARAMETERS)[number];

/** A revision's correction from a bench run of the finished build (worked out by the calibration, not typed). */
export const calibrationSchema = z.strictObject({
  parameter: z.enum(CALIBRATION_PARAMETERS),
  /** Multiplies the conductance of the parameter's links; 1 is the model as it stands. */
  factor: z.number().min(0.05).max(20),
  /** The 95 % interval of the factor from the fit; null when the run could not bound it. */
  low: z.number().min(0).max(1000).nullable(),
  high: z.number().min(0).max(1000).nullable(),
  run: z.strictObject({ id: z.string().trim().min(1).max(40), title: z.string().max(160) }),
  readingCount: z.number().int().min(1).max(1_000_000),
  rmsBeforeK: z.number().min(0).max(1000),
  rmsAfterK: z.number().min(0).max(1000),
});
export type Calibration = z.output<typeof calibrationSchema>;

export const buildDesignSchema = z.strictObject({
  version: z.literal(1).default(1),
  housing: slot("housing").optional(),
  housingShape: housingShapeSchema.default({ form: "box" }),
  lightEngine: lightEngineSchema,
  driver: driverSlotSchema.default({ cooling: { kind: "floating" } }),
  pack: packSchema.default({ series: 1, parallel: 1 }),
  environment: environmentSchema.default({ ambientC: 25, orientation: "upright", air: { kind: "still" }, contact: "hold-1min" }),
  costs: costsSchema.default({ extras: [] }),
  calibration: calibrationSchema.optional(),
});

export type BuildDesign = z.output<typeof buildDesignSchema>;
export type BuildDesignInput = z.input<typeof buildDesignSchema>;
export type Slot<K extends PartKind> = z.output<ReturnType<typeof slot<K>>>;
export type Mount = z.output<typeof mountSchema>;
export type DriverCooling = z.output<typeof driverCoolingSchema>;
export type BoardDesign = z.output<typeof boardSchema>;
export type ReflectorDesign = z.output<typeof reflectorSchema>;
export type Environment = z.output<typeof environmentSchema>;
export type HousingShape = z.output<typeof housingShapeSchema>;
export type Costs = z.output<typeof costsSchema>;

