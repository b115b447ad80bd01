/**
 * What the HTTP benchmarks share: the bench database (sinkwise_bench, migrated and seeded
 * with the demo), a production server of the current build on a free loopback port
 * (3310–3399) in its own process group, and a signed-in cookie.
 */
import { execFileSync, spawn } from "node:child_process";
import { existsSync } from "node:fs";
import http from "node:http";
import { createConnection } from "node:net";
import mysql from "mysql2/promise";
import { loadEnvFile } from "./load-env";

export const BENCH_DB = "sinkwise_bench";

export function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] ?? Number.NaN;
}

export function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(s.length * q))] ?? Number.NaN;
}

const keepAlive = new http.Agent({ keepAlive: true, maxSockets: 1 });

/**
 * One request over a kept-alive loopback connection with Node's own HTTP client, the lightest
 * there is: the timed figures are the server's and the wire's, not a heavier client's (fetch
 * spends a few milliseconds of its own on a few hundred kB). Returns status, headers and text.
 */
export function request(url: string, init: { method?: string; headers?: Record<string, string>; body?: string } = {}): Promise<{ status: number; header: (name: string) => string | undefined; text: string }> {
  return new Promise((resolve, reject) => {
    const body = init.body === undefined ? undefined : Buffer.from(init.body, "utf8");
    const req = http.request(url, { method: init.method ?? "GET", agent: keepAlive, headers: { ...init.headers, ...(body ? { "content-length": String(body.byteLength) } : {}) } }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => {
        const value = (name: string) => {
          const v = res.headers[name.toLowerCase()];
          return Array.isArray(v) ? v.join(", ") : v;
        };
        resolve({ status: res.statusCode ?? 0, header: value, text: Buffer.concat(chunks).toString("utf8") });
      });
      res.on("error", reject);
    });
    req.on("error", reject);
    req.end(body);
  });
}

export async function connectBenchDb(): Promise<mysql.Connection> {
  return mysql.createConnection({
    host: process.env.DATABASE_HOST ?? "127.0.0.1",
    port: Number(process.env.DATABASE_PORT ?? 3307),
    user: process.env.DATABASE_USER,
    password: process.env.DATABASE_PASSWORD,
    database: BENCH_DB,
  });
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

/** Migrates and seeds the bench database (idempotent). */
export function prepareBenchDb(): void {
  // On a fresh machine the secrets file does not exist yet: write it before reading it.
  execFileSync("bash", ["scripts/env.sh"], { stdio: "ignore" });
  loadEnvFile();
  const env = { ...process.env, DATABASE_NAME: BENCH_DB, NEXT_TELEMETRY_DISABLED: "1" };
  execFileSync("bash", ["scripts/db.sh", "start"], { stdio: "ignore" });
  execFileSync("bash", ["scripts/db.sh", "create-db", BENCH_DB], { stdio: "ignore" });
  const tsx = "node_modules/.bin/tsx";
  execFileSync(tsx, ["--conditions=react-server", "scripts/migrate.ts"], { env, stdio: "ignore" });
  execFileSync(tsx, ["--conditions=react-server", "scripts/seed.ts"], { env, stdio: "ignore" });
}

export type BenchServer = { base: string; signIn: (email: string) => Promise<string>; stop: () => Promise<void> };

/** Serves the current production build (building it first if there is none) against the bench database. */
export async function startBenchServer(label: string): Promise<BenchServer> {
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const env = { ...process.env, DATABASE_NAME: BENCH_DB, APP_URL: base, NEXT_TELEMETRY_DISABLED: "1" };
  if (!existsSync(".next/BUILD_ID")) {
    console.log(`[bench:${label}] no production build: running next build`);
    execFileSync("node", ["node_modules/next/dist/bin/next", "build"], { env, stdio: "ignore" });
  }
  // Its own process group: `next start` runs next-server as a child, and both must stop.
  const server = spawn("node", ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(port)], { env, stdio: "ignore", detached: true });
  let exited = false;
  server.once("exit", () => {
    exited = true;
  });
  const stop = async () => {
    if (!exited && server.pid) {
      const gone = new Promise((r) => server.once("exit", r));
      process.kill(-server.pid, "SIGTERM");
      await gone;
    }
  };
  try {
    await waitFor(`${base}/api/v1/health`, () => !exited);
  } catch (e) {
    await stop();
    throw e;
  }
  const signIn = async (email: string) => {
    const r = await fetch(`${base}/api/v1/auth/signin`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: base, "x-forwarded-for": "198.51.100.7" },
      body: JSON.stringify({ email, password: process.env.DEMO_PASSWORD }),
    });
    if (r.status !== 200) throw new Error(`bench sign-in of ${email} failed: ${r.status}`);
    return (r.headers.getSetCookie()[0] ?? "").split(";")[0] ?? "";
  };
  return { base, signIn, stop };
}
