/**
 * Bench-run fit benchmark: prints figures, asserts nothing. Target from the bench runs'
 * issue: fitting 1,200 readings ≤ 50 ms median.
 */
import { fitInputSchema, fitWarmUp, naturalPath, riseAt } from "../lib/bench";
import { calibrateBuild } from "../lib/bench/calibrate";
import { evaluateBuild, type ResolvedBuild } from "../lib/retrofit";
import { lantern } from "../tests/unit/retrofit/fixtures/builds";

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** 1,200 readings of a 4.5 K/W, 90 J/K sink at 7 W over two time constants, with ±0.3 K of noise. */
function run(seed: number, ambientC = 25) {
  const path = naturalPath({ ambientC: 25, surface: "vertical-plate", characteristicLengthM: 0.05, emissivity: 0.5, emissivityNote: "" });
  const times = Float64Array.from({ length: 1200 }, (_, i) => (i + 1) * ((2 * 4.5 * 90) / 1200));
  const rise = riseAt(path, 7, 4.5, 90, times, new Float64Array(times.length));
  let s = seed;
  const rnd = () => ((s = (s * 16807) % 2147483647), s / 2147483647 - 0.5);
  return fitInputSchema.parse({ ambientC, heatW: 7, readings: Array.from(times, (t, i) => ({ tS: t, tempC: ambientC + rise[i]! + 0.6 * rnd() })) });
}

export async function benchFit(): Promise<void> {
  const inputs = Array.from({ length: 40 }, (_, i) => run(i + 1));
  for (let i = 0; i < 5; i++) fitWarmUp(inputs[i]!);
  // A new ambient builds the conductance table afresh: the cold figure includes that.
  const cold: number[] = [];
  const fresh = Array.from({ length: 9 }, (_, i) => run(i + 1, 25.1 + i / 10));
  for (const input of fresh) {
    const t0 = performance.now();
    fitWarmUp(input);
    cold.push(performance.now() - t0);
  }
  const times: number[] = [];
  let last = fitWarmUp(inputs[0]!);
  for (const input of inputs) {
    const t0 = performance.now();
    last = fitWarmUp(input);
    times.push(performance.now() - t0);
  }
  console.log("\n== Bench runs: fitting a warm-up ==");
  console.log(`fit of 1,200 readings (R and C, natural convection + radiation path): median ${median(times).toFixed(2)} ms, max ${Math.max(...times).toFixed(2)} ms over ${times.length} runs (target ≤ 50 ms median)`);
  console.log(`fit of 1,200 readings at an ambient not seen before (conductance table built): median ${median(cold).toFixed(2)} ms`);
  console.log(`  last fit: R = ${last.sinkToAirKPerW.value.toFixed(3)} K/W [${last.sinkToAirKPerW.low.toFixed(3)}, ${last.sinkToAirKPerW.high.toFixed(3)}] (true 4.5), C = ${last.heatCapacityJPerK.value.toFixed(1)} J/K [${last.heatCapacityJPerK.low.toFixed(1)}, ${last.heatCapacityJPerK.high.toFixed(1)}] (true 90), RMS ${last.rmsK.toFixed(3)} K`);
  benchCalibration();
}

/** Calibrating the test lantern to 40 readings of its own warm-up with the inside air at 0.7 of the model's. */
export function benchCalibration(): void {
  const build = lantern();
  const truth: ResolvedBuild = { ...build, calibration: { parameter: "inside-air", factor: 0.7, low: null, high: null, run: { id: "bench", title: "bench" }, readingCount: 1, rmsBeforeK: 0, rmsAfterK: 0 } };
  const mode = evaluateBuild(truth, { skipWhatItTakes: true }).scenarios.filter((s) => s.kind === "mode" && s.warmup).at(-1)!;
  const readings = ["heatsink", "housing wall"].flatMap((place) => {
    const node = mode.thermal!.nodes.find((n) => n.place === place)!;
    return Array.from({ length: 20 }, (_, k) => {
      const i = mode.warmup!.timesS.findIndex((t) => t >= (k + 1) * 120);
      return { tS: mode.warmup!.timesS[i]!, tempC: mode.warmup!.temperaturesC[node.id]![i]!, place };
    });
  });
  const times: number[] = [];
  let last: ReturnType<typeof calibrateBuild> | null = null;
  for (let i = 0; i < 5; i++) {
    const t0 = performance.now();
    last = calibrateBuild({ build, run: { id: "bench", title: "bench", ambientC: 25, mode: mode.name, readings }, sinkMeasured: true });
    times.push(performance.now() - t0);
  }
  console.log("\n== Bench runs: calibrating a build to its warm-up ==");
  console.log(`calibration of the test lantern (inside air) to 40 readings: median ${median(times).toFixed(0)} ms over ${times.length} runs, ${last!.evaluations} warm-ups worked out each`);
  console.log(`  factor ${last!.factor.toFixed(3)} [${last!.low?.toFixed(3) ?? "–"}, ${last!.high?.toFixed(3) ?? "–"}] (true 0.7), misfit ${last!.rmsBeforeK.toFixed(2)} K → ${last!.rmsAfterK.toFixed(3)} K`);
}

if (process.argv[1]?.endsWith("bench-fit.ts")) void benchFit();
