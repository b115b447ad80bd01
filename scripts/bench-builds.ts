/**
 * Build solve benchmark: POST /api/v1/builds/[id]/solve on the seeded demo builds, served by
 * the production build against the bench database, asked as the Budget asks (the figures;
 * their traces come apart). "Cold" solves a revision nothing has solved yet, as when a maker
 * has just saved one (the whole evaluation runs: every mode's steady state, warm-up, inverse
 * problems, and charging): each cold solve is of a fresh revision of a throwaway copy of the
 * build, so the database is not busy deleting cached results meanwhile; "cached" is the answer
 * for an unchanged revision. The server reports the evaluation's own time (Server-Timing:
 * evaluate); the target is a cold median of at most 2 × that evaluation time + 5 ms per demo
 * build. Requests go over one kept-alive
 * connection with Node's HTTP client (see `request`). Every demo build is solved cold once
 * before any is timed, so the first one timed does not pay for the server compiling the
 * route and the engine (which a server does once, not per request). Prints figures only.
 */
import { BENCH_DB, connectBenchDb, median, prepareBenchDb, quantile, request, startBenchServer } from "./bench-server";
import { target } from "./bench-targets";

// A median of 15 stays put from run to run where one of 7 moved by a few milliseconds.
const COLD_RUNS = 15;
const CACHED_RUNS = 20;

