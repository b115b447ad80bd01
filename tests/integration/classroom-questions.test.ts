import { beforeAll, describe, expect, it } from "vitest";
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { withTestDb } from "../support/db";
import { Client, type Json, signedIn, uniqueEmail } from "../support/http";
import { signUp, waitForMail } from "../support/mail";
import { createParts, newBuild, newUser, retrofitDesign, type PartIds } from "../support/retrofit";

// Worked examples whose values are questions: nothing that carries the numbers opens to a
// student before they are revealed; answers are checked a bounded number of times; an
// invited existing account joins on sign-in; a published example is edited without its
// numbers moving when a part is edited.
let instructor: Client;
let admin: Client;
let parts: PartIds;

type Quantity = { value: number | null; hidden?: boolean };
type Derivation = { links: { key: string; result: Quantity }[]; network: { node: string; temperature: Quantity }[] };
const body = <T>(r: { body: Json }, key: string) => r.body[key] as T;

async function newClass(): Promise<{ id: string; joinCode: string }> {
  const r = await instructor.post("/api/v1/classes", { name: "Questions course", term: "Winter" });
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return body<{ id: string; joinCode: string }>(r, "class");
}

async function newStudent(code: string, tag: string) {
  const s = await newUser(admin, "maker", tag);
  expect((await s.client.post("/api/v1/classes/join", { code })).status).toBe(200);
  return s;
}

/** A build of the instructor's, shared with every signed-in user, published with the junction hidden. */
async function hiddenExample(classId: string, title: string) {
  const buildId = await newBuild(instructor, { title, design: retrofitDesign(parts, "strapped"), visibility: "shared" });
  const r = await instructor.post(`/api/v1/classes/${classId}/examples`, { title, buildId, hidden: ["node:junction"], tolerancePercent: 2 });
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return { buildId, exampleId: body<{ id: string }>(r, "example").id };
}

beforeAll(async () => {
  instructor = await signedIn("instructor@sinkwise.test");
  admin = await signedIn("admin@sinkwise.test");
  parts = await createParts(instructor, "shared");
});

describe("hidden values stay hidden on every path", () => {
  it("a student cannot open the example's build, its Budget, Side by side, a fork or its design until the values are revealed", async () => {
    const cls = await newClass();
    const { buildId, exampleId } = await hiddenExample(cls.id, "Hidden junction lantern");
    const student = (await newStudent(cls.joinCode, "questions-student")).client;

    // The build (shared with everyone, and behind an example of their class) is not found for them.
    expect((await student.get(`/api/v1/builds/${buildId}`)).status).toBe(404);
    expect((await student.post(`/api/v1/builds/${buildId}/solve`, { revision: 1 })).status).toBe(404);
    const mine = await newBuild(student, { title: "My own lantern", design: retrofitDesign(parts, "floating") });
    expect((await student.get(`/api/v1/compare?items=${mine}@1,${buildId}@1`)).status).toBe(404);
    const page = await student.get(`/builds/${buildId}`);
    expect(page.status).toBe(404);
    const fork = await student.post(`/api/v1/examples/${exampleId}/fork`);
    expect(fork.status).toBe(409);
    expect(fork.body.error?.message).toMatch(/still questions/);
    const file = await student.get(`/api/v1/examples/${exampleId}/export`);
    expect(file.status).toBe(200);
    expect((file.body.build as { design: unknown }).design).toBeNull();
    const seen = await student.get(`/api/v1/examples/${exampleId}`);
    expect(body<Derivation>(seen, "derivation").network.find((n) => n.node === "junction")!.temperature).toMatchObject({ value: null, hidden: true });
    expect(JSON.stringify(seen.body)).not.toMatch(/"buildId":"[^"]+","buildTitle"[^}]*"hidden":\["/);

    // The instructor still opens everything; another signed-in user (not in the class) still sees the shared build.
    expect((await instructor.get(`/api/v1/builds/${buildId}`)).status).toBe(200);
    const outsider = await newUser(admin, "maker", "questions-outsider");
    expect((await outsider.client.get(`/api/v1/builds/${buildId}`)).status).toBe(200);

    // Revealed: the build, its Budget and a fork open.
    expect((await instructor.patch(`/api/v1/examples/${exampleId}`, { reveal: true })).status).toBe(200);
    expect((await student.get(`/api/v1/builds/${buildId}`)).status).toBe(200);
    expect((await student.post(`/api/v1/examples/${exampleId}/fork`)).status).toBe(201);
    expect(((await student.get(`/api/v1/examples/${exampleId}/export`)).body.build as { design: unknown }).design).not.toBeNull();
  });

  it("a reveal date in the past opens the build as a reveal by hand does", async () => {
    const cls = await newClass();
    const { buildId, exampleId } = await hiddenExample(cls.id, "Reveal-date lantern");
    const student = (await newStudent(cls.joinCode, "questions-dated")).client;
    expect((await student.get(`/api/v1/builds/${buildId}`)).status).toBe(404);
    await withTestDb((c) => c.query("UPDATE worked_example SET reveal_at = ? WHERE id = ?", [new Date(Date.now() - 60_000), exampleId]));
    expect((await student.get(`/api/v1/builds/${buildId}`)).status).toBe(200);
  });
});

