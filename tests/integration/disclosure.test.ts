import { beforeAll, describe, expect, it } from "vitest";
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { Client, signedIn } from "../support/http";
import { createParts, newBuild, newUser, retrofitDesign, type PartIds } from "../support/retrofit";

// What an answer may tell about other people's things: a share link shows the build's
// figures and only public parts; a part's delete refusal counts builds but names only
// those the caller may see.
let owner: Client;
let admin: Client;
let stranger: { client: Client; id: string };
let parts: PartIds;

// Names and a value nobody else uses, so finding them anywhere in an answer is a leak.
const PRIVATE_EMITTER = "Owner's private emitter ZK-31";
const STRANGER_DRIVER = "Stranger's shared driver QX-7";
const PRIVATE_NOTE = "bench-measured on the owner's own rig QX";

beforeAll(async () => {
  [owner, admin] = await Promise.all([signedIn("maker@sinkwise.test"), signedIn("admin@sinkwise.test")]);
  stranger = await newUser(admin, "maker", "stranger");
  parts = await createParts(owner, "private");
  const emitter = await owner.post("/api/v1/parts", { ...GOOD_PARTS.emitter, name: PRIVATE_EMITTER, provenanceNote: PRIVATE_NOTE, visibility: "private" });
  expect(emitter.status).toBe(201);
  const driver = await stranger.client.post("/api/v1/parts", { ...GOOD_PARTS.driver, name: STRANGER_DRIVER, visibility: "shared" });
  expect(driver.status).toBe(201);
  parts = { ...parts, emitter: (emitter.body.part as { id: string }).id, driver: (driver.body.part as { id: string }).id };
});

describe("a share link carries the build's figures and only published parts", () => {
  it("names no private part and no one else's shared part anywhere in its answer, and keeps the figures", async () => {
    const buildId = await newBuild(owner, { title: "Lantern with private parts", design: retrofitDesign(parts, "strapped") });
    const created = await owner.post(`/api/v1/builds/${buildId}/shares`, {});
    expect(created.status).toBe(201);
    const token = (created.body.share as { token: string }).token;
    const r = await new Client().get(`/api/v1/share/${token}`);
    expect(r.status).toBe(200);
    const text = JSON.stringify(r.body);
    for (const secret of [PRIVATE_EMITTER, STRANGER_DRIVER, PRIVATE_NOTE, GOOD_PARTS.heatsink.name, GOOD_PARTS.interface.name, GOOD_PARTS.cell.name]) {
      expect(text, secret).not.toContain(secret);
    }
    expect(r.body.parts).toEqual([]);
    // The figures are there: a verdict and, per scenario, its limits with headroom.
    const result = r.body.result as { verdict: string | null; scenarios: { thermal: { limits: { headroomK: number }[] } | null }[] };
    expect(result.verdict).not.toBeNull();
    expect(result.scenarios.some((s) => (s.thermal?.limits.length ?? 0) > 0)).toBe(true);
    // The owner's own view still names the parts (nothing is lost for them).
    const own = await owner.get(`/api/v1/builds/${buildId}/solve`);
    if (own.status === 200) expect(JSON.stringify(own.body)).toContain(PRIVATE_EMITTER);
  });
});

describe("a part's delete refusal counts the builds that use it and names only visible ones", () => {
  it("says how many builds use the part and never names a stranger's private build", async () => {
    const shared = await owner.post("/api/v1/parts", { ...GOOD_PARTS.interface, name: "Shared paste for the delete test", visibility: "shared" });
    const partId = (shared.body.part as { id: string }).id;
    const design = { lightEngine: { count: 1, interface: { partId } }, environment: { ambientC: 25 } };
    const secretTitle = "Stranger's secret build SB-9";
    const mine = await newBuild(owner, { title: "My build with the shared paste", design });
    const theirs = await stranger.client.post("/api/v1/builds", { title: secretTitle, design, visibility: "private" });
    expect(theirs.status, JSON.stringify(theirs.body)).toBe(201);
    expect(mine).toBeTruthy();
    const refused = await owner.request("DELETE", `/api/v1/parts/${partId}`);
    expect(refused.status).toBe(409);
    const message = refused.body.error?.message ?? "";
    expect(message).toContain("used by 2 builds");
    expect(message).toContain('"My build with the shared paste"');
    expect(message).toContain("1 you cannot see");
    expect(message).not.toContain(secretTitle);
  });
});
