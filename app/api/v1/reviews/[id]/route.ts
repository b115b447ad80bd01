import { listComments } from "@/db/queries/reviews";
import { requireUser } from "@/server/auth/session";
import { loadReview } from "@/server/reviews/load";
import { json, route } from "@/server/route";

export const GET = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { review, role } = await loadReview({ id: (await params).id, viewer: user });
  return json({ review, role, comments: await listComments({ reviewId: review.id }) });
});
