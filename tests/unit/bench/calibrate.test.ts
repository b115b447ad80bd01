import { describe, expect, it } from "vitest";
import { calibrateBuild, leastCertainParameter } from "@/lib/bench/calibrate";
import { evaluateBuild, type ResolvedBuild } from "@/lib/retrofit";
import { calibratedLinkIndices } from "@/lib/retrofit/compile/calibration";
import type { Calibration } from "@/lib/retrofit/design-schema";
import { lantern } from "../retrofit/fixtures/builds";

const RUN = { id: "run-1", title: "Synthetic warm-up" };
const cal = (parameter: Calibration["parameter"], factor: number): Calibration => ({ parameter, factor, low: null, high: null, run: RUN, readingCount: 1, rmsBeforeK: 0, rmsAfterK: 0 });

/** The build's own warm-up at a known factor, read every 2 min for 40 min at three places, with ±0.3 K of fixed noise. */
function syntheticRun(build: ResolvedBuild, calibration: Calibration, ambientC: number) {
  const b: ResolvedBuild = { ...build, calibration, environment: { ...build.environment, ambientC } };
  const scenario = evaluateBuild(b, { skipWhatItTakes: true }).scenarios.filter((s) => s.kind === "mode" && s.warmup).at(-1)!;
  const w = scenario.warmup!;
  const noise = [0.3, -0.2, 0.1, -0.3, 0.2, 0, -0.1, 0.3, -0.3, 0.1, -0.2];
  const readings: { tS: number; tempC: number; place: string }[] = [];
  let k = 0;
  for (const place of ["heatsink", "housing wall", "driver board"]) {
    const node = scenario.thermal!.nodes.find((n) => n.place === place)!;
    for (let t = 120; t <= 2400; t += 120) {
      const i = w.timesS.findIndex((x) => x >= t);
      readings.push({ tS: w.timesS[i]!, tempC: w.temperaturesC[node.id]![i]! + noise[k++ % noise.length]!, place });
    }
  }
  return { mode: scenario.name, readings };
}

describe("calibrating a build to a bench run of the finished lamp", () => {
  it("picks the least certain figure: a declared rating not measured, else the inside air of a sealed housing, else the outside air", () => {
    const b = lantern(); // declared 8 K/W sink in a sealed steel lantern
    expect(leastCertainParameter(b, { sinkMeasured: false })?.parameter).toBe("sink-rating");
    expect(leastCertainParameter(b, { sinkMeasured: true })?.parameter).toBe("inside-air");
    const vented = { ...b, housing: { ...b.housing!, specs: { ...b.housing!.specs, enclosure: "vented" as const } } };
    expect(leastCertainParameter(vented, { sinkMeasured: true })?.parameter).toBe("outside-air");
    expect(leastCertainParameter({ ...b, housing: undefined }, { sinkMeasured: true })).toBeNull();
  });

  it("a factor multiplies the conductance of exactly the links it names, and the link's trace keeps the model's inside it", () => {
    const b = lantern();
    const plain = evaluateBuild(b, { skipWarmup: true, skipWhatItTakes: true }).scenarios.find((s) => s.kind === "mode")!;
    const scaled = evaluateBuild({ ...b, calibration: cal("inside-air", 0.5) }, { skipWarmup: true, skipWhatItTakes: true }).scenarios.find((s) => s.kind === "mode")!;
    const indices = calibratedLinkIndices("inside-air", plain.network!.links, null);
    expect(indices.length).toBeGreaterThanOrEqual(2);
    for (const i of indices) {
      const before = plain.network!.links[i]!;
      const after = scaled.network!.links[i]!;
      if (before.type === "natural-convection" && after.type === "natural-convection") expect(after.areaM2).toBeCloseTo(before.areaM2 * 0.5, 12);
      const t = scaled.thermal!.links[i]!.trace;
      expect(t.element).toBe("calibrated");
      expect(t.parts).toHaveLength(1);
      expect(t.notes.join(" ")).toMatch(/Synthetic warm-up/);
    }
    // Less conductance through the inside air: every place inside runs hotter.
    expect(scaled.thermal!.byPlace["heatsink"]!).toBeGreaterThan(plain.thermal!.byPlace["heatsink"]! + 0.5);
    // Links the parameter does not name are untouched.
    const junction = plain.network!.links.findIndex((l) => l.from === "junction");
    expect(scaled.network!.links[junction]).toEqual(plain.network!.links[junction]);
  });

  it("recovers a known factor on the inside air from a synthetic warm-up with ±0.3 K noise, and the misfit falls", () => {
    const b = lantern();
    const truth = 0.7;
    const run = syntheticRun(b, cal("inside-air", truth), 21);
    const r = calibrateBuild({ build: b, run: { ...RUN, ambientC: 21, mode: run.mode, readings: run.readings }, sinkMeasured: true });
    expect(r.choice.parameter).toBe("inside-air");
    expect(r.factor).toBeGreaterThan(truth * 0.95);
    expect(r.factor).toBeLessThan(truth * 1.05);
    expect(r.low).not.toBeNull();
    expect(r.low!).toBeLessThan(r.factor);
    expect(r.high!).toBeGreaterThan(r.factor);
    expect(r.rmsAfterK).toBeLessThan(0.4); // the noise's own RMS is about 0.2 K
    expect(r.rmsBeforeK).toBeGreaterThan(r.rmsAfterK * 2);
    expect(r.readingCount).toBe(60);
    expect(r.atEdge).toBe(false);
    expect(r.calibration).toMatchObject({ parameter: "inside-air", run: RUN, readingCount: 60 });
  });

  it("a lamp the figure cannot explain ends at the edge of the range, with a warning", () => {
    const b = lantern();
    const run = syntheticRun(b, cal("inside-air", 1), 21);
    // A lamp that never warmed (every reading at the room's 21 °C): no rating short of a perfect sink explains it.
    const cold = run.readings.map((x) => ({ ...x, tempC: 21 }));
    const r = calibrateBuild({ build: b, run: { ...RUN, ambientC: 21, mode: run.mode, readings: cold }, sinkMeasured: false });
    expect(r.choice.parameter).toBe("sink-rating");
    expect(r.atEdge).toBe(true);
    expect(r.warnings.join(" ")).toMatch(/end of the range tried/);
  });

  it("readings at no place the model has are refused in words", () => {
    expect(() => calibrateBuild({ build: lantern(), run: { ...RUN, ambientC: 21, readings: [{ tS: 60, tempC: 30, place: "lid" }, { tS: 120, tempC: 31, place: "lid" }] }, sinkMeasured: true })).toThrow(/None of the run's readings is at a place the model has \(lid\)/);
  });
});
