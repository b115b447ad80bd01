import { fileTypeFromBuffer } from "file-type/core";
import { ATTACHMENT_TYPES, describeRefusedType, sniffAttachmentType, type AttachmentType } from "./file-type";

/**
 * The whole-file check of an upload, beyond its first bytes: the well-known `file-type`
 * sniffer must agree with the signature, the file must be built like its type (a PDF ends
 * with its trailer, a PNG with its IEND chunk, a JPEG has its end-of-image marker, a WebP's
 * RIFF size is the file's), and no web-page markup may hide anywhere in it — a "polyglot"
 * that starts as a PDF or JPEG and goes on as HTML is refused.
 */
export type Inspection = { ok: true; type: AttachmentType } | { ok: false; message: string };

const MIME_OF: Record<string, AttachmentType> = Object.fromEntries(
  (Object.entries(ATTACHMENT_TYPES) as [AttachmentType, (typeof ATTACHMENT_TYPES)[AttachmentType]][]).map(([type, info]) => [info.contentType, type]),
);

// Markup a browser would run or render as a page if it ever sniffed the file as HTML.
const MARKUP = ["<html", "<script", "<!doctype html", "<body", "<iframe", "<svg", "<object", "<embed", "<form", "<img ", "<a href", "<meta http-equiv"];

function asLowerLatin1(bytes: Uint8Array): string {
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString("latin1").toLowerCase();
}

function lastIndexOfAscii(bytes: Uint8Array, text: string, from: number): number {
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).lastIndexOf(text, from, "latin1");
}

/** Why the bytes are not built like `type`, or null when they are. */
function structureProblem(bytes: Uint8Array, type: AttachmentType): string | null {
  const n = bytes.byteLength;
  switch (type) {
    case "pdf": {
      // ISO 32000-1 §7.5.5: the file ends with "startxref", the offset and "%%EOF".
      const eof = lastIndexOfAscii(bytes, "%%EOF", n);
      if (eof < 0 || n - eof > 1024) return "the PDF has no end-of-file marker (%%EOF) at its end";
      if (lastIndexOfAscii(bytes, "startxref", eof) < 0) return "the PDF has no cross-reference table (startxref)";
      return null;
    }
    case "png": {
      // ISO/IEC 15948 §5.6: the last chunk is IEND (length 0, type "IEND", CRC AE 42 60 82).
      const tail = [0x49, 0x45, 0x4e, 0x44, 0xae, 0x42, 0x60, 0x82];
      const ok = n >= 20 && tail.every((b, i) => bytes[n - 8 + i] === b);
      return ok ? null : "the PNG does not end with its IEND chunk";
    }
    case "jpeg": {
      // ITU T.81 Annex B: the image ends with EOI (FF D9); phones may append data after it.
      const eoi = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).lastIndexOf(Buffer.from([0xff, 0xd9]));
      return eoi > 2 ? null : "the JPEG has no end-of-image marker";
    }
    case "webp": {
      // RFC 9649 §2.5: the RIFF size field is the file size minus 8 (padded to even).
      const size = n >= 12 ? (bytes[4]! | (bytes[5]! << 8) | (bytes[6]! << 16) | (bytes[7]! << 24)) >>> 0 : -1;
      return size + 8 === n || size + 9 === n ? null : "the WebP's RIFF size does not match the file";
    }
  }
}

export async function inspectAttachment(bytes: Uint8Array): Promise<Inspection> {
  const signature = sniffAttachmentType(bytes);
  if (!signature) return { ok: false, message: describeRefusedType(bytes) };
  const sniffed = await fileTypeFromBuffer(bytes);
  const type = sniffed ? MIME_OF[sniffed.mime] : undefined;
  if (type !== signature) {
    return { ok: false, message: `the file starts like a ${ATTACHMENT_TYPES[signature].label} but its contents are ${sniffed ? `a ${sniffed.ext.toUpperCase()} file` : "not one"}` };
  }
  const broken = structureProblem(bytes, type);
  if (broken) return { ok: false, message: `${broken}; upload the file as it was saved, not cut or joined to something else` };
  const text = asLowerLatin1(bytes);
  const markup = MARKUP.find((tag) => text.includes(tag));
  if (markup) return { ok: false, message: `the ${ATTACHMENT_TYPES[type].label} carries web-page markup (${markup.trim()}…) inside it; attachments must be plain datasheets or photos` };
  return { ok: true, type };
}
