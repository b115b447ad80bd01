import { deleteAttachment } from "@/db/queries/part-attachments";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { ATTACHMENT_CSP, contentDisposition, editableAttachment, visibleAttachment } from "@/server/parts/attachments";
import { currentViewer, viewerOf } from "@/server/parts/api";
import { json, route } from "@/server/route";
import { deleteObject, getObjectStream } from "@/server/storage";

type Context = { params: Promise<{ id: string; attachmentId: string }> };

/** Streams the file to anyone who may see the part; the bytes never pass through memory whole. */
export const GET = route<Context>(async (_request, { params }) => {
  const { id, attachmentId } = await params;
  const row = await visibleAttachment({ partId: id, id: attachmentId, viewer: await currentViewer() });
  const object = await getObjectStream({ key: row.objectKey });
  if (!object) throw new ApiError("not_found:attachment", "The attachment's file is missing from storage.", "attachmentId");
  const headers: Record<string, string> = {
    "content-type": row.contentType,
    "content-disposition": contentDisposition(row.filename, row.contentType),
    "x-content-type-options": "nosniff",
    // A stored file is data, never a page: no scripts, no forms, even if a viewer opens it inline.
    "content-security-policy": ATTACHMENT_CSP,
    "cache-control": "private, no-store",
  };
  if (object.length !== undefined) headers["content-length"] = String(object.length);
  return new Response(object.stream, { headers });
});

export const DELETE = route<Context>(async (_request, { params }) => {
  const { id, attachmentId } = await params;
  const user = await requireUser();
  const row = await editableAttachment({ partId: id, id: attachmentId, viewer: viewerOf(user) });
  await deleteAttachment({ id: row.id });
  await deleteObject({ key: row.objectKey });
  return json({ deleted: { id: row.id, filename: row.filename } });
});
