import { createReview, listReviewsForBuild } from "@/db/queries/reviews";
import { getUserByEmail } from "@/db/queries/users";
import { ApiError } from "@/lib/http/api-error";
import { requestReviewSchema } from "@/lib/reviews/api-schemas";
import { requireUser } from "@/server/auth/session";
import { loadBuild, loadRevision } from "@/server/builds/load";
import { mailReviewRequest } from "@/server/reviews/mail";
import { loadBuildReviews } from "@/server/reviews/load";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

/** Reviews of a build: all of them for its owner and admins; a reviewer sees their own. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  return json({ reviews: await loadBuildReviews({ build, viewer: user }) });
});

/** The owner asks a reviewer (by e-mail) to review a revision; the reviewer is e-mailed and notified. */
export const POST = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  if (!build.access.isOwner) throw new ApiError("forbidden:build", "Only the build's owner asks for a review of it.");
  const input = await readJson(request, requestReviewSchema, "review");
  const revision = await loadRevision({ build, number: input.revision });
  const reviewer = await getUserByEmail({ email: input.reviewerEmail });
  // The same answer for "no account" and "not a reviewer": the address book is not told.
  if (!reviewer || reviewer.role !== "reviewer") {
    throw new ApiError("bad_request:review", `${input.reviewerEmail} is not a Sinkwise reviewer: a review goes to a user with the reviewer role.`, "reviewerEmail");
  }
  if (reviewer.id === user.id) throw new ApiError("bad_request:review", "You cannot review your own build.", "reviewerEmail");
  const open = (await listReviewsForBuild({ buildId: build.id })).find((r) => r.reviewerId === reviewer.id && r.revisionNumber === revision.number && r.status === "requested");
  if (open) throw new ApiError("conflict:review", `${reviewer.displayName} already has an open review of revision ${revision.number}.`, "reviewerEmail");

  const { id } = await createReview({
    buildId: build.id,
    revisionNumber: revision.number,
    requestedBy: user.id,
    reviewerId: reviewer.id,
    message: input.message,
    notify: { text: `${user.displayName} asks for your review of "${build.title}" (revision ${revision.number}).` },
  });
  const mailed = await mailReviewRequest({ to: reviewer.email, reviewId: id, buildTitle: build.title, revision: revision.number, makerName: user.displayName, message: input.message });
  return json({ review: { id, buildId: build.id, revisionNumber: revision.number, reviewerId: reviewer.id, reviewerName: reviewer.displayName, status: "requested" }, mailed }, 201);
});
