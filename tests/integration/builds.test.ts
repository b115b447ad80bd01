import { beforeAll, describe, expect, it } from "vitest";
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { Client, signedIn, uniqueEmail } from "../support/http";
import { signUp } from "../support/mail";

// Builds by role: owner, another maker, a reviewer, an admin, anonymous.
let owner: Client;
let other: Client;
let reviewer: Client;
let admin: Client;
let emitterId = "";
let privatePartId = "";

// The fixture emitter (generic, invented), shared so other makers can pick it.
const EMITTER = { ...GOOD_PARTS.emitter, name: "Test emitter for builds", visibility: "shared" as const, curves: {} };

function design(partId?: string, ambient: number | string = 25) {
  return { lightEngine: partId ? { emitter: { partId }, count: 1 } : { count: 1 }, environment: { ambientC: ambient } };
}

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  reviewer = await signedIn("reviewer@sinkwise.test");
  admin = await signedIn("admin@sinkwise.test");
  other = new Client();
  await signUp(other, { email: uniqueEmail("other-maker"), password: "long enough pw", displayName: "Other Maker" });
  const created = await owner.post("/api/v1/parts", EMITTER);
  expect(created.status).toBe(201);
  emitterId = (created.body.part as { id: string }).id;
  const priv = await other.post("/api/v1/parts", { ...EMITTER, name: "Private emitter", visibility: "private" });
  privatePartId = (priv.body.part as { id: string }).id;
});

async function newBuild(client: Client, body: Record<string, unknown> = {}) {
  const r = await client.post("/api/v1/builds", { title: "Lantern test", design: design(emitterId), ...body });
  expect(r.status, JSON.stringify(r.body)).toBe(201);
  return (r.body.build as { id: string }).id;
}

describe("builds: create, read, revise", () => {
  it("creates a build with revision 1 and lists it as mine", async () => {
    const id = await newBuild(owner, { design: design(emitterId, "30 degC") });
    const got = await owner.get(`/api/v1/builds/${id}`);
    expect(got.status).toBe(200);
    const revision = got.body.revision as { number: number; design: { environment: { ambientC: number } } };
    expect(revision.number).toBe(1);
    // Stored in SI/°C after unit parsing.
    expect(revision.design.environment.ambientC).toBeCloseTo(30, 9);
    const list = await owner.get("/api/v1/builds");
    expect((list.body.mine as { id: string }[]).some((b) => b.id === id)).toBe(true);
  });

  it("saves a new immutable revision on each design change and keeps the old one", async () => {
    const id = await newBuild(owner);
    const patched = await owner.patch(`/api/v1/builds/${id}`, { design: design(emitterId, 35), note: "warmer shed" });
    expect(patched.status).toBe(200);
    expect((patched.body.build as { currentRevision: number }).currentRevision).toBe(2);
    const first = await owner.get(`/api/v1/builds/${id}/revisions/1`);
    expect((first.body.revision as { design: { environment: { ambientC: number } } }).design.environment.ambientC).toBe(25);
    const history = await owner.get(`/api/v1/builds/${id}/revisions`);
    expect((history.body.revisions as { number: number; note: string }[]).map((r) => r.number)).toEqual([2, 1]);
    // A title change alone makes no revision.
    await owner.patch(`/api/v1/builds/${id}`, { title: "Renamed lantern" });
    expect(((await owner.get(`/api/v1/builds/${id}/revisions`)).body.revisions as unknown[]).length).toBe(2);
  });

  it("accepts every mounting and driver-cooling kind the Heat path editor offers, with units", async () => {
    const id = await newBuild(owner);
    const mounts = [
      { kind: "in-housing-air" },
      { kind: "pressed-to-wall", contactAreaM2: "9 cm^2" },
      { kind: "through-reflector", reflector: { material: "aluminium-6063-t5", thicknessM: "0.5 mm", lengthM: "30 mm", meanCircumferenceM: "12 cm", rimContactAreaM2: "4 cm^2" } },
    ];
    const coolings = [{ kind: "floating" }, { kind: "ground-plane-to-wall" }];
    for (const mount of mounts) {
      for (const cooling of coolings) {
        const r = await owner.patch(`/api/v1/builds/${id}`, { design: { lightEngine: { emitter: { partId: emitterId }, mount }, driver: { cooling } } });
        expect(r.status, JSON.stringify(r.body)).toBe(200);
      }
    }
    const rev = await owner.get(`/api/v1/builds/${id}`);
    const mount = (rev.body.revision as { design: { lightEngine: { mount: { reflector?: { lengthM: number } } } } }).design.lightEngine.mount;
    expect(mount.reflector?.lengthM).toBeCloseTo(0.03, 9);
  });

  it("refuses bad designs naming the field, and writes nothing", async () => {
    const before = ((await owner.get("/api/v1/builds")).body.mine as unknown[]).length;
    const zero = await owner.post("/api/v1/builds", { title: "Bad", design: { lightEngine: { count: 0 } } });
    expect(zero.status).toBe(400);
    expect(zero.body.error?.path).toBe("design.lightEngine.count");
    const unit = await owner.post("/api/v1/builds", { title: "Bad", design: { lightEngine: {}, environment: { ambientC: "3 W" } } });
    expect(unit.status).toBe(400);
    expect(unit.body.error?.path).toBe("design.environment.ambientC");
    const hidden = await owner.post("/api/v1/builds", { title: "Bad", design: design(privatePartId) });
    expect(hidden.status).toBe(400);
    expect(hidden.body.error?.message).toContain(privatePartId);
    const noTitle = await owner.post("/api/v1/builds", { title: " ", design: design() });
    expect(noTitle.status).toBe(400);
    expect(noTitle.body.error?.path).toBe("title");
    expect(((await owner.get("/api/v1/builds")).body.mine as unknown[]).length).toBe(before);
  });
});

