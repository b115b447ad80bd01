import { decideReview } from "@/db/queries/reviews";
import { ApiError } from "@/lib/http/api-error";
import { REVIEW_STATUS_LABELS, verdictSchema } from "@/lib/reviews/api-schemas";
import { requireUser } from "@/server/auth/session";
import { loadReview } from "@/server/reviews/load";
import { mailVerdict } from "@/server/reviews/mail";
import { json, readJson, route } from "@/server/route";

/** The assigned reviewer records approved / changes requested / rejected; the maker is told. */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const { review, role } = await loadReview({ id: (await params).id, viewer: user });
  if (role !== "reviewer") throw new ApiError("forbidden:review", "Only the assigned reviewer records the verdict.");
  const input = await readJson(request, verdictSchema, "verdict");
  const decided = await decideReview({
    id: review.id,
    buildId: review.buildId,
    status: input.status,
    summary: input.summary,
    notify: { userId: review.requestedBy, text: `${user.displayName}: ${REVIEW_STATUS_LABELS[input.status]} — "${review.buildTitle}" (revision ${review.revisionNumber}).` },
  });
  if (!decided) throw new ApiError("conflict:review", "This review already has its verdict.", "status");
  const mailed = await mailVerdict({ to: review.requesterEmail, reviewId: review.id, buildId: review.buildId, buildTitle: review.buildTitle, revision: review.revisionNumber, reviewerName: user.displayName, status: input.status, summary: input.summary });
  return json({ review: { id: review.id, status: input.status, summary: input.summary }, mailed });
});