describe("no other path to the same build gives the questions away", () => {
  it("an exercise starting from the example's build cannot be started until the values are revealed; the instructor is told why", async () => {
    const cls = await newClass();
    const { buildId, exampleId } = await hiddenExample(cls.id, "Starter behind questions");
    const student = await newStudent(cls.joinCode, "questions-starter");
    const x = await instructor.post(`/api/v1/classes/${cls.id}/exercises`, { title: "Cool the driver", buildId, dueAt: new Date(Date.now() + 86_400_000).toISOString() });
    expect(x.status, JSON.stringify(x.body)).toBe(201);
    expect(x.body.warning).toMatch(/Students can start this exercise once you reveal the values of the worked example “Starter behind questions”/);
    const exerciseId = body<{ id: string }>(x, "exercise").id;
    const ownBuilds = async () => withTestDb(async (c) => ((await c.query("SELECT count(*) AS n FROM build WHERE owner_id = ?", [student.id]))[0] as { n: number }[])[0]!.n);

    // Refused with the reason, and no copy written.
    const start = await student.client.post(`/api/v1/exercises/${exerciseId}/start`);
    expect(start.status).toBe(409);
    expect(start.body.error).toMatchObject({ code: "conflict:exercise", message: expect.stringMatching(/starts from the build of the worked example “Starter behind questions”, whose values are still questions/) });
    expect(await ownBuilds()).toBe(0);
    const page = await student.client.get(`/classes/${cls.id}/exercises/${exerciseId}`);
    expect(String(page.body.text)).toContain("whose values are still questions");
    expect(String(page.body.text)).not.toContain("Start (make my own copy)");

    // The instructor starts it (they see the values anyway); once revealed, the student does too.
    expect((await instructor.post(`/api/v1/exercises/${exerciseId}/start`)).status).toBe(201);
    expect((await instructor.patch(`/api/v1/examples/${exampleId}`, { reveal: true })).status).toBe(200);
    expect((await student.client.post(`/api/v1/exercises/${exerciseId}/start`)).status).toBe(201);
    expect(await ownBuilds()).toBe(1);

    // Hiding the values again: the instructor is told that a student already holds a copy.
    expect((await instructor.patch(`/api/v1/examples/${exampleId}`, { reveal: false })).status).toBe(200);
    const examplePage = await instructor.get(`/classes/${cls.id}/examples/${exampleId}`);
    expect(String(examplePage.body.text)).toMatch(/1 student already has their own copy of this example(&#x27;|')s build/);
  });

  it("share links of the build and of a review of it stay closed while the values are questions, and the owner is told why", async () => {
    const cls = await newClass();
    const { buildId, exampleId } = await hiddenExample(cls.id, "Shared behind questions");
    const anonymous = new Client();
    const made = await instructor.post(`/api/v1/builds/${buildId}/shares`, { revision: 1 });
    expect(made.status, JSON.stringify(made.body)).toBe(201);
    const token = body<{ token: string }>(made, "share").token;
    const review = await instructor.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: "reviewer@sinkwise.test" });
    expect(review.status, JSON.stringify(review.body)).toBe(201);
    const reviewShare = await instructor.post(`/api/v1/reviews/${body<{ id: string }>(review, "review").id}/shares`, {});
    expect(reviewShare.status, JSON.stringify(reviewShare.body)).toBe(201);
    const reviewToken = body<{ token: string }>(reviewShare, "share").token;

    const opened = await anonymous.get(`/api/v1/share/${token}`);
    expect(opened.status).toBe(409);
    expect(opened.body.error).toMatchObject({ code: "conflict:share", message: expect.stringMatching(/values are still questions for a class/) });
    expect(JSON.stringify(opened.body)).not.toContain("temperaturesC");
    const openedReview = await anonymous.get(`/api/v1/review-share/${reviewToken}`);
    expect(openedReview.status).toBe(409);
    expect(JSON.stringify(openedReview.body)).not.toContain("scenarios");
    const sharedPage = await anonymous.get(`/share/${token}`);
    expect(String(sharedPage.body.text)).toContain("Try the link again after the values are revealed.");
    const heatPath = await instructor.get(`/builds/${buildId}`);
    expect(String(heatPath.body.text)).toContain("links to this build do not open: they would show the answers");

    expect((await instructor.patch(`/api/v1/examples/${exampleId}`, { reveal: true })).status).toBe(200);
    expect((await anonymous.get(`/api/v1/share/${token}`)).status).toBe(200);
    expect((await anonymous.get(`/api/v1/review-share/${reviewToken}`)).status).toBe(200);
    expect(String((await instructor.get(`/builds/${buildId}`)).body.text)).not.toContain("they would show the answers");
  });
});

