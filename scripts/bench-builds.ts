/**
 * Build solve benchmark: POST /api/v1/builds/[id]/solve on the seeded demo builds, served by
 * the production build against the bench database. "Cold" clears the solve cache before
 * each request (the whole evaluation runs: every mode's steady state, warm-up, inverse
 * problems, and charging); "cached" is the answer for an unchanged revision. The server
 * reports the evaluation's own time (Server-Timing: evaluate); the target is a cold median
 * of at most 2 × that evaluation time + 5 ms per demo build. Prints figures only.
 */
import { BENCH_DB, connectBenchDb, median, prepareBenchDb, quantile, startBenchServer } from "./bench-server";

const COLD_RUNS = 7;
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
      const r = await fetch(`${server.base}/api/v1/builds/${id}/solve`, { method: "POST", headers: { cookie, origin: server.base, "content-type": "application/json" }, body });
      const text = await r.text();
      const ms = performance.now() - t0;
      if (r.status !== 200) throw new Error(`solve ${id} → ${r.status}`);
      const evaluate = /evaluate;dur=([\d.]+)/.exec(r.headers.get("server-timing") ?? "")?.[1];
      return { ms, evaluateMs: evaluate === undefined ? null : Number(evaluate), bytes: Buffer.byteLength(text) };
    };
    const clear = (id: string) => conn.query("DELETE r FROM solve_cache r JOIN build_revision v ON v.id = r.revision_id WHERE v.build_id = ?", [id]);
    const allCold: number[] = [];
    const allCached: number[] = [];
    let met = 0;
    for (const b of list.mine) {
      const cold: number[] = [];
      const evals: number[] = [];
      let bytes = 0;
      for (let i = 0; i < COLD_RUNS; i++) {
        await clear(b.id);
        const r = await solve(b.id);
        cold.push(r.ms);
        if (r.evaluateMs !== null) evals.push(r.evaluateMs);
        bytes = r.bytes;
      }
      await clear(b.id);
      const full = await solve(b.id, JSON.stringify({ curves: "full" }));
      const cached: number[] = [];
      for (let i = 0; i < CACHED_RUNS; i++) cached.push((await solve(b.id)).ms);
      allCold.push(...cold);
      allCached.push(...cached);
      const target = 2 * median(evals) + 5;
      const ok = median(cold) <= target;
      if (ok) met++;
      console.log(
        `[bench:builds]   ${b.title.padEnd(46)} cold median ${median(cold).toFixed(1)} ms (evaluation ${median(evals).toFixed(1)} ms; target ≤ ${target.toFixed(1)} ms: ${ok ? "met" : "NOT met"}) · cached median ${median(cached).toFixed(1)} ms · answer ${(bytes / 1000).toFixed(0)} kB (full curves ${(full.bytes / 1000).toFixed(0)} kB)`,
      );
    }
    const c = median(allCold);
    const h = median(allCached);
    console.log(`[bench:builds] solve route over ${list.mine.length} demo builds: cold median ${c.toFixed(1)} ms (p90 ${quantile(allCold, 0.9).toFixed(1)}), cached median ${h.toFixed(1)} ms (p90 ${quantile(allCached, 0.9).toFixed(1)}); cold/cached ${(c / h).toFixed(1)}×`);
    console.log(`[bench:builds]   cold ≤ 2 × evaluation + 5 ms: met for ${met} of ${list.mine.length} demo builds; target median < 30 ms: cached ${h < 30 ? "met" : "NOT met"}, cold ${c < 30 ? "met" : "NOT met"}`);
  } finally {
    await conn.end();
    await server.stop();
  }
}
