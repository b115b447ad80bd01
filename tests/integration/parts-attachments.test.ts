import { beforeAll, describe, expect, it } from "vitest";
import { Client, signedIn, uniqueEmail } from "../support/http";
import { withTestDb } from "../support/db";
import { minimalPdf, minimalPng } from "../support/pdf";

let owner: Client;
let other: Client;
let admin: Client;
const anonymous = new Client();
let sharedId = "";
let privateId = "";


function form(bytes: Uint8Array, name: string, type = "application/pdf"): FormData {
  const data = new FormData();
  data.append("file", new Blob([bytes as BlobPart], { type }), name);
  return data;
}

type AttachmentJson = { id: string; filename: string; contentType: string; sizeBytes: number; url: string };

async function attachmentRows(partId: string): Promise<number> {
  return withTestDb(async (conn) => {
    const [rows] = await conn.query("SELECT COUNT(*) AS n FROM part_attachment WHERE part_id = ?", [partId]);
    return Number((rows as { n: number }[])[0]?.n ?? 0);
  });
}

const SPREADER = { kind: "spreader", provenance: "estimate", specs: { material: "copper-pure", thicknessM: "0.07 mm", widthM: "25 mm", lengthM: "60 mm" } };

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  admin = await signedIn("admin@sinkwise.test");
  other = new Client();
  await other.post("/api/v1/auth/signup", { email: uniqueEmail("attach-other"), password: "long enough pw", displayName: "Attach Other" });
  sharedId = ((await owner.post("/api/v1/parts", { ...SPREADER, name: "Strap with datasheet", visibility: "shared" })).body.part as { id: string }).id;
  privateId = ((await owner.post("/api/v1/parts", { ...SPREADER, name: "Private strap with datasheet" })).body.part as { id: string }).id;
});

describe("attachments: upload round trip through the S3 fake", () => {
  let attachment: AttachmentJson;

  it("uploads a real PDF with a hostile name and lists it under a clean one", async () => {
    const pdf = minimalPdf();
    const r = await owner.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(pdf, "../../etc/data sheet<v2>.pdf"));
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    attachment = r.body.attachment as AttachmentJson;
    expect(attachment.filename).toBe("data sheet_v2.pdf");
    expect(attachment.contentType).toBe("application/pdf");
    expect(attachment.sizeBytes).toBe(pdf.byteLength);
    const list = await other.get(`/api/v1/parts/${sharedId}/attachments`);
    expect(list.status).toBe(200);
    expect((list.body.attachments as AttachmentJson[]).map((a) => a.id)).toContain(attachment.id);
  });

  it("streams the same bytes back to anyone who may see the part", async () => {
    for (const client of [owner, other, admin]) {
      const res = await client.fetchRaw("GET", attachment.url);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toBe("application/pdf");
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("content-disposition")).toContain('filename="data sheet_v2.pdf"');
      expect(new Uint8Array(await res.arrayBuffer())).toEqual(minimalPdf());
    }
    expect((await anonymous.fetchRaw("GET", attachment.url)).status).toBe(404);
  });

  it("keys objects randomly: the key is not in any URL and is long", async () => {
    const key = await withTestDb(async (conn) => {
      const [rows] = await conn.query("SELECT object_key AS k FROM part_attachment WHERE id = ?", [attachment.id]);
      return String((rows as { k: string }[])[0]?.k);
    });
    expect(key).toMatch(new RegExp(`^parts/${sharedId}/[A-Za-z0-9_-]{32}$`));
    expect(attachment.url).not.toContain(key.split("/").pop());
  });

  it("hides a private part's attachments from other users and anonymous", async () => {
    const r = await owner.send("POST", `/api/v1/parts/${privateId}/attachments`, form(minimalPdf(), "private.pdf"));
    expect(r.status).toBe(201);
    const url = (r.body.attachment as AttachmentJson).url;
    expect((await other.fetchRaw("GET", url)).status).toBe(404);
    expect((await anonymous.get(`/api/v1/parts/${privateId}/attachments`)).status).toBe(404);
    expect((await admin.fetchRaw("GET", url)).status).toBe(200);
  });

  it("only the owner or an admin uploads or deletes", async () => {
    const denied = await other.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(minimalPdf(), "mine.pdf"));
    expect(denied.status).toBe(403);
    expect((await anonymous.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(minimalPdf(), "anon.pdf"))).status).toBe(401);
    expect((await other.request("DELETE", attachment.url)).status).toBe(403);
    const before = await attachmentRows(sharedId);
    expect((await owner.request("DELETE", attachment.url)).status).toBe(200);
    expect(await attachmentRows(sharedId)).toBe(before - 1);
    expect((await owner.fetchRaw("GET", attachment.url)).status).toBe(404);
    const again = await owner.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(minimalPdf(), "again.pdf"));
    expect((await admin.request("DELETE", (again.body.attachment as AttachmentJson).url)).status).toBe(200);
  });
});

