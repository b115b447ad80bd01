import { z } from "zod";
import { formatNumber, unitField } from "@/lib/units";
import { CURVE_KIND_INFO, type CurveKind } from "./kinds";

/** A point in storage units (see lib/units/quantities.ts): °C, A, V, fractions. */
export interface CurvePoint {
  readonly x: number;
  readonly y: number;
}

export interface Curve {
  readonly points: readonly CurvePoint[];
  /** Where the points came from (datasheet figure, bench run). */
  readonly note?: string;
}

/** Enough for a digitised datasheet figure; more only slows the form and the JSON column. */
export const MAX_CURVE_POINTS = 200;

/**
 * Schema for one curve of a kind: at least two points, strictly increasing x (the inverse of
 * a curve with repeated x is undefined for interpolation), finite y within the axis bounds.
 * Points accept numbers in storage units or strings with units, like every part field.
 */
export function curveSchema(kind: CurveKind) {
  const info = CURVE_KIND_INFO[kind];
  const point = z.object({
    x: unitField(info.x.quantity, info.x.bounds),
    y: unitField(info.y.quantity, info.y.bounds),
  });
  return z.object({
    points: z
      .array(point)
      .min(2, "a curve needs at least two points")
      .max(MAX_CURVE_POINTS, `a curve may have at most ${MAX_CURVE_POINTS} points`)
      .superRefine((points, ctx) => {
        for (let index = 1; index < points.length; index += 1) {
          const previous = points[index - 1];
          const current = points[index];
          if (previous && current && !(current.x > previous.x)) {
            ctx.addIssue({
              code: "custom",
              path: [index, "x"],
              message: `must be greater than the previous x (${formatNumber(previous.x, 6)})`,
            });
          }
        }
      }),
    note: z.string().trim().max(500).optional(),
  });
}

export type CurveInput = z.input<ReturnType<typeof curveSchema>>;

/** Schemas for the curves a part kind carries, keyed by curve kind, each optional. */
export function curvesSchema<const K extends readonly CurveKind[]>(kinds: K) {
  const shape = Object.fromEntries(kinds.map((kind) => [kind, curveSchema(kind).optional()])) as {
    [Kind in K[number]]: z.ZodOptional<ReturnType<typeof curveSchema>>;
  };
  return z.strictObject(shape);
}
