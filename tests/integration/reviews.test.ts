import { beforeAll, describe, expect, it } from "vitest";
import { Client, signedIn } from "../support/http";
import { waitForMail } from "../support/mail";
import { createParts, newBuild, newUser, retrofitDesign, type PartIds } from "../support/retrofit";

// Reviews by role: owner (demo maker), assigned reviewer (demo reviewer), another reviewer,
// another maker, anonymous, admin.
let owner: Client;
let reviewer: Client;
let otherReviewer: Client;
let otherReviewerEmail = "";
let otherMaker: Client;
let otherMakerEmail = "";
let admin: Client;
const anonymous = new Client();
let parts: PartIds;
const REVIEWER_EMAIL = "reviewer@sinkwise.test";

type Review = { id: string; status: string; revisionNumber: number; olderRevision: boolean; summary: string; reviewerId: string; buildId: string };
type Comment = { anchorKind: string; anchorKey: string; target: string; body: string; authorName: string };

beforeAll(async () => {
  [owner, reviewer, admin] = await Promise.all([signedIn("maker@sinkwise.test"), signedIn(REVIEWER_EMAIL), signedIn("admin@sinkwise.test")]);
  const r2 = await newUser(admin, "reviewer", "second-reviewer");
  otherReviewer = r2.client;
  otherReviewerEmail = r2.email;
  const m2 = await newUser(admin, "maker", "other-maker");
  otherMaker = m2.client;
  otherMakerEmail = m2.email;
  parts = await createParts(owner, "private");
});

async function privateBuild(title = "Lantern under review"): Promise<string> {
  return newBuild(owner, { title, design: retrofitDesign(parts, "strapped") });
}

async function requestReview(buildId: string, body: Record<string, unknown> = {}): Promise<string> {
  const r = await owner.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: REVIEWER_EMAIL, ...body });
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return (r.body.review as { id: string }).id;
}

describe("reviews: requesting one", () => {
  it("e-mails the reviewer a link to the review (received by the fake SMTP server) and notifies them", async () => {
    const title = `Bicycle headlamp ${Date.now().toString(36)}`;
    const buildId = await privateBuild(title);
    const before = (await reviewer.get("/api/v1/notifications")).body.unread as number;
    const r = await owner.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: "Reviewer@Sinkwise.test", message: "Is the strap enough on high?" });
    expect(r.status).toBe(201);
    expect(r.body.mailed).toBe(true);
    const id = (r.body.review as { id: string }).id;
    const mail = await waitForMail(REVIEWER_EMAIL, title);
    expect(mail.subject).toBe(`Review requested: ${title} (revision 1)`);
    expect(mail.text).toContain(`/reviews/${id}`);
    expect(mail.text).toContain("Is the strap enough on high?");
    const notes = await reviewer.get("/api/v1/notifications");
    expect(notes.body.unread).toBe(before + 1);
    const items = notes.body.items as { kind: string; reviewId: string }[];
    expect(items[0]).toMatchObject({ kind: "review_requested", reviewId: id });
  });

  it("refuses a reviewer address that is not a reviewer, naming reviewerEmail, and writes nothing", async () => {
    const buildId = await privateBuild();
    for (const reviewerEmail of [otherMakerEmail, "nobody-here@example.org", "admin@sinkwise.test"]) {
      const r = await owner.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail });
      expect(r.status).toBe(400);
      expect(r.body.error?.path).toBe("reviewerEmail");
      expect(r.body.error?.message).toContain(reviewerEmail);
    }
    const bad = await owner.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: "not an address" });
    expect(bad.status).toBe(400);
    expect(bad.body.error?.path).toBe("reviewerEmail");
    const noRevision = await owner.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: REVIEWER_EMAIL, revision: 9 });
    expect(noRevision.status).toBe(404);
    expect(noRevision.body.error?.path).toBe("revision");
    expect(((await owner.get(`/api/v1/builds/${buildId}/reviews`)).body.reviews as unknown[]).length).toBe(0);
  });

  it("lets only the owner ask: other makers 404 on a private build, 403 on a shared one; anonymous 401", async () => {
    const buildId = await privateBuild();
    expect((await otherMaker.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: REVIEWER_EMAIL })).status).toBe(404);
    expect((await anonymous.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: REVIEWER_EMAIL })).status).toBe(401);
    expect((await admin.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: REVIEWER_EMAIL })).status).toBe(403);
    const shared = await newBuild(owner, { title: "Shared lamp", visibility: "shared", design: retrofitDesign(parts, "floating") });
    const r = await otherMaker.post(`/api/v1/builds/${shared}/reviews`, { reviewerEmail: REVIEWER_EMAIL });
    expect(r.status).toBe(403);
    expect(r.body.error?.code).toBe("forbidden:build");
  });

  it("refuses a second open request of the same revision from the same reviewer", async () => {
    const buildId = await privateBuild();
    await requestReview(buildId);
    const again = await owner.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: REVIEWER_EMAIL });
    expect(again.status).toBe(409);
  });
});

