import "server-only";
import { getReview, listReviewsForBuild, listReviewsForReviewer, type ReviewRow } from "@/db/queries/reviews";
import type { BuildViewer } from "@/lib/builds/access";
import { ApiError } from "@/lib/http/api-error";
import type { LoadedBuild } from "@/server/builds/load";

export type ReviewRole = "reviewer" | "owner" | "admin";

/** What a review looks like in our answers: the stored row plus whether a newer revision exists. */
export type ReviewView = ReviewRow & { olderRevision: boolean };

export function reviewView(row: ReviewRow): ReviewView {
  return { ...row, olderRevision: row.revisionNumber < row.currentRevision };
}

/**
 * Reviews of a build the viewer may see (loaded with `loadBuild`): every one for its owner
 * and admins; a reviewer sees the reviews they were asked for, anyone else none.
 */
export async function loadBuildReviews({ build, viewer }: { build: LoadedBuild; viewer: NonNullable<BuildViewer> }): Promise<ReviewView[]> {
  const seeAll = build.access.isOwner || viewer.role === "admin";
  return (await listReviewsForBuild({ buildId: build.id })).filter((r) => seeAll || r.reviewerId === viewer.id).map(reviewView);
}

/**
 * The review when the viewer takes part in it (its reviewer, the build's owner) or is an
 * admin; otherwise 404, so a review's existence is not told.
 */
export async function loadReview({ id, viewer }: { id: string; viewer: NonNullable<BuildViewer> }): Promise<{ review: ReviewView; role: ReviewRole }> {
  const row = await getReview({ id });
  const role: ReviewRole | null = !row ? null : row.reviewerId === viewer.id ? "reviewer" : row.buildOwnerId === viewer.id ? "owner" : viewer.role === "admin" ? "admin" : null;
  if (!row || !role) throw new ApiError("not_found:review", "No such review, or you take no part in it.", "id");
  return { review: reviewView(row), role };
}

/**
 * The viewer's own review (as its reviewer) of each build revision, an open one before a
 * decided one; null where the viewer reviews none. Side by side lets them pin comments there.
 */
export async function reviewsAsReviewer({ viewer, revisions }: { viewer: NonNullable<BuildViewer>; revisions: readonly { buildId: string; revision: number }[] }): Promise<({ id: string; status: ReviewRow["status"] } | null)[]> {
  const mine = await listReviewsForReviewer({ reviewerId: viewer.id });
  return revisions.map((r) => {
    const hit = mine.find((x) => x.buildId === r.buildId && x.revisionNumber === r.revision);
    return hit ? { id: hit.id, status: hit.status } : null;
  });
}
