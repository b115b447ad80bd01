import { beforeAll, describe, expect, it } from "vitest";
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { withTestDb } from "../support/db";
import { Client, signedIn } from "../support/http";
import { createParts, newBuild, newUser, retrofitDesign, type PartIds } from "../support/retrofit";

// Review share links by role: the reviewer and the build's owner make and revoke them; nobody
// else may; anyone with the token reads the review without signing in, with no e-mail address
// and no value of a private part in the answer.
const REVIEWER_EMAIL = "reviewer@sinkwise.test";
const OWNER_EMAIL = "maker@sinkwise.test";
// Distinctive ratings on the owner's private parts: they must not come back through a link.
const PRIVATE_TJ = 143.7;
const PRIVATE_BOARD = 93.3;
let owner: Client;
let reviewer: Client;
let admin: Client;
let otherReviewer: Client;
let otherMaker: Client;
const anonymous = new Client();
let parts: PartIds;
let reviewId = "";
let otherEmails: string[] = [];

type Share = { id: string; token: string; url: string; state: string; expiresAt: string | null };
type Shared = {
  review: { buildTitle: string; status: string; statusLabel: string; summary: string; reviewerName: string; ownerName: string };
  comments: { authorName: string; target: string; body: string }[];
  results: { verdict: string | null; scenarios: { label: string; limits: { place: string; temperatureC: number; limitC: number | null; headroomK: number | null }[] }[] } | null;
  heatPaths: { scenarioId: string; label: string; pins: Record<string, number>; thermal: { nodes: { id: string; place: string }[]; links: { from: string; to: string; place: string; watts: number | null; kelvinPerWatt: number | null }[]; temperaturesC: Record<string, number> } }[];
};

beforeAll(async () => {
  [owner, reviewer, admin] = await Promise.all([signedIn(OWNER_EMAIL), signedIn(REVIEWER_EMAIL), signedIn("admin@sinkwise.test")]);
  const r2 = await newUser(admin, "reviewer", "share-reviewer");
  const m2 = await newUser(admin, "maker", "share-maker");
  otherReviewer = r2.client;
  otherMaker = m2.client;
  otherEmails = [r2.email, m2.email];
  parts = await createParts(owner, "public");
  // The emitter and the driver are the owner's own, with ratings nobody else should read.
  const mine = async (part: object) => {
    const r = await owner.post("/api/v1/parts", { ...part, visibility: "private" });
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    return (r.body.part as { id: string }).id;
  };
  parts.emitter = await mine({ ...GOOD_PARTS.emitter, name: "My own emitter", specs: { ...GOOD_PARTS.emitter.specs, maxTjC: `${PRIVATE_TJ} °C` } });
  parts.driver = await mine({ ...GOOD_PARTS.driver, name: "My own driver", specs: { ...GOOD_PARTS.driver.specs, maxBoardTempC: PRIVATE_BOARD } });
  const buildId = await newBuild(owner, { title: "Lantern with my own parts", design: retrofitDesign(parts, "strapped") });
  const r = await owner.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: REVIEWER_EMAIL });
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  reviewId = (r.body.review as { id: string }).id;
  expect((await reviewer.post(`/api/v1/reviews/${reviewId}/comments`, { anchor: { kind: "node", key: "driver#mode:high" }, body: "The driver board is the weak point on high." })).status).toBe(201);
  expect((await reviewer.post(`/api/v1/reviews/${reviewId}/verdict`, { status: "changes_requested", summary: "Press the driver to the wall." })).status).toBe(200);
}, 120_000);

async function share(client: Client, body: Record<string, unknown> = {}): Promise<Share> {
  const r = await client.post(`/api/v1/reviews/${reviewId}/shares`, body);
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return r.body.share as Share;
}

