import "server-only";
import { type AttachmentRecord, getAttachment } from "@/db/queries/part-attachments";
import { ApiError } from "@/lib/http/api-error";
import { MAX_ATTACHMENT_BYTES } from "@/lib/attachments";
import { readBody, type RouteOptions } from "@/server/route";
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

/** The request pipeline's options for a route that takes one uploaded file in `field`. */
export function uploadLimit(field: string): RouteOptions {
  return {
    maxBodyBytes: MAX_ATTACHMENT_BYTES + FORM_OVERHEAD_BYTES,
    tooLarge: { field, message: `${field}: the upload is over the 10 MB limit` },
  };
}

/**
 * Reads a multipart body with one file (through the pipeline's streamed limit, so an
 * oversized upload is never held in memory) and returns the file in `field`.
 */
export async function readUpload(request: Request, field: string): Promise<File> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) {
    throw new ApiError(`bad_request:${field}`, `${field}: send the file as multipart/form-data in a field named "${field}"`, field);
  }
  const bytes = await readBody(request);
  let form: FormData;
  try {
    form = await new Response(bytes, { headers: { "content-type": type } }).formData();
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

/**
 * Every stored file downloads (Content-Disposition: attachment), except an image, which is
 * shown inline under a sandboxing policy that lets it be nothing but an image.
 */
export function contentDisposition(filename: string, contentType: string): string {
  const ascii = filename.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  return `${isInlineImage(contentType) ? "inline" : "attachment"}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(filename)}`;
}

export function isInlineImage(contentType: string): boolean {
  return contentType === "image/png" || contentType === "image/jpeg" || contentType === "image/webp";
}

/** The policy a stored file is served under: no scripts, no forms, no plugins, no framing. */
export const ATTACHMENT_CSP = "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox; frame-ancestors 'none'";
