import { beforeAll, describe, expect, it } from "vitest";
import { withTestDb } from "../support/db";
import { BASE_URL, Client, type Json, signedIn, uniqueEmail } from "../support/http";
import { waitForMail } from "../support/mail";
import { createParts, newBuild, newUser, retrofitDesign, type PartIds } from "../support/retrofit";

// The Classroom over HTTP with the real database and the mail fake: the whole flow from
// opening a class to feedback, and every access rule of the class, its examples and hand-ins.
const INBOX = process.env.MAIL_INBOX_URL ?? "http://127.0.0.1:1081";

let instructor: Client;
let admin: Client;
let parts: PartIds;
let exampleBuild = "";

type Quantity = { value: number | null; hidden?: boolean; ref?: string };
type Step = { key: string; result: Quantity; inputs: Quantity[] };
type Derivation = {
  scenarioId: string;
  heat: Step[];
  links: Step[];
  network: { key: string; node: string; temperature: Quantity; residualW: number; sourceW: number }[];
  limits: { key: string; temperature: Quantity; headroom: Quantity; verdict: string }[];
  verdict: { value: string | null; hidden: boolean };
  hideable: { key: string }[];
};

const body = <T>(r: { body: Json }, key: string) => r.body[key] as T;

async function newClass(client: Client, name = "Evening course, test"): Promise<{ id: string; joinCode: string }> {
  const r = await client.post("/api/v1/classes", { name, term: "Autumn" });
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return body<{ id: string; joinCode: string }>(r, "class");
}

/** A new account that joins the class with its join code. */
async function newStudent(classCode: string, tag: string): Promise<{ client: Client; id: string }> {
  const s = await newUser(admin, "maker", tag);
  const j = await s.client.post("/api/v1/classes/join", { code: classCode });
  expect(j.status, JSON.stringify(j.body)).toBe(200);
  return { client: s.client, id: s.id };
}

async function newInstructor(tag: string): Promise<Client> {
  const u = await newUser(admin, "maker", tag);
  const p = await admin.patch(`/api/v1/admin/users/${u.id}`, { role: "instructor" });
  expect(p.status).toBe(200);
  return signedIn(u.email, "long enough pw");
}

function tokenFromMail(text: string): string {
  const m = /\/join\/([A-Za-z0-9_-]{43})/.exec(text);
  if (!m) throw new Error(`no invitation link in: ${text}`);
  return m[1]!;
}

async function mailsTo(address: string): Promise<number> {
  const mails = (await (await fetch(`${INBOX}/api/email`)).json()) as { to: { address: string }[] }[];
  return mails.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase())).length;
}

beforeAll(async () => {
  instructor = await signedIn("instructor@sinkwise.test");
  admin = await signedIn("admin@sinkwise.test");
  parts = await createParts(instructor, "shared");
  exampleBuild = await newBuild(instructor, { title: "Lantern for the class", design: retrofitDesign(parts, "strapped") });
});