describe("review share links", () => {
  it("are made by the reviewer and the build's owner only", async () => {
    const byReviewer = await share(reviewer, { expiresInDays: 7 });
    expect(byReviewer.url).toMatch(/\/share\/review\/[A-Za-z0-9_-]{43}$/);
    expect(byReviewer.state).toBe("active");
    expect(new Date(byReviewer.expiresAt ?? 0).getTime()).toBeGreaterThan(Date.now() + 6.9 * 86_400_000);
    const byOwner = await share(owner);
    expect(byOwner.expiresAt).toBeNull();
    expect((await admin.post(`/api/v1/reviews/${reviewId}/shares`, {})).status).toBe(403);
    expect((await otherReviewer.post(`/api/v1/reviews/${reviewId}/shares`, {})).status).toBe(404);
    expect((await otherMaker.post(`/api/v1/reviews/${reviewId}/shares`, {})).status).toBe(404);
    expect((await anonymous.post(`/api/v1/reviews/${reviewId}/shares`, {})).status).toBe(401);
    // Both see the review's links, never a token.
    const listed = await owner.get(`/api/v1/reviews/${reviewId}/shares`);
    const ids = (listed.body.shares as Share[]).map((s) => s.id);
    expect(ids).toEqual(expect.arrayContaining([byReviewer.id, byOwner.id]));
    expect(JSON.stringify(listed.body)).not.toContain(byReviewer.token);
    expect((await otherMaker.get(`/api/v1/reviews/${reviewId}/shares`)).status).toBe(404);
    const count = async () => ((await owner.get(`/api/v1/reviews/${reviewId}/shares`)).body.shares as Share[]).length;
    const before = await count();
    for (const [body, path] of [[{ expiresInDays: 0 }, "expiresInDays"], [{ expiresInDays: "soon" }, "expiresInDays"], [{ revision: 2 }, ""]] as const) {
      const bad = await reviewer.post(`/api/v1/reviews/${reviewId}/shares`, body);
      expect(bad.status, JSON.stringify(body)).toBe(400);
      expect(bad.body.error?.path).toBe(path);
    }
    expect((await reviewer.post(`/api/v1/reviews/${reviewId}/shares`, { expiresInDays: 400 })).body.error?.message).toContain("Expiry is 1 to 365 days.");
    expect(await count()).toBe(before);
  });

  it("open without signing in: verdict and comments in words, no e-mail address, no private part value", async () => {
    const s = await share(reviewer);
    const r = await anonymous.get(`/api/v1/review-share/${s.token}`);
    expect(r.status, JSON.stringify(r.body).slice(0, 300)).toBe(200);
    const body = r.body as unknown as Shared;
    expect(body.review).toMatchObject({ buildTitle: "Lantern with my own parts", status: "changes_requested", statusLabel: "changes requested", summary: "Press the driver to the wall." });
    expect(body.comments).toEqual([expect.objectContaining({ target: "driver board, high mode", body: "The driver board is the weak point on high." })]);
    const text = JSON.stringify(r.body);
    for (const email of [OWNER_EMAIL, REVIEWER_EMAIL, ...otherEmails]) expect(text).not.toContain(email);
    expect(text).not.toMatch(/@/);
    // The private ratings are neither shown nor recoverable as temperature + headroom.
    expect(text).not.toContain(String(PRIVATE_TJ));
    expect(text).not.toContain(String(PRIVATE_BOARD));
    expect(text).not.toMatch(/My own (emitter|driver)|rthJsp|maxTjC|maxBoardTempC|"trace"|"design"/);
    const high = body.results?.scenarios.find((x) => x.label === "high mode");
    expect(high, text.slice(0, 400)).toBeDefined();
    const place = (p: string) => high!.limits.find((l) => l.place === p);
    expect(place("driver board")).toMatchObject({ limitC: null, headroomK: null });
    expect(place("LED junction")).toMatchObject({ limitC: null, headroomK: null });
    expect(Number.isFinite(place("driver board")!.temperatureC)).toBe(true);
    // The housing surface limit is a touch threshold, not a part's rating: it is shown.
    expect(place("housing surface")?.limitC).toEqual(expect.any(Number));
    // The heat path is drawn with the reviewer's pin on the driver board in high mode; links through the
    // owner's private emitter and driver carry no figures, the housing's (a public part) do.
    const path = body.heatPaths.find((h) => h.scenarioId === "mode:high");
    expect(path?.pins).toEqual({ "node:driver": 1 });
    expect(path!.thermal.nodes.map((n) => n.place)).toEqual(expect.arrayContaining(["driver board", "LED junction"]));
    const fromDriver = path!.thermal.links.filter((l) => l.from === "driver");
    expect(fromDriver.length).toBeGreaterThan(0);
    for (const l of fromDriver) expect(l).toMatchObject({ watts: null, kelvinPerWatt: null });
    for (const l of path!.thermal.links.filter((x) => x.from === "junction")) expect(l.kelvinPerWatt).toBeNull();
    expect(path!.thermal.links.some((l) => l.kelvinPerWatt !== null && Number.isFinite(l.kelvinPerWatt))).toBe(true);
    // The page reads the same.
    const page = await anonymous.request("GET", `/share/review/${s.token}`);
    expect(page.status).toBe(200);
    expect(String(page.body.text)).toContain("Press the driver to the wall.");
    expect(String(page.body.text)).not.toContain(String(PRIVATE_BOARD));
  });

  it("stop when revoked by either of them, and refuse expired and unknown tokens", async () => {
    const s = await share(owner);
    expect((await otherMaker.request("DELETE", `/api/v1/reviews/${reviewId}/shares/${s.id}`)).status).toBe(404);
    expect((await admin.request("DELETE", `/api/v1/reviews/${reviewId}/shares/${s.id}`)).status).toBe(403);
    expect((await reviewer.request("DELETE", `/api/v1/reviews/${reviewId}/shares/${s.id}`)).status).toBe(200);
    const after = await anonymous.get(`/api/v1/review-share/${s.token}`);
    expect(after.status).toBe(404);
    expect(after.body.error?.message).toBe("This review link was revoked.");
    expect((await owner.request("DELETE", `/api/v1/reviews/${reviewId}/shares/${s.id}`)).status).toBe(404);
    const listed = ((await owner.get(`/api/v1/reviews/${reviewId}/shares`)).body.shares as Share[]).find((x) => x.id === s.id);
    expect(listed?.state).toBe("revoked");

    const e = await share(reviewer, { expiresInDays: 1 });
    await withTestDb((c) => c.query("UPDATE review_share_link SET expires_at = ? WHERE id = ?", [new Date(Date.now() - 60_000), e.id]));
    const expired = await anonymous.get(`/api/v1/review-share/${e.token}`);
    expect(expired.status).toBe(404);
    expect(expired.body.error?.message).toMatch(/^This review link expired on \d{4}-\d{2}-\d{2}\.$/);
    const unknown = await anonymous.get(`/api/v1/review-share/${"B".repeat(43)}`);
    expect(unknown.status).toBe(404);
    expect(unknown.body.error?.message).toBe("This review link does not exist.");
    expect((await anonymous.get("/api/v1/review-share/short")).status).toBe(404);
    // The token is stored hashed: the database does not hold it.
    const rows = await withTestDb(async (c) => (await c.query("SELECT token_hash FROM review_share_link WHERE id = ?", [e.id]))[0] as { token_hash: string }[]);
    expect(rows[0]?.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(rows[0]?.token_hash).not.toBe(e.token);
  });
});
