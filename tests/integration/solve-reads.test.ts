// The solve route reads the build, its revision, the solve cache, the parts snapshot and a
// solver change in one round trip beside the session check. These tests hold that the one read
// gives what the separate reads give, and that its access facts are those of the session's own
// user, never of whoever a cookie names.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getBuildToSolve } from "@/db/queries/builds";
import { getSnapshot } from "@/db/queries/snapshots";
import { getSolveReads } from "@/db/queries/solve-cache";
import { pool } from "@/db/client";
import { sessionIdOf } from "@/server/auth/session";
import { withTestDb } from "../support/db";
import { Client, signedIn } from "../support/http";
import { createParts, retrofitDesign } from "../support/retrofit";

let owner: Client;
let stranger: Client;
let ownerId = "";
let buildId = "";

const sessionOf = (c: Client): string => {
  const parsed = sessionIdOf(c.sessionToken() ?? "");
  if (!parsed) throw new Error("no session cookie");
  return parsed.id;
};

async function rows<T>(query: string, params: unknown[] = []): Promise<T[]> {
  return withTestDb(async (c) => (await c.query(query, params))[0] as T[]);
}

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  stranger = await signedIn("student1@sinkwise.test");
  ownerId = (await owner.get("/api/v1/me")).body.user?.id ?? "";
  const ids = await createParts(owner, "private");
  const b = await owner.post("/api/v1/builds", { title: "One-read lantern", visibility: "private", design: retrofitDesign(ids, "strapped") });
  expect(b.status).toBe(201);
  buildId = (b.body.build as { id: string }).id;
  // A solve fills the cache (written after the answer: wait for both shapes).
  expect((await owner.post(`/api/v1/builds/${buildId}/solve`, {})).status).toBe(200);
  const stored = async () => (await rows<{ n: number }>("SELECT COUNT(*) AS n FROM solve_cache c JOIN build_revision r ON r.id = c.revision_id WHERE r.build_id = ?", [buildId]))[0]?.n;
  for (let i = 0; i < 100 && Number(await stored()) < 3; i++) await new Promise((r) => setTimeout(r, 100));
  expect(Number(await stored())).toBe(3);
});

afterAll(async () => {
  await pool().end();
  (globalThis as { sinkwisePool?: unknown; sinkwiseDb?: unknown }).sinkwisePool = undefined;
  (globalThis as { sinkwisePool?: unknown; sinkwiseDb?: unknown }).sinkwiseDb = undefined;
});

describe("the solve's reads in one round trip", () => {
  it("give what the separate reads give: the cached bytes, every key newest first, the snapshot", async () => {
    const revisions = await rows<{ id: string }>("SELECT DISTINCT revision_id AS id FROM solve_cache UNION SELECT DISTINCT revision_id FROM revision_part_snapshot");
    expect(revisions.length).toBeGreaterThan(5);
    for (const { id } of revisions) {
      const cached = await rows<{ key: string; result: Buffer }>("SELECT cache_key AS `key`, CAST(result AS BINARY) AS result FROM solve_cache WHERE revision_id = ? ORDER BY created_at DESC", [id]);
      const key = cached[0]?.key ?? "no-such-key";
      const reads = await getSolveReads({ revisionId: id, cacheKey: key, solverVersion: "any" });
      expect(reads.keys).toEqual(cached.map((c) => c.key));
      if (cached[0]) expect(reads.hit?.equals(cached[0].result)).toBe(true);
      else expect(reads.hit).toBeUndefined();
      const alone = await getSnapshot({ revisionId: id });
      expect(reads.snapshot === undefined).toBe(alone === undefined);
      if (alone) expect(JSON.stringify([...reads.snapshot!].sort())).toBe(JSON.stringify([...alone].sort()));
    }
  });

  it("reads a solver change for its own version only", async () => {
    const [revision] = await rows<{ id: string }>("SELECT r.id FROM build_revision r WHERE r.build_id = ? AND r.number = 1", [buildId]);
    await withTestDb((c) =>
      c.query("INSERT INTO revision_solver_change (revision_id, solver_version, previous_version, changes, created_at) VALUES (?, 'test-v2', 'test-v1', ?, NOW(3))", [revision!.id, JSON.stringify(["Mode high, LED junction: 92 °C → 95 °C"])]),
    );
    try {
      const mine = await getSolveReads({ revisionId: revision!.id, cacheKey: "x", solverVersion: "test-v2" });
      expect(mine.change).toEqual({ previousVersion: "test-v1", changes: ["Mode high, LED junction: 92 °C → 95 °C"] });
      const other = await getSolveReads({ revisionId: revision!.id, cacheKey: "x", solverVersion: "test-v3" });
      expect(other.change).toBeNull();
    } finally {
      await withTestDb((c) => c.query("DELETE FROM revision_solver_change WHERE revision_id = ? AND solver_version = 'test-v2'", [revision!.id]));
    }
  });

  it("takes its access facts from the session's own user, and gives the build to that user only", async () => {
    const args = { id: buildId, cacheKey: "x", solverVersion: "any" };
    const asOwner = await getBuildToSolve({ ...args, sessionId: sessionOf(owner) });
    expect(asOwner?.viewerId).toBe(ownerId);
    expect(asOwner?.build({ id: ownerId, role: "maker" })?.id).toBe(buildId);
    expect(asOwner?.revision?.number).toBe(1);
    expect(asOwner?.reads?.snapshot?.size).toBeGreaterThan(0);
    // The owner's facts are never handed to another viewer.
    expect(asOwner?.build({ id: "someone-else", role: "admin" })).toBeUndefined();

    const strangerId = (await stranger.get("/api/v1/me")).body.user?.id ?? "";
    const asStranger = await getBuildToSolve({ ...args, sessionId: sessionOf(stranger) });
    expect(asStranger?.viewerId).toBe(strangerId);
    expect(asStranger?.build({ id: strangerId, role: "maker" })).toBeUndefined();

    const noSession = await getBuildToSolve({ ...args, sessionId: "0.no-such-session" });
    expect(noSession?.viewerId).toBeNull();

    const missingRevision = await getBuildToSolve({ ...args, sessionId: sessionOf(owner), number: 99 });
    expect(missingRevision?.build({ id: ownerId, role: "maker" })?.id).toBe(buildId);
    expect(missingRevision?.revision).toBeUndefined();
    expect(missingRevision?.reads).toBeUndefined();

    expect(await getBuildToSolve({ ...args, id: "no-such-build", sessionId: sessionOf(owner) })).toBeUndefined();
  });

  it("answers a stranger 404, an anonymous bad body 401, the owner's bad body 400, then the cached result", async () => {
    expect((await stranger.post(`/api/v1/builds/${buildId}/solve`, {})).status).toBe(404);
    expect((await new Client().post(`/api/v1/builds/${buildId}/solve`, { curves: "wrong" })).status).toBe(401);
    const bad = await owner.post(`/api/v1/builds/${buildId}/solve`, { curves: "wrong" });
    expect(bad.status).toBe(400);
    expect(bad.body.error?.message).toContain("curves");
    expect((await owner.post(`/api/v1/builds/${buildId}/solve`, { revision: 2 })).status).toBe(404);
    const hit = await owner.post(`/api/v1/builds/${buildId}/solve`, {});
    expect(hit.status).toBe(200);
    expect(hit.body.cached).toBe(true);
    expect((hit.body.evaluation as { scenarios: unknown[] }).scenarios.length).toBeGreaterThan(0);
  });
});
