import { describe, expect, it } from "vitest";
import { describeRefusedType, sanitiseFilename, sniffAttachmentType } from "@/lib/attachments";

const bytes = (...values: (number | string)[]) =>
  new Uint8Array(values.flatMap((v) => (typeof v === "string" ? [...v].map((c) => c.charCodeAt(0)) : [v])));

describe("sniffAttachmentType: the type comes from the signature bytes", () => {
  // Signatures: PDF "%PDF-" (ISO 32000-1 §7.5.2), PNG (ISO/IEC 15948 §5.2), JPEG SOI + marker
  // (ITU T.81 Annex B), WebP RIFF container with "WEBP" form type (RFC 9649 §2).
  it.each([
    ["pdf", bytes("%PDF-1.7\n")],
    ["png", bytes(0x89, "PNG", 0x0d, 0x0a, 0x1a, 0x0a)],
    ["jpeg", bytes(0xff, 0xd8, 0xff, 0xe0)],
    ["webp", bytes("RIFF", 0x24, 0, 0, 0, "WEBPVP8 ")],
  ])("recognises %s", (type, data) => {
    expect(sniffAttachmentType(data)).toBe(type);
  });

  it.each([
    ["a Windows program", bytes("MZ", 0x90, 0)],
    ["a Linux program", bytes(0x7f, "ELF")],
    ["a ZIP archive", bytes("PK", 3, 4)],
    ["empty", bytes()],
    ["a RIFF file that is not WebP", bytes("RIFF", 0, 0, 0, 0, "WAVE")],
    ["text that mentions %PDF later", bytes(" %PDF-1.4")],
  ])("refuses %s", (_what, data) => {
    expect(sniffAttachmentType(data)).toBeNull();
  });

  it("says what the refused file looks like and what is allowed", () => {
    expect(describeRefusedType(bytes("MZ"))).toBe(
      "the file is a Windows program; attachments must be PDF, PNG, JPEG, WebP (checked from the file's contents, not its name)",
    );
  });
});

describe("sanitiseFilename", () => {
  it.each([
    ["../../etc/passwd", "pdf", "passwd.pdf"],
    ["C:\\Users\\x\\sheet.PDF", "pdf", "sheet.pdf"],
    ["photo.pdf", "png", "photo.png"],
    ["Lüfter Datenblatt.pdf", "pdf", "Lufter Datenblatt.pdf"],
    ["<script>.jpeg", "jpeg", "script.jpg"],
    ["...", "webp", "attachment.webp"],
    ["a\u0000b\r\n.pdf", "pdf", "a_b.pdf"],
  ] as const)("%s as %s → %s", (name, type, expected) => {
    expect(sanitiseFilename(name, type)).toBe(expected);
  });

  it("keeps names short", () => {
    expect(sanitiseFilename(`${"x".repeat(300)}.pdf`, "pdf").length).toBeLessThanOrEqual(114);
  });
});
