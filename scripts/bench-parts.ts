/**
 * Parts bin benchmark: 5,000 parts in a dedicated database (sinkwise_bench), a production
 * server of the current build on a free loopback port (3310–3399), and the median time of the list API with
 * filter + sort + search as the Parts bin sends it. Target from the parts issue: median ≤ 50 ms.
 * Prints figures, asserts nothing.
 */
import { randomBytes } from "node:crypto";
import type mysql from "mysql2/promise";
import { partSchema, type PartInput } from "../lib/parts";
import { CATALOGUE } from "./seed/catalogue-data";
import { BENCH_DB, connectBenchDb, median, prepareBenchDb, quantile, startBenchServer } from "./bench-server";

const PARTS = 5000;
const RUNS = 50;

/** 5,000 parts: every catalogue part in many variants, spread over owners, provenance and visibility. */
async function seedParts(conn: mysql.Connection): Promise<void> {
  const [counted] = await conn.query("SELECT COUNT(*) AS n FROM part WHERE name LIKE 'Bench %'");
  if (Number((counted as { n: number }[])[0]?.n) === PARTS) return;
  await conn.query("DELETE FROM part WHERE name LIKE 'Bench %'");
  const [users] = await conn.query("SELECT id FROM user WHERE email IN ('maker@sinkwise.test','admin@sinkwise.test','reviewer@sinkwise.test','instructor@sinkwise.test')");
  const owners = (users as { id: string }[]).map((u) => u.id);
  const templates = Object.values(CATALOGUE).map((input) => partSchema.parse(input as PartInput));
  const provenances = ["datasheet", "measured", "estimate"] as const;
  const visibilities = ["private", "shared", "public"] as const;
  const rows: unknown[][] = [];
  const now = Date.now();
  for (let i = 0; i < PARTS; i++) {
    const t = templates[i % templates.length]!;
    const specs: Record<string, unknown> = { ...(t.specs as Record<string, unknown>) };
    // Vary the numbers so a figure sort has work to do.
    for (const [k, v] of Object.entries(specs)) if (typeof v === "number" && k !== "finCount") specs[k] = Number((v * (0.8 + ((i * 7919) % 400) / 1000)).toPrecision(6));
    if (typeof specs.finCount === "number") specs.finCount = 4 + (i % 20);
    rows.push([
      randomBytes(15).toString("base64url"),
      owners[i % owners.length],
      t.kind,
      `Bench ${t.kind} ${String(i).padStart(4, "0")} ${t.name}`.slice(0, 120),
      provenances[i % 3],
      "bench part",
      visibilities[(i >> 1) % 3],
      i % 5 === 0 ? null : (i % 37) + 0.5,
      i % 11 === 0,
      JSON.stringify(specs),
      JSON.stringify(t.curves),
      new Date(now - i * 60_000),
      new Date(now - i * 60_000),
    ]);
  }
  for (let i = 0; i < rows.length; i += 500) {
    await conn.query(
      "INSERT INTO part (id, owner_id, kind, name, provenance, provenance_note, visibility, cost_eur, verified, specs, curves, created_at, updated_at) VALUES ?",
      [rows.slice(i, i + 500)],
    );
  }
  await conn.query("ANALYZE TABLE part");
}

export async function benchParts(): Promise<void> {
  console.log(`\n[bench:parts] database ${BENCH_DB}: migrating and seeding ${PARTS} parts`);
  prepareBenchDb();
  const conn = await connectBenchDb();
  try {
    await seedParts(conn);
  } finally {
    await conn.end();
  }
  const server = await startBenchServer("parts");
  const BASE = server.base;
  try {
    const cookie = await server.signIn("maker@sinkwise.test");
    // What the Parts bin sends: a kind or provenance filter, a sort, sometimes a search, a page.
    const queries = [
      "kind=heatsink&sort=name&dir=asc&page=1&pageSize=25",
      "kind=heatsink&provenance=measured&sort=spec:finCount&dir=desc&page=2&pageSize=25",
      "provenance=estimate&owner=everyone&sort=updated&dir=desc&page=5&pageSize=25",
      "kind=cell&q=3000&sort=spec:capacityCoulomb&dir=asc&page=1&pageSize=50",
      "owner=mine&sort=name&dir=asc&page=3&pageSize=25",
    ];
    const get = async (q: string) => {
      const t0 = performance.now();
      const r = await fetch(`${BASE}/api/v1/parts?${q}`, { headers: { cookie } });
      const body = (await r.json()) as { total?: number };
      const ms = performance.now() - t0;
      if (r.status !== 200) throw new Error(`GET /api/v1/parts?${q} → ${r.status}`);
      return { ms, total: body.total ?? 0 };
    };
    for (let i = 0; i < 10; i++) await get(queries[i % queries.length]!);
    const samples: number[] = [];
    const totals = new Map<string, number>();
    for (let i = 0; i < RUNS; i++) {
      const q = queries[i % queries.length]!;
      const { ms, total } = await get(q);
      samples.push(ms);
      totals.set(q, total);
    }
    const med = median(samples);
    console.log(`[bench:parts] GET /api/v1/parts over ${PARTS} parts, ${RUNS} requests (5 filter/sort/search mixes, signed in as a maker):`);
    console.log(`[bench:parts]   median ${med.toFixed(1)} ms, p90 ${quantile(samples, 0.9).toFixed(1)} ms, max ${Math.max(...samples).toFixed(1)} ms — target median ≤ 50 ms: ${med <= 50 ? "met" : "NOT met"}`);
    for (const [q, total] of totals) console.log(`[bench:parts]   ${total} matching  ?${q}`);
  } finally {
    await server.stop();
  }
}
