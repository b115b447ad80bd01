import { revokeReviewShare } from "@/db/queries/review-shares";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { loadReview } from "@/server/reviews/load";
import { json, route } from "@/server/route";

/** Revokes a review link (its reviewer or the build's owner): the next request with its token is refused. */
export const DELETE = route<{ params: Promise<{ id: string; shareId: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const p = await params;
  const { review, role } = await loadReview({ id: p.id, viewer: user });
  if (role === "admin") throw new ApiError("forbidden:review", "Only the review's reviewer and the build's owner manage its links.");
  const revoked = await revokeReviewShare({ id: p.shareId, reviewId: review.id });
  if (!revoked) throw new ApiError("not_found:share", "No such active link on this review.", "shareId");
  return json({ ok: true });
});
