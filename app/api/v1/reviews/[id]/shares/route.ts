import { createReviewShare, listReviewShares } from "@/db/queries/review-shares";
import { ApiError } from "@/lib/http/api-error";
import { createReviewShareSchema } from "@/lib/reviews/api-schemas";
import { expiryFrom, shareState } from "@/lib/reviews/share-token";
import { requireUser } from "@/server/auth/session";
import { loadReview, type ReviewRole } from "@/server/reviews/load";
import { appUrl } from "@/server/reviews/mail";
import { hashShareToken, newShareToken } from "@/server/reviews/tokens";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

function mayShare(role: ReviewRole): void {
  if (role === "admin") throw new ApiError("forbidden:review", "Only the review's reviewer and the build's owner share a review.");
}

/** The review's share links (never their tokens), for its reviewer and the build's owner. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { review, role } = await loadReview({ id: (await params).id, viewer: user });
  mayShare(role);
  const now = new Date();
  return json({ shares: (await listReviewShares({ reviewId: review.id })).map((s) => ({ ...s, state: shareState(s, now) })) });
});

/** A read-only link to the reviewed revision with its verdict and comments; the token is in this answer only. */
export const POST = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const { review, role } = await loadReview({ id: (await params).id, viewer: user });
  mayShare(role);
  const input = await readJson(request, createReviewShareSchema, "share");
  const token = newShareToken();
  const share = await createReviewShare({ reviewId: review.id, tokenHash: hashShareToken(token), createdBy: user.id, expiresAt: expiryFrom(input.expiresInDays) });
  return json({ share: { ...share, state: "active", token, url: appUrl(`/share/review/${token}`) } }, 201);
});
