import "server-only";
import type { PartRecord } from "@/db/queries/parts";
import { designLabels, plainIssues, type PlainIssue } from "@/lib/messages";
import { buildDesignSchema, type BuildEvaluation } from "@/lib/retrofit";
import { loadDesignParts, type LoadedBuild } from "./load";
import { evaluateRevision } from "./solve";

export type PreviewAnswer =
  | { buildId: string; unsaved: true; valid: true; evaluation: BuildEvaluation }
  | { buildId: string; unsaved: true; valid: false; issues: PlainIssue[] };

/**
 * Evaluates a design that is not saved (the editor's draft) and writes nothing: no
 * revision, no cached result. Parts are those the build's owner may use plus those the
 * person editing may use (a member may pick their own parts before saving).
 */
export async function previewDesign({ build, design, viewer }: { build: LoadedBuild; design: unknown; viewer: { id: string; role: string } }): Promise<PreviewAnswer> {
  const parsed = buildDesignSchema.safeParse(design);
  if (!parsed.success) return { buildId: build.id, unsaved: true, valid: false, issues: plainIssues(parsed.error, designLabels) };
  const owner = await loadDesignParts({ design, viewer: { id: build.ownerId, role: "maker" } });
  const records = new Map<string, PartRecord>(owner);
  if (viewer.id !== build.ownerId) {
    for (const [id, r] of await loadDesignParts({ design, viewer })) records.set(id, r);
  }
  return { buildId: build.id, unsaved: true, valid: true, evaluation: evaluateRevision({ design, records }) };
}