describe("reviews: who sees them and the build under review", () => {
  it("gives the assigned reviewer read access to the private build, never edit", async () => {
    const buildId = await privateBuild();
    expect((await reviewer.get(`/api/v1/builds/${buildId}`)).status).toBe(404);
    await requestReview(buildId);
    const seen = await reviewer.get(`/api/v1/builds/${buildId}`);
    expect(seen.status).toBe(200);
    expect((seen.body.build as { access: { canEdit: boolean; canView: boolean } }).access).toMatchObject({ canView: true, canEdit: false });
    const edit = await reviewer.patch(`/api/v1/builds/${buildId}`, { title: "Reviewer was here" });
    expect(edit.status).toBe(403);
    expect((await reviewer.request("DELETE", `/api/v1/builds/${buildId}`)).status).toBe(403);
    expect((await otherReviewer.get(`/api/v1/builds/${buildId}`)).status).toBe(404);
  });

  it("shows the review to its reviewer, the owner and an admin; 404 for others; 401 anonymous", async () => {
    const buildId = await privateBuild();
    const id = await requestReview(buildId, { message: "please" });
    for (const c of [owner, reviewer, admin]) {
      const r = await c.get(`/api/v1/reviews/${id}`);
      expect(r.status).toBe(200);
      expect((r.body.review as Review).status).toBe("requested");
    }
    expect((await reviewer.get(`/api/v1/reviews/${id}`)).body.role).toBe("reviewer");
    expect((await owner.get(`/api/v1/reviews/${id}`)).body.role).toBe("owner");
    expect((await otherReviewer.get(`/api/v1/reviews/${id}`)).status).toBe(404);
    expect((await otherMaker.get(`/api/v1/reviews/${id}`)).status).toBe(404);
    expect((await anonymous.get(`/api/v1/reviews/${id}`)).status).toBe(401);
    expect((await owner.get(`/api/v1/reviews/nope`)).status).toBe(404);
  });

  it("lists the reviewer's queue and the maker's requests", async () => {
    const buildId = await privateBuild("Queue lamp");
    const id = await requestReview(buildId);
    const queue = await reviewer.get("/api/v1/reviews");
    expect((queue.body.assigned as Review[]).some((r) => r.id === id)).toBe(true);
    const mine = await owner.get("/api/v1/reviews");
    expect((mine.body.requested as Review[]).some((r) => r.id === id)).toBe(true);
    expect((await otherReviewer.get("/api/v1/reviews")).body.assigned).toEqual([]);
    expect((await anonymous.get("/api/v1/reviews")).status).toBe(401);
    const onBuild = await reviewer.get(`/api/v1/builds/${buildId}/reviews`);
    expect((onBuild.body.reviews as Review[]).map((r) => r.id)).toEqual([id]);
  });
});

