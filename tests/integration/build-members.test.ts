import { beforeAll, describe, expect, it } from "vitest";
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { Client, signedIn, uniqueEmail } from "../support/http";
import { signUp, waitForMail } from "../support/mail";

// Sharing a build with named people: the owner decides who views and who edits.
let owner: Client;
let editor: Client;
let viewer: Client;
let editorEmail = "";
let viewerEmail = "";
let editorId = "";
let emitterId = "";

// The fixture emitter (generic, invented), shared so members may save designs that use it.
const EMITTER = { ...GOOD_PARTS.emitter, name: "Test emitter for members", visibility: "shared" as const, curves: {} };

function design(ambientC = 25) {
  return { lightEngine: { emitter: { partId: emitterId }, count: 1 }, environment: { ambientC } };
}

async function newMaker(tag: string): Promise<{ client: Client; email: string; id: string }> {
  const client = new Client();
  const email = uniqueEmail(tag);
  const r = await signUp(client, { email, password: "long enough pw", displayName: `Maker ${tag}` });
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return { client, email, id: r.body.user?.id ?? "" };
}

async function newBuild(): Promise<string> {
  const r = await owner.post("/api/v1/builds", { title: "Shared shed lamp", design: design() });
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return (r.body.build as { id: string }).id;
}

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  const e = await newMaker("member-editor");
  const v = await newMaker("member-viewer");
  editor = e.client;
  editorEmail = e.email;
  editorId = e.id;
  viewer = v.client;
  viewerEmail = v.email;
  const created = await owner.post("/api/v1/parts", EMITTER);
  expect(created.status).toBe(201);
  emitterId = (created.body.part as { id: string }).id;
});

