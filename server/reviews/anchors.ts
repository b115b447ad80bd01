import "server-only";
import { getBuild, getRevision } from "@/db/queries/builds";
import { getUserById } from "@/db/queries/users";
import { ApiError } from "@/lib/http/api-error";
import { heatPathAnchors, type HeatPathAnchors } from "@/lib/reviews/anchors";
import { solveRevision, type RevisionSolve } from "@/server/builds/solve";
import type { ReviewView } from "./load";

/**
 * The reviewed revision's evaluation as its owner sees the parts: a review lets the reviewer
 * check exactly what the maker built, private parts included (the one solver path, cached).
 * Call only after loadReview has admitted the viewer.
 */
export async function reviewedSolve({ review }: { review: ReviewView }): Promise<RevisionSolve> {
  return (await reviewedRevision({ review })).solved;
}

/** The reviewed revision's stored design and its evaluation (as reviewedSolve). */
export async function reviewedRevision({ review }: { review: ReviewView }): Promise<{ design: unknown; solved: RevisionSolve }> {
  const owner = await getUserById({ id: review.buildOwnerId });
  const viewer = owner ? { id: owner.id, role: owner.role } : null;
  const build = viewer ? await getBuild({ id: review.buildId, viewer }) : undefined;
  const revision = build ? await getRevision({ buildId: build.id, number: review.revisionNumber }) : undefined;
  if (!build || !revision) throw new ApiError("not_found:revision", `Revision ${review.revisionNumber} of this build is not there any more.`, "revision");
  return { design: revision.design, solved: await solveRevision({ build, revision }) };
}

export async function reviewAnchors({ review }: { review: ReviewView }): Promise<HeatPathAnchors> {
  return heatPathAnchors((await reviewedSolve({ review })).evaluation);
}
