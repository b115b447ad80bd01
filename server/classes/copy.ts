import "server-only";
import { createBuild, type RevisionRow } from "@/db/queries/builds";
import { collectPartIds } from "@/lib/builds/part-ids";
import { ApiError } from "@/lib/http/api-error";
import { loadDesignParts } from "@/server/builds/load";

/**
 * Copies a revision into a new private build of the user's (an example's fork, an exercise's
 * own copy). A design naming parts the user may not see cannot be copied: the copy would not
 * evaluate for them.
 */
export async function copyRevision({ revision, user, title, summary, note }: { revision: RevisionRow; user: { id: string; role: string }; title: string; summary: string; note: string }): Promise<{ id: string; revision: number }> {
  const visible = await loadDesignParts({ design: revision.design, viewer: user });
  const partIds = collectPartIds(revision.design);
  const hidden = partIds.filter((id) => !visible.has(id));
  if (hidden.length) throw new ApiError("forbidden:part", "This build uses parts that are private to their owner, so it cannot be copied. Ask your instructor to share those parts.");
  return createBuild({ ownerId: user.id, title: title.slice(0, 160), summary, visibility: "private", design: revision.design, partIds, note });
}

/** The Side by side address for two revisions. */
export function compareHref(a: { buildId: string; revision: number }, b: { buildId: string; revision: number }): string {
  return `/compare?items=${a.buildId}@${a.revision},${b.buildId}@${b.revision}`;
}