describe("builds: who may see and change them", () => {
  it("hides a private build from other makers and reviewers, shows it to an admin read-only", async () => {
    const id = await newBuild(owner);
    expect((await other.get(`/api/v1/builds/${id}`)).status).toBe(404);
    expect((await reviewer.get(`/api/v1/builds/${id}`)).status).toBe(404);
    const seen = await admin.get(`/api/v1/builds/${id}`);
    expect(seen.status).toBe(200);
    expect((seen.body.build as { access: { canEdit: boolean } }).access.canEdit).toBe(false);
    expect((await admin.patch(`/api/v1/builds/${id}`, { title: "Admin edit" })).status).toBe(403);
    expect((await new Client().get(`/api/v1/builds/${id}`)).status).toBe(401);
  });

  it("lets everyone signed in read a shared build, but only the owner change or delete it", async () => {
    const id = await newBuild(owner, { visibility: "shared" });
    expect((await other.get(`/api/v1/builds/${id}`)).status).toBe(200);
    const list = await other.get("/api/v1/builds");
    expect((list.body.shared as { id: string }[]).some((b) => b.id === id)).toBe(true);
    const edit = await other.patch(`/api/v1/builds/${id}`, { design: design(emitterId, 40) });
    expect(edit.status).toBe(403);
    expect(edit.body.error?.code).toBe("forbidden:build");
    expect((await reviewer.patch(`/api/v1/builds/${id}`, { title: "Reviewer edit" })).status).toBe(403);
    expect((await other.request("DELETE", `/api/v1/builds/${id}`)).status).toBe(403);
    expect((await owner.request("DELETE", `/api/v1/builds/${id}`)).status).toBe(200);
    expect((await owner.get(`/api/v1/builds/${id}`)).status).toBe(404);
  });

  it("forks: another maker copies a shared build into their own; the owner makes a variant", async () => {
    const id = await newBuild(owner, { visibility: "shared", title: "Headlamp" });
    const copy = await other.post(`/api/v1/builds/${id}/fork`, {});
    expect(copy.status).toBe(201);
    const copyId = (copy.body.build as { id: string }).id;
    const got = await other.get(`/api/v1/builds/${copyId}`);
    expect((got.body.build as { ownerId: string; access: { isOwner: boolean } }).access.isOwner).toBe(true);
    const variant = await owner.post(`/api/v1/builds/${id}/fork`, { variantNote: "driver strapped to the case" });
    expect(variant.status).toBe(201);
    const vId = (variant.body.build as { id: string }).id;
    const variants = await owner.get(`/api/v1/builds/${id}/variants`);
    expect((variants.body.variants as { id: string; variantNote: string | null }[]).map((v) => v.id)).toEqual(expect.arrayContaining([id, vId]));
  });

  it("refuses to delete a part that a build uses, naming the build", async () => {
    await newBuild(owner, { title: "Uses the emitter" });
    const r = await owner.request("DELETE", `/api/v1/parts/${emitterId}`);
    expect(r.status).toBe(409);
    expect(r.body.error?.message).toContain("Uses the emitter");
  });
});

describe("builds: export and import", () => {
  it("round-trips a build through the build file with its parts made inline", async () => {
    const id = await newBuild(owner, { title: "Exported lantern" });
    const file = await owner.get(`/api/v1/builds/${id}/export`);
    expect(file.status).toBe(200);
    expect(file.body.format).toBe("sinkwise-build");
    expect((file.body.parts as { id: string }[]).map((p) => p.id)).toEqual([emitterId]);
    const imported = await other.post("/api/v1/builds/import", file.body);
    expect(imported.status).toBe(201);
    const got = await other.get(`/api/v1/builds/${(imported.body.build as { id: string }).id}`);
    const emitter = (got.body.revision as { design: { lightEngine: { emitter: { inline?: { rthJspKPerW: number }; name?: string } } } }).design.lightEngine.emitter;
    expect(emitter.inline?.rthJspKPerW).toBeCloseTo(2.5, 9);
    expect(emitter.name).toBe(EMITTER.name);
    const wrong = await other.post("/api/v1/builds/import", { ...file.body, version: 7 });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error?.path).toBe("version");
  });
});
