import { deleteAttachment, getAttachment } from "@/db/queries/part-attachments";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { contentDisposition } from "@/server/parts/attachments";
import { currentViewer, editablePart, viewerOf, visiblePart } from "@/server/parts/api";
import { json, route } from "@/server/route";
import { deleteObject, getObjectStream } from "@/server/storage";

type Context = { params: Promise<{ id: string; attachmentId: string }> };

async function attachmentOf(partId: string, attachmentId: string) {
  const row = await getAttachment({ partId, id: attachmentId });
  if (!row) throw new ApiError("not_found:attachment", "No such attachment on this part.", "attachmentId");
  return row;
}

/** Streams the file to anyone who may see the part; the bytes never pass through memory whole. */
export const GET = route<Context>(async (_request, { params }) => {
  const { id, attachmentId } = await params;
  await visiblePart(id, await currentViewer());
  const row = await attachmentOf(id, attachmentId);
  const object = await getObjectStream({ key: row.objectKey });
  if (!object) throw new ApiError("not_found:attachment", "The attachment's file is missing from storage.", "attachmentId");
  const headers: Record<string, string> = {
    "content-type": row.contentType,
    "content-disposition": contentDisposition(row.filename, row.contentType),
    "x-content-type-options": "nosniff",
    // A stored file is data, never a page: no scripts, no forms, even if a viewer opens it inline.
    "content-security-policy": "sandbox",
    "cache-control": "private, no-store",
  };
  if (object.length !== undefined) headers["content-length"] = String(object.length);
  return new Response(object.stream, { headers });
});

export const DELETE = route<Context>(async (_request, { params }) => {
  const { id, attachmentId } = await params;
  const user = await requireUser();
  await editablePart(id, viewerOf(user));
  const row = await attachmentOf(id, attachmentId);
  await deleteAttachment({ id: row.id });
  await deleteObject({ key: row.objectKey });
  return json({ deleted: { id: row.id, filename: row.filename } });
});