describe("the whole flow", () => {
  it("invite by e-mail → join from the mail's link → fork → start → hand in → roster → feedback seen by the student", async () => {
    const cls = await newClass(instructor);
    const email = uniqueEmail("invited-student");
    const inv = await instructor.post(`/api/v1/classes/${cls.id}/invitations`, { emails: [email] });
    expect(inv.status, JSON.stringify(inv.body)).toBe(201);
    expect(inv.body).toMatchObject({ invited: 1, mailed: 1 });
    const mail = await waitForMail(email, "Invitation to the class");
    const token = tokenFromMail(mail.text ?? "");

    // The address has no account: the link makes one and joins the class.
    const student = new Client();
    const joined = await student.post("/api/v1/classes/join", { token, displayName: "Invited student", password: "long enough pw" });
    expect(joined.status, JSON.stringify(joined.body)).toBe(201);
    expect(student.hasSession()).toBe(true);
    const mine = await student.get("/api/v1/classes");
    const listed = body<{ id: string; myRole: string; joinCode?: string }[]>(mine, "classes");
    expect(listed).toEqual([expect.objectContaining({ id: cls.id, myRole: "student" })]);
    expect(listed[0]).not.toHaveProperty("joinCode");
    // The same link works once.
    const again = await new Client().post("/api/v1/classes/join", { token, displayName: "Someone", password: "long enough pw" });
    expect(again.status).toBe(409);
    expect(again.body.error?.message).toMatch(/already used/);

    // A worked example with two values hidden.
    const draft = await instructor.post(`/api/v1/classes/${cls.id}/examples`, { title: "Where the junction's heat goes", narrative: "Read $R = L/(kA)$ first.", buildId: exampleBuild });
    expect(draft.status, JSON.stringify(draft.body)).toBe(201);
    const full = await instructor.get(`/api/v1/examples/${body<{ id: string }>(draft, "example").id}`);
    const d = body<Derivation>(full, "derivation");
    const hideKeys = [d.links[0]!.key, "node:junction"];
    const created = await instructor.post(`/api/v1/classes/${cls.id}/examples`, { title: "Questions on the lantern", buildId: exampleBuild, hidden: hideKeys, tolerancePercent: 2 });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const exampleId = body<{ id: string }>(created, "example").id;

    const seen = await student.get(`/api/v1/examples/${exampleId}`);
    expect(seen.status).toBe(200);
    const sd = body<Derivation>(seen, "derivation");
    expect(sd.links[0]!.result).toMatchObject({ value: null, hidden: true });
    expect(sd.network.find((n) => n.node === "junction")!.temperature).toMatchObject({ value: null, hidden: true });
    expect(sd.verdict.hidden).toBe(true);
    expect(JSON.stringify(seen.body)).not.toContain('"hidden":["');

    // Answers are checked within the tolerance without telling the value.
    const truth = d.network.find((n) => n.node === "junction")!.temperature.value!;
    const right = await student.post(`/api/v1/examples/${exampleId}/answers`, { key: "node:junction", value: truth * 1.01 });
    expect(right.body).toMatchObject({ correct: true });
    expect(JSON.stringify(right.body)).not.toContain(String(truth));
    const wrong = await student.post(`/api/v1/examples/${exampleId}/answers`, { key: "node:junction", value: truth * 1.1 });
    expect(wrong.body).toMatchObject({ correct: false });

    // Revealed by the instructor: the student sees the values.
    expect((await instructor.patch(`/api/v1/examples/${exampleId}`, { reveal: true })).status).toBe(200);
    const revealed = body<Derivation>(await student.get(`/api/v1/examples/${exampleId}`), "derivation");
    // The first answer may be worked out afresh and a later one read from the stored result, which keeps
    // 7 significant digits: the revealed value is the same figure to that precision.
    const shown = revealed.network.find((n) => n.node === "junction")!.temperature.value!;
    expect(Math.abs(shown - truth)).toBeLessThanOrEqual(Math.abs(truth) * 1e-6);

    // Fork with one click; Side by side opens with the example and the fork.
    const fork = await student.post(`/api/v1/examples/${exampleId}/fork`);
    expect(fork.status, JSON.stringify(fork.body)).toBe(201);
    const href = body<string>(fork, "compareHref");
    expect(href).toMatch(new RegExp(`^/compare\\?items=${exampleBuild}@1,`));
    const compared = await student.get(`/api/v1/compare?items=${href.split("items=")[1]}`);
    expect(compared.status, JSON.stringify(compared.body)).toBe(200);

    // An exercise: start, save, hand in twice before the due date.
    const ex = await instructor.post(`/api/v1/classes/${cls.id}/exercises`, { title: "Cool the driver", instructions: "Move the driver to the case wall.", buildId: exampleBuild, dueAt: new Date(Date.now() + 3_600_000).toISOString() });
    expect(ex.status, JSON.stringify(ex.body)).toBe(201);
    const exerciseId = body<{ id: string }>(ex, "exercise").id;
    const start = await student.post(`/api/v1/exercises/${exerciseId}/start`);
    expect(start.status).toBe(201);
    const copyId = body<{ id: string }>(start, "build").id;
    expect(body<{ id: string }>(await student.post(`/api/v1/exercises/${exerciseId}/start`), "build").id).toBe(copyId);
    const saved = await student.patch(`/api/v1/builds/${copyId}`, { design: retrofitDesign(parts, "ground-plane-to-wall"), note: "driver on the wall" });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const h1 = await student.post(`/api/v1/exercises/${exerciseId}/handins`, { buildId: copyId, revision: 1 });
    expect(h1.status, JSON.stringify(h1.body)).toBe(201);
    const h2 = await student.post(`/api/v1/exercises/${exerciseId}/handins`, { buildId: copyId });
    expect(body<{ revision: number; late: boolean }>(h2, "handin")).toMatchObject({ revision: 2, late: false });
    const h2Id = body<{ id: string }>(h2, "handin").id;

    // The roster: the latest hand-in counts, with its figures beside the starter's.
    const roster = await instructor.get(`/api/v1/exercises/${exerciseId}`);
    expect(roster.status).toBe(200);
    const r = body<{ starter: { junctionC: number }; rows: { studentName: string; handins: number; latest: { id: string } | null; figures: { junctionC: number; verdict: string } | null }[] }>(roster, "roster");
    const row = r.rows.find((x) => x.studentName === "Invited student")!;
    expect(row.handins).toBe(2);
    expect(row.latest?.id).toBe(h2Id);
    expect(row.figures?.junctionC).toBeGreaterThan(25);
    expect(r.starter.junctionC).toBeGreaterThan(25);
    // The instructor may open the hand-in's build (for Side by side against the starter).
    expect((await instructor.get(`/api/v1/builds/${copyId}`)).status).toBe(200);

    // Feedback: in the app and by e-mail, and on the student's hand-in.
    const fb = await instructor.post(`/api/v1/handins/${h2Id}/feedback`, { feedback: "Good: the driver now sheds its heat into the wall.", mark: "A-" });
    expect(fb.status, JSON.stringify(fb.body)).toBe(200);
    expect(fb.body.mailed).toBe(true);
    await waitForMail(email, "Feedback on your hand-in");
    const notes = await student.get("/api/v1/notifications");
    expect(body<{ kind: string; href: string }[]>(notes, "items")).toContainEqual(expect.objectContaining({ kind: "feedback", href: `/classes/${cls.id}/exercises/${exerciseId}` }));
    const mineNow = await student.get(`/api/v1/exercises/${exerciseId}`);
    expect(body<{ id: string; feedback: string; mark: string }[]>(mineNow, "handins")[0]).toMatchObject({ id: h2Id, feedback: expect.stringContaining("sheds its heat"), mark: "A-" });
    expect(mineNow.body.roster).toBeUndefined();

    // After the due date a hand-in is marked late.
    await withTestDb((c) => c.query("UPDATE exercise SET due_at = ? WHERE id = ?", [new Date(Date.now() - 60_000), exerciseId]));
    const late = await student.post(`/api/v1/exercises/${exerciseId}/handins`, { buildId: copyId });
    expect(body<{ late: boolean }>(late, "handin").late).toBe(true);
  });
});

