import { beforeAll, describe, expect, it } from "vitest";
import { Client, signedIn, uniqueEmail } from "../support/http";
import { withTestDb } from "../support/db";
import { GOOD_PARTS } from "../unit/parts/fixtures";

// Parts by who asks: the owner, another signed-in maker, an admin, and nobody.
let owner: Client;
let other: Client;
let admin: Client;
const anonymous = new Client();
const tag = Date.now().toString(36);

type PartJson = {
  id: string;
  name: string;
  kind: string;
  visibility: string;
  verified: boolean;
  canEdit: boolean;
  specs: Record<string, unknown>;
  curves: Record<string, { points: { x: number; y: number }[] }>;
  owner: { id: string; displayName: string };
  notes: { field: string; message: string }[];
};
type PageJson = { items: PartJson[]; total: number; page: number; pageSize: number };

async function create(client: Client, body: Record<string, unknown>): Promise<PartJson> {
  const r = await client.post("/api/v1/parts", body);
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return r.body.part as PartJson;
}

async function partCount(name: string): Promise<number> {
  return withTestDb(async (conn) => {
    const [rows] = await conn.query("SELECT COUNT(*) AS n FROM part WHERE name = ?", [name]);
    return Number((rows as { n: number }[])[0]?.n ?? 0);
  });
}

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  admin = await signedIn("admin@sinkwise.test");
  other = new Client();
  const up = await other.post("/api/v1/auth/signup", { email: uniqueEmail("parts-other"), password: "long enough pw", displayName: "Other Maker" });
  expect(up.status).toBe(201);
});

describe("parts: create and read back in storage units", () => {
  it("stores a heatsink typed in inches and grams as metres and kilograms", async () => {
    const part = await create(owner, { ...GOOD_PARTS.heatsink, name: `Inch sink ${tag}`, specs: { ...GOOD_PARTS.heatsink.specs, baseLengthM: "0.8 in", massKg: "45 g" } });
    // 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
    expect(part.specs.baseLengthM).toBeCloseTo(0.02032, 12);
    expect(part.specs.massKg).toBeCloseTo(0.045, 12);
    expect(part.kind).toBe("heatsink");
    expect(part.visibility).toBe("private");
    expect(part.verified).toBe(false);
    expect(part.canEdit).toBe(true);
    const got = await owner.get(`/api/v1/parts/${part.id}`);
    expect(got.status).toBe(200);
    expect((got.body.part as PartJson).specs.finCount).toBe(6);
  });

  it("keeps curves and returns advisory notes", async () => {
    const part = await create(owner, { ...GOOD_PARTS.emitter, name: `Curve emitter ${tag}`, specs: { ...GOOD_PARTS.emitter.specs, heatFraction: "30 %" } });
    expect(part.curves.fluxVsTj?.points).toEqual([{ x: 25, y: 1 }, { x: 85, y: 0.88 }, { x: 125, y: 0.78 }]);
    expect(part.notes.map((n) => n.field)).toContain("heatFraction");
  });

  it("creates every kind from the fixtures", async () => {
    for (const fixture of Object.values(GOOD_PARTS)) {
      const part = await create(owner, { ...fixture, name: `${fixture.name} ${tag}` });
      expect(part.kind).toBe(fixture.kind);
    }
  });
});

