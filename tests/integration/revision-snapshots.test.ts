import { beforeAll, describe, expect, it } from "vitest";
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { withTestDb } from "../support/db";
import { Client, signedIn } from "../support/http";
import { createParts, type PartIds, retrofitDesign } from "../support/retrofit";

let owner: Client;
let ids: PartIds;
let buildId = "";

type Solve = { revision: number; cached: boolean; solverVersion: string; solverChange: unknown; evaluation: { scenarios: { id: string; thermal: { limits: { id: string; temperatureC: number }[] } | null }[] } };

const solve = async (revision: number): Promise<Solve> => {
  const r = await owner.post(`/api/v1/builds/${buildId}/solve`, { revision });
  expect(r.status).toBe(200);
  return r.body as unknown as Solve;
};
const junction = (s: Solve) => s.evaluation.scenarios.find((x) => x.id.startsWith("mode"))?.thermal?.limits.find((l) => l.id === "junction")?.temperatureC;

/**
 * Drops the cached results of a build's revisions, so the next solve works the figures out
 * again. The cache is written after an answer leaves: first wait for the rows of the
 * revisions just solved, so none lands after the delete.
 */
async function dropCachedResults(...solved: number[]): Promise<void> {
  const count = () =>
    withTestDb(async (c) => {
      const [rows] = await c.query("SELECT COUNT(DISTINCT r.number) AS n FROM solve_cache rr JOIN build_revision r ON r.id = rr.revision_id WHERE r.build_id = ? AND r.number IN (?)", [buildId, solved.length ? solved : [0]]);
      return Number((rows as { n: number }[])[0]?.n ?? 0);
    });
  await expect.poll(count, { timeout: 10_000 }).toBe(solved.length);
  await withTestDb((c) => c.query("DELETE rr FROM solve_cache rr JOIN build_revision r ON r.id = rr.revision_id WHERE r.build_id = ?", [buildId]));
}

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  ids = await createParts(owner, "private");
  const b = await owner.post("/api/v1/builds", { title: "Snapshot test lantern", design: retrofitDesign(ids, "strapped") });
  expect(b.status).toBe(201);
  buildId = (b.body.build as { id: string }).id;
});

describe("a saved revision never changes", () => {
  it("keeps its figures byte for byte when a part it used is edited in the bin", async () => {
    const before = await solve(1);
    const t0 = junction(before);
    expect(typeof t0).toBe("number");

    // The emitter gets a much worse thermal resistance (its owner re-measured it).
    const edit = await owner.patch(`/api/v1/parts/${ids.emitter}`, { specs: { ...GOOD_PARTS.emitter.specs, rthJspKPerW: "9 K/W" } });
    expect(edit.status).toBe(200);

    // Worked out again from scratch (no cached result), revision 1 still reads the same.
    await dropCachedResults(1);
    const after = await solve(1);
    expect(after.cached).toBe(false);
    expect(JSON.stringify(after.evaluation)).toBe(JSON.stringify(before.evaluation));

    // The editor says what changed and offers a new revision with the current parts.
    const page = await owner.get(`/builds/${buildId}`);
    // React separates adjacent text with empty comments in server-rendered HTML.
    const html = String((page.body as { text?: string }).text ?? "").replace(/<!-- -->/g, "");
    expect(html).toContain("Parts changed since revision 1");
    expect(html).toMatch(/Rth|thermal resistance/i);
    expect(html).toContain("Save revision 2 with the current parts");

    // A new revision of the same design picks the edit up: the junction runs hotter.
    const design = await owner.get(`/api/v1/builds/${buildId}/revisions/1`);
    const saved = await owner.patch(`/api/v1/builds/${buildId}`, { design: (design.body.revision as { design: unknown }).design, note: "current parts" });
    expect(saved.status).toBe(200);
    const r2 = await solve(2);
    expect(junction(r2)!).toBeGreaterThan(t0! + 1);
    // …and revision 1 still does not move.
    expect(JSON.stringify((await solve(1)).evaluation)).toBe(JSON.stringify(before.evaluation));
  });

  it("takes a snapshot for a revision saved before snapshots were kept, on its first solve", async () => {
    await withTestDb((c) => c.query("DELETE s FROM revision_part_snapshot s JOIN build_revision r ON r.id = s.revision_id WHERE r.build_id = ? AND r.number = 2", [buildId]));
    await dropCachedResults(1, 2);
    const first = await solve(2);
    const rows = await withTestDb(async (c) => {
      const [r] = await c.query("SELECT COUNT(*) AS n FROM revision_part_snapshot s JOIN build_revision r ON r.id = s.revision_id WHERE r.build_id = ? AND r.number = 2", [buildId]);
      return Number((r as { n: number }[])[0]?.n ?? 0);
    });
    expect(rows).toBe(Object.keys(ids).length);
    await owner.patch(`/api/v1/parts/${ids.emitter}`, { specs: { ...GOOD_PARTS.emitter.specs, rthJspKPerW: "1 K/W" } });
    await dropCachedResults(2);
    expect(JSON.stringify((await solve(2)).evaluation)).toBe(JSON.stringify(first.evaluation));
  });

  it("records the solver version and says when a newer solver moved the figures", async () => {
    const s = await solve(1);
    expect(s.solverVersion).toMatch(/^e\d+\.\d+$/);
    expect(s.solverChange).toBeNull();
    // A result kept from an older solver, with a different junction temperature.
    // The cache is written after the answer leaves: wait until the row is there.
    const cachedRow = () =>
      withTestDb(async (c) => {
        const [rows] = await c.query("SELECT rr.revision_id, rr.result FROM solve_cache rr JOIN build_revision r ON r.id = rr.revision_id WHERE r.build_id = ? AND r.number = 1 AND rr.cache_key NOT LIKE '%:traces'", [buildId]);
        return (rows as { revision_id: string; result: unknown }[])[0];
      });
    await expect.poll(cachedRow, { timeout: 10_000 }).toBeDefined();
    const row = (await cachedRow())!;
    await withTestDb(async (c) => {
      // The raw driver may hand the JSON column back parsed or as text.
      const old = (typeof row.result === "string" ? JSON.parse(row.result) : row.result) as Solve["evaluation"];
      for (const sc of old.scenarios) for (const l of sc.thermal?.limits ?? []) if (l.id === "junction") l.temperatureC -= 14;
      await c.query("DELETE FROM solve_cache WHERE revision_id = ?", [row.revision_id]);
      await c.query("INSERT INTO solve_cache (revision_id, cache_key, result, created_at) VALUES (?, 'e0.1', ?, NOW(3))", [row.revision_id, JSON.stringify(old)]);
    });
    const again = await solve(1);
    const change = again.solverChange as { previousVersion: string; changes: string[] };
    expect(change.previousVersion).toBe("e0.1");
    expect(change.changes.some((c) => c.includes("LED junction"))).toBe(true);
    // The note stays with the cached result.
    expect(((await solve(1)).solverChange as { previousVersion: string }).previousVersion).toBe("e0.1");
  });
});