describe("the derivation", () => {
  it("has the Budget's numbers for the same revision: heat, every link, every node, every limit", async () => {
    const cls = await newClass(instructor, "Derivation check");
    const created = await instructor.post(`/api/v1/classes/${cls.id}/examples`, { title: "Numbers", buildId: exampleBuild, revision: 1 });
    const view = await instructor.get(`/api/v1/examples/${body<{ id: string }>(created, "example").id}`);
    const d = body<Derivation>(view, "derivation");
    const solved = await instructor.post(`/api/v1/builds/${exampleBuild}/solve`, { revision: 1 });
    expect(solved.status).toBe(200);
    type Scenario = { id: string; mode: { emitterHeat: { value: number }; driverLoss: { value: number } } | null; thermal: { links: { index: number; kelvinPerWatt: number }[]; temperaturesC: Record<string, number>; limits: { id: string; temperatureC: number; headroomK: number }[]; verdict: string } };
    const scenario = (solved.body.evaluation as { scenarios: Scenario[] }).scenarios.find((s) => s.id === d.scenarioId)!;
    expect(scenario).toBeDefined();
    expect(d.heat.find((h) => h.key === "heat:emitter-heat")!.result.value).toBe(scenario.mode!.emitterHeat.value);
    expect(d.heat.find((h) => h.key === "heat:driver-loss")!.result.value).toBe(scenario.mode!.driverLoss.value);
    expect(d.links).toHaveLength(scenario.thermal.links.length);
    for (const l of scenario.thermal.links) expect(d.links.find((x) => x.key === `link:${l.index}`)!.result.value).toBe(l.kelvinPerWatt);
    for (const n of d.network) {
      expect(n.temperature.value).toBe(scenario.thermal.temperaturesC[n.node]);
      // Each node's balance closes: heat in equals heat out.
      expect(Math.abs(n.residualW)).toBeLessThan(1e-3);
    }
    for (const l of scenario.thermal.limits) {
      const step = d.limits.find((x) => x.key === `limit:${l.id}`)!;
      expect(step.temperature.value).toBe(l.temperatureC);
      expect(step.headroom.value).toBe(l.headroomK);
    }
    expect(d.verdict.value).toBe(scenario.thermal.verdict);
  });
});