describe("answer checks are rate limited", () => {
  it("20 checks per question in ten minutes, counted atomically under a burst; 429 names the field, and another question has its own allowance", async () => {
    const cls = await newClass();
    const { exampleId } = await hiddenExample(cls.id, "Rate-limited lantern");
    const student = (await newStudent(cls.joinCode, "questions-guesser")).client;
    const burst = await Promise.all(Array.from({ length: 26 }, (_, i) => student.post(`/api/v1/examples/${exampleId}/answers`, { key: "node:junction", value: 40 + i })));
    const statuses = burst.map((r) => r.status);
    expect(statuses.filter((s) => s === 200)).toHaveLength(20);
    expect(statuses.filter((s) => s === 429)).toHaveLength(6);
    const refused = burst.find((r) => r.status === 429)!;
    expect(refused.body.error).toMatchObject({ code: "rate_limited:answer", path: "value" });
    expect(refused.body.error?.message).toMatch(/Too many answers checked for this value/);
    // The instructor hides a second value: it has an allowance of its own.
    const full = await instructor.get(`/api/v1/examples/${exampleId}`);
    const link = body<Derivation>(full, "derivation").links[0]!.key;
    expect((await instructor.patch(`/api/v1/examples/${exampleId}`, { hidden: ["node:junction", link] })).status).toBe(200);
    expect((await student.post(`/api/v1/examples/${exampleId}/answers`, { key: link, value: 1 })).status).toBe(200);
  });
});