describe("parts: bad input names the field and writes nothing", () => {
  const cases: [string, (name: string) => Record<string, unknown>, string, RegExp][] = [
    ["a power in a length field", (name) => ({ ...GOOD_PARTS.heatsink, name, specs: { ...GOOD_PARTS.heatsink.specs, baseLengthM: "3 W" } }), "specs.baseLengthM", /expected a length/],
    ["a missing required field", (name) => ({ ...GOOD_PARTS.emitter, name, specs: { ...GOOD_PARTS.emitter.specs, maxTjC: undefined } }), "specs.maxTjC", /required/],
    ["emissivity above 1", (name) => ({ ...GOOD_PARTS.housing, name, specs: { ...GOOD_PARTS.housing.specs, emissivity: 1.2 } }), "specs.emissivity", /at most 1/],
    ["a negative mass", (name) => ({ ...GOOD_PARTS.cell, name, specs: { ...GOOD_PARTS.cell.specs, massKg: "-46 g" } }), "specs.massKg", /greater than 0/],
    [
      "a curve with two points at the same x",
      (name) => ({ ...GOOD_PARTS.emitter, name, curves: { fluxVsTj: { points: [{ x: 25, y: 1 }, { x: 25, y: 0.9 }] } } }),
      "curves.fluxVsTj.points[1].x",
      /greater than the previous x/,
    ],
    ["a missing name", (name) => ({ ...GOOD_PARTS.spreader, name: "", provenanceNote: name }), "name", /required/],
    ["an unknown kind", (name) => ({ ...GOOD_PARTS.spreader, kind: "flux-capacitor", name }), "kind", /must be one of/],
  ];
  for (const [what, body, path, message] of cases) {
    it(`refuses ${what}`, async () => {
      const name = `Bad ${what} ${tag}`;
      const r = await owner.post("/api/v1/parts", body(name));
      expect(r.status, JSON.stringify(r.body)).toBe(400);
      expect(r.body.error?.path).toBe(path);
      expect(r.body.error?.message).toMatch(message);
      expect(JSON.stringify(r.body)).not.toContain("NaN");
      expect(await partCount(name)).toBe(0);
    });
  }

  it("refuses a body that is not JSON, and an anonymous create", async () => {
    const r = await owner.request("POST", "/api/v1/parts", "{oops", { "content-type": "application/json" });
    expect(r.status).toBe(400);
    expect((await anonymous.post("/api/v1/parts", GOOD_PARTS.spreader)).status).toBe(401);
  });
});

