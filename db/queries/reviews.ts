import "server-only";
import { aliasedTable, and, asc, desc, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { builds, notifications, reviewComments, reviews, users, type ANCHOR_KINDS, type NOTIFICATION_KINDS, type REVIEW_STATUSES } from "../schema";
import { newId } from "./users";

export type ReviewStatus = (typeof REVIEW_STATUSES)[number];
export type Verdict = Exclude<ReviewStatus, "requested">;
export type AnchorKind = (typeof ANCHOR_KINDS)[number];
type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

/** A notification to write in the same transaction as the change it tells about. */
export type Notify = { userId: string; kind: NotificationKind; text: string };

export interface ReviewRow {
  id: string;
  buildId: string;
  buildTitle: string;
  buildOwnerId: string;
  variantNote: string | null;
  currentRevision: number;
  revisionNumber: number;
  requestedBy: string;
  requesterName: string;
  requesterEmail: string;
  reviewerId: string;
  reviewerName: string;
  reviewerEmail: string;
  status: ReviewStatus;
  message: string;
  summary: string;
  createdAt: Date;
  decidedAt: Date | null;
}

export interface CommentRow {
  id: string;
  reviewId: string;
  authorId: string;
  authorName: string;
  anchorKind: AnchorKind;
  anchorKey: string;
  body: string;
  createdAt: Date;
}

const requester = aliasedTable(users, "requester");
const reviewer = aliasedTable(users, "reviewer");

const reviewColumns = {
  id: reviews.id,
  buildId: reviews.buildId,
  buildTitle: builds.title,
  buildOwnerId: builds.ownerId,
  variantNote: builds.variantNote,
  currentRevision: builds.currentRevision,
  revisionNumber: reviews.revisionNumber,
  requestedBy: reviews.requestedBy,
  requesterName: requester.displayName,
  requesterEmail: requester.email,
  reviewerId: reviews.reviewerId,
  reviewerName: reviewer.displayName,
  reviewerEmail: reviewer.email,
  status: reviews.status,
  message: reviews.message,
  summary: reviews.summary,
  createdAt: reviews.createdAt,
  decidedAt: reviews.decidedAt,
};

function selectReviews() {
  return db()
    .select(reviewColumns)
    .from(reviews)
    .innerJoin(builds, eq(builds.id, reviews.buildId))
    .innerJoin(requester, eq(requester.id, reviews.requestedBy))
    .innerJoin(reviewer, eq(reviewer.id, reviews.reviewerId));
}

/** Creates a review request and the reviewer's notification, in one transaction. */
export async function createReview(input: {
  buildId: string;
  revisionNumber: number;
  requestedBy: string;
  reviewerId: string;
  message: string;
  notify: Omit<Notify, "userId" | "kind">;
}): Promise<{ id: string }> {
  const id = newId();
  const now = new Date();
  await db().transaction(async (tx) => {
    await tx.insert(reviews).values({
      id,
      buildId: input.buildId,
      revisionNumber: input.revisionNumber,
      requestedBy: input.requestedBy,
      reviewerId: input.reviewerId,
      status: "requested",
      message: input.message,
      createdAt: now,
    });
    await tx.insert(notifications).values({ id: newId(), userId: input.reviewerId, kind: "review_requested", reviewId: id, buildId: input.buildId, text: input.notify.text, createdAt: now });
  });
  return { id };
}

export async function getReview({ id }: { id: string }): Promise<ReviewRow | undefined> {
  const rows = await selectReviews().where(eq(reviews.id, id)).limit(1);
  return rows[0];
}

/** The reviewer's queue: open requests first (oldest first), then decided ones (newest first). */
export async function listReviewsForReviewer({ reviewerId }: { reviewerId: string }): Promise<ReviewRow[]> {
  return selectReviews()
    .where(eq(reviews.reviewerId, reviewerId))
    .orderBy(sql`case when ${reviews.status} = 'requested' then 0 else 1 end`, sql`case when ${reviews.status} = 'requested' then ${reviews.createdAt} end`, desc(reviews.decidedAt))
    .limit(500);
}

export async function listReviewsRequestedBy({ userId }: { userId: string }): Promise<ReviewRow[]> {
  return selectReviews().where(eq(reviews.requestedBy, userId)).orderBy(desc(reviews.createdAt)).limit(500);
}

export async function listReviewsForBuild({ buildId }: { buildId: string }): Promise<ReviewRow[]> {
  return selectReviews().where(eq(reviews.buildId, buildId)).orderBy(desc(reviews.createdAt)).limit(200);
}

export async function listComments({ reviewId }: { reviewId: string }): Promise<CommentRow[]> {
  return db()
    .select({
      id: reviewComments.id,
      reviewId: reviewComments.reviewId,
      authorId: reviewComments.authorId,
      authorName: users.displayName,
      anchorKind: reviewComments.anchorKind,
      anchorKey: reviewComments.anchorKey,
      body: reviewComments.body,
      createdAt: reviewComments.createdAt,
    })
    .from(reviewComments)
    .innerJoin(users, eq(users.id, reviewComments.authorId))
    .where(eq(reviewComments.reviewId, reviewId))
    .orderBy(asc(reviewComments.createdAt), asc(reviewComments.id))
    .limit(1000);
}

/** Adds a pinned comment and notifies the other party, in one transaction. */
export async function addComment(input: {
  reviewId: string;
  buildId: string;
  authorId: string;
  anchor: { kind: AnchorKind; key: string };
  body: string;
  notify: Omit<Notify, "kind">;
}): Promise<{ id: string }> {
  const id = newId();
  const now = new Date();
  await db().transaction(async (tx) => {
    await tx.insert(reviewComments).values({ id, reviewId: input.reviewId, authorId: input.authorId, anchorKind: input.anchor.kind, anchorKey: input.anchor.key, body: input.body, createdAt: now });
    await tx.insert(notifications).values({ id: newId(), userId: input.notify.userId, kind: "comment", reviewId: input.reviewId, buildId: input.buildId, text: input.notify.text, createdAt: now });
  });
  return { id };
}

/**
 * Records the verdict of an open review and notifies the maker. False when the review had
 * already been decided (the row is locked, so two verdicts cannot both land).
 */
export async function decideReview(input: { id: string; buildId: string; status: Verdict; summary: string; notify: Omit<Notify, "kind"> }): Promise<boolean> {
  return db().transaction(async (tx) => {
    const rows = await tx.select({ status: reviews.status }).from(reviews).where(eq(reviews.id, input.id)).for("update");
    if (rows[0]?.status !== "requested") return false;
    const now = new Date();
    await tx.update(reviews).set({ status: input.status, summary: input.summary, decidedAt: now }).where(and(eq(reviews.id, input.id), eq(reviews.status, "requested")));
    await tx.insert(notifications).values({ id: newId(), userId: input.notify.userId, kind: "verdict", reviewId: input.id, buildId: input.buildId, text: input.notify.text, createdAt: now });
    return true;
  });
}
