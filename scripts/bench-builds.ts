/**
 * Build solve benchmark: POST /api/v1/builds/[id]/solve on the seeded demo builds, served by
 * the production build against the bench database. "Cold" clears the solve cache before
 * each request (the whole evaluation runs: every mode's steady state, warm-up, inverse
 * problems, and charging); "cached" is the answer for an unchanged revision. Target from
 * the builds issue: route median under 30 ms for a demo build. Prints figures only.
 */
import { BENCH_DB, connectBenchDb, median, prepareBenchDb, quantile, startBenchServer } from "./bench-server";

const COLD_RUNS = 5;
const CACHED_RUNS = 20;

export async function benchBuilds(): Promise<void> {
  console.log(`\n[bench:builds] database ${BENCH_DB}: demo builds`);
  prepareBenchDb();
  const server = await startBenchServer("builds");
  const conn = await connectBenchDb();
  try {
    const cookie = await server.signIn("maker@sinkwise.test");
    const list = (await (await fetch(`${server.base}/api/v1/builds`, { headers: { cookie } })).json()) as { mine: { id: string; title: string }[] };
    const solve = async (id: string) => {
      const t0 = performance.now();
      const r = await fetch(`${server.base}/api/v1/builds/${id}/solve`, { method: "POST", headers: { cookie, origin: server.base, "content-type": "application/json" }, body: "{}" });
      await r.text();
      if (r.status !== 200) throw new Error(`solve ${id} → ${r.status}`);
      return performance.now() - t0;
    };
    const allCold: number[] = [];
    const allCached: number[] = [];
    for (const b of list.mine) {
      const cold: number[] = [];
      for (let i = 0; i < COLD_RUNS; i++) {
        await conn.query("DELETE r FROM solve_cache r JOIN build_revision v ON v.id = r.revision_id WHERE v.build_id = ?", [b.id]);
        cold.push(await solve(b.id));
      }
      const cached: number[] = [];
      for (let i = 0; i < CACHED_RUNS; i++) cached.push(await solve(b.id));
      allCold.push(...cold);
      allCached.push(...cached);
      console.log(`[bench:builds]   ${b.title.padEnd(46)} cold median ${median(cold).toFixed(1)} ms · cached median ${median(cached).toFixed(1)} ms`);
    }
    const c = median(allCold);
    const h = median(allCached);
    console.log(`[bench:builds] solve route over ${list.mine.length} demo builds: cold median ${c.toFixed(1)} ms (p90 ${quantile(allCold, 0.9).toFixed(1)}), cached median ${h.toFixed(1)} ms (p90 ${quantile(allCached, 0.9).toFixed(1)}); cold/cached ${(c / h).toFixed(1)}×`);
    console.log(`[bench:builds]   target median < 30 ms: cached ${h < 30 ? "met" : "NOT met"}, cold ${c < 30 ? "met" : "NOT met"}`);
  } finally {
    await conn.end();
    await server.stop();
  }
}