describe("access", () => {
  let cls: { id: string; joinCode: string };
  let a: { client: Client; id: string };
  let b: { client: Client; id: string };
  let exampleId = "";
  let exerciseId = "";
  let handinA = "";

  beforeAll(async () => {
    cls = await newClass(instructor, "Access rules");
    a = await newStudent(cls.joinCode, "student-a");
    b = await newStudent(cls.joinCode, "student-b");
    const ex = await instructor.post(`/api/v1/classes/${cls.id}/examples`, { title: "Visible to the class", buildId: exampleBuild });
    exampleId = body<{ id: string }>(ex, "example").id;
    const x = await instructor.post(`/api/v1/classes/${cls.id}/exercises`, { title: "Exercise", buildId: exampleBuild, dueAt: new Date(Date.now() + 86_400_000).toISOString() });
    exerciseId = body<{ id: string }>(x, "exercise").id;
    const copy = body<{ id: string }>(await a.client.post(`/api/v1/exercises/${exerciseId}/start`), "build").id;
    const h = await a.client.post(`/api/v1/exercises/${exerciseId}/handins`, { buildId: copy });
    handinA = body<{ id: string }>(h, "handin").id;
    await instructor.post(`/api/v1/handins/${handinA}/feedback`, { feedback: "Private to student A", mark: "7/10" });
  });

  it("a student never sees another student's hand-in, feedback or mark (404)", async () => {
    const other = await b.client.get(`/api/v1/handins/${handinA}`);
    expect(other.status).toBe(404);
    expect(JSON.stringify(other.body)).not.toContain("Private to student A");
    expect(body<unknown[]>(await b.client.get(`/api/v1/exercises/${exerciseId}/handins`), "handins")).toEqual([]);
    const exB = await b.client.get(`/api/v1/exercises/${exerciseId}`);
    expect(JSON.stringify(exB.body)).not.toContain("7/10");
    expect(exB.body.roster).toBeUndefined();
    expect((await b.client.post(`/api/v1/handins/${handinA}/feedback`, { feedback: "x" })).status).toBe(404);
    expect((await a.client.get(`/api/v1/handins/${handinA}`)).body.handin).toMatchObject({ mark: "7/10" });
  });

  it("a student sees only their classes; students cannot teach", async () => {
    const listed = body<{ id: string }[]>(await a.client.get("/api/v1/classes"), "classes");
    expect(listed.map((c) => c.id)).toEqual([cls.id]);
    const own = await a.client.get(`/api/v1/classes/${cls.id}`);
    expect(own.body.class).toMatchObject({ canTeach: false });
    expect(own.body.class).not.toHaveProperty("joinCode");
    expect(JSON.stringify(own.body.members)).not.toContain("@");
    expect((await a.client.post("/api/v1/classes", { name: "Mine" })).status).toBe(403);
    expect((await a.client.post(`/api/v1/classes/${cls.id}/examples`, { title: "x", buildId: exampleBuild })).status).toBe(403);
    expect((await a.client.post(`/api/v1/classes/${cls.id}/invitations`, { emails: ["x@example.org"] })).status).toBe(403);
    expect((await a.client.patch(`/api/v1/classes/${cls.id}`, { rotateJoinCode: true })).status).toBe(403);
    expect((await a.client.request("DELETE", `/api/v1/classes/${cls.id}/members/${b.id}`)).status).toBe(403);
  });

  it("an instructor of class A sees nothing of class B", async () => {
    const other = await newInstructor("other-instructor");
    const own = await newClass(other, "Class B");
    expect((await other.get(`/api/v1/classes/${cls.id}`)).status).toBe(404);
    expect((await other.get(`/api/v1/examples/${exampleId}`)).status).toBe(404);
    expect((await other.get(`/api/v1/exercises/${exerciseId}`)).status).toBe(404);
    expect((await other.get(`/api/v1/handins/${handinA}`)).status).toBe(404);
    expect((await other.post(`/api/v1/handins/${handinA}/feedback`, { feedback: "x" })).status).toBe(404);
    expect((await instructor.get(`/api/v1/classes/${own.id}`)).status).toBe(404);
    expect(body<{ id: string }[]>(await other.get("/api/v1/classes"), "classes").map((c) => c.id)).toEqual([own.id]);
  });

  it("a removed member loses access at once", async () => {
    const c = await newStudent(cls.joinCode, "student-c");
    expect((await c.client.get(`/api/v1/examples/${exampleId}`)).status).toBe(200);
    expect((await instructor.request("DELETE", `/api/v1/classes/${cls.id}/members/${c.id}`)).status).toBe(200);
    expect((await c.client.get(`/api/v1/classes/${cls.id}`)).status).toBe(404);
    expect((await c.client.get(`/api/v1/examples/${exampleId}`)).status).toBe(404);
    expect((await c.client.post(`/api/v1/examples/${exampleId}/fork`)).status).toBe(404);
    expect((await c.client.get(`/api/v1/builds/${exampleBuild}`)).status).toBe(404);
  });

  it("a rotated join code stops working at once", async () => {
    const r = await instructor.patch(`/api/v1/classes/${cls.id}`, { rotateJoinCode: true });
    const fresh = body<{ joinCode: string }>(r, "class").joinCode;
    expect(fresh).not.toBe(cls.joinCode);
    const late = await newUser(admin, "maker", "late-joiner");
    const old = await late.client.post("/api/v1/classes/join", { code: cls.joinCode });
    expect(old.status).toBe(404);
    expect(old.body.error).toMatchObject({ path: "code", message: expect.stringContaining("No class has this join code") });
    expect((await late.client.post("/api/v1/classes/join", { code: fresh.toLowerCase() })).status).toBe(200);
    cls.joinCode = fresh;
  });

  it("an expired invitation is refused with a clear message", async () => {
    const email = uniqueEmail("expired-invite");
    await instructor.post(`/api/v1/classes/${cls.id}/invitations`, { emails: [email] });
    const token = tokenFromMail((await waitForMail(email, "Invitation")).text ?? "");
    await withTestDb((c) => c.query("UPDATE class_invitation SET expires_at = ? WHERE email = ?", [new Date(Date.now() - 1000), email]));
    const r = await new Client().post("/api/v1/classes/join", { token, displayName: "Too late", password: "long enough pw" });
    expect(r.status).toBe(409);
    expect(r.body.error?.message).toMatch(/expired/);
    expect(await withTestDb(async (c) => ((await c.query("SELECT count(*) AS n FROM user WHERE email = ?", [email]))[0] as { n: number }[])[0]!.n)).toBe(0);
  });

  it("an anonymous visitor gets only what a link opens, and a revoked link opens nothing", async () => {
    const anon = new Client();
    expect((await anon.get("/api/v1/classes")).status).toBe(401);
    expect((await anon.get(`/api/v1/classes/${cls.id}`)).status).toBe(401);
    expect((await anon.get(`/api/v1/examples/${exampleId}`)).status).toBe(401);
    expect((await anon.get(`/api/v1/exercises/${exerciseId}`)).status).toBe(401);
    expect((await anon.get(`/api/v1/exercises/${exerciseId}/handins`)).status).toBe(401);
    expect((await anon.get(`/api/v1/handins/${handinA}`)).status).toBe(401);
    expect((await anon.post(`/api/v1/examples/${exampleId}/fork`)).status).toBe(401);
    expect((await anon.get(`/api/v1/builds/${exampleBuild}`)).status).toBe(401);
    const on = await instructor.patch(`/api/v1/examples/${exampleId}`, { visibility: "link" });
    const url = body<string>(on, "linkUrl");
    const token = url.split("/examples/link/")[1]!;
    const opened = await anon.get(`/api/v1/examples/link/${token}`);
    expect(opened.status).toBe(200);
    expect(opened.body.derivation).toBeTruthy();
    expect(JSON.stringify(opened.body)).not.toContain(cls.id);
    await instructor.patch(`/api/v1/examples/${exampleId}`, { visibility: "class" });
    expect((await anon.get(`/api/v1/examples/link/${token}`)).status).toBe(404);
  });

  it("an archived class is read-only", async () => {
    const arch = await newClass(instructor, "To archive");
    expect((await instructor.patch(`/api/v1/classes/${arch.id}`, { archived: true })).body.class).toMatchObject({ archived: true });
    const r = await instructor.post(`/api/v1/classes/${arch.id}/examples`, { title: "x", buildId: exampleBuild });
    expect(r.status).toBe(409);
    expect(r.body.error?.message).toMatch(/archived/);
    expect((await instructor.patch(`/api/v1/classes/${arch.id}`, { name: "renamed" })).status).toBe(409);
    expect((await instructor.patch(`/api/v1/classes/${arch.id}`, { archived: false })).status).toBe(200);
  });
});

