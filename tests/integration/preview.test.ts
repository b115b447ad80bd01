import { beforeAll, describe, expect, it } from "vitest";
import { withTestDb } from "../support/db";
import { Client, signedIn } from "../support/http";
import { createParts, newBuild, newUser, retrofitDesign, type PartIds } from "../support/retrofit";

// The live editor's preview: evaluates an unsaved design, writes nothing, by role.
let owner: Client;
let admin: Client;
let ids: PartIds;
let buildId = "";

async function rowCounts(): Promise<Record<string, number>> {
  return withTestDb(async (conn) => {
    const out: Record<string, number> = {};
    for (const table of ["build", "build_revision", "revision_part", "solve_cache"]) {
      const [rows] = await conn.query(`SELECT COUNT(*) AS n FROM ${table}`);
      out[table] = Number((rows as { n: number }[])[0]!.n);
    }
    return out;
  });
}

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  admin = await signedIn("admin@sinkwise.test");
  ids = await createParts(owner, "private");
  buildId = await newBuild(owner, { title: "Preview test torch", design: retrofitDesign(ids, "floating") });
});

describe("POST /api/v1/builds/[id]/preview", () => {
  it("evaluates the unsaved design (the answer follows the draft) and writes no row", async () => {
    const before = await rowCounts();
    const cool = await owner.post(`/api/v1/builds/${buildId}/preview`, { design: retrofitDesign(ids, "floating", 20) });
    const hot = await owner.post(`/api/v1/builds/${buildId}/preview`, { design: retrofitDesign(ids, "floating", 55) });
    expect(cool.status, JSON.stringify(cool.body)).toBe(200);
    expect(hot.status).toBe(200);
    expect(cool.body.unsaved).toBe(true);
    expect(cool.body.valid).toBe(true);
    type Ev = { scenarios: { kind: string; thermal: { temperaturesC: Record<string, number> } | null }[] };
    const junction = (b: typeof cool.body) => (b.evaluation as Ev).scenarios.find((s) => s.kind === "mode")!.thermal!.temperaturesC;
    // The same draft in 35 K warmer air: every place of it is warmer.
    const [a, b] = [junction(cool.body), junction(hot.body)];
    expect(Object.keys(b).sort()).toEqual(Object.keys(a).sort());
    expect(Object.keys(a).length).toBeGreaterThan(2);
    for (const node of Object.keys(a)) expect(b[node]!, node).toBeGreaterThan(a[node]!);
    expect(await rowCounts()).toEqual(before);
    const saved = await owner.get(`/api/v1/builds/${buildId}`);
    expect((saved.body.build as { currentRevision: number }).currentRevision).toBe(1);
  });

  it("a design that does not read answers with every issue in plain words, naming labels, and writes nothing", async () => {
    const before = await rowCounts();
    const design = retrofitDesign(ids, "floating");
    const bad = { ...design, pack: { ...design.pack, chargerCount: 2.5, series: "two" }, environment: { ambientC: "hot" } };
    const r = await owner.post(`/api/v1/builds/${buildId}/preview`, { design: bad });
    expect(r.status).toBe(200);
    expect(r.body.valid).toBe(false);
    const issues = r.body.issues as { path: string; message: string }[];
    expect(issues.map((i) => i.path).sort()).toEqual(["environment.ambientC", "pack.chargerCount", "pack.series"]);
    expect(issues.find((i) => i.path === "pack.chargerCount")?.message).toBe("Chargers in parallel: must be a whole number");
    expect(issues.find((i) => i.path === "pack.series")?.message).toBe("Cells in series: must be a number");
    expect(issues.find((i) => i.path === "environment.ambientC")?.message).toMatch(/^Ambient temperature: /);
    expect(JSON.stringify(r.body)).not.toContain("NaN");
    expect(await rowCounts()).toEqual(before);
  });

  it("saving the same bad design is refused with the field's label in the message and the machine path in path", async () => {
    const design = retrofitDesign(ids, "floating");
    const r = await owner.patch(`/api/v1/builds/${buildId}`, { design: { ...design, pack: { ...design.pack, chargerCount: 2.5 } } });
    expect(r.status).toBe(400);
    expect(r.body.error?.message).toBe("Chargers in parallel: must be a whole number");
    expect(r.body.error?.path).toBe("design.pack.chargerCount");
  });

  it("by role: anonymous 401, another maker 404, a reviewer it is not shared with 404, the admin (views, does not edit) 403", async () => {
    const body = { design: retrofitDesign(ids, "floating") };
    expect((await new Client().post(`/api/v1/builds/${buildId}/preview`, body)).status).toBe(401);
    const other = await newUser(admin, "maker", "preview-other");
    expect((await other.client.post(`/api/v1/builds/${buildId}/preview`, body)).status).toBe(404);
    const reviewer = await newUser(admin, "reviewer", "preview-reviewer");
    expect((await reviewer.client.post(`/api/v1/builds/${buildId}/preview`, body)).status).toBe(404);
    expect((await admin.post(`/api/v1/builds/${buildId}/preview`, body)).status).toBe(403);
  });
});
