import { beforeAll, describe, expect, it } from "vitest";
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { withTestDb } from "../support/db";
import { Client, signedIn } from "../support/http";
import { createParts, newBuild, newUser, retrofitDesign, type PartIds } from "../support/retrofit";

// Share links by role: owner, assigned reviewer, another reviewer, another maker, anonymous, admin.
let owner: Client;
let reviewer: Client;
let otherReviewer: Client;
let otherMaker: Client;
let admin: Client;
const anonymous = new Client();
let parts: PartIds;
let publicEmitterId = "";
let buildId = "";

type Share = { id: string; token: string; url: string; revisionNumber: number; expiresAt: string | null; state: string };

beforeAll(async () => {
  [owner, reviewer, admin] = await Promise.all([signedIn("maker@sinkwise.test"), signedIn("reviewer@sinkwise.test"), signedIn("admin@sinkwise.test")]);
  otherReviewer = (await newUser(admin, "reviewer", "share-reviewer")).client;
  otherMaker = (await newUser(admin, "maker", "share-maker")).client;
  parts = await createParts(owner, "private");
  const pub = await owner.post("/api/v1/parts", { ...GOOD_PARTS.emitter, name: "Public test emitter", visibility: "public" });
  publicEmitterId = (pub.body.part as { id: string }).id;
  buildId = await newBuild(owner, { title: "Shared lantern", summary: "Square 6 V lantern on two cells", design: retrofitDesign({ ...parts, emitter: publicEmitterId }, "strapped") });
  const r = await owner.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: "reviewer@sinkwise.test" });
  expect(r.status).toBe(201);
});

async function share(body: Record<string, unknown> = {}): Promise<Share> {
  const r = await owner.post(`/api/v1/builds/${buildId}/shares`, body);
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return r.body.share as Share;
}

