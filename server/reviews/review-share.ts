import "server-only";
import { getReview, listComments } from "@/db/queries/reviews";
import { findReviewShareByHash } from "@/db/queries/review-shares";
import { getUserById } from "@/db/queries/users";
import { ApiError } from "@/lib/http/api-error";
import { type UnpublishedPart, withholdUnpublished } from "@/lib/reviews/publish";
import { anchorLabel, diagramPins, heatPathAnchors } from "@/lib/reviews/anchors";
import { REVIEW_STATUS_LABELS } from "@/lib/reviews/api-schemas";
import { SHARE_TOKEN_PATTERN, shareState } from "@/lib/reviews/share-token";
import { sharedHeatPaths, sharedReviewResults, type SharedHeatPath, type SharedReviewResults } from "@/lib/reviews/shared-review";
import { loadDesignParts } from "@/server/builds/load";
import { assertLinkOpen } from "@/server/classes/withheld";
import { reviewedRevision } from "./anchors";
import { reviewView } from "./load";
import { hashShareToken } from "./tokens";

export interface SharedReview {
  review: { buildTitle: string; variantNote: string | null; revisionNumber: number; status: string; statusLabel: string; summary: string; reviewerName: string; ownerName: string; createdAt: Date; decidedAt: Date | null };
  comments: { authorName: string; target: string; body: string; createdAt: Date }[];
  results: SharedReviewResults | null;
  /** Each scenario's heat path, figures withheld where they would show an unpublished part, with the comments pinned on it. */
  heatPaths: (SharedHeatPath & { pins: Record<string, number> })[];
  expiresAt: Date | null;
}

type Slot = "emitter" | "driver" | "cell";
const partIdAt = (design: unknown, path: readonly string[]): string | null => {
  let at: unknown = design;
  for (const k of path) at = at && typeof at === "object" ? (at as Record<string, unknown>)[k] : undefined;
  return at && typeof at === "object" && typeof (at as { partId?: unknown }).partId === "string" ? (at as { partId: string }).partId : null;
};
const SLOT_PATHS: Record<Slot, readonly string[]> = { emitter: ["lightEngine", "emitter"], driver: ["driver", "part"], cell: ["pack", "cell"] };

/**
 * What a review share token opens, without sign-in: the reviewed revision's verdict, its
 * comments (targets in words, authors by display name) and a results summary without any
 * private part value, e-mail address or id. Unknown, revoked and expired tokens are refused
 * with a message saying which.
 */
export async function openReviewShare({ token }: { token: string }): Promise<SharedReview> {
  const unknown = new ApiError("not_found:share", "This review link does not exist.", "token");
  if (!SHARE_TOKEN_PATTERN.test(token)) throw unknown;
  const link = await findReviewShareByHash({ tokenHash: hashShareToken(token) });
  if (!link) throw unknown;
  const state = shareState(link);
  if (state === "revoked") throw new ApiError("not_found:share", "This review link was revoked.", "token");
  if (state === "expired") throw new ApiError("not_found:share", `This review link expired on ${link.expiresAt?.toISOString().slice(0, 10)}.`, "token");
  const row = await getReview({ id: link.reviewId });
  if (!row) throw unknown;
  const review = reviewView(row);
  // Its results and comments quote the build's numbers: closed while they are an example's questions.
  await assertLinkOpen({ buildId: review.buildId });
  const [comments, reviewed] = await Promise.all([listComments({ reviewId: review.id }), reviewedRevision({ review }).catch(() => null)]);
  const solved = reviewed?.solved ?? null;
  const anchors = solved ? heatPathAnchors(solved.evaluation) : { nodes: [], links: [], figures: [] };
  let results: SharedReviewResults | null = null;
  let heatPaths: SharedReview["heatPaths"] = [];
  let unpublished: UnpublishedPart[] = [];
  if (reviewed && solved) {
    const publicParts = await loadDesignParts({ design: reviewed.design, viewer: null });
    const isPublic = (id: string) => publicParts.get(id)?.visibility === "public";
    // A link's name may quote its part ("strap <name>: …"): an unpublished part is not named through the link.
    const owner = await getUserById({ id: review.buildOwnerId });
    const ownerParts = owner ? await loadDesignParts({ design: reviewed.design, viewer: { id: owner.id, role: owner.role } }) : new Map<string, { id: string; name: string }>();
    unpublished = [...ownerParts.values()].filter((p) => !isPublic(p.id)).map((p) => ({ id: p.id, name: p.name }));
    heatPaths = withholdUnpublished(sharedHeatPaths(solved.evaluation, reviewed.design, isPublic), unpublished).map((h) => ({ ...h, pins: diagramPins(comments, h.scenarioId) }));
    const open = new Set<Slot>((Object.keys(SLOT_PATHS) as Slot[]).filter((slot) => {
      const id = partIdAt(reviewed.design, SLOT_PATHS[slot]);
      return id !== null && isPublic(id);
    }));
    results = sharedReviewResults(solved.evaluation, open);
  }
  return {
    review: {
      buildTitle: review.buildTitle,
      variantNote: review.variantNote,
      revisionNumber: review.revisionNumber,
      status: review.status,
      statusLabel: REVIEW_STATUS_LABELS[review.status],
      summary: review.summary,
      reviewerName: review.reviewerName,
      ownerName: review.requesterName,
      createdAt: review.createdAt,
      decidedAt: review.decidedAt,
    },
    comments: comments.map((c) => ({ authorName: c.authorName, target: withholdUnpublished(anchorLabel(anchors, { kind: c.anchorKind, key: c.anchorKey }), unpublished), body: c.body, createdAt: c.createdAt })),
    results,
    heatPaths,
    expiresAt: link.expiresAt,
  };
}
