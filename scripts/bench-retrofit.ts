/**
 * Build evaluation benchmark: prints figures, asserts nothing (speed is not a unit test).
 * Target: every demo build's evaluation (steady, warm-up, limits, what it takes, charging)
 * under 10 ms median; the figures are taken under whatever load the machine has.
 */
import { evaluateBuild, type ResolvedBuild } from "../lib/retrofit";
import { target } from "./bench-targets";
import { headlamp, inspection, lantern } from "../tests/unit/retrofit/fixtures/builds";

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function time(runs: number, f: () => void): { median: number; p90: number } {
  for (let i = 0; i < 10; i++) f();
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    f();
    samples.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  const sorted = [...samples].sort((a, b) => a - b);
  return { median: median(samples), p90: sorted[Math.floor(sorted.length * 0.9)]! };
}

export async function benchRetrofit(): Promise<void> {
  const builds: [string, ResolvedBuild][] = [
    ["lantern (declared sink, 2 modes + charging)", lantern()],
    ["headlamp (finned sink, strap, breeze, 2 modes)", headlamp()],
    ["inspection lamp (4P pack, 3 A charger, 3 modes + charging)", inspection()],
  ];
  console.log("retrofit: evaluateBuild (steady fixed point, warm-up, limits, what it takes)");
  // A server evaluates builds of every kind: let the engine's code be compiled for all three
  // before any is timed, so the first one measured is not also paying for the compiler.
  for (let i = 0; i < 20; i++) for (const [, build] of builds) evaluateBuild(build);
  for (const [name, build] of builds) {
    const full = time(40, () => evaluateBuild(build));
    const core = time(40, () => evaluateBuild(build, { skipWarmup: true, skipWhatItTakes: true }));
    console.log(`  ${name}: median ${full.median.toFixed(2)} ms (p90 ${full.p90.toFixed(2)}); steady only ${core.median.toFixed(2)} ms`);
    console.log(`    ${target(`evaluateBuild median, ${name.split(" (")[0]}`, full.median, 10, "ms", 2, "<")}`);
  }
}
