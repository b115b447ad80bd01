/**
 * Live editor benchmark: POST /api/v1/builds/[id]/preview with each seeded demo build's
 * design, changed a little on every run (the ambient temperature) as a person typing would,
 * served by the production build against the bench database. The editor sends a draft
 * PREVIEW_DEBOUNCE_MS after the last change, so the time from the last change to the
 * updated verdict is that wait plus the round trip printed here. Target from the maker's
 * issue: ≤ 300 ms median. Prints figures only.
 */
import { PREVIEW_DEBOUNCE_MS } from "../components/builds/use-design-preview";
import { BENCH_DB, median, prepareBenchDb, quantile, startBenchServer } from "./bench-server";
import { target } from "./bench-targets";

const RUNS = 15;

export async function benchPreview(): Promise<void> {
  console.log(`\n[bench:preview] database ${BENCH_DB}: demo builds, unsaved drafts`);
  prepareBenchDb();
  const server = await startBenchServer("preview");
  try {
    const cookie = await server.signIn("maker@sinkwise.test");
    const headers = { cookie, origin: server.base, "content-type": "application/json" };
    const list = (await (await fetch(`${server.base}/api/v1/builds`, { headers: { cookie } })).json()) as { mine: { id: string; title: string }[] };
    const all: number[] = [];
    for (const b of list.mine) {
      const got = (await (await fetch(`${server.base}/api/v1/builds/${b.id}`, { headers: { cookie } })).json()) as { revision: { design: { environment?: { ambientC?: number } } } };
      const design = got.revision.design;
      const times: number[] = [];
      for (let i = 0; i < RUNS; i++) {
        const draft = { ...design, environment: { ...design.environment, ambientC: 20 + i * 0.5 } };
        const t0 = performance.now();
        const r = await fetch(`${server.base}/api/v1/builds/${b.id}/preview`, { method: "POST", headers, body: JSON.stringify({ design: draft }) });
        const body = (await r.json()) as { valid?: boolean };
        if (r.status !== 200 || body.valid !== true) throw new Error(`preview ${b.id} → ${r.status}`);
        times.push(performance.now() - t0);
      }
      all.push(...times);
      const m = median(times);
      console.log(`[bench:preview]   ${b.title.padEnd(46)} round trip median ${m.toFixed(1)} ms (p90 ${quantile(times, 0.9).toFixed(1)}) · last change → verdict ${(m + PREVIEW_DEBOUNCE_MS).toFixed(0)} ms`);
    }
    const m = median(all);
    const total = m + PREVIEW_DEBOUNCE_MS;
    console.log(`[bench:preview] preview over ${list.mine.length} demo builds: round trip median ${m.toFixed(1)} ms (p90 ${quantile(all, 0.9).toFixed(1)}); with the ${PREVIEW_DEBOUNCE_MS} ms wait after the last change: ${total.toFixed(0)} ms`);
    console.log(`[bench:preview]   ${target("live editor, last change → verdict, median", total, 300, "ms", 0)}`);
  } finally {
    await server.stop();
  }
}
