import { beforeAll, describe, expect, it } from "vitest";
import { withTestDb } from "../support/db";
import { Client, signedIn } from "../support/http";
import { newBuild, newUser } from "../support/retrofit";

// The Builds list: rename, archive, delete (with what points at a build kept), search, by role.
let owner: Client;
let admin: Client;
let other: Client;
let reviewer: Client;
let reviewerEmail = "";
const tag = Date.now().toString(36);
const design = { lightEngine: { count: 1 }, environment: { ambientC: 25 } };
let instructor: Client;

async function rowExists(id: string): Promise<boolean> {
  return withTestDb(async (conn) => {
    const [rows] = await conn.query("SELECT COUNT(*) AS n FROM build WHERE id = ?", [id]);
    return Number((rows as { n: number }[])[0]!.n) === 1;
  });
}

type Listed = { id: string; title: string; archivedAt: string | null };
const ids = (list: unknown) => (list as Listed[]).map((b) => b.id);

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  admin = await signedIn("admin@sinkwise.test");
  instructor = await signedIn("instructor@sinkwise.test");
  other = (await newUser(admin, "maker", "list-other")).client;
  const r = await newUser(admin, "reviewer", "list-reviewer");
  reviewer = r.client;
  reviewerEmail = r.email;
});

describe("builds list: rename, archive, delete, search", () => {
  it("the owner renames; another maker, a reviewer and anonymous cannot (404 / 401), and the title stays", async () => {
    const id = await newBuild(owner, { title: `Rename me ${tag}`, design });
    expect((await other.patch(`/api/v1/builds/${id}`, { title: "Hijacked" })).status).toBe(404);
    expect((await reviewer.patch(`/api/v1/builds/${id}`, { title: "Hijacked" })).status).toBe(404);
    expect((await new Client().patch(`/api/v1/builds/${id}`, { title: "Hijacked" })).status).toBe(401);
    const empty = await owner.patch(`/api/v1/builds/${id}`, { title: "  " });
    expect(empty.status).toBe(400);
    expect(empty.body.error?.message).toBe("Give the build a title.");
    expect((await owner.patch(`/api/v1/builds/${id}`, { title: `Renamed torch ${tag}` })).status).toBe(200);
    const got = await owner.get(`/api/v1/builds/${id}`);
    expect((got.body.build as { title: string }).title).toBe(`Renamed torch ${tag}`);
  });

  it("search by name finds the owner's builds whose title contains the text, and nothing else", async () => {
    const a = await newBuild(owner, { title: `Brass lamp ${tag}`, design });
    const b = await newBuild(owner, { title: `Tin lantern ${tag}`, design });
    const found = await owner.get(`/api/v1/builds?q=${encodeURIComponent(`brass lamp ${tag}`)}`);
    expect(ids(found.body.mine)).toEqual([a]);
    expect(ids(found.body.mine)).not.toContain(b);
    const wild = await owner.get(`/api/v1/builds?q=${encodeURIComponent("%")}`);
    expect(ids(wild.body.mine)).not.toContain(a);
  });

  it("archive takes a build out of the list and keeps it; only the owner archives; it can be brought back", async () => {
    const id = await newBuild(owner, { title: `Archive me ${tag}`, design, visibility: "shared" });
    // A shared build: another maker sees it but may not archive it.
    expect((await other.patch(`/api/v1/builds/${id}`, { archived: true })).status).toBe(403);
    expect((await admin.patch(`/api/v1/builds/${id}`, { archived: true })).status).toBe(403);
    expect((await owner.patch(`/api/v1/builds/${id}`, { archived: true })).status).toBe(200);
    const list = await owner.get("/api/v1/builds");
    expect(ids(list.body.mine)).not.toContain(id);
    expect(ids(list.body.archived)).toContain(id);
    expect(ids((await other.get("/api/v1/builds")).body.shared)).not.toContain(id);
    expect((await owner.get(`/api/v1/builds/${id}`)).status).toBe(200);
    expect((await owner.patch(`/api/v1/builds/${id}`, { archived: false })).status).toBe(200);
    expect(ids((await owner.get("/api/v1/builds")).body.mine)).toContain(id);
  });

  it("delete: only the owner; the build and its revisions are gone", async () => {
    const id = await newBuild(owner, { title: `Delete me ${tag}`, design, visibility: "shared" });
    expect((await other.request("DELETE", `/api/v1/builds/${id}`)).status).toBe(403);
    expect((await reviewer.request("DELETE", `/api/v1/builds/${id}`)).status).toBe(403);
    expect((await admin.request("DELETE", `/api/v1/builds/${id}`)).status).toBe(403);
    expect((await new Client().request("DELETE", `/api/v1/builds/${id}`)).status).toBe(401);
    expect(await rowExists(id)).toBe(true);
    const r = await owner.request("DELETE", `/api/v1/builds/${id}`);
    expect(r.status).toBe(200);
    expect(r.body.deleted).toBe(true);
    expect(await rowExists(id)).toBe(false);
    expect((await owner.get(`/api/v1/builds/${id}`)).status).toBe(404);
  });

  it("delete of a build a review points at archives it instead, and the reviewer still sees what was checked", async () => {
    const id = await newBuild(owner, { title: `Reviewed ${tag}`, design });
    const review = await owner.post(`/api/v1/builds/${id}/reviews`, { reviewerEmail });
    expect(review.status, JSON.stringify(review.body)).toBe(201);
    const r = await owner.request("DELETE", `/api/v1/builds/${id}`);
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ deleted: false, archived: true });
    expect(String(r.body.message)).toMatch(/archived, not deleted: a review points at its revisions/);
    expect(await rowExists(id)).toBe(true);
    expect((await reviewer.get(`/api/v1/builds/${id}/revisions/1`)).status).toBe(200);
    expect(ids((await owner.get("/api/v1/builds")).body.archived)).toContain(id);
  });

  it("delete of a build a class's worked example points at archives it instead", async () => {
    const id = await newBuild(instructor, { title: `Class example ${tag}`, design });
    const cls = await instructor.post("/api/v1/classes", { name: `Archive test ${tag}`, term: "Autumn" });
    expect(cls.status, JSON.stringify(cls.body)).toBe(201);
    const example = await instructor.post(`/api/v1/classes/${(cls.body.class as { id: string }).id}/examples`, { title: "Where the heat goes", narrative: "Read it first.", buildId: id });
    expect(example.status, JSON.stringify(example.body)).toBe(201);
    const r = await instructor.request("DELETE", `/api/v1/builds/${id}`);
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ deleted: false, archived: true });
    expect(String(r.body.message)).toMatch(/archived, not deleted: a class points at its revisions/);
    expect(await rowExists(id)).toBe(true);
    expect(ids((await instructor.get("/api/v1/builds")).body.archived)).toContain(id);
  });
});
