import { z } from "zod";
import { checkBounds, parseQuantity, type Quantity, type UnitChoice, type UnitFieldOptions } from "@/lib/units";
import { isMaterialId, MATERIAL_IDS } from "./materials";
import { modesSchema, type DriverMode, type DriverModeInput } from "./modes";

/**
 * One row of a kind's field table. Forms (label, help, unit adornment), CSV headers, table
 * columns and the zod schema are all derived from these rows, so a field is described once.
 */
interface BaseField {
  readonly key: string;
  readonly label: string;
  readonly required: boolean;
  readonly help: string;
  /** For kinds whose specs are a union (heatsink, interface): the option this field belongs to. */
  readonly variant?: string;
}

export interface QuantityField extends BaseField, Pick<UnitFieldOptions, "min" | "max" | "gt" | "lt"> {
  readonly type: "quantity";
  readonly quantity: Quantity;
  /** Unit of a bare number in forms and CSV; defaults to the quantity's (lib/units). */
  readonly bareUnit?: UnitChoice;
}
export interface ChoiceField extends BaseField {
  readonly type: "choice";
  readonly options: readonly string[];
}
export interface TextField extends BaseField {
  readonly type: "text";
  readonly maxLength: number;
}
/** A material id from the shared materials list (lib/thermal/materials). */
export interface MaterialField extends BaseField {
  readonly type: "material";
}
/** The driver's list of modes; stored as an array, written in one CSV cell. */
export interface ModesField extends BaseField {
  readonly type: "modes";
}

export type FieldDef = QuantityField | ChoiceField | TextField | MaterialField | ModesField;

type ValueOf<F> = F extends { readonly type: "quantity" }
  ? number
  : F extends { readonly type: "choice"; readonly options: readonly (infer O)[] }
    ? O
    : F extends { readonly type: "modes" }
      ? DriverMode[]
      : string;

type InputOf<F> = F extends { readonly type: "quantity" }
  ? number | string
  : F extends { readonly type: "modes" }
    ? DriverModeInput[]
    : string;

type Simplify<T> = { [K in keyof T]: T[K] } & {};

/** The stored (output) shape of a field table: required keys required, the rest optional. */
export type SpecsOf<F extends FieldDef> = Simplify<
  { [P in F as P extends { readonly required: true } ? P["key"] : never]: ValueOf<P> } & {
    [P in F as P extends { readonly required: true } ? never : P["key"]]?: ValueOf<P>;
  }
>;
/** What an API body or form may send: unit strings allowed, "" or null for "not given". */
export type SpecsInputOf<F extends FieldDef> = Simplify<
  { [P in F as P extends { readonly required: true } ? P["key"] : never]: InputOf<P> } & {
    [P in F as P extends { readonly required: true } ? never : P["key"]]?: InputOf<P> | null;
  }
>;

type FieldsOfVariant<F extends FieldDef, O> = F extends { readonly variant: infer V } ? (V extends O ? F : never) : F;
type DiscriminatorOptions<F extends FieldDef, D extends string> = Extract<F, { readonly key: D }> extends {
  readonly options: readonly (infer O)[];
}
  ? O
  : never;
export type VariantSpecsOf<F extends FieldDef, D extends string> =
  DiscriminatorOptions<F, D> extends infer O ? (O extends string ? SpecsOf<FieldsOfVariant<F, O>> & { [K in D]: O } : never) : never;
export type VariantSpecsInputOf<F extends FieldDef, D extends string> =
  DiscriminatorOptions<F, D> extends infer O ? (O extends string ? SpecsInputOf<FieldsOfVariant<F, O>> & { [K in D]: O } : never) : never;

const isEmpty = (value: unknown) => value === undefined || value === null || (typeof value === "string" && value.trim() === "");

const wrongType = (expected: string) => (issue: { input?: unknown }) =>
  issue.input === undefined || issue.input === null ? "required" : `expected ${expected}`;

/** Runs `convert` on a present value; handles "required" and "not given" the same way for every field type. */
function field<T>(def: FieldDef, accepts: z.ZodType, convert: (value: never, ctx: z.RefinementCtx) => T) {
  return z
    .union([accepts, z.null()], { error: wrongType(def.type === "quantity" ? "a number or a value with a unit" : "text") })
    .optional()
    .transform((value, ctx): T | undefined => {
      if (isEmpty(value)) {
        if (def.required) ctx.addIssue({ code: "custom", message: "required" });
        return undefined;
      }
      return convert(value as never, ctx);
    });
}

function issue(ctx: z.RefinementCtx, message: string): undefined {
  ctx.addIssue({ code: "custom", message });
  return undefined;
}

/** The zod schema of one field. */
export function fieldSchema(def: FieldDef): z.ZodType {
  switch (def.type) {
    case "quantity":
      return field(def, z.union([z.number(), z.string()]), (value: number | string, ctx) => {
        const parsed = parseQuantity(value, def.quantity, { bareUnit: def.bareUnit });
        if (!parsed.ok) return issue(ctx, parsed.message);
        const bound = checkBounds(parsed.si, def.quantity, def);
        return bound ? issue(ctx, bound) : parsed.si;
      });
    case "choice":
      return field(def, z.string(), (value: string, ctx) => {
        const choice = value.trim();
        return def.options.includes(choice) ? choice : issue(ctx, `must be one of: ${def.options.join(", ")}`);
      });
    case "text":
      return field(def, z.string(), (value: string, ctx) => {
        const text = value.trim();
        return text.length <= def.maxLength ? text : issue(ctx, `must be at most ${def.maxLength} characters`);
      });
    case "material":
      return field(def, z.string(), (value: string, ctx) => {
        const id = value.trim();
        return isMaterialId(id) ? id : issue(ctx, `unknown material "${id}"; choose one of: ${MATERIAL_IDS.join(", ")}`);
      });
    case "modes":
      return def.required ? modesSchema : modesSchema.optional();
  }
}

function objectOf(fields: readonly FieldDef[]) {
  return z.strictObject(Object.fromEntries(fields.map((def) => [def.key, fieldSchema(def)])));
}

/** A kind's specs schema from its field table (one strict object). */
export function buildSpecsSchema<const F extends readonly FieldDef[]>(fields: F) {
  return objectOf(fields) as unknown as z.ZodType<SpecsOf<F[number]>, SpecsInputOf<F[number]>>;
}

/**
 * For kinds that are "either this or that" (a heatsink is rated or measured out; an
 * interface is a bulk material or a per-area resistance): one strict object per option of
 * the discriminator field, joined as a discriminated union.
 */
export function buildVariantSpecsSchema<const F extends readonly FieldDef[], const D extends string>(fields: F, discriminator: D) {
  const disc = fields.find((def) => def.key === discriminator);
  if (!disc || disc.type !== "choice") throw new Error(`buildVariantSpecsSchema: ${discriminator} is not a choice field`);
  const options = disc.options.map((option) =>
    objectOf(fields.filter((def) => def.key !== discriminator && (def.variant === undefined || def.variant === option))).extend({
      [discriminator]: z.literal(option),
    }),
  );
  const [first, ...rest] = options;
  if (!first) throw new Error(`buildVariantSpecsSchema: ${discriminator} has no options`);
  const union = z.discriminatedUnion(discriminator, [first, ...rest], {
    error: (iss) =>
      iss.code === "invalid_union" || iss.input === undefined ? `must be one of: ${disc.options.join(", ")}` : undefined,
  });
  return union as unknown as z.ZodType<VariantSpecsOf<F[number], D>, VariantSpecsInputOf<F[number], D>>;
}