describe("bad input", () => {
  let cls: { id: string; joinCode: string };
  beforeAll(async () => {
    cls = await newClass(instructor, "Bad input");
  });

  it("refuses empty and over-long names, naming the field", async () => {
    for (const name of ["", "   ", "x".repeat(201)]) {
      const r = await instructor.post("/api/v1/classes", { name });
      expect(r.status).toBe(400);
      expect(r.body.error).toMatchObject({ path: "name", message: expect.stringMatching(/class name/) });
    }
    const t = await instructor.post(`/api/v1/classes/${cls.id}/examples`, { title: "", buildId: exampleBuild });
    expect(t.body.error).toMatchObject({ path: "title" });
  });

  it("refuses a due date in the past at creation", async () => {
    const r = await instructor.post(`/api/v1/classes/${cls.id}/exercises`, { title: "Late already", buildId: exampleBuild, dueAt: new Date(Date.now() - 3_600_000).toISOString() });
    expect(r.status).toBe(400);
    expect(r.body.error).toMatchObject({ path: "dueAt", message: expect.stringContaining("due date is in the past") });
    const list = body<unknown[]>(await instructor.get(`/api/v1/classes/${cls.id}/exercises`), "exercises");
    expect(list).toHaveLength(0);
  });

  it("refuses a whole invitation list with one malformed address, naming it, and sends nothing", async () => {
    const good = uniqueEmail("good-invite");
    const r = await instructor.post(`/api/v1/classes/${cls.id}/invitations`, { emails: [good, "not an address@", "x@example.org"] });
    expect(r.status).toBe(400);
    expect(r.body.error).toMatchObject({ path: "emails[1]", message: expect.stringContaining('"not an address@"') });
    expect(await mailsTo(good)).toBe(0);
    const listed = await instructor.get(`/api/v1/classes/${cls.id}`);
    expect(JSON.stringify(listed.body.invitations)).not.toContain(good);
  });

  it("refuses a hand-in of a revision that is not the student's, and writes nothing", async () => {
    const s = await newStudent(cls.joinCode, "bad-handin");
    const x = await instructor.post(`/api/v1/classes/${cls.id}/exercises`, { title: "Hand-in check", buildId: exampleBuild, dueAt: new Date(Date.now() + 3_600_000).toISOString() });
    const exerciseId = body<{ id: string }>(x, "exercise").id;
    // The starter is readable to the class, but it is the instructor's.
    const r = await s.client.post(`/api/v1/exercises/${exerciseId}/handins`, { buildId: exampleBuild });
    expect(r.status).toBe(400);
    expect(r.body.error).toMatchObject({ path: "buildId", message: expect.stringContaining("not yours") });
    const none = await s.client.post(`/api/v1/exercises/${exerciseId}/handins`, { buildId: "nope" });
    expect(none.body.error).toMatchObject({ path: "buildId" });
    expect(body<unknown[]>(await s.client.get(`/api/v1/exercises/${exerciseId}/handins`), "handins")).toEqual([]);
  });

  it("refuses hidden values the derivation does not have, and malformed join input", async () => {
    const r = await instructor.post(`/api/v1/classes/${cls.id}/examples`, { title: "x", buildId: exampleBuild, hidden: ["link:999"] });
    expect(r.status).toBe(400);
    expect(r.body.error).toMatchObject({ path: "hidden[0]" });
    const j = await instructor.post("/api/v1/classes/join", { token: "short" });
    expect(j.status).toBe(404);
    expect((await instructor.post("/api/v1/classes/join", {})).status).toBe(400);
    const text = await fetch(`${BASE_URL}/api/v1/classes/join`, { method: "POST", headers: { origin: BASE_URL, "content-type": "application/json" }, body: "{not json" });
    expect(text.status).toBe(400);
  });
});
