import { beforeAll, describe, expect, it } from "vitest";
import { Client, signedIn } from "../support/http";
import { createParts, newBuild, newUser, retrofitDesign, type PartIds } from "../support/retrofit";

// Side by side by role: owner, assigned reviewer, another reviewer, another maker, anonymous, admin.
let owner: Client;
let reviewer: Client;
let otherReviewer: Client;
let otherMaker: Client;
let admin: Client;
const anonymous = new Client();
let parts: PartIds;
let strapped = "";
let pressed = "";
let floating = "";
let hidden = "";
let reviewId = "";

type Row = { key: string; label: string; values: (number | string | null)[]; deltas: (number | null)[]; judgements: (string | null)[] };
type Diff = { slot: string; values: string[]; differs: boolean };
type Compared = { columns: { buildId: string; revision: number; variantNote: string | null }[]; differences: Diff[]; figures: Row[]; warmups: { node: string; columns: unknown[] }[]; ladders: { scenarioId: string; columns: unknown[] }[] };

beforeAll(async () => {
  [owner, reviewer, admin] = await Promise.all([signedIn("maker@sinkwise.test"), signedIn("reviewer@sinkwise.test"), signedIn("admin@sinkwise.test")]);
  otherReviewer = (await newUser(admin, "reviewer", "compare-reviewer")).client;
  otherMaker = (await newUser(admin, "maker", "compare-maker")).client;
  parts = await createParts(owner, "shared");
  strapped = await newBuild(owner, { title: "Lantern", design: retrofitDesign(parts, "strapped") });
  const fork = async (note: string, cooling: "ground-plane-to-wall" | "floating") => {
    const r = await owner.post(`/api/v1/builds/${strapped}/fork`, { variantNote: note });
    const id = (r.body.build as { id: string }).id;
    expect((await owner.patch(`/api/v1/builds/${id}`, { design: retrofitDesign(parts, cooling), note })).status).toBe(200);
    return id;
  };
  pressed = await fork("driver pressed to the wall", "ground-plane-to-wall");
  floating = await fork("driver floating free", "floating");
  hidden = await newBuild(otherMaker, { title: "Someone else's lamp", design: { lightEngine: { count: 1 } } });
  // The demo reviewer reviews the strapped one, so may see it (and only it).
  const asked = await owner.post(`/api/v1/builds/${strapped}/reviews`, { reviewerEmail: "reviewer@sinkwise.test" });
  expect(asked.status).toBe(201);
  reviewId = (asked.body.review as { id: string }).id;
}, 60_000);

