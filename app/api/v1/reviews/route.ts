import { listReviewsForReviewer, listReviewsRequestedBy } from "@/db/queries/reviews";
import { requireUser } from "@/server/auth/session";
import { reviewView } from "@/server/reviews/load";
import { json, route } from "@/server/route";

/** The caller's reviews: the queue assigned to them, and the ones they asked for. */
export const GET = route(async () => {
  const user = await requireUser();
  const [assigned, requested] = await Promise.all([listReviewsForReviewer({ reviewerId: user.id }), listReviewsRequestedBy({ userId: user.id })]);
  return json({ assigned: assigned.map(reviewView), requested: requested.map(reviewView) });
});
