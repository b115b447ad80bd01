import { z } from "zod";
import { curvesSchema } from "@/lib/curves";
import { COMMON_FIELDS, type PartKind, type Provenance, type Visibility } from "./common";
import { fieldSchema } from "./fields";
import { KIND_DEFINITIONS } from "./registry";
import { KIND_SCHEMAS } from "./kind-schemas";

/** The fields every part has, as schemas (their definitions are in common.ts). */
export const commonShape = {
  name: fieldSchema(COMMON_FIELDS[0]) as z.ZodType<string, string>,
  provenance: fieldSchema(COMMON_FIELDS[1]) as z.ZodType<Provenance, string>,
  provenanceNote: fieldSchema(COMMON_FIELDS[2]).optional() as z.ZodOptional<z.ZodType<string | undefined, string | null | undefined>>,
  // Not wrapped in .optional(): the transform must run on a missing key to fill the default.
  visibility: fieldSchema(COMMON_FIELDS[3]).transform((value) => value ?? "private") as unknown as z.ZodOptional<
    z.ZodType<Visibility, string | null | undefined>
  >,
  costEur: fieldSchema(COMMON_FIELDS[4]).optional() as z.ZodOptional<z.ZodType<number | undefined, number | string | null | undefined>>,
};

/** One kind's full part schema: common fields, kind literal, specs and that kind's curves. */
function partOf<const K extends PartKind>(kind: K) {
  const def = KIND_DEFINITIONS[kind];
  return z.strictObject({
    kind: z.literal(kind),
    ...commonShape,
    specs: KIND_SCHEMAS[kind] as (typeof KIND_SCHEMAS)[K],
    // Curves are optional per kind; a missing object means "none".
    curves: curvesSchema(def.curveKinds as (typeof KIND_DEFINITIONS)[K]["curveKinds"])
      .optional()
      .transform((curves) => curves ?? {}),
  });
}

export const PART_SCHEMAS = {
  emitter: partOf("emitter"),
  driver: partOf("driver"),
  heatsink: partOf("heatsink"),
  interface: partOf("interface"),
  spreader: partOf("spreader"),
  housing: partOf("housing"),
  cell: partOf("cell"),
  charger: partOf("charger"),
  protection: partOf("protection"),
} as const;

/**
 * The body of POST /api/v1/parts and the shape a stored part round-trips through: every
 * number in its storage unit after parsing (see lib/units/quantities.ts).
 */
export const partSchema = z.discriminatedUnion(
  "kind",
  [
    PART_SCHEMAS.emitter,
    PART_SCHEMAS.driver,
    PART_SCHEMAS.heatsink,
    PART_SCHEMAS.interface,
    PART_SCHEMAS.spreader,
    PART_SCHEMAS.housing,
    PART_SCHEMAS.cell,
    PART_SCHEMAS.charger,
    PART_SCHEMAS.protection,
  ],
  { error: (issue) => (issue.code === "invalid_union" ? `must be one of: ${Object.keys(PART_SCHEMAS).join(", ")}` : undefined) },
);

export type Part = z.output<typeof partSchema>;
export type PartInput = z.input<typeof partSchema>;
export type PartOfKind<K extends PartKind> = Extract<Part, { kind: K }>;
export type SpecsOfKind<K extends PartKind> = PartOfKind<K>["specs"];
