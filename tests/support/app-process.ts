// More app processes from the same production build, for the scale-out and fault tests:
// each is `next start` on its own loopback port with the test server's environment.
import { type ChildProcess, spawn } from "node:child_process";
import { BASE_URL } from "./http";

export type AppProcess = { base: string; port: number; child: ChildProcess; stop(): Promise<void> };

/** A port near the test server's own (TEST_APP_PORT + n), so engineers' runs do not collide. */
export function nearbyPort(n: number): number {
  return Number(new URL(BASE_URL).port) + n;
}

async function answers(url: string): Promise<boolean> {
  try {
    return (await fetch(url)).status < 500;
  } catch {
    return false;
  }
}

/** Starts an app process and waits (polling, up to `timeoutMs`) until its health route answers. */
export async function startApp(port: number, env: Record<string, string> = {}, timeoutMs = 90_000): Promise<AppProcess> {
  const base = `http://127.0.0.1:${port}`;
  if (await answers(`${base}/api/v1/health`)) throw new Error(`port ${port} is in use already`);
  const child = spawn(process.execPath, ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(port)], {
    env: { ...process.env, APP_URL: base, ...env },
    stdio: "ignore",
  });
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  const stop = async () => {
    if (child.exitCode === null && child.signalCode === null) child.kill("SIGTERM");
    await exited;
  };
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the app on port ${port} exited (${child.exitCode})`);
    if (await answers(`${base}/api/v1/health`)) return { base, port, child, stop };
    await new Promise((r) => setTimeout(r, 200));
  }
  await stop();
  throw new Error(`the app on port ${port} did not answer within ${timeoutMs} ms`);
}
