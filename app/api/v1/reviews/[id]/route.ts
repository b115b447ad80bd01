import { listComments } from "@/db/queries/reviews";
import { anchorLabel } from "@/lib/reviews/anchors";
import { requireUser } from "@/server/auth/session";
import { reviewAnchors } from "@/server/reviews/anchors";
import { loadReview } from "@/server/reviews/load";
import { json, route } from "@/server/route";

export const GET = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { review, role } = await loadReview({ id: (await params).id, viewer: user });
  const [comments, anchors] = await Promise.all([listComments({ reviewId: review.id }), reviewAnchors({ review })]);
  return json({ review, role, comments: comments.map((c) => ({ ...c, target: anchorLabel(anchors, { kind: c.anchorKind, key: c.anchorKey }) })), anchors });
});