describe("side by side: the comparison", () => {
  it("lists the cooling difference first and every figure with deltas against the first column", async () => {
    const r = await owner.get(`/api/v1/compare?items=${strapped},${pressed},${floating}`);
    expect(r.status, JSON.stringify(r.body).slice(0, 400)).toBe(200);
    const c = r.body as unknown as Compared;
    expect(c.columns.map((x) => x.buildId)).toEqual([strapped, pressed, floating]);
    expect(c.columns[1]).toMatchObject({ revision: 2, variantNote: "driver pressed to the wall" });
    // Parts and mounting differences first: only the driver cooling differs.
    expect(c.differences[0]).toMatchObject({ slot: "driver.cooling", differs: true });
    expect(c.differences[0]!.values[2]).toBe("floating free in the housing's air");
    expect(c.differences.filter((d) => d.differs).map((d) => d.slot)).toEqual(["driver.cooling"]);
    const keys = c.figures.map((f) => f.key);
    expect(keys).toEqual(expect.arrayContaining(["build/verdict", "build/cost", "build/charge-time"]));
    const driverT = c.figures.find((f) => f.key.endsWith("/temperature:driver board") && f.key.startsWith("mode:high"));
    expect(driverT, keys.join("\n")).toBeDefined();
    const [t0, , t2] = driverT!.values as number[];
    // Floating free in a sealed housing, the driver runs hotter than strapped to the case (PRODUCT.md, common practice).
    expect(t2!).toBeGreaterThan(t0!);
    expect(driverT!.deltas[0]).toBeNull();
    expect(driverT!.deltas[2]).toBeCloseTo(t2! - t0!, 9);
    expect(driverT!.judgements[2]).toBe("worse");
    // Cost: the strap and adhesive are priced parts or not; the delta is a number or null, never NaN.
    for (const f of c.figures) for (const d of f.deltas) if (d !== null) expect(Number.isFinite(d)).toBe(true);
    expect(keys.some((k) => k.startsWith("mode:high/headroom:"))).toBe(true);
    expect(keys.some((k) => k.startsWith("mode:low/time:"))).toBe(true);
    expect(keys).toEqual(expect.arrayContaining(["mode:high/runtime", "mode:high/flux"]));
    expect(c.warmups.length).toBeGreaterThan(0);
    expect(c.warmups[0]!.columns).toHaveLength(3);
    expect(c.ladders.find((l) => l.scenarioId === "mode:high")?.columns).toHaveLength(3);
  });

  it("compares revisions of one build (buildId@revision)", async () => {
    const r = await owner.get(`/api/v1/compare?items=${pressed}@1,${pressed}@2`);
    expect(r.status).toBe(200);
    const c = r.body as unknown as Compared;
    expect(c.columns.map((x) => x.revision)).toEqual([1, 2]);
    expect(c.differences[0]).toMatchObject({ slot: "driver.cooling", differs: true });
  });

  it("refuses more than four, fewer than two, or malformed items, naming items", async () => {
    const five = await owner.get(`/api/v1/compare?items=${[strapped, pressed, floating, strapped, pressed].join(",")}`);
    expect(five.status).toBe(400);
    expect(five.body.error?.message).toContain("at most 4");
    expect(five.body.error?.path).toBe("items");
    const one = await owner.get(`/api/v1/compare?items=${strapped}`);
    expect(one.status).toBe(400);
    expect(one.body.error?.message).toContain("at least 2");
    expect((await owner.get(`/api/v1/compare`)).body.error?.path).toBe("items");
    const bad = await owner.get(`/api/v1/compare?items=${strapped},not%20an%20id`);
    expect(bad.status).toBe(400);
    expect(bad.body.error?.path).toBe("items[1]");
  });

  it("refuses the whole comparison when any one build is not visible, and tells nothing of the others", async () => {
    const r = await owner.get(`/api/v1/compare?items=${strapped},${hidden}`);
    expect(r.status).toBe(404);
    expect(r.body.error?.path).toBe("items[1]");
    expect(Object.keys(r.body)).toEqual(["error"]);
    expect(JSON.stringify(r.body)).not.toContain("Lantern");
    const missingRev = await owner.get(`/api/v1/compare?items=${strapped}@9,${pressed}`);
    expect(missingRev.status).toBe(404);
    expect(missingRev.body.error?.path).toBe("items[0]");
  });

  it("by role: the assigned reviewer sees the reviewed build only; others 404; admin sees all; anonymous 401", async () => {
    const own = await reviewer.get(`/api/v1/compare?items=${strapped},${strapped}@1`);
    expect(own.status).toBe(200);
    // The reviewer's own review of that revision comes with each column, so its heat path takes pins there.
    expect((own.body.columns as { review: { id: string; status: string } | null }[]).map((c) => c.review)).toEqual([{ id: reviewId, status: "requested" }, { id: reviewId, status: "requested" }]);
    const byOwner = await owner.get(`/api/v1/compare?items=${strapped},${pressed}`);
    expect((byOwner.body.columns as { review: unknown }[]).map((c) => c.review)).toEqual([null, null]);
    const mixed = await reviewer.get(`/api/v1/compare?items=${strapped},${pressed}`);
    expect(mixed.status).toBe(404);
    expect(mixed.body.error?.path).toBe("items[1]");
    expect((await otherReviewer.get(`/api/v1/compare?items=${strapped},${pressed}`)).status).toBe(404);
    expect((await otherMaker.get(`/api/v1/compare?items=${strapped},${hidden}`)).status).toBe(404);
    expect((await admin.get(`/api/v1/compare?items=${strapped},${hidden}`)).status).toBe(200);
    expect((await anonymous.get(`/api/v1/compare?items=${strapped},${pressed}`)).status).toBe(401);
  });
});

describe("side by side: saved comparisons", () => {
  it("saves one with its own URL; the owner and those who may see every build open it", async () => {
    const items = [{ buildId: strapped }, { buildId: pressed }, { buildId: floating, revision: 2 }];
    const r = await owner.post("/api/v1/comparisons", { title: "Three ways to cool the driver", items });
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    const saved = r.body.comparison as { id: string; url: string };
    expect(saved.url).toBe(`/compare?saved=${saved.id}`);
    const got = await owner.get(`/api/v1/comparisons/${saved.id}`);
    expect(got.body.comparison).toMatchObject({ title: "Three ways to cool the driver", items });
    expect((await admin.get(`/api/v1/comparisons/${saved.id}`)).status).toBe(200);
    expect((await reviewer.get(`/api/v1/comparisons/${saved.id}`)).status).toBe(404);
    expect((await otherMaker.get(`/api/v1/comparisons/${saved.id}`)).status).toBe(404);
    expect((await anonymous.get(`/api/v1/comparisons/${saved.id}`)).status).toBe(401);
    expect(((await owner.get("/api/v1/comparisons")).body.comparisons as { id: string }[]).some((x) => x.id === saved.id)).toBe(true);
  });

  it("refuses to save a comparison of an invisible build or of five, and saves nothing", async () => {
    const before = ((await owner.get("/api/v1/comparisons")).body.comparisons as unknown[]).length;
    const invisible = await owner.post("/api/v1/comparisons", { title: "x", items: [{ buildId: strapped }, { buildId: hidden }] });
    expect(invisible.status).toBe(404);
    expect(invisible.body.error?.path).toBe("items[1]");
    const five = await owner.post("/api/v1/comparisons", { title: "x", items: Array.from({ length: 5 }, () => ({ buildId: strapped })) });
    expect(five.status).toBe(400);
    expect(five.body.error?.path).toBe("items");
    const noTitle = await owner.post("/api/v1/comparisons", { title: "", items: [{ buildId: strapped }, { buildId: pressed }] });
    expect(noTitle.body.error?.path).toBe("title");
    expect(((await owner.get("/api/v1/comparisons")).body.comparisons as unknown[]).length).toBe(before);
  });
});