describe("an invited existing account joins on sign-in", () => {
  it("signing in with the invited address joins the class once; the invitation is used", async () => {
    const cls = await newClass();
    const existing = await newUser(admin, "maker", "invited-existing");
    const inv = await instructor.post(`/api/v1/classes/${cls.id}/invitations`, { emails: [existing.email.toUpperCase()] });
    expect(inv.status, JSON.stringify(inv.body)).toBe(201);
    await waitForMail(existing.email, "Invitation to the class");
    expect(body<{ id: string }[]>(await existing.client.get("/api/v1/classes"), "classes").map((c) => c.id)).not.toContain(cls.id);

    const again = new Client();
    const signin = await again.post("/api/v1/auth/signin", { email: existing.email, password: "long enough pw" });
    expect(signin.status).toBe(200);
    expect(body<{ id: string }[]>(signin, "joinedClasses")).toEqual([expect.objectContaining({ id: cls.id })]);
    const mine = body<{ id: string; myRole: string }[]>(await again.get("/api/v1/classes"), "classes");
    expect(mine).toContainEqual(expect.objectContaining({ id: cls.id, myRole: "student" }));
    // Used: a second sign-in joins nothing more, and the link from the mail is refused as used.
    const second = await new Client().post("/api/v1/auth/signin", { email: existing.email, password: "long enough pw" });
    expect(body<unknown[]>(second, "joinedClasses")).toEqual([]);
    const used = await withTestDb(async (c) => {
      const [rows] = await c.query("SELECT used_by FROM class_invitation WHERE class_id = ?", [cls.id]);
      return rows as { used_by: string }[];
    });
    expect(used).toEqual([{ used_by: existing.id }]);
  });

  it("a wrong password joins nothing and says nothing about invitations", async () => {
    const cls = await newClass();
    const email = uniqueEmail("invited-wrongpw");
    const u = await signUp(new Client(), { email, password: "long enough pw", displayName: "Wrong pw" });
    expect(u.status).toBe(201);
    await instructor.post(`/api/v1/classes/${cls.id}/invitations`, { emails: [email] });
    const r = await new Client().post("/api/v1/auth/signin", { email, password: "not the password" });
    expect(r.status).toBe(401);
    expect(JSON.stringify(r.body)).not.toMatch(/class/i);
    const open = await withTestDb(async (c) => {
      const [rows] = await c.query("SELECT used_at FROM class_invitation WHERE class_id = ?", [cls.id]);
      return rows as { used_at: Date | null }[];
    });
    expect(open).toEqual([{ used_at: null }]);
  });
});

describe("editing a published worked example", () => {
  it("title and narrative change; bad input names the field and writes nothing; the numbers stay as published when a part is edited", async () => {
    const cls = await newClass();
    const own = await createParts(instructor, "private");
    const buildId = await newBuild(instructor, { title: "Pinned lantern", design: retrofitDesign(own, "strapped") });
    const created = await instructor.post(`/api/v1/classes/${cls.id}/examples`, { title: "Pinned", buildId, narrative: "First text." });
    const exampleId = body<{ id: string }>(created, "example").id;
    const before = body<Derivation>(await instructor.get(`/api/v1/examples/${exampleId}`), "derivation").network.find((n) => n.node === "junction")!.temperature.value!;

    const edited = await instructor.patch(`/api/v1/examples/${exampleId}`, { title: "Pinned, edited", narrative: "Second text with $R = L/(kA)$." });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    const empty = await instructor.patch(`/api/v1/examples/${exampleId}`, { title: "" });
    expect(empty.status).toBe(400);
    expect(empty.body.error).toMatchObject({ path: "title", message: expect.stringContaining("Enter the example title.") });
    const page = await instructor.get(`/classes/${cls.id}/examples/${exampleId}/edit`);
    expect(page.status).toBe(200);
    expect(String(page.body.text ?? page.body)).toContain("Pinned, edited");

    // A student of the class gets "not found" for the edit screen and cannot change the example.
    const student = (await newStudent(cls.joinCode, "questions-editor")).client;
    expect((await student.get(`/classes/${cls.id}/examples/${exampleId}/edit`)).status).toBe(404);
    expect((await student.patch(`/api/v1/examples/${exampleId}`, { title: "Mine now" })).status).toBe(403);

    // Edit a part the revision used, drop the cached answers, and work the example out again.
    expect((await instructor.patch(`/api/v1/parts/${own.emitter}`, { specs: { ...GOOD_PARTS.emitter.specs, rthJspKPerW: "9 K/W" } })).status).toBe(200);
    await withTestDb((c) => c.query("DELETE rr FROM solve_cache rr JOIN build_revision r ON r.id = rr.revision_id WHERE r.build_id = ?", [buildId]));
    const after = body<Derivation>(await instructor.get(`/api/v1/examples/${exampleId}`), "derivation").network.find((n) => n.node === "junction")!.temperature.value!;
    expect(Math.abs(after - before)).toBeLessThanOrEqual(Math.abs(before) * 1e-6);
    const edit = await instructor.get(`/classes/${cls.id}/examples/${exampleId}/edit`);
    expect(String(edit.body.text ?? edit.body)).toMatch(/changed in the bin since/);
  });
});
