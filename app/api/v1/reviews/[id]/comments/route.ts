import { addComment, listComments } from "@/db/queries/reviews";
import { ApiError } from "@/lib/http/api-error";
import { anchorLabel, anchorProblem } from "@/lib/reviews/anchors";
import { commentSchema } from "@/lib/reviews/api-schemas";
import { reviewAnchors } from "@/server/reviews/anchors";
import { requireUser } from "@/server/auth/session";
import { loadReview } from "@/server/reviews/load";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { review } = await loadReview({ id: (await params).id, viewer: user });
  const [comments, anchors] = await Promise.all([listComments({ reviewId: review.id }), reviewAnchors({ review })]);
  return json({ comments: comments.map((c) => ({ ...c, target: anchorLabel(anchors, { kind: c.anchorKind, key: c.anchorKey }) })) });
});

/** The assigned reviewer or the build's owner pins a comment to a node, a link or a figure. */
export const POST = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const { review, role } = await loadReview({ id: (await params).id, viewer: user });
  if (role === "admin") throw new ApiError("forbidden:review", "Only the reviewer and the build's owner comment on a review.");
  const input = await readJson(request, commentSchema, "comment");
  const anchors = await reviewAnchors({ review });
  const problem = anchorProblem(anchors, input.anchor, review.revisionNumber);
  if (problem) throw new ApiError("bad_request:comment", problem, "anchor.key");
  const target = anchorLabel(anchors, input.anchor);
  const other = role === "reviewer" ? review.requestedBy : review.reviewerId;
  const { id } = await addComment({
    reviewId: review.id,
    buildId: review.buildId,
    authorId: user.id,
    anchor: input.anchor,
    body: input.body,
    notify: { userId: other, text: `${user.displayName} commented on the ${target} in the review of "${review.buildTitle}".` },
  });
  return json({ comment: { id, reviewId: review.id, authorId: user.id, anchorKind: input.anchor.kind, anchorKey: input.anchor.key, target, body: input.body } }, 201);
});