describe("parts: who sees what", () => {
  let privateId = "";
  let sharedId = "";
  let publicId = "";
  beforeAll(async () => {
    privateId = (await create(owner, { ...GOOD_PARTS.spreader, name: `Private vis strap ${tag}`, visibility: "private" })).id;
    sharedId = (await create(owner, { ...GOOD_PARTS.spreader, name: `Shared vis strap ${tag}`, visibility: "shared" })).id;
    publicId = (await create(owner, { ...GOOD_PARTS.spreader, name: `Public vis strap ${tag}`, visibility: "public" })).id;
  });

  it("owner and admin see a private part; another user and anonymous get 404", async () => {
    expect((await owner.get(`/api/v1/parts/${privateId}`)).status).toBe(200);
    const asAdmin = await admin.get(`/api/v1/parts/${privateId}`);
    expect(asAdmin.status).toBe(200);
    expect((asAdmin.body.part as PartJson).canEdit).toBe(true);
    expect((await other.get(`/api/v1/parts/${privateId}`)).status).toBe(404);
    const anon = await anonymous.get(`/api/v1/parts/${privateId}`);
    expect(anon.status).toBe(404);
    expect(anon.body.error?.code).toBe("not_found:part");
  });

  it("a shared part is seen by signed-in users only; a public one by anyone", async () => {
    const seen = await other.get(`/api/v1/parts/${sharedId}`);
    expect(seen.status).toBe(200);
    expect((seen.body.part as PartJson).canEdit).toBe(false);
    expect((await anonymous.get(`/api/v1/parts/${sharedId}`)).status).toBe(404);
    expect((await anonymous.get(`/api/v1/parts/${publicId}`)).status).toBe(200);
  });

  it("lists follow the same rule", async () => {
    const q = `/api/v1/parts?q=${encodeURIComponent(`vis strap ${tag}`)}&pageSize=100`;
    const names = async (c: Client) => ((await c.get(q)).body as unknown as PageJson).items.map((p) => p.name).sort();
    expect(await names(owner)).toEqual([`Private vis strap ${tag}`, `Public vis strap ${tag}`, `Shared vis strap ${tag}`]);
    expect(await names(admin)).toEqual([`Private vis strap ${tag}`, `Public vis strap ${tag}`, `Shared vis strap ${tag}`]);
    expect(await names(other)).toEqual([`Public vis strap ${tag}`, `Shared vis strap ${tag}`]);
    expect(await names(anonymous)).toEqual([`Public vis strap ${tag}`]);
    expect((await anonymous.get("/api/v1/parts?owner=mine")).status).toBe(401);
  });

  it("only the owner or an admin edits; the other user gets 403 and nothing changes", async () => {
    const denied = await other.patch(`/api/v1/parts/${sharedId}`, { name: "Taken over" });
    expect(denied.status).toBe(403);
    expect(denied.body.error?.code).toBe("forbidden:part");
    expect((await other.patch(`/api/v1/parts/${privateId}`, { name: "Taken over" })).status).toBe(404);
    expect((await anonymous.patch(`/api/v1/parts/${sharedId}`, { name: "Taken over" })).status).toBe(401);
    expect(await partCount("Taken over")).toBe(0);
    const byAdmin = await admin.patch(`/api/v1/parts/${sharedId}`, { provenanceNote: "checked by the admin" });
    expect(byAdmin.status).toBe(200);
    const byOwner = await owner.patch(`/api/v1/parts/${sharedId}`, { specs: { ...GOOD_PARTS.spreader.specs, widthM: "1 in" } });
    expect(byOwner.status).toBe(200);
    const part = byOwner.body.part as PartJson & { provenanceNote: string };
    expect(part.specs.widthM).toBeCloseTo(0.0254, 12);
    expect(part.provenanceNote).toBe("checked by the admin");
  });

  it("a patch is validated as a whole part and cannot change the kind", async () => {
    const bad = await owner.patch(`/api/v1/parts/${sharedId}`, { specs: { ...GOOD_PARTS.spreader.specs, thicknessM: "2 K/W" } });
    expect(bad.status).toBe(400);
    expect(bad.body.error?.path).toBe("specs.thicknessM");
    const kind = await owner.patch(`/api/v1/parts/${sharedId}`, { kind: "cell" });
    expect(kind.status).toBe(400);
    expect(kind.body.error?.path).toBe("kind");
  });

  it("only an admin marks a part verified, and only with what it was checked against", async () => {
    const check = { verified: true, against: "Tape maker's datasheet, 2022 edition, page 2" };
    expect((await owner.patch(`/api/v1/parts/${publicId}/verify`, check)).status).toBe(403);
    expect((await anonymous.patch(`/api/v1/parts/${publicId}/verify`, check)).status).toBe(401);
    // The strap is an estimate: there is nothing to check it against until it cites a datasheet.
    expect((await admin.patch(`/api/v1/parts/${publicId}/verify`, check)).status).toBe(400);
    expect((await owner.patch(`/api/v1/parts/${publicId}`, { provenance: "datasheet", provenanceNote: "tape maker's datasheet" })).status).toBe(200);
    expect((await admin.patch(`/api/v1/parts/${publicId}/verify`, { verified: true })).body.error?.path).toBe("against");
    const r = await admin.patch(`/api/v1/parts/${publicId}/verify`, check);
    expect(r.status).toBe(200);
    expect((r.body.part as PartJson).verified).toBe(true);
    expect((await admin.patch(`/api/v1/parts/${publicId}/verify`, { verified: "yes" })).body.error?.path).toBe("verified");
  });

  it("duplicates a visible part into the caller's bin as private, unverified", async () => {
    const r = await other.post(`/api/v1/parts/${publicId}/duplicate`);
    expect(r.status).toBe(201);
    const copy = r.body.part as PartJson;
    expect(copy.name).toBe(`Public vis strap ${tag} (copy)`);
    expect(copy.visibility).toBe("private");
    expect(copy.verified).toBe(false);
    expect(copy.canEdit).toBe(true);
    expect(copy.owner.displayName).toBe("Other Maker");
    expect((await other.post(`/api/v1/parts/${privateId}/duplicate`)).status).toBe(404);
    expect((await anonymous.post(`/api/v1/parts/${publicId}/duplicate`)).status).toBe(401);
  });

  it("deletes: other user 403, anonymous 401, owner 200 then 404", async () => {
    const id = (await create(owner, { ...GOOD_PARTS.spreader, name: `Doomed strap ${tag}`, visibility: "shared" })).id;
    expect((await other.request("DELETE", `/api/v1/parts/${id}`)).status).toBe(403);
    expect((await anonymous.request("DELETE", `/api/v1/parts/${id}`)).status).toBe(401);
    expect((await owner.request("DELETE", `/api/v1/parts/${id}`)).status).toBe(200);
    expect((await owner.get(`/api/v1/parts/${id}`)).status).toBe(404);
    const byAdmin = (await create(owner, { ...GOOD_PARTS.spreader, name: `Admin-removed strap ${tag}` })).id;
    expect((await admin.request("DELETE", `/api/v1/parts/${byAdmin}`)).status).toBe(200);
  });

  it("refuses a cross-origin write", async () => {
    const foreign = new Client("http://evil.example");
    expect((await foreign.post("/api/v1/parts", GOOD_PARTS.spreader)).status).toBe(403);
  });
});

