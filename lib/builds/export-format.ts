import { z } from "zod";
import { mapPartSlots } from "./part-ids";

/**
 * The Sinkwise build file, version 1: one JSON document carrying a build's design and a
 * copy of every part it uses, so it can be imported on another account or instance.
 *
 * {
 *   "format": "sinkwise-build", "version": 1, "exportedAt": ISO-8601,
 *   "build": { "title", "summary", "revision" },
 *   "design": <build design JSON, SI units, slots as { "partId" } or { "inline" }>,
 *   "parts": [ { "id", "kind", "name", "provenance", "specs", "curves", "costEur"? } ]
 * }
 *
 * Import turns each referenced part into an inline slot (its specs typed in place), so the
 * imported build does not depend on the exporter's Parts bin.
 */
export const BUILD_FILE_FORMAT = "sinkwise-build";
export const BUILD_FILE_VERSION = 1;

const exportedPartSchema = z.object({
  id: z.string().min(1).max(100),
  kind: z.string().min(1).max(40),
  name: z.string().min(1).max(160),
  provenance: z.string().max(40).optional(),
  specs: z.record(z.string(), z.unknown()),
  curves: z.record(z.string(), z.unknown()).default({}),
  costEur: z.number().min(0).nullable().optional(),
});

export const buildFileSchema = z.object({
  format: z.literal(BUILD_FILE_FORMAT, { error: `format must be "${BUILD_FILE_FORMAT}"` }),
  version: z.literal(BUILD_FILE_VERSION, { error: `version must be ${BUILD_FILE_VERSION}; this file is from another Sinkwise version` }),
  exportedAt: z.string().optional(),
  build: z.object({
    title: z.string().trim().min(1).max(160),
    summary: z.string().max(2000).default(""),
    revision: z.number().int().positive().optional(),
  }),
  design: z.record(z.string(), z.unknown()),
  parts: z.array(exportedPartSchema).max(200).default([]),
});

export type BuildFile = z.infer<typeof buildFileSchema>;
export type ExportedPart = z.infer<typeof exportedPartSchema>;

export function makeBuildFile(input: {
  title: string;
  summary: string;
  revision: number;
  design: unknown;
  parts: readonly ExportedPart[];
  now?: Date;
}): BuildFile {
  return {
    format: BUILD_FILE_FORMAT,
    version: BUILD_FILE_VERSION,
    exportedAt: (input.now ?? new Date()).toISOString(),
    build: { title: input.title, summary: input.summary, revision: input.revision },
    design: input.design as Record<string, unknown>,
    parts: [...input.parts],
  };
}

/**
 * The design of an imported file with every `{ partId }` replaced by an inline copy of the
 * part from the file. A reference to a part the file does not carry is returned in `missing`.
 */
export function inlineFileParts(file: BuildFile): { design: unknown; missing: string[] } {
  const byId = new Map(file.parts.map((p) => [p.id, p]));
  const missing: string[] = [];
  const design = mapPartSlots(file.design, (partId) => {
    const part = byId.get(partId);
    if (!part) {
      missing.push(partId);
      return { partId };
    }
    return {
      inline: part.specs,
      name: part.name,
      ...(Object.keys(part.curves).length > 0 ? { curves: part.curves } : {}),
      ...(typeof part.costEur === "number" ? { costEur: part.costEur } : {}),
    };
  });
  return { design, missing };
}
