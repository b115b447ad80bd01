import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "../client";
import { partAttachments } from "../schema";
import { newId } from "./users";

export type AttachmentRecord = typeof partAttachments.$inferSelect;

export async function listAttachments({ partId }: { partId: string }): Promise<AttachmentRecord[]> {
  return db().select().from(partAttachments).where(eq(partAttachments.partId, partId)).orderBy(asc(partAttachments.createdAt), asc(partAttachments.id));
}

export async function getAttachment({ partId, id }: { partId: string; id: string }): Promise<AttachmentRecord | undefined> {
  const rows = await db()
    .select()
    .from(partAttachments)
    .where(and(eq(partAttachments.partId, partId), eq(partAttachments.id, id)))
    .limit(1);
  return rows[0];
}

export async function createAttachment(input: Omit<AttachmentRecord, "id" | "createdAt">): Promise<AttachmentRecord> {
  const row = { ...input, id: newId(), createdAt: new Date() };
  await db().insert(partAttachments).values(row);
  return row;
}

export async function deleteAttachment({ id }: { id: string }): Promise<void> {
  await db().delete(partAttachments).where(eq(partAttachments.id, id));
}

/** Object keys of a part's attachments, to remove the stored bytes when the part goes. */
export async function attachmentKeys({ partId }: { partId: string }): Promise<string[]> {
  const rows = await db().select({ key: partAttachments.objectKey }).from(partAttachments).where(eq(partAttachments.partId, partId));
  return rows.map((r) => r.key);
}
