import { z } from "zod";
import { formatQuantity } from "./format";
import { parseQuantity } from "./parse";
import { METRIC_PREFERENCES, QUANTITY_INFO, type Quantity, type UnitChoice } from "./quantities";

export interface UnitFieldOptions {
  /** Inclusive bounds, in the storage unit. */
  readonly min?: number;
  readonly max?: number;
  /** Exclusive bounds, in the storage unit (a thickness must be greater than 0). */
  readonly gt?: number;
  readonly lt?: number;
  /** Defaults to true. An optional field takes "", null or a missing key as "not given". */
  readonly required?: boolean;
  /** Unit of a bare number string; defaults to the quantity's (see quantities.ts). */
  readonly bareUnit?: UnitChoice;
}

export type UnitInput = number | string;

// Bounds are printed the way the metric form shows them, so "must be at least 5 g" reads
// in the unit the person most likely typed. Zero is printed in the quantity's plain unit
// ("greater than 0 W"), not the smallest one on the ladder ("0 mW").
const show = (value: number, quantity: Quantity) => formatQuantity(value, quantity, METRIC_PREFERENCES, { digits: 6, ...(value === 0 ? { unit: QUANTITY_INFO[quantity].bare } : {}) });

/** Checks a parsed value against the field's bounds; returns the message or null. */
export function checkBounds(value: number, quantity: Quantity, options: UnitFieldOptions): string | null {
  if (quantity === "count" && !Number.isInteger(value)) return "must be a whole number";
  if (options.gt !== undefined && !(value > options.gt)) return `must be greater than ${show(options.gt, quantity)}`;
  if (options.min !== undefined && value < options.min) return `must be at least ${show(options.min, quantity)}`;
  if (options.lt !== undefined && !(value < options.lt)) return `must be less than ${show(options.lt, quantity)}`;
  if (options.max !== undefined && value > options.max) return `must be at most ${show(options.max, quantity)}`;
  return null;
}

function convert(value: UnitInput, quantity: Quantity, options: UnitFieldOptions, ctx: z.RefinementCtx): number {
  const parsed = parseQuantity(value, quantity, { bareUnit: options.bareUnit });
  if (!parsed.ok) {
    ctx.addIssue({ code: "custom", message: parsed.message });
    return 0;
  }
  const bound = checkBounds(parsed.si, quantity, options);
  if (bound) ctx.addIssue({ code: "custom", message: bound });
  return parsed.si;
}

const wrongType = (issue: { input?: unknown }) =>
  issue.input === undefined || issue.input === null ? "required" : "expected a number or a value with a unit";

/**
 * A zod field for a unit-bearing value: a number (already in the storage unit) or a string
 * with a unit ("20 mm"), transformed into the storage-unit number. The same schema serves
 * API bodies, forms and CSV cells; issues carry the field's path, so callers name the field.
 */
// Optional fields are wrapped in ZodOptional so z.object() marks their keys optional.
type OptionalUnitField = z.ZodOptional<z.ZodType<number | undefined, UnitInput | null | undefined>>;
export function unitField(quantity: Quantity, options: UnitFieldOptions & { required: false }): OptionalUnitField;
export function unitField(quantity: Quantity, options?: UnitFieldOptions & { required?: true }): z.ZodType<number, UnitInput>;
export function unitField(quantity: Quantity, options?: UnitFieldOptions): OptionalUnitField | z.ZodType<number, UnitInput>;
export function unitField(quantity: Quantity, options: UnitFieldOptions = {}): OptionalUnitField | z.ZodType<number, UnitInput> {
  if (options.required === false) {
    return z
      .union([z.number(), z.string(), z.null()], { error: wrongType })
      .optional()
      .transform((value, ctx) => {
        if (value === undefined || value === null || (typeof value === "string" && value.trim() === "")) return undefined;
        return convert(value, quantity, options, ctx);
      })
      .optional();
  }
  return z
    .union([z.number(), z.string()], { error: wrongType })
    .transform((value, ctx) => convert(value, quantity, options, ctx));
}
