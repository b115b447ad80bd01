import "server-only";
import { and, eq, notInArray } from "drizzle-orm";
import { db } from "../client";
import { partAttachments, parts, partVerifications, users } from "../schema";

export interface PartVerification {
  byName: string;
  at: Date;
  against: string;
  attachment: { id: string; filename: string } | null;
}

export async function getPartVerification({ partId }: { partId: string }): Promise<PartVerification | null> {
  const rows = await db()
    .select({ byName: users.displayName, at: partVerifications.verifiedAt, against: partVerifications.against, attachmentId: partAttachments.id, filename: partAttachments.filename })
    .from(partVerifications)
    .innerJoin(users, eq(users.id, partVerifications.verifiedBy))
    .leftJoin(partAttachments, eq(partAttachments.id, partVerifications.attachmentId))
    .where(eq(partVerifications.partId, partId))
    .limit(1);
  const r = rows[0];
  if (!r) return null;
  return { byName: r.byName, at: r.at, against: r.against, attachment: r.attachmentId && r.filename ? { id: r.attachmentId, filename: r.filename } : null };
}

/** Records a check (replacing an earlier one) and sets the part's verified flag, in one transaction. */
export async function verifyPart({ partId, userId, against, attachmentId }: { partId: string; userId: string; against: string; attachmentId: string | null }): Promise<void> {
  const now = new Date();
  await db().transaction(async (tx) => {
    await tx
      .insert(partVerifications)
      .values({ partId, verifiedBy: userId, verifiedAt: now, against, attachmentId })
      .onDuplicateKeyUpdate({ set: { verifiedBy: userId, verifiedAt: now, against, attachmentId } });
    await tx.update(parts).set({ verified: true }).where(eq(parts.id, partId));
  });
}

/** Takes a part's verified mark away (an admin withdrew it, or its values were edited). */
export async function unverifyPart({ partId }: { partId: string }): Promise<void> {
  await db().transaction(async (tx) => {
    await tx.delete(partVerifications).where(eq(partVerifications.partId, partId));
    await tx.update(parts).set({ verified: false }).where(eq(parts.id, partId));
  });
}

/** Whether an attachment belongs to a part (a check may cite only the part's own files). */
export async function isPartAttachment({ partId, attachmentId }: { partId: string; attachmentId: string }): Promise<boolean> {
  const rows = await db().select({ id: partAttachments.id }).from(partAttachments).where(and(eq(partAttachments.id, attachmentId), eq(partAttachments.partId, partId))).limit(1);
  return rows.length === 1;
}

/**
 * Clears every verified mark that no recorded check stands behind (catalogue parts seeded as
 * "verified" before checks were recorded were invented estimates). Returns how many.
 */
export async function clearUnbackedVerifiedMarks(): Promise<number> {
  const backed = db().select({ id: partVerifications.partId }).from(partVerifications);
  const [result] = await db().update(parts).set({ verified: false }).where(and(eq(parts.verified, true), notInArray(parts.id, backed)));
  return Number((result as { affectedRows?: number }).affectedRows ?? 0);
}