describe("parts: the table's query in SQL", () => {
  beforeAll(async () => {
    for (const [i, fins] of [12, 3, 7].entries()) {
      await create(owner, {
        ...GOOD_PARTS.heatsink,
        name: `Sortable sink ${String.fromCharCode(67 - i)} ${tag}`,
        provenance: i === 0 ? "estimate" : "measured",
        visibility: "shared",
        specs: { ...GOOD_PARTS.heatsink.specs, finCount: fins, baseWidthM: "100 mm" },
      });
    }
  });
  const base = `/api/v1/parts?kind=heatsink&q=${encodeURIComponent(`Sortable sink`)}`;

  it("filters by kind, provenance and owner, and searches by name", async () => {
    const all = (await owner.get(`${base}&pageSize=100`)).body as unknown as PageJson;
    expect(all.items.filter((p) => p.name.endsWith(tag)).length).toBe(3);
    expect(all.items.every((p) => p.kind === "heatsink")).toBe(true);
    const measured = (await owner.get(`${base}&provenance=measured&pageSize=100`)).body as unknown as PageJson;
    expect(measured.items.filter((p) => p.name.endsWith(tag)).map((p) => p.name).sort()).toEqual([`Sortable sink A ${tag}`, `Sortable sink B ${tag}`]);
    const mineForOther = (await other.get(`${base}&owner=mine`)).body as unknown as PageJson;
    expect(mineForOther.total).toBe(0);
    const everyone = (await other.get(`${base}&owner=everyone&pageSize=100`)).body as unknown as PageJson;
    expect(everyone.items.filter((p) => p.name.endsWith(tag)).length).toBe(3);
  });

  it("sorts by name and by a main figure, and pages with a total", async () => {
    const q = `/api/v1/parts?kind=heatsink&q=${encodeURIComponent(`Sortable sink`)}&owner=mine`;
    const byName = (await owner.get(`${q}&sort=name&dir=desc&pageSize=100`)).body as unknown as PageJson;
    const mine = byName.items.filter((p) => p.name.endsWith(tag));
    expect(mine.map((p) => p.name)).toEqual([`Sortable sink C ${tag}`, `Sortable sink B ${tag}`, `Sortable sink A ${tag}`]);
    const byFins = (await owner.get(`${q}&sort=spec:finCount&dir=asc&pageSize=100`)).body as unknown as PageJson;
    const fins = byFins.items.map((p) => p.specs.finCount as number);
    expect(fins).toEqual([...fins].sort((a, b) => a - b));
    const first = (await owner.get(`${q}&sort=name&pageSize=2&page=1`)).body as unknown as PageJson;
    const second = (await owner.get(`${q}&sort=name&pageSize=2&page=2`)).body as unknown as PageJson;
    expect(first.items.length).toBe(2);
    expect(first.total).toBeGreaterThanOrEqual(3);
    expect(second.items.map((p) => p.id)).not.toContain(first.items[0]?.id);
  });

  it("refuses a bad query naming the parameter", async () => {
    const cases: [string, string][] = [
      ["kind=lamp", "kind"],
      ["sort=colour", "sort"],
      ["sort=spec:finCount", "sort"],
      ["kind=heatsink&sort=spec:DROP TABLE", "sort"],
      ["pageSize=1000", "pageSize"],
      ["page=0", "page"],
      ["dir=up", "dir"],
    ];
    for (const [query, path] of cases) {
      const r = await owner.get(`/api/v1/parts?${query}`);
      expect(r.status, query).toBe(400);
      expect(r.body.error?.path, query).toBe(path);
    }
  });

  it("treats search text literally (no LIKE wildcards)", async () => {
    const r = (await owner.get(`/api/v1/parts?q=${encodeURIComponent("%_%")}`)).body as unknown as PageJson;
    expect(r.items.every((p) => p.name.includes("%_%"))).toBe(true);
  });
});
