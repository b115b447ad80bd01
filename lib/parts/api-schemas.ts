import { z } from "zod";
import { PART_KINDS, PROVENANCES, VISIBILITIES } from "./common";
import { KIND_DEFINITIONS } from "./registry";

/** Columns the Parts bin sorts by in SQL; `spec:<key>` sorts by a main figure of the kind. */
export const PART_SORTS = ["name", "kind", "provenance", "owner", "updated", "cost"] as const;
export type PartSort = (typeof PART_SORTS)[number] | `spec:${string}`;

export const MAX_PAGE_SIZE = 100;

const emptyToUndefined = (value: unknown) => (value === "" || value === null ? undefined : value);

/**
 * The Parts bin's query string (GET /api/v1/parts and /export): filters, search, sort and
 * page. A spec sort must name a main figure of the filtered kind, so the SQL only ever sees
 * a key from the field tables.
 */
export const partListQuerySchema = z
  .object({
    kind: z.preprocess(emptyToUndefined, z.enum(PART_KINDS, { error: `must be one of: ${PART_KINDS.join(", ")}` }).optional()),
    provenance: z.preprocess(emptyToUndefined, z.enum(PROVENANCES, { error: `must be one of: ${PROVENANCES.join(", ")}` }).optional()),
    visibility: z.preprocess(emptyToUndefined, z.enum(VISIBILITIES, { error: `must be one of: ${VISIBILITIES.join(", ")}` }).optional()),
    owner: z.preprocess(emptyToUndefined, z.enum(["mine", "everyone"], { error: "must be mine or everyone" }).default("everyone")),
    verified: z.preprocess(emptyToUndefined, z.enum(["true", "false"], { error: "must be true or false" }).optional()).transform((v) => (v === undefined ? undefined : v === "true")),
    q: z.preprocess(emptyToUndefined, z.string().trim().max(120, "must be at most 120 characters").optional()),
    sort: z.preprocess(emptyToUndefined, z.string().default("name")),
    dir: z.preprocess(emptyToUndefined, z.enum(["asc", "desc"], { error: "must be asc or desc" }).default("asc")),
    page: z.preprocess(emptyToUndefined, z.coerce.number({ error: "must be a whole number" }).int("must be a whole number").min(1, "must be at least 1").max(100_000, "must be at most 100000").default(1)),
    pageSize: z.preprocess(
      emptyToUndefined,
      z.coerce.number({ error: "must be a whole number" }).int("must be a whole number").min(1, "must be at least 1").max(MAX_PAGE_SIZE, `must be at most ${MAX_PAGE_SIZE}`).default(25),
    ),
  })
  .superRefine((query, ctx) => {
    if ((PART_SORTS as readonly string[]).includes(query.sort)) return;
    const key = query.sort.startsWith("spec:") ? query.sort.slice(5) : undefined;
    if (key === undefined) {
      ctx.addIssue({ code: "custom", path: ["sort"], message: `must be one of: ${PART_SORTS.join(", ")}, or spec:<field> with a kind` });
      return;
    }
    const figures: readonly string[] = query.kind ? KIND_DEFINITIONS[query.kind].mainFigures : [];
    if (!figures.includes(key)) {
      ctx.addIssue({
        code: "custom",
        path: ["sort"],
        message: query.kind ? `spec:${key} is not a main figure of a ${query.kind}; use one of: ${figures.join(", ")}` : "sorting by a spec field needs a kind filter",
      });
    }
  })
  .transform((query) => ({ ...query, sort: query.sort as PartSort }));

export type PartListQuery = z.output<typeof partListQuerySchema>;

/** Reads URLSearchParams into the plain object the schema expects (last value wins). */
export function searchParamsObject(params: URLSearchParams): Record<string, string> {
  return Object.fromEntries(params.entries());
}

/**
 * PATCH /api/v1/parts/[id]: the common fields are merged into the stored part; `specs` and
 * `curves`, when given, replace the stored ones whole (a heatsink switching from declared to
 * geometry must drop the declared fields). The merged part is validated by partSchema.
 */
export const partPatchSchema = z
  .object({
    kind: z.enum(PART_KINDS).optional(),
    name: z.unknown().optional(),
    provenance: z.unknown().optional(),
    provenanceNote: z.unknown().optional(),
    visibility: z.unknown().optional(),
    costEur: z.unknown().optional(),
    specs: z.unknown().optional(),
    curves: z.unknown().optional(),
  })
  .strict();
export type PartPatch = z.output<typeof partPatchSchema>;

/**
 * PATCH /api/v1/parts/[id]/verify. Marking verified records what the values were checked
 * against (a cited datasheet or measurement) and, optionally, which attachment holds it.
 */
export const verifySchema = z.discriminatedUnion(
  "verified",
  [
    z.strictObject({
      verified: z.literal(true),
      against: z
        .string({ error: "Checked against: name the datasheet (title, revision, page) or the measurement the values were checked against." })
        .trim()
        .min(10, { error: "Checked against: name the datasheet (title, revision, page) or the measurement (who measured, how, when) — at least 10 characters." })
        .max(500, { error: "Checked against: keep it under 500 characters." }),
      attachmentId: z.string().trim().min(1).max(40).optional(),
    }),
    z.strictObject({ verified: z.literal(false) }),
  ],
  { error: "Verified: must be true or false." },
);

/** POST /api/v1/parts/import: preview first, then commit the same text (all-or-nothing). */
export const partImportSchema = z.strictObject({
  kind: z.enum(PART_KINDS, { error: `must be one of: ${PART_KINDS.join(", ")}` }),
  csv: z.string({ error: "required" }).min(1, "the CSV is empty").max(900_000, "the CSV is over 900 kB; split it into several files"),
  mode: z.enum(["preview", "commit"], { error: "must be preview or commit" }).default("preview"),
});
export type PartImportRequest = z.output<typeof partImportSchema>;

/** At most this many parts in one import or one export. */
export const MAX_IMPORT_ROWS = 2000;
export const MAX_EXPORT_ROWS = 10_000;
