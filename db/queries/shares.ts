import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { db } from "../client";
import { builds, shareLinks } from "../schema";
import { newId } from "./users";

export interface ShareLinkRow {
  id: string;
  buildId: string;
  revisionNumber: number;
  createdBy: string;
  expiresAt: Date | null;
  revokedAt: Date | null;
  createdAt: Date;
}

const columns = {
  id: shareLinks.id,
  buildId: shareLinks.buildId,
  revisionNumber: shareLinks.revisionNumber,
  createdBy: shareLinks.createdBy,
  expiresAt: shareLinks.expiresAt,
  revokedAt: shareLinks.revokedAt,
  createdAt: shareLinks.createdAt,
};

/** Stores a link by the SHA-256 of its token: the token itself is shown once and never kept. */
export async function createShareLink(input: { buildId: string; revisionNumber: number; tokenHash: string; createdBy: string; expiresAt: Date | null }): Promise<ShareLinkRow> {
  const row = { id: newId(), ...input, revokedAt: null, createdAt: new Date() };
  await db().insert(shareLinks).values(row);
  const { tokenHash: _hash, ...rest } = row;
  return rest;
}

export async function listShareLinks({ buildId }: { buildId: string }): Promise<ShareLinkRow[]> {
  return db().select(columns).from(shareLinks).where(eq(shareLinks.buildId, buildId)).orderBy(desc(shareLinks.createdAt)).limit(200);
}

/** Revokes a link of this build; false when there is no such link (or it was revoked before). */
export async function revokeShareLink({ id, buildId }: { id: string; buildId: string }): Promise<boolean> {
  const [result] = await db()
    .update(shareLinks)
    .set({ revokedAt: new Date() })
    .where(and(eq(shareLinks.id, id), eq(shareLinks.buildId, buildId), isNull(shareLinks.revokedAt)));
  return result.affectedRows > 0;
}

export async function getShareLink({ id, buildId }: { id: string; buildId: string }): Promise<ShareLinkRow | undefined> {
  const rows = await db().select(columns).from(shareLinks).where(and(eq(shareLinks.id, id), eq(shareLinks.buildId, buildId))).limit(1);
  return rows[0];
}

/** The link a token hash stands for, with the owner of its build; validity is the caller's rule. */
export async function findShareLinkByHash({ tokenHash }: { tokenHash: string }): Promise<(ShareLinkRow & { ownerId: string }) | undefined> {
  const rows = await db()
    .select({ ...columns, ownerId: builds.ownerId })
    .from(shareLinks)
    .innerJoin(builds, eq(builds.id, shareLinks.buildId))
    .where(eq(shareLinks.tokenHash, tokenHash))
    .limit(1);
  return rows[0];
}