describe("reviews: pinned comments and the verdict", () => {
  it("takes comments pinned to a node, a link or a figure from the reviewer and the owner only", async () => {
    const buildId = await privateBuild();
    const id = await requestReview(buildId);
    const c1 = await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "node", key: "driver" }, body: "Driver board runs close to its limit on high." });
    expect(c1.status, JSON.stringify(c1.body)).toBe(201);
    const c2 = await owner.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "link", key: "driver->wall-driver" }, body: "The strap is 25 mm wide." });
    expect(c2.status, JSON.stringify(c2.body)).toBe(201);
    expect((await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "figure", key: "mode:high/headroom" }, body: "See the headroom." })).status).toBe(201);
    expect((await otherReviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "node", key: "driver" }, body: "x" })).status).toBe(404);
    expect((await otherMaker.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "node", key: "driver" }, body: "x" })).status).toBe(404);
    expect((await anonymous.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "node", key: "driver" }, body: "x" })).status).toBe(401);
    expect((await admin.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "node", key: "driver" }, body: "x" })).status).toBe(403);
    const badKind = await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "part", key: "driver" }, body: "x" });
    expect(badKind.status).toBe(400);
    expect(badKind.body.error?.path).toBe("anchor.kind");
    const nowhere = await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "node", key: "flux-capacitor" }, body: "x" });
    expect(nowhere.status).toBe(400);
    expect(nowhere.body.error?.path).toBe("anchor.key");
    // The message names the field on screen and what is wrong in words, never an id.
    expect(nowhere.body.error?.message).toMatch(/^Pinned to: that place in the heat path does not exist in revision \d+/);
    expect(nowhere.body.error?.message).not.toMatch(/flux-capacitor|junction|wall-engine/);
    const missingScenario = await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "node", key: "driver#mode:turbo" }, body: "x" });
    expect(missingScenario.status).toBe(400);
    expect(missingScenario.body.error?.path).toBe("anchor.key");
    const pinned = await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "node", key: "driver#mode:high" }, body: "Too hot in high." });
    expect(pinned.status, JSON.stringify(pinned.body)).toBe(201);
    expect((pinned.body.comment as { target: string }).target).toBe("driver board, high mode");
    const anchors = (await reviewer.get(`/api/v1/reviews/${id}`)).body.anchors as { nodes: { key: string }[]; links: { key: string }[]; figures: { key: string }[] };
    expect(anchors.nodes.map((n) => n.key)).toEqual(expect.arrayContaining(["junction", "driver", "wall-driver"]));
    expect(anchors.links.map((n) => n.key)).toContain("driver->wall-driver");
    expect(anchors.figures.map((n) => n.key)).toContain("mode:high/headroom");
    const empty = await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "node", key: "driver" }, body: "  " });
    expect(empty.status).toBe(400);
    expect(empty.body.error?.path).toBe("body");
    const comments = (await owner.get(`/api/v1/reviews/${id}`)).body.comments as Comment[];
    expect(comments.map((c) => [c.anchorKind, c.anchorKey])).toEqual([
      ["node", "driver"],
      ["link", "driver->wall-driver"],
      ["figure", "mode:high/headroom"],
      ["node", "driver#mode:high"],
    ]);
    expect(comments.map((c) => c.target)).toEqual(["driver board", expect.any(String), "headroom table, high mode", "driver board, high mode"]);
    // Notifications name the target in words, never by its key.
    const told = (await owner.get("/api/v1/notifications")).body.items as { text: string; reviewId: string }[];
    const mine = told.filter((n) => n.reviewId === id).map((n) => n.text);
    expect(mine.some((t) => t.includes("commented on the driver board, high mode"))).toBe(true);
    expect(mine.join("\n")).not.toMatch(/#mode|->|mode:high/);
    // The owner hears of the reviewer's comments.
    const notes = (await owner.get("/api/v1/notifications")).body.items as { kind: string; reviewId: string }[];
    expect(notes.some((n) => n.kind === "comment" && n.reviewId === id)).toBe(true);
  });

  it("takes a comment pinned on a point of a warm-up curve, named in words, and refuses a point the curve does not have", async () => {
    const id = await requestReview(await privateBuild("Lantern with a warm-up to pin"));
    const before = ((await owner.get(`/api/v1/reviews/${id}`)).body.comments as Comment[]).length;
    const onCurve = await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "figure", key: "mode:high/warmup/driver-board/at/2" }, body: "Already close after two minutes." });
    expect(onCurve.status, JSON.stringify(onCurve.body)).toBe(201);
    expect((onCurve.body.comment as Comment).target).toBe("warm-up of the driver board at 2 min, high mode");
    const past = await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "figure", key: "mode:high/warmup/driver-board/at/99999" }, body: "x" });
    expect(past.status).toBe(400);
    expect(past.body.error?.path).toBe("anchor.key");
    expect(past.body.error?.message).toMatch(/^Pinned to: that point is not on a warm-up curve of revision \d+/);
    const nowhere = await reviewer.post(`/api/v1/reviews/${id}/comments`, { anchor: { kind: "figure", key: "mode:turbo/warmup/driver-board/at/2" }, body: "x" });
    expect(nowhere.status).toBe(400);
    // Nothing written by the refusals.
    expect(((await owner.get(`/api/v1/reviews/${id}`)).body.comments as Comment[]).length).toBe(before + 1);
  });

  it("takes the verdict from the assigned reviewer only, e-mails and notifies the maker, and takes it once", async () => {
    const title = `Inspection lamp ${Date.now().toString(36)}`;
    const buildId = await newBuild(owner, { title, design: retrofitDesign(parts, "ground-plane-to-wall") });
    const id = await requestReview(buildId);
    const verdict = { status: "changes_requested", summary: "Time-limit high mode to 10 minutes." };
    expect((await owner.post(`/api/v1/reviews/${id}/verdict`, verdict)).status).toBe(403);
    expect((await admin.post(`/api/v1/reviews/${id}/verdict`, verdict)).status).toBe(403);
    expect((await otherReviewer.post(`/api/v1/reviews/${id}/verdict`, verdict)).status).toBe(404);
    expect((await otherMaker.post(`/api/v1/reviews/${id}/verdict`, verdict)).status).toBe(404);
    expect((await anonymous.post(`/api/v1/reviews/${id}/verdict`, verdict)).status).toBe(401);
    const bad = await reviewer.post(`/api/v1/reviews/${id}/verdict`, { status: "fine", summary: "ok" });
    expect(bad.status).toBe(400);
    expect(bad.body.error?.path).toBe("status");
    const noSummary = await reviewer.post(`/api/v1/reviews/${id}/verdict`, { status: "approved", summary: "" });
    expect(noSummary.status).toBe(400);
    expect(noSummary.body.error?.path).toBe("summary");
    expect(noSummary.body.error?.message).toBe("Summary: write a sentence or two saying why.");
    expect(((await owner.get(`/api/v1/reviews/${id}`)).body.review as Review).status).toBe("requested");

    const ok = await reviewer.post(`/api/v1/reviews/${id}/verdict`, verdict);
    expect(ok.status).toBe(200);
    const mail = await waitForMail("maker@sinkwise.test", `Verdict on ${title}`);
    expect(mail.subject).toBe(`Verdict on ${title}: changes requested`);
    expect(mail.text).toContain("Time-limit high mode to 10 minutes.");
    const seen = (await owner.get(`/api/v1/builds/${buildId}/reviews`)).body.reviews as Review[];
    expect(seen[0]).toMatchObject({ id, status: "changes_requested", summary: verdict.summary });
    const notes = (await owner.get("/api/v1/notifications")).body.items as { kind: string; reviewId: string }[];
    expect(notes.some((n) => n.kind === "verdict" && n.reviewId === id)).toBe(true);
    const twice = await reviewer.post(`/api/v1/reviews/${id}/verdict`, { status: "approved", summary: "Changed my mind." });
    expect(twice.status).toBe(409);
    expect(((await owner.get(`/api/v1/reviews/${id}`)).body.review as Review).status).toBe("changes_requested");
  });

  it("marks earlier reviews as about an older revision once the build has a new one", async () => {
    const buildId = await privateBuild();
    const id = await requestReview(buildId);
    expect(((await owner.get(`/api/v1/reviews/${id}`)).body.review as Review).olderRevision).toBe(false);
    const patched = await owner.patch(`/api/v1/builds/${buildId}`, { design: retrofitDesign(parts, "ground-plane-to-wall"), note: "pressed the driver to the wall" });
    expect(patched.status).toBe(200);
    const after = (await reviewer.get(`/api/v1/reviews/${id}`)).body.review as Review;
    expect(after).toMatchObject({ revisionNumber: 1, olderRevision: true });
    // A review of the new revision is not older.
    const second = await requestReview(buildId);
    expect(((await owner.get(`/api/v1/reviews/${second}`)).body.review as Review).revisionNumber).toBe(2);
  });
});

describe("notifications", () => {
  it("counts unread ones, marks them read, and needs a session", async () => {
    const buildId = await privateBuild();
    await requestReview(buildId);
    const before = await reviewer.get("/api/v1/notifications");
    expect(before.body.unread as number).toBeGreaterThan(0);
    const first = (before.body.items as { id: string }[])[0]!;
    const one = await reviewer.post("/api/v1/notifications/read", { ids: [first.id] });
    expect(one.body.marked).toBe(1);
    // Someone else's notification ids are not theirs to mark.
    expect((await otherMaker.post("/api/v1/notifications/read", { ids: [first.id] })).body.marked).toBe(0);
    await reviewer.post("/api/v1/notifications/read", {});
    expect((await reviewer.get("/api/v1/notifications")).body.unread).toBe(0);
    expect((await reviewer.post("/api/v1/notifications/read", { ids: "all" })).body.error?.path).toBe("ids");
    expect((await anonymous.get("/api/v1/notifications")).status).toBe(401);
    expect((await anonymous.post("/api/v1/notifications/read", {})).status).toBe(401);
  });
});
