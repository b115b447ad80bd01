import "server-only";
import { type AttachmentRecord, getAttachment } from "@/db/queries/part-attachments";
import { ApiError } from "@/lib/http/api-error";
import { MAX_ATTACHMENT_BYTES } from "@/lib/attachments";
import type { PartViewer } from "@/lib/parts";
import { editablePart, visiblePart } from "./api";

/** An attachment is seen by whoever may see its part (404 alike for a hidden part and a missing file). */
export async function visibleAttachment({ partId, id, viewer }: { partId: string; id: string; viewer: PartViewer }): Promise<AttachmentRecord> {
  await visiblePart(partId, viewer);
  return attachmentOf(partId, id);
}

/** An attachment is removed by whoever may change its part. */
export async function editableAttachment({ partId, id, viewer }: { partId: string; id: string; viewer: PartViewer }): Promise<AttachmentRecord> {
  await editablePart(partId, viewer);
  return attachmentOf(partId, id);
}

async function attachmentOf(partId: string, id: string): Promise<AttachmentRecord> {
  const row = await getAttachment({ partId, id });
  if (!row) throw new ApiError("not_found:attachment", "No such attachment on this part.", "attachmentId");
  return row;
}

// Room for the multipart boundaries and headers around a file at the limit.
const FORM_OVERHEAD_BYTES = 64 * 1024;

function tooLarge(field: string): ApiError {
  return new ApiError(`payload_too_large:${field}`, `${field}: the upload is over the 10 MB limit`, field);
}

/**
 * Reads a multipart body with one file, stopping as soon as it passes the limit so an
 * oversized upload is never held in memory, and returns the file in `field`.
 */
export async function readUpload(request: Request, field: string): Promise<File> {
  const limit = MAX_ATTACHMENT_BYTES + FORM_OVERHEAD_BYTES;
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) {
    throw new ApiError(`bad_request:${field}`, `${field}: send the file as multipart/form-data in a field named "${field}"`, field);
  }
  const declared = Number(request.headers.get("content-length"));
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(field);
  const chunks: Uint8Array[] = [];
  let size = 0;
  if (request.body) {
    const reader = request.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      size += value.byteLength;
      if (size > limit) {
        await reader.cancel();
        throw tooLarge(field);
      }
      chunks.push(value);
    }
  }
  let form: FormData;
  try {
    form = await new Response(Buffer.concat(chunks), { headers: { "content-type": type } }).formData();
  } catch {
    throw new ApiError(`bad_request:${field}`, `${field}: the form data could not be read`, field);
  }
  const file = form.get(field);
  if (!(file instanceof File)) throw new ApiError(`bad_request:${field}`, `${field}: required (choose a file to upload)`, field);
  return file;
}

export function attachmentJson(row: AttachmentRecord) {
  return {
    id: row.id,
    filename: row.filename,
    contentType: row.contentType,
    sizeBytes: row.sizeBytes,
    createdAt: row.createdAt.toISOString(),
    url: `/api/v1/parts/${row.partId}/attachments/${row.id}`,
  };
}

export type AttachmentJson = ReturnType<typeof attachmentJson>;

/** PDFs and images open in the browser; the name is ASCII-only plus an RFC 6266 UTF-8 form. */
export function contentDisposition(filename: string, contentType: string): string {
  const inline = contentType === "application/pdf" || contentType.startsWith("image/");
  const ascii = filename.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  return `${inline ? "inline" : "attachment"}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(filename)}`;
}