describe("share links: creating and listing", () => {
  it("gives the owner a 32-byte base64url token once, and keeps only its hash", async () => {
    const s = await share({ expiresInDays: 7 });
    expect(s.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(s.url).toMatch(new RegExp(`/share/${s.token}$`));
    expect(s.revisionNumber).toBe(1);
    expect(new Date(s.expiresAt ?? 0).getTime()).toBeGreaterThan(Date.now() + 6.9 * 86_400_000);
    const stored = await withTestDb(async (c) => {
      const [rows] = await c.query("SELECT token_hash FROM share_link WHERE id = ?", [s.id]);
      return rows as { token_hash: string }[];
    });
    expect(stored[0]?.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored[0]?.token_hash).not.toContain(s.token);
    const list = await owner.get(`/api/v1/builds/${buildId}/shares`);
    const listed = (list.body.shares as Share[]).find((x) => x.id === s.id);
    expect(listed).toMatchObject({ state: "active" });
    expect(listed).not.toHaveProperty("token");
    expect(JSON.stringify(list.body)).not.toContain(s.token);
  });

  it("lets only the owner create, list and revoke links", async () => {
    for (const c of [reviewer, admin]) {
      expect((await c.post(`/api/v1/builds/${buildId}/shares`, {})).status).toBe(403);
      expect((await c.get(`/api/v1/builds/${buildId}/shares`)).status).toBe(403);
    }
    for (const c of [otherReviewer, otherMaker]) {
      expect((await c.post(`/api/v1/builds/${buildId}/shares`, {})).status).toBe(404);
      expect((await c.get(`/api/v1/builds/${buildId}/shares`)).status).toBe(404);
    }
    expect((await anonymous.post(`/api/v1/builds/${buildId}/shares`, {})).status).toBe(401);
    const s = await share();
    expect((await reviewer.request("DELETE", `/api/v1/builds/${buildId}/shares/${s.id}`)).status).toBe(403);
    expect((await otherMaker.request("DELETE", `/api/v1/builds/${buildId}/shares/${s.id}`)).status).toBe(404);
    expect((await anonymous.request("DELETE", `/api/v1/builds/${buildId}/shares/${s.id}`)).status).toBe(401);
    expect((await anonymous.get(`/api/v1/share/${s.token}`)).status).toBe(200);
  });

  it("refuses bad input naming the field, and writes nothing", async () => {
    const before = ((await owner.get(`/api/v1/builds/${buildId}/shares`)).body.shares as unknown[]).length;
    for (const [body, path] of [
      [{ expiresInDays: 0 }, "expiresInDays"],
      [{ expiresInDays: 2.5 }, "expiresInDays"],
      [{ expiresInDays: "soon" }, "expiresInDays"],
      [{ revision: -1 }, "revision"],
      [{ colour: "red" }, ""],
    ] as const) {
      const r = await owner.post(`/api/v1/builds/${buildId}/shares`, body);
      expect(r.status, JSON.stringify(body)).toBe(400);
      expect(r.body.error?.path).toBe(path);
    }
    const missing = await owner.post(`/api/v1/builds/${buildId}/shares`, { revision: 5 });
    expect(missing.status).toBe(404);
    expect(((await owner.get(`/api/v1/builds/${buildId}/shares`)).body.shares as unknown[]).length).toBe(before);
  });
});

describe("share links: opening one without signing in", () => {
  it("shows the build summary, the revision's design and only the public parts it uses", async () => {
    const s = await share();
    const r = await anonymous.get(`/api/v1/share/${s.token}`);
    expect(r.status).toBe(200);
    expect(r.body.build).toMatchObject({ id: buildId, title: "Shared lantern", summary: "Square 6 V lantern on two cells" });
    expect((r.body.revision as { number: number; design: { lightEngine: { emitter: { partId: string } } } }).design.lightEngine.emitter.partId).toBe(publicEmitterId);
    const shown = (r.body.parts as { id: string; name: string }[]).map((p) => p.id);
    expect(shown).toEqual([publicEmitterId]);
    expect(JSON.stringify(r.body.parts)).not.toContain(GOOD_PARTS.driver.name);
    // The Budget figures, worked out as the owner sees the parts.
    const result = r.body.result as { verdict: string | null; scenarios: { id: string }[] };
    expect(["within budget", "tight", "over budget"]).toContain(result.verdict);
    expect(result.scenarios.map((x) => x.id)).toContain("mode:high");
  });

  it("stops working the moment the link is revoked", async () => {
    const s = await share();
    expect((await anonymous.get(`/api/v1/share/${s.token}`)).status).toBe(200);
    expect((await owner.request("DELETE", `/api/v1/builds/${buildId}/shares/${s.id}`)).status).toBe(200);
    const after = await anonymous.get(`/api/v1/share/${s.token}`);
    expect(after.status).toBe(404);
    expect(after.body.error?.message).toBe("This share link was revoked by the build's owner.");
    expect((await owner.request("DELETE", `/api/v1/builds/${buildId}/shares/${s.id}`)).status).toBe(404);
    const listed = ((await owner.get(`/api/v1/builds/${buildId}/shares`)).body.shares as Share[]).find((x) => x.id === s.id);
    expect(listed?.state).toBe("revoked");
  });

  it("refuses an expired link and an unknown or malformed token", async () => {
    const s = await share({ expiresInDays: 1 });
    await withTestDb((c) => c.query("UPDATE share_link SET expires_at = ? WHERE id = ?", [new Date(Date.now() - 60_000), s.id]));
    const r = await anonymous.get(`/api/v1/share/${s.token}`);
    expect(r.status).toBe(404);
    expect(r.body.error?.message).toMatch(/^This share link expired on \d{4}-\d{2}-\d{2}\.$/);
    const unknown = await anonymous.get(`/api/v1/share/${"A".repeat(43)}`);
    expect(unknown.status).toBe(404);
    expect(unknown.body.error?.message).toBe("This share link does not exist.");
    expect((await anonymous.get("/api/v1/share/short")).status).toBe(404);
  });

  it("pins the revision it was made for: a later revision does not change what the link shows", async () => {
    const own = await newBuild(owner, { title: "Pinned lamp", design: retrofitDesign(parts, "floating") });
    const s = (await owner.post(`/api/v1/builds/${own}/shares`, {})).body.share as Share;
    await owner.patch(`/api/v1/builds/${own}`, { design: retrofitDesign(parts, "strapped") });
    const r = await anonymous.get(`/api/v1/share/${s.token}`);
    expect((r.body.revision as { number: number; design: { driver: { cooling: { kind: string } } } }).design.driver.cooling.kind).toBe("floating");
  });
});