describe("build members", () => {
  it("lets a maker the build is shared with for editing save a revision and see it under shared", async () => {
    const id = await newBuild();
    expect((await editor.patch(`/api/v1/builds/${id}`, { design: design(30) })).status).toBe(404);
    const added = await owner.post(`/api/v1/builds/${id}/members`, { email: editorEmail.toUpperCase(), canEdit: true });
    expect(added.status, JSON.stringify(added.body)).toBe(201);
    const listed = await owner.get(`/api/v1/builds/${id}/members`);
    expect(listed.body.members).toEqual([{ email: editorEmail, canEdit: true }]);
    const patched = await editor.patch(`/api/v1/builds/${id}`, { design: design(30), note: "by the member" });
    expect(patched.status, JSON.stringify(patched.body)).toBe(200);
    expect((patched.body.build as { currentRevision: number }).currentRevision).toBe(2);
    const list = await editor.get("/api/v1/builds");
    expect((list.body.shared as { id: string }[]).some((b) => b.id === id)).toBe(true);
    // A member may not change the visibility, and may not share further.
    expect((await editor.patch(`/api/v1/builds/${id}`, { visibility: "shared" })).status).toBe(403);
    const reshare = await editor.post(`/api/v1/builds/${id}/members`, { email: viewerEmail, canEdit: false });
    expect(reshare.status).toBe(403);
    expect(reshare.body.error?.code).toBe("forbidden:build");
  });

  it("gives a view-only member read access and a 403 on PATCH; sharing again changes the right", async () => {
    const id = await newBuild();
    expect((await owner.post(`/api/v1/builds/${id}/members`, { email: viewerEmail })).status).toBe(201);
    const seen = await viewer.get(`/api/v1/builds/${id}`);
    expect(seen.status).toBe(200);
    expect((seen.body.build as { access: { canEdit: boolean } }).access.canEdit).toBe(false);
    const edit = await viewer.patch(`/api/v1/builds/${id}`, { design: design(35) });
    expect(edit.status).toBe(403);
    expect(edit.body.error?.code).toBe("forbidden:build");
    // Members see who else it is shared with, without their e-mails.
    const members = (await viewer.get(`/api/v1/builds/${id}/members`)).body.members as Record<string, unknown>[];
    expect(members).toHaveLength(1);
    expect(members[0]).not.toHaveProperty("email");
    // Upsert: the same person shared again for editing becomes an editor, still one row.
    expect((await owner.post(`/api/v1/builds/${id}/members`, { email: viewerEmail, canEdit: true })).status).toBe(201);
    expect(((await owner.get(`/api/v1/builds/${id}/members`)).body.members as unknown[]).length).toBe(1);
    expect((await viewer.patch(`/api/v1/builds/${id}`, { design: design(35) })).status).toBe(200);
  });

  it("refuses bad shares naming the field", async () => {
    const id = await newBuild();
    const self = await owner.post(`/api/v1/builds/${id}/members`, { email: "maker@sinkwise.test", canEdit: true });
    expect(self.status).toBe(400);
    expect(self.body.error?.path).toBe("email");
    const malformed = await owner.post(`/api/v1/builds/${id}/members`, { email: "not an address" });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error?.path).toBe("email");
    const notBool = await owner.post(`/api/v1/builds/${id}/members`, { email: editorEmail, canEdit: "yes" });
    expect(notBool.status).toBe(400);
    expect(notBool.body.error?.path).toBe("canEdit");
  });

  it("a reviewer shared with for editing still only views", async () => {
    const id = await newBuild();
    expect((await owner.post(`/api/v1/builds/${id}/members`, { email: "reviewer@sinkwise.test", canEdit: true })).status).toBe(201);
    const reviewer = await signedIn("reviewer@sinkwise.test");
    const seen = await reviewer.get(`/api/v1/builds/${id}`);
    expect(seen.status).toBe(200);
    expect((seen.body.build as { access: { canEdit: boolean } }).access.canEdit).toBe(false);
    expect((await reviewer.patch(`/api/v1/builds/${id}`, { design: design(33) })).status).toBe(403);
  });

  it("shares with an address the same way whether or not an account uses it; the build opens when one is made", async () => {
    const id = await newBuild();
    const nobody = uniqueEmail("not-yet");
    const forNobody = await owner.post(`/api/v1/builds/${id}/members`, { email: nobody, canEdit: true });
    const forSomebody = await owner.post(`/api/v1/builds/${id}/members`, { email: viewerEmail, canEdit: true });
    expect(forNobody.status).toBe(201);
    expect(forSomebody.status).toBe(201);
    expect(Object.keys(forNobody.body).sort()).toEqual(Object.keys(forSomebody.body).sort());
    expect(forNobody.body.member).toEqual({ email: nobody, canEdit: true });
    expect(forSomebody.body.member).toEqual({ email: viewerEmail, canEdit: true });
    expect(String(forNobody.body.message).replace(nobody, "X")).toBe(String(forSomebody.body.message).replace(viewerEmail, "X"));
    // The owner's list names addresses only, the same for both.
    expect((await owner.get(`/api/v1/builds/${id}/members`)).body.members).toEqual(
      [{ email: nobody, canEdit: true }, { email: viewerEmail, canEdit: true }].sort((a, b) => a.email.localeCompare(b.email)),
    );
    // Both get a mail; the one without an account makes one and finds the build shared with them.
    await waitForMail(nobody, "shared a Sinkwise build with you");
    await waitForMail(viewerEmail, "shared a Sinkwise build with you");
    const newcomer = new Client();
    expect((await signUp(newcomer, { email: nobody, password: "long enough pw", displayName: "Newcomer" })).status).toBe(201);
    const seen = await newcomer.get(`/api/v1/builds/${id}`);
    expect(seen.status).toBe(200);
    expect((seen.body.build as { access: { canEdit: boolean } }).access.canEdit).toBe(true);
    // Removal by address works for either kind.
    expect((await owner.request("DELETE", `/api/v1/builds/${id}/members/${encodeURIComponent(nobody)}`)).status).toBe(200);
    expect((await newcomer.get(`/api/v1/builds/${id}`)).status).toBe(404);
  });

  it("refuses members changes by anyone but the owner", async () => {
    const id = await newBuild();
    // A private build is not even found by a stranger; a shared one is seen but not shared further.
    expect((await editor.post(`/api/v1/builds/${id}/members`, { email: viewerEmail })).status).toBe(404);
    expect((await owner.patch(`/api/v1/builds/${id}`, { visibility: "shared" })).status).toBe(200);
    const stranger = await editor.post(`/api/v1/builds/${id}/members`, { email: viewerEmail, canEdit: true });
    expect(stranger.status).toBe(403);
    expect((await owner.post(`/api/v1/builds/${id}/members`, { email: viewerEmail })).status).toBe(201);
    expect((await editor.request("DELETE", `/api/v1/builds/${id}/members/${editorId}`)).status).toBe(403);
  });

  it("takes a removal into effect at once", async () => {
    const id = await newBuild();
    expect((await owner.post(`/api/v1/builds/${id}/members`, { email: editorEmail, canEdit: true })).status).toBe(201);
    expect((await editor.get(`/api/v1/builds/${id}`)).status).toBe(200);
    const removed = await owner.request("DELETE", `/api/v1/builds/${id}/members/${editorId}`);
    expect(removed.status).toBe(200);
    expect((await editor.get(`/api/v1/builds/${id}`)).status).toBe(404);
    expect((await editor.patch(`/api/v1/builds/${id}`, { design: design(40) })).status).toBe(404);
    const list = await editor.get("/api/v1/builds");
    expect((list.body.shared as { id: string }[]).some((b) => b.id === id)).toBe(false);
    const again = await owner.request("DELETE", `/api/v1/builds/${id}/members/${editorId}`);
    expect(again.status).toBe(404);
    expect(again.body.error?.path).toBe("userId");
  });

  it("answers 401 to anonymous callers", async () => {
    const id = await newBuild();
    const anon = new Client();
    expect((await anon.get(`/api/v1/builds/${id}/members`)).status).toBe(401);
    expect((await anon.post(`/api/v1/builds/${id}/members`, { email: viewerEmail })).status).toBe(401);
    expect((await anon.request("DELETE", `/api/v1/builds/${id}/members/${editorId}`)).status).toBe(401);
  });
});
