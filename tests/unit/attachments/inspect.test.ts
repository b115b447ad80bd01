import { describe, expect, it } from "vitest";
import { inspectAttachment } from "@/lib/attachments";
import { minimalPdf, minimalPng } from "../../support/pdf";

const text = (s: string) => new TextEncoder().encode(s);
const join = (...parts: Uint8Array[]) => new Uint8Array(parts.flatMap((p) => [...p]));

describe("inspectAttachment: the whole file, not only its first bytes", () => {
  it("accepts a real PDF and a real PNG", async () => {
    expect(await inspectAttachment(minimalPdf())).toEqual({ ok: true, type: "pdf" });
    expect(await inspectAttachment(minimalPng())).toEqual({ ok: true, type: "png" });
  });

  it("refuses PDF and JPEG magic followed by a web page", async () => {
    const page = text("<!DOCTYPE html><html><script>alert(1)</script></html>");
    const pdf = minimalPdf();
    const pdfPolyglot = join(pdf.slice(0, 9), text("% "), page, text("\n"), pdf.slice(9));
    const jpegPolyglot = join(new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0, 16]), text("JFIF\0"), page, new Uint8Array([0xff, 0xd9]));
    for (const bytes of [pdfPolyglot, jpegPolyglot]) {
      const r = await inspectAttachment(bytes);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.message).toMatch(/web-page markup/);
    }
  });

  it("refuses a PDF cut short and a PNG without its end", async () => {
    const cut = await inspectAttachment(minimalPdf().slice(0, 80));
    expect(cut.ok).toBe(false);
    if (!cut.ok) expect(cut.message).toMatch(/%%EOF/);
    const png = await inspectAttachment(minimalPng().slice(0, 40));
    expect(png.ok).toBe(false);
  });
});
