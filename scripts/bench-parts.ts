/**
 * Parts bin benchmark: 5,000 parts in a dedicated database (sinkwise_bench), a production
 * server of the current build on a free loopback port (3310–3399), and the median time of the list API with
 * filter + sort + search as the Parts bin sends it. Target from the parts issue: median ≤ 50 ms.
 * Prints figures, asserts nothing.
 */
import { execFileSync, spawn } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync } from "node:fs";
import { createConnection } from "node:net";
import mysql from "mysql2/promise";
import { partSchema, type PartInput } from "../lib/parts";
import { CATALOGUE } from "../db/seed/catalogue-data";
import { loadEnvFile } from "./load-env";

const BENCH_DB = "sinkwise_bench";
const PARTS = 5000;
const RUNS = 50;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] ?? Number.NaN;
}
function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(s.length * q))] ?? Number.NaN;
}

async function connect(): Promise<mysql.Connection> {
  return mysql.createConnection({
    host: process.env.DATABASE_HOST ?? "127.0.0.1",
    port: Number(process.env.DATABASE_PORT ?? 3307),
    user: process.env.DATABASE_USER,
    password: process.env.DATABASE_PASSWORD,
    database: BENCH_DB,
  });
}

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

/** True when something already answers on 127.0.0.1:port (another engineer's server, say). */
function portBusy(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = createConnection(port, "127.0.0.1");
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("error", () => resolve(false));
  });
}

async function freePort(): Promise<number> {
  for (let port = 3310; port < 3400; port++) if (!(await portBusy(port))) return port;
  throw new Error("no free port in 3310–3399");
}

async function waitFor(url: string, alive: () => boolean, tries = 300): Promise<void> {
  for (let i = 0; i < tries; i++) {
    if (!alive()) throw new Error("the bench server exited");
    try {
      if ((await fetch(url)).status < 500) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${url} did not answer`);
}

export async function benchParts(): Promise<void> {
  loadEnvFile();
  const PORT = await freePort();
  const BASE = `http://127.0.0.1:${PORT}`;
  const env = { ...process.env, DATABASE_NAME: BENCH_DB, APP_URL: BASE, NEXT_TELEMETRY_DISABLED: "1" };
  console.log(`\n[bench:parts] database ${BENCH_DB}: migrating and seeding ${PARTS} parts`);
  execFileSync("bash", ["scripts/db.sh", "start"], { stdio: "ignore" });
  execFileSync("bash", ["scripts/db.sh", "create-db", BENCH_DB], { stdio: "ignore" });
  const tsx = ["node_modules/.bin/tsx", "--conditions=react-server"];
  execFileSync(tsx[0]!, [tsx[1]!, "scripts/migrate.ts"], { env, stdio: "ignore" });
  execFileSync(tsx[0]!, [tsx[1]!, "scripts/seed.ts"], { env, stdio: "ignore" });
  const conn = await connect();
  try {
    await seedParts(conn);
  } finally {
    await conn.end();
  }

  if (!existsSync(".next/BUILD_ID")) {
    console.log("[bench:parts] no production build: running next build");
    execFileSync("node", ["node_modules/next/dist/bin/next", "build"], { env, stdio: "ignore" });
  }
  // Its own process group: `next start` runs next-server as a child, and both must stop.
  const server = spawn("node", ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(PORT)], { env, stdio: "ignore", detached: true });
  let exited = false;
  server.once("exit", () => {
    exited = true;
  });
  try {
    await waitFor(`${BASE}/api/v1/health`, () => !exited);
    const signIn = await fetch(`${BASE}/api/v1/auth/signin`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: BASE, "x-forwarded-for": "198.51.100.7" },
      body: JSON.stringify({ email: "maker@sinkwise.test", password: process.env.DEMO_PASSWORD }),
    });
    const cookie = (signIn.headers.getSetCookie()[0] ?? "").split(";")[0] ?? "";
    if (signIn.status !== 200) throw new Error(`bench sign-in failed: ${signIn.status}`);
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
    if (!exited && server.pid) {
      const gone = new Promise((r) => server.once("exit", r));
      process.kill(-server.pid, "SIGTERM");
      await gone;
    }
  }
}
