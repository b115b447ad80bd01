import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { db } from "../client";
import { reviewShareLinks } from "../schema";
import { newId } from "./users";

export interface ReviewShareRow {
  id: string;
  reviewId: string;
  createdBy: string;
  expiresAt: Date | null;
  revokedAt: Date | null;
  createdAt: Date;
}

const columns = {
  id: reviewShareLinks.id,
  reviewId: reviewShareLinks.reviewId,
  createdBy: reviewShareLinks.createdBy,
  expiresAt: reviewShareLinks.expiresAt,
  revokedAt: reviewShareLinks.revokedAt,
  createdAt: reviewShareLinks.createdAt,
};

/** Stores a review link by the SHA-256 of its token: the token itself is shown once and never kept. */
export async function createReviewShare(input: { reviewId: string; tokenHash: string; createdBy: string; expiresAt: Date | null }): Promise<ReviewShareRow> {
  const row = { id: newId(), ...input, revokedAt: null, createdAt: new Date() };
  await db().insert(reviewShareLinks).values(row);
  const { tokenHash: _hash, ...rest } = row;
  return rest;
}

export async function listReviewShares({ reviewId }: { reviewId: string }): Promise<ReviewShareRow[]> {
  return db().select(columns).from(reviewShareLinks).where(eq(reviewShareLinks.reviewId, reviewId)).orderBy(desc(reviewShareLinks.createdAt)).limit(200);
}

/** Revokes a link of this review; false when there is no such active link. */
export async function revokeReviewShare({ id, reviewId }: { id: string; reviewId: string }): Promise<boolean> {
  const [result] = await db()
    .update(reviewShareLinks)
    .set({ revokedAt: new Date() })
    .where(and(eq(reviewShareLinks.id, id), eq(reviewShareLinks.reviewId, reviewId), isNull(reviewShareLinks.revokedAt)));
  return result.affectedRows > 0;
}

export async function findReviewShareByHash({ tokenHash }: { tokenHash: string }): Promise<ReviewShareRow | undefined> {
  const rows = await db().select(columns).from(reviewShareLinks).where(eq(reviewShareLinks.tokenHash, tokenHash)).limit(1);
  return rows[0];
}