describe("attachments: refused uploads write nothing", () => {
  it("refuses 11 MB with 413 naming the field", async () => {
    const big = new Uint8Array(11 * 1024 * 1024);
    big.set(new TextEncoder().encode("%PDF-1.4\n"));
    const before = await attachmentRows(sharedId);
    const r = await owner.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(big, "huge.pdf"));
    expect(r.status).toBe(413);
    expect(r.body.error?.path).toBe("file");
    expect(r.body.error?.message).toMatch(/10 MB/);
    expect(await attachmentRows(sharedId)).toBe(before);
  });

  it("refuses a Windows program renamed .pdf, judged by its bytes", async () => {
    // "MZ" header and the DOS stub message of a Windows executable (PE/COFF specification).
    const exe = new TextEncoder().encode("MZ\x90\x00\x03\x00\x00\x00This program cannot be run in DOS mode.\r\n");
    const r = await owner.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(exe, "datasheet.pdf", "application/pdf"));
    expect(r.status).toBe(400);
    expect(r.body.error?.path).toBe("file");
    expect(r.body.error?.message).toMatch(/Windows program/);
    expect(r.body.error?.message).toMatch(/PDF, PNG, JPEG, WebP/);
  });

  it("accepts a PNG and refuses a form without a file", async () => {
    const r = await owner.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(minimalPng(), "photo.pdf"));
    expect(r.status).toBe(201);
    expect((r.body.attachment as AttachmentJson).filename).toBe("photo.png");
    const empty = await owner.send("POST", `/api/v1/parts/${sharedId}/attachments`, new FormData());
    expect(empty.status).toBe(400);
    expect(empty.body.error?.path).toBe("file");
    const json = await owner.post(`/api/v1/parts/${sharedId}/attachments`, { file: "x" });
    expect(json.status).toBe(400);
    expect(json.body.error?.path).toBe("file");
  });

  it("refuses polyglots: PDF or JPEG magic that goes on as a web page, and a cut-off PDF", async () => {
    const html = "<!DOCTYPE html><html><body><script>alert(document.cookie)</script></body></html>";
    const pdfThenHtml = new TextEncoder().encode(`%PDF-1.4\n${html}\n%%EOF\n`);
    const jpegThenHtml = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0, 16, ...new TextEncoder().encode(`JFIF\0${html}`), 0xff, 0xd9]);
    const pdfWithHtml = new Uint8Array([...minimalPdf().slice(0, 20), ...new TextEncoder().encode(`% ${html}\n`), ...minimalPdf().slice(20)]);
    const cut = minimalPdf().slice(0, 60);
    const before = await attachmentRows(sharedId);
    for (const [bytes, name] of [[pdfThenHtml, "a.pdf"], [jpegThenHtml, "b.jpg"], [pdfWithHtml, "c.pdf"], [cut, "d.pdf"]] as const) {
      const r = await owner.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(bytes, name));
      expect(r.status, name).toBe(400);
      expect(r.body.error?.path).toBe("file");
    }
    expect(await attachmentRows(sharedId)).toBe(before);
  });

  it("serves a PDF as a download and an image inline under a sandboxing policy", async () => {
    const pdf = await owner.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(minimalPdf(), "sheet.pdf"));
    const png = await owner.send("POST", `/api/v1/parts/${sharedId}/attachments`, form(minimalPng(), "photo.png", "image/png"));
    const pdfRes = await owner.fetchRaw("GET", (pdf.body.attachment as AttachmentJson).url);
    expect(pdfRes.headers.get("content-disposition")).toMatch(/^attachment;/);
    const pngRes = await owner.fetchRaw("GET", (png.body.attachment as AttachmentJson).url);
    expect(pngRes.headers.get("content-disposition")).toMatch(/^inline;/);
    expect(pngRes.headers.get("content-security-policy")).toContain("sandbox");
    expect(pngRes.headers.get("content-security-policy")).toContain("default-src 'none'");
    expect(pngRes.headers.get("x-content-type-options")).toBe("nosniff");
  });

  it("deleting the part removes its attachments", async () => {
    const id = ((await owner.post("/api/v1/parts", { ...SPREADER, name: "Short-lived strap" })).body.part as { id: string }).id;
    await owner.send("POST", `/api/v1/parts/${id}/attachments`, form(minimalPdf(), "sheet.pdf"));
    expect(await attachmentRows(id)).toBe(1);
    expect((await owner.request("DELETE", `/api/v1/parts/${id}`)).status).toBe(200);
    expect(await attachmentRows(id)).toBe(0);
  });
});
