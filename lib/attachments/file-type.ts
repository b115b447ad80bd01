/**
 * Attachments are datasheets and photos. The type is read from the file's first bytes
 * (its signature), never from the name or the browser's content type, so an `.exe` renamed
 * `.pdf` is refused.
 */
export const ATTACHMENT_TYPES = {
  pdf: { contentType: "application/pdf", extension: "pdf", label: "PDF" },
  png: { contentType: "image/png", extension: "png", label: "PNG" },
  jpeg: { contentType: "image/jpeg", extension: "jpg", label: "JPEG" },
  webp: { contentType: "image/webp", extension: "webp", label: "WebP" },
} as const;

export type AttachmentType = keyof typeof ATTACHMENT_TYPES;

/** 10 MB: a scanned datasheet or a phone photo fits; a video does not. */
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;

const startsWith = (bytes: Uint8Array, signature: readonly number[], offset = 0) =>
  bytes.length >= offset + signature.length && signature.every((b, i) => bytes[offset + i] === b);

const ascii = (text: string) => [...text].map((c) => c.charCodeAt(0));

/** The attachment type the bytes are, or null for anything else. */
export function sniffAttachmentType(bytes: Uint8Array): AttachmentType | null {
  // PDF: "%PDF-" (ISO 32000-1 §7.5.2); readers accept it within the first 1024 bytes, but a
  // file we serve back must start with it.
  if (startsWith(bytes, ascii("%PDF-"))) return "pdf";
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return "png";
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return "jpeg";
  if (startsWith(bytes, ascii("RIFF")) && startsWith(bytes, ascii("WEBP"), 8)) return "webp";
  return null;
}

/** What the refusal says: what the bytes look like when we can tell, and what is allowed. */
export function describeRefusedType(bytes: Uint8Array): string {
  const allowed = Object.values(ATTACHMENT_TYPES)
    .map((t) => t.label)
    .join(", ");
  const looksLike = startsWith(bytes, ascii("MZ"))
    ? "a Windows program"
    : startsWith(bytes, [0x7f, 0x45, 0x4c, 0x46])
      ? "a Linux program"
      : startsWith(bytes, [0x50, 0x4b, 0x03, 0x04])
        ? "a ZIP archive"
        : bytes.length === 0
          ? "empty"
          : "not a file type we accept";
  return `the file is ${looksLike}; attachments must be ${allowed} (checked from the file's contents, not its name)`;
}

const UNSAFE = /[^A-Za-z0-9._ ()+-]+/g;

/**
 * A name that is safe in a Content-Disposition header and on any file system: no path,
 * no control or shell characters, at most 120 characters, and the extension of the type
 * the bytes really are (so "photo.pdf" that is a PNG is saved as "photo.png").
 */
export function sanitiseFilename(original: string, type: AttachmentType): string {
  const base = original.split(/[\\/]/).pop() ?? "";
  const cleaned = base
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(UNSAFE, "_")
    .replace(/_+/g, "_")
    .replace(/^[.\s_]+|[.\s_]+$/g, "");
  const { extension } = ATTACHMENT_TYPES[type];
  const stem = cleaned.replace(/\.(pdf|png|jpe?g|webp)$/i, "").replace(/[.\s_]+$/g, "") || "attachment";
  return `${stem.slice(0, 110)}.${extension}`;
}
