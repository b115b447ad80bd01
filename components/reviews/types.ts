import type { HeatPathAnchors } from "@/lib/reviews/anchors";

/** Shapes of the review API answers as the browser receives them (dates as ISO strings). */
export type ReviewStatus = "requested" | "approved" | "changes_requested" | "rejected";

export interface ReviewItem {
  id: string;
  buildId: string;
  buildTitle: string;
  variantNote: string | null;
  revisionNumber: number;
  currentRevision: number;
  olderRevision: boolean;
  requesterName: string;
  reviewerName: string;
  status: ReviewStatus;
  message: string;
  summary: string;
  createdAt: string;
  decidedAt: string | null;
}

export interface CommentItem {
  id: string;
  authorName: string;
  anchorKind: "node" | "link" | "figure";
  anchorKey: string;
  /** The target in words ("driver board, high mode"). */
  target: string;
  body: string;
  createdAt: string;
}

export type Anchors = HeatPathAnchors;

export interface NotificationItem {
  id: string;
  kind: "review_requested" | "verdict" | "comment" | "feedback";
  reviewId: string | null;
  buildId: string | null;
  /** Where a Classroom notification leads (a hand-in's exercise). */
  href: string | null;
  text: string;
  readAt: string | null;
  createdAt: string;
}

export interface ShareItem {
  id: string;
  /** Build links only: a review link opens the reviewed revision. */
  revisionNumber?: number;
  expiresAt: string | null;
  revokedAt: string | null;
  createdAt: string;
  state: "active" | "revoked" | "expired";
  /** Only in the answer that created the link. */
  url?: string;
}