export async function benchBuilds(): Promise<void> {
  console.log(`\n[bench:builds] database ${BENCH_DB}: demo builds`);
  prepareBenchDb();
  const server = await startBenchServer("builds");
  const conn = await connectBenchDb();
  try {
    const cookie = await server.signIn("maker@sinkwise.test");
    const list = (await (await fetch(`${server.base}/api/v1/builds`, { headers: { cookie } })).json()) as { mine: { id: string; title: string }[] };
    const solve = async (id: string, body = "{}") => {
      const t0 = performance.now();
      const r = await request(`${server.base}/api/v1/builds/${id}/solve`, { method: "POST", headers: { cookie, origin: server.base, "content-type": "application/json" }, body });
      const ms = performance.now() - t0;
      const text = r.text;
      if (r.status !== 200) throw new Error(`solve ${id} → ${r.status}`);
      const timing = r.header("server-timing") ?? "";
      const dur = (name: string) => {
        const v = new RegExp(`${name};dur=([\\d.]+)`).exec(timing)?.[1];
        return v === undefined ? null : Number(v);
      };
      return { ms, evaluateMs: dur("evaluate"), serializeMs: dur("serialize"), handlerMs: dur("handler"), bytes: Buffer.byteLength(text), cached: text.slice(0, 400).includes('"cached":true') };
    };
    const clear = (id: string) => conn.query("DELETE r FROM solve_cache r JOIN build_revision v ON v.id = r.revision_id WHERE v.build_id = ?", [id]);
    // The cache is written after the answer has left: wait for the three shapes it keeps (the
    // figures, their traces, the whole result) to land, so that no write of one solve runs into
    // the next, and a clear cannot race a write (which would make the next "cold" solve a hit).
    const settled = async (id: string, number?: number) => {
      for (let i = 0; i < 100; i++) {
        const [rows] = await conn.query("SELECT COUNT(*) AS n FROM solve_cache r JOIN build_revision v ON v.id = r.revision_id WHERE v.build_id = ? AND (? IS NULL OR v.number = ?)", [id, number ?? null, number ?? null]);
        if (Number((rows as { n: number }[])[0]?.n ?? 0) >= 3) return;
        await new Promise((r) => setTimeout(r, 20));
      }
    };
    const api = async (path: string, method: string, body?: unknown) => {
      const r = await request(`${server.base}${path}`, { method, headers: { cookie, origin: server.base, "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
      if (r.status >= 300) throw new Error(`${method} ${path} → ${r.status}: ${r.text.slice(0, 200)}`);
      return JSON.parse(r.text) as unknown;
    };
    const freshRevisions = async (id: string): Promise<{ id: string; revisions: number[] }> => {
      const { revision } = (await api(`/api/v1/builds/${id}`, "GET")) as { revision: { design: unknown } };
      const { build } = (await api(`/api/v1/builds/${id}/fork`, "POST", { title: "bench copy" })) as { build: { id: string } };
      const revisions: number[] = [];
      for (let i = 0; i < COLD_RUNS; i++) {
        const saved = (await api(`/api/v1/builds/${build.id}`, "PATCH", { design: revision.design, note: "bench" })) as { build: { currentRevision: number } };
        revisions.push(saved.build.currentRevision);
      }
      return { id: build.id, revisions };
    };
    // The floor under every figure below: a route that does nothing, over the same connection.
    const floor: number[] = [];
    for (let i = 0; i < 60; i++) {
      const t0 = performance.now();
      await request(`${server.base}/api/v1/ping`);
      if (i >= 10) floor.push(performance.now() - t0);
    }
    console.log(`[bench:builds]   a route that does nothing (/api/v1/ping): median ${median(floor).toFixed(1)} ms over this connection`);
    for (const b of list.mine) {
      await clear(b.id);
      await solve(b.id);
      await settled(b.id);
    }
    const allCold: number[] = [];
    const allCached: number[] = [];
    let met = 0;
    for (const b of list.mine) {
      const cold: number[] = [];
      const evals: number[] = [];
      const serials: number[] = [];
      const handlers: number[] = [];
      let bytes = 0;
      // Each cold solve is of a revision nothing has solved yet, as when a maker saves one: a
      // throwaway copy of the build gets COLD_RUNS revisions of the same design first.
      const copy = await freshRevisions(b.id);
      for (const number of copy.revisions) {
        const r = await solve(copy.id, JSON.stringify({ revision: number }));
        if (r.cached) throw new Error(`cold solve of ${b.title} answered from the cache`);
        await settled(copy.id, number);
        cold.push(r.ms);
        if (r.evaluateMs !== null) evals.push(r.evaluateMs);
        if (r.serializeMs !== null) serials.push(r.serializeMs);
        if (r.handlerMs !== null) handlers.push(r.handlerMs);
        bytes = r.bytes;
      }
      await api(`/api/v1/builds/${copy.id}`, "DELETE");
      await clear(b.id);
      const full = await solve(b.id, JSON.stringify({ curves: "full" }));
      await settled(b.id);
      const cached: number[] = [];
      const cachedHandlers: number[] = [];
      for (let i = 0; i < CACHED_RUNS; i++) {
        const r = await solve(b.id);
        cached.push(r.ms);
        if (r.handlerMs !== null) cachedHandlers.push(r.handlerMs);
      }
      allCold.push(...cold);
      allCached.push(...cached);
      const evalMs = median(evals);
      const limit = 2 * evalMs + 5;
      const coldMs = median(cold);
      if (coldMs <= limit) met++;
      console.log(
        `[bench:builds]   ${b.title.padEnd(46)} cold median ${coldMs.toFixed(1)} ms, evaluation ${evalMs.toFixed(1)} ms (cold ÷ evaluation ${(coldMs / evalMs).toFixed(2)}; the rest ${(coldMs - evalMs).toFixed(1)} ms: serialising ${median(serials).toFixed(1)}, handler in all ${median(handlers).toFixed(1)}) · cached median ${median(cached).toFixed(1)} ms (handler ${median(cachedHandlers).toFixed(1)}) · answer ${(bytes / 1000).toFixed(0)} kB (full curves ${(full.bytes / 1000).toFixed(0)} kB)`,
      );
      console.log(`[bench:builds]     ${target(`cold solve over HTTP, ${b.title} (≤ 2 × its evaluation ${evalMs.toFixed(2)} ms + 5 ms)`, coldMs, limit, "ms")}`);
    }
    const c = median(allCold);
    const h = median(allCached);
    console.log(`[bench:builds] solve route over ${list.mine.length} demo builds: cold median ${c.toFixed(1)} ms (p90 ${quantile(allCold, 0.9).toFixed(1)}), cached median ${h.toFixed(1)} ms (p90 ${quantile(allCached, 0.9).toFixed(1)}); cold/cached ${(c / h).toFixed(1)}×`);
    console.log(`[bench:builds]   cold ≤ 2 × evaluation + 5 ms: ok for ${met} of ${list.mine.length} demo builds`);
    console.log(`[bench:builds]   ${target("solve route over the demo builds, cached median", h, 30, "ms", 1, "<")}`);
    console.log(`[bench:builds]   ${target("solve route over the demo builds, cold median", c, 30, "ms", 1, "<")}`);
  } finally {
    await conn.end();
    await server.stop();
  }
}
