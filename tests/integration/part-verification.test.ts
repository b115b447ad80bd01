import { beforeAll, describe, expect, it } from "vitest";
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { Client, signedIn } from "../support/http";

let admin: Client;
let maker: Client;

beforeAll(async () => {
  admin = await signedIn("admin@sinkwise.test");
  maker = await signedIn("maker@sinkwise.test");
});

type PartBody = { part: { id: string; verified: boolean; provenance: string; owner: { displayName: string } } };

describe("honest provenance: verified means checked against a cited source", () => {
  it("does not call the invented catalogue parts verified", async () => {
    const list = await admin.get("/api/v1/parts?verified=true&pageSize=100");
    expect(list.status).toBe(200);
    const rows = (list.body as unknown as { items: { name: string; provenance: string }[] }).items;
    // Every demo catalogue part is an invented estimate: none may carry the mark.
    expect(rows.filter((p) => p.provenance === "estimate")).toEqual([]);
  });

  it("refuses to verify an estimate, and a check that cites nothing, writing nothing", async () => {
    const estimate = await maker.post("/api/v1/parts", { ...GOOD_PARTS.spreader, name: `Estimate strap ${Date.now()}`, visibility: "shared" });
    const id = (estimate.body as unknown as PartBody).part.id;
    const r = await admin.request("PATCH", `/api/v1/parts/${id}/verify`, { verified: true, against: "Datasheet rev. B, table 1" });
    expect(r.status).toBe(400);
    expect(r.body.error?.message).toMatch(/estimate cannot be verified/);

    const sheet = await maker.post("/api/v1/parts", { ...GOOD_PARTS.spreader, name: `Datasheet strap ${Date.now()}`, provenance: "datasheet", provenanceNote: "tape maker's sheet", visibility: "shared" });
    const sid = (sheet.body as unknown as PartBody).part.id;
    const empty = await admin.request("PATCH", `/api/v1/parts/${sid}/verify`, { verified: true, against: "  " });
    expect(empty.status).toBe(400);
    expect(empty.body.error?.message).toMatch(/Checked against: name the datasheet/);
    expect(empty.body.error?.message).not.toMatch(/NaN|invalid|expected/i);
    expect(((await admin.get(`/api/v1/parts/${sid}`)).body as unknown as PartBody).part.verified).toBe(false);
  });

  it("records who checked which values against what, and when; an edit of the values takes the mark away", async () => {
    const sheet = await maker.post("/api/v1/parts", { ...GOOD_PARTS.spreader, name: `Checked strap ${Date.now()}`, provenance: "datasheet", provenanceNote: "tape maker's sheet", visibility: "shared" });
    const id = (sheet.body as unknown as PartBody).part.id;
    const before = Date.now();
    const r = await admin.request("PATCH", `/api/v1/parts/${id}/verify`, { verified: true, against: "Tape maker's datasheet, 2022 edition, p. 2 (thickness and conductivity)" });
    expect(r.status).toBe(200);
    const v = (r.body as unknown as { verification: { byName: string; at: string; against: string } }).verification;
    expect(v.byName).toMatch(/Alder Penhale/);
    expect(v.against).toContain("2022 edition");
    expect(Date.parse(v.at)).toBeGreaterThanOrEqual(before - 5_000);
    const page = await maker.get(`/parts/${id}`);
    const html = String((page.body as { text?: string }).text ?? "").replace(/<!-- -->/g, "");
    expect(html).toContain("Verified against");
    expect(html).toContain("2022 edition");

    const edit = await maker.patch(`/api/v1/parts/${id}`, { specs: { ...GOOD_PARTS.spreader.specs, thicknessM: "0.2 mm" } });
    expect(edit.status).toBe(200);
    expect((edit.body as unknown as PartBody).part.verified).toBe(false);
  });
});
