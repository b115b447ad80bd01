// The solve route sends the figures with each trace (the working behind a number) as a
// reference, and the traces on their own when asked: what a reader opens is read then, and the
// answer the Budget waits for is a third of the size. These tests hold that nothing is lost on
// the way: the figures and the traces joined again are the answer with every trace in place,
// fresh or from the cache, and the traces are guarded like the figures.
import { beforeAll, describe, expect, it } from "vitest";
import { isTrace, isTraceRef } from "@/lib/thermal";
import { withTestDb } from "../support/db";
import { Client, signedIn } from "../support/http";
import { createParts, retrofitDesign } from "../support/retrofit";
import { joinTraces } from "../support/traces";

let owner: Client;
let stranger: Client;
let buildId = "";

type Answer = { revision: number; cached: boolean; solverChange: unknown; evaluation?: unknown; traces?: unknown[] };

async function solve(body: Record<string, unknown>, client = owner): Promise<Answer> {
  const r = await client.post(`/api/v1/builds/${buildId}/solve`, body);
  expect(r.status).toBe(200);
  return r.body as unknown as Answer;
}

async function keptKeys(): Promise<string[]> {
  return withTestDb(async (c) => {
    const [rows] = await c.query("SELECT cache_key FROM solve_cache c JOIN build_revision r ON r.id = c.revision_id WHERE r.build_id = ? ORDER BY cache_key", [buildId]);
    return (rows as { cache_key: string }[]).map((r) => r.cache_key);
  });
}

const clearCache = () => withTestDb((c) => c.query("DELETE c FROM solve_cache c JOIN build_revision r ON r.id = c.revision_id WHERE r.build_id = ?", [buildId]));

/** Every value in a JSON value that passes the test, with its path. */
function found(value: unknown, test: (v: unknown) => boolean, path = "", out: string[] = []): string[] {
  if (test(value)) out.push(path);
  if (value && typeof value === "object") for (const [k, v] of Object.entries(value)) found(v, test, `${path}.${k}`, out);
  return out;
}

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  stranger = await signedIn("student1@sinkwise.test");
  const ids = await createParts(owner, "private");
  const b = await owner.post("/api/v1/builds", { title: "Traces-apart lantern", visibility: "private", design: retrofitDesign(ids, "strapped") });
  expect(b.status).toBe(201);
  buildId = (b.body.build as { id: string }).id;
});

describe("a solve's traces sent apart", () => {
  it("sends the figures with references only, and the references and the traces joined are the answer with its traces in place", async () => {
    const lean = await solve({});
    expect(lean.cached).toBe(false);
    expect(found(lean.evaluation, isTrace)).toEqual([]);
    const refs = found(lean.evaluation, isTraceRef);
    expect(refs.length).toBeGreaterThan(20);
    // Only traces became references: the links, limits and figures keep their own fields.
    expect(refs.filter((p) => !/trace/i.test(p))).toEqual([]);

    const listed = await solve({ traces: "only" });
    expect(listed.revision).toBe(lean.revision);
    expect(listed.traces!.length).toBeGreaterThan(0);
    expect(listed.traces!.every(isTrace)).toBe(true);
    // Every trace sent is referred to, and every reference is to a trace sent.
    const numbers = new Set<number>();
    JSON.stringify(lean.evaluation, (_k, v: unknown) => (isTraceRef(v) ? (numbers.add(v.traceRef), v) : v));
    expect([...numbers].sort((a, b) => a - b)).toEqual(listed.traces!.map((_t, i) => i));

    const inline = await solve({ traces: "inline" });
    expect(found(inline.evaluation, isTraceRef)).toEqual([]);
    expect(joinTraces(lean.evaluation, listed.traces!)).toEqual(inline.evaluation);
    // A third or less of the bytes the Budget waits for.
    expect(JSON.stringify(lean.evaluation).length).toBeLessThan(0.5 * JSON.stringify(inline.evaluation).length);
  });

  it("keeps the figures, the traces and the whole result after one cold solve, and serves each from the cache", async () => {
    await clearCache();
    const fresh = await solve({});
    expect(fresh.cached).toBe(false);
    await expect.poll(keptKeys, { timeout: 10_000 }).toHaveLength(3);
    const keys = await keptKeys();
    expect(keys.filter((k) => k.endsWith(":chart:apart"))).toHaveLength(1);
    expect(keys.filter((k) => k.endsWith(":traces"))).toHaveLength(1);
    expect(keys.filter((k) => !k.includes(":"))).toHaveLength(1);

    const [figures, traces, inline] = [await solve({}), await solve({ traces: "only" }), await solve({ traces: "inline", curves: "full" })];
    expect([figures.cached, traces.cached]).toEqual([true, true]);
    expect(figures.evaluation).toEqual(fresh.evaluation);
    // The traces kept after the figures were sent are the ones their references number.
    const joined = joinTraces(figures.evaluation, traces.traces!) as { scenarios: { id: string; thermal?: { links: unknown[] } }[] };
    const whole = inline.evaluation as typeof joined;
    expect(joined.scenarios.map((s) => s.thermal?.links)).toEqual(whole.scenarios.map((s) => s.thermal?.links));
  });

  it("answers the traces from a cold start too, in the order a later answer's references number them", async () => {
    await clearCache();
    const listed = await solve({ traces: "only" });
    expect(listed.cached).toBe(false);
    await expect.poll(keptKeys, { timeout: 10_000 }).toHaveLength(3);
    const figures = await solve({});
    expect(figures.cached).toBe(true);
    const inline = await solve({ traces: "inline" });
    expect(joinTraces(figures.evaluation, listed.traces!)).toEqual(inline.evaluation);
  });

  it("guards the traces as it guards the figures, and says what a wrong choice of traces is", async () => {
    expect((await stranger.post(`/api/v1/builds/${buildId}/solve`, { traces: "only" })).status).toBe(404);
    expect((await new Client().post(`/api/v1/builds/${buildId}/solve`, { traces: "only" })).status).toBe(401);
    const bad = await owner.post(`/api/v1/builds/${buildId}/solve`, { traces: "all" });
    expect(bad.status).toBe(400);
    expect(bad.body.error?.message).toContain("traces is apart, inline or only");
    expect((await owner.post(`/api/v1/builds/${buildId}/solve`, { traces: "only", revision: 9 })).status).toBe(404);
  });

  it("compares a newer solver's figures with an older result, never with an older list of traces", async () => {
    await clearCache();
    await solve({});
    await expect.poll(keptKeys, { timeout: 10_000 }).toHaveLength(3);
    // Only a list of traces is left from an "older solver": there are no older figures to compare.
    await withTestDb(async (c) => {
      const [rows] = await c.query("SELECT c.revision_id, c.result FROM solve_cache c JOIN build_revision r ON r.id = c.revision_id WHERE r.build_id = ? AND c.cache_key LIKE '%:traces'", [buildId]);
      const row = (rows as { revision_id: string; result: unknown }[])[0]!;
      await c.query("DELETE FROM solve_cache WHERE revision_id = ?", [row.revision_id]);
      await c.query("INSERT INTO solve_cache (revision_id, cache_key, result, created_at) VALUES (?, 'e0.1:traces', ?, NOW(3))", [row.revision_id, typeof row.result === "string" ? row.result : JSON.stringify(row.result)]);
    });
    const again = await solve({});
    expect(again.cached).toBe(false);
    expect(again.solverChange).toBeNull();
  });
});
