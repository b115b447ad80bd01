import { createAttachment, listAttachments } from "@/db/queries/part-attachments";
import { ApiError } from "@/lib/http/api-error";
import { ATTACHMENT_TYPES, inspectAttachment, MAX_ATTACHMENT_BYTES, sanitiseFilename } from "@/lib/attachments";
import { requireUser } from "@/server/auth/session";
import { attachmentJson, readUpload, uploadLimit } from "@/server/parts/attachments";
import { currentViewer, editablePart, viewerOf, visiblePart } from "@/server/parts/api";
import { json, route } from "@/server/route";
import { newObjectKey, putObject } from "@/server/storage";

type Context = { params: Promise<{ id: string }> };

export const GET = route<Context>(async (_request, { params }) => {
  const { id } = await params;
  await visiblePart(id, await currentViewer());
  const rows = await listAttachments({ partId: id });
  return json({ attachments: rows.map(attachmentJson) });
});

/** multipart/form-data with one file in the field `file`: 10 MB at most, PDF/PNG/JPEG/WebP by its bytes. */
export const POST = route<Context>(async (request, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  await editablePart(id, viewerOf(user));
  const file = await readUpload(request, "file");
  const bytes = new Uint8Array(await file.arrayBuffer());
  if (bytes.byteLength > MAX_ATTACHMENT_BYTES) {
    throw new ApiError("payload_too_large:file", `file: ${file.name || "the file"} is over the 10 MB limit`, "file");
  }
  const inspection = await inspectAttachment(bytes);
  if (!inspection.ok) throw new ApiError("bad_request:file", `file: ${inspection.message}`, "file");
  const { type } = inspection;
  const { contentType } = ATTACHMENT_TYPES[type];
  const key = newObjectKey(id);
  await putObject({ key, body: bytes, contentType });
  const row = await createAttachment({
    partId: id,
    uploadedBy: user.id,
    objectKey: key,
    filename: sanitiseFilename(file.name, type),
    contentType,
    sizeBytes: bytes.byteLength,
  });
  return json({ attachment: attachmentJson(row) }, 201);
}, uploadLimit("file"));
