import { z } from "zod";
import { buildDesignSchema } from "@/lib/retrofit";

/** The longest title a build keeps (its database column). */
export const MAX_TITLE_CHARS = 160;

const title = z.string({ error: "Give the build a title." }).trim().min(1, { error: "Give the build a title." }).max(MAX_TITLE_CHARS);
const summary = z.string().trim().max(2000, { error: "Keep the summary under 2000 characters." });
const visibility = z.enum(["private", "shared"], { error: "Visibility is private or shared." });

export const createBuildSchema = z.strictObject({
  title,
  summary: summary.default(""),
  visibility: visibility.default("private"),
  design: buildDesignSchema,
  note: z.string().trim().max(500).default("First revision"),
});

/** Title/summary/visibility change in place; a design makes a new, immutable revision. */
export const updateBuildSchema = z.strictObject({
  title: title.optional(),
  summary: summary.optional(),
  visibility: visibility.optional(),
  design: buildDesignSchema.optional(),
  note: z.string().trim().max(500).default(""),
  /** Owner only: true takes the build out of the lists (it keeps every revision), false brings it back. */
  archived: z.boolean({ error: "Archived is yes or no." }).optional(),
});

export const forkBuildSchema = z.strictObject({
  title: title.optional(),
  /** What the variant changes ("driver strapped to the case"); makes the fork a variant. */
  variantNote: z.string().trim().max(500).optional(),
  revision: z.number().int().positive().optional(),
});

export const solveBuildSchema = z.strictObject({
  revision: z.number().int().positive().optional(),
  /** "chart" (the default): warm-up curves thinned in time to what a chart draws; "full": every sample. */
  curves: z.enum(["chart", "full"], { error: "curves is chart or full." }).default("chart"),
  /**
   * "apart" (the default): each trace (the working behind a number) is a reference into the list
   * that "only" answers with; "inline": every trace in place.
   */
  traces: z.enum(["apart", "inline", "only"], { error: "traces is apart, inline or only." }).default("apart"),
});

export type CreateBuildInput = z.infer<typeof createBuildSchema>;
export type UpdateBuildInput = z.infer<typeof updateBuildSchema>;

/** The live editor's draft: any JSON; the preview validates it as a design and reports every issue. */
export const previewDesignSchema = z.strictObject({ design: z.unknown() });
