import { beforeAll, describe, expect, it } from "vitest";
import type { BuildEvaluation } from "@/lib/retrofit";
import { Client, signedIn } from "../support/http";
import { createParts, retrofitDesign } from "../support/retrofit";

let maker: Client;
let other: Client;
const anonymous = new Client();
let buildId = "";
let runId = "";
let evaluation: BuildEvaluation;
let readingCount = 0;

type Calib = { calibration: { parameter: string; name: string; factor: number; low: number | null; high: number | null; rmsBeforeK: number; rmsAfterK: number; readingCount: number; canSave: boolean; warnings: string[] }; revision?: { number: number; url: string } };

const TRUE_FACTOR = 0.6;
let design: Record<string, unknown>;

beforeAll(async () => {
  [maker, other] = await Promise.all([signedIn("maker@sinkwise.test"), signedIn("reviewer@sinkwise.test")]);
  const parts = await createParts(maker, "private");
  design = retrofitDesign(parts, "strapped", 22);
  const b = await maker.post("/api/v1/builds", { title: "Calibration test lantern", design });
  expect(b.status).toBe(201);
  buildId = (b.body.build as { id: string }).id;
  // The "lamp": this build with the convection of its inside air at 0.6 of the model's (revision 2),
  // read every 3 minutes for 45 minutes at four places and rounded to 0.1 °C as a meter shows it;
  // then revision 3 puts the model back as it stands, for the calibration to find the 0.6 again.
  const synthetic = { parameter: "inside-air", factor: TRUE_FACTOR, low: null, high: null, run: { id: "synthetic", title: "synthetic lamp" }, readingCount: 1, rmsBeforeK: 0, rmsAfterK: 0 };
  expect((await maker.patch(`/api/v1/builds/${buildId}`, { design: { ...design, calibration: synthetic }, note: "the synthetic lamp" })).status).toBe(200);
  const solved = await maker.post(`/api/v1/builds/${buildId}/solve`, { curves: "full" });
  expect(solved.status).toBe(200);
  evaluation = (solved.body as unknown as { evaluation: BuildEvaluation }).evaluation;
  expect((await maker.patch(`/api/v1/builds/${buildId}`, { design, note: "the model as it stands" })).status).toBe(200);
  const mode = evaluation.scenarios.filter((s) => s.kind === "mode" && s.warmup).at(-1)!;
  const w = mode.warmup!;
  const readings: { tS: number; tempC: number; place: string }[] = [];
  for (const place of ["heatsink", "housing wall", "housing air", "cells"]) {
    const node = mode.thermal!.nodes.find((n) => n.place === place);
    if (!node) continue;
    for (let t = 180; t <= 2700; t += 180) {
      const i = w.timesS.findIndex((x) => x >= t);
      readings.push({ tS: w.timesS[i]!, tempC: Math.round(w.temperaturesC[node.id]![i]! * 10) / 10, place });
    }
  }
  expect(readings.length).toBeGreaterThanOrEqual(45);
  readingCount = readings.length;
  const r = await maker.post("/api/v1/bench/runs", { title: "Finished lantern on the bench", powered: { kind: "build", buildId, mode: mode.name }, conditions: { ambientC: 22, volts: "7.4 V", amps: "0.9 A" }, readings });
  expect(r.status).toBe(201);
  runId = (r.body.run as { id: string }).id;
});

describe("calibrating a build to its measured warm-up", () => {
  it("works out the factor on the least certain figure without saving anything", async () => {
    const r = await maker.post(`/api/v1/bench/runs/${runId}/calibration`, {});
    expect(r.status).toBe(200);
    const c = (r.body as unknown as Calib).calibration;
    // The heatsink is a measured part and the lantern is sealed: the inside air is the least certain figure.
    expect(c.parameter).toBe("inside-air");
    expect(c.readingCount).toBe(readingCount);
    expect(c.rmsAfterK).toBeLessThan(c.rmsBeforeK);
    expect(c.rmsAfterK).toBeLessThan(0.2); // the readings' own rounding is ±0.05 K
    expect(c.factor).toBeGreaterThan(TRUE_FACTOR * 0.9);
    expect(c.factor).toBeLessThan(TRUE_FACTOR * 1.1);
    expect(c.canSave).toBe(true);
    expect(c.low).not.toBeNull();
    expect(c.low!).toBeLessThan(c.factor);
    expect(c.high!).toBeGreaterThan(c.factor);
    const build = await maker.get(`/api/v1/builds/${buildId}`);
    expect((build.body.build as { currentRevision: number }).currentRevision).toBe(3);
  });

  it("saving makes a new revision whose corrected links trace the model's figure and the factor, and the misfit falls", async () => {
    const r = await maker.post(`/api/v1/bench/runs/${runId}/calibration`, { save: true });
    expect(r.status).toBe(201);
    const saved = r.body as unknown as Calib;
    expect(saved.revision?.number).toBe(4);
    const rev = await maker.get(`/api/v1/builds/${buildId}/revisions/4`);
    expect(rev.status).toBe(200);
    const revision = rev.body.revision as { design: { calibration?: { parameter: string; factor: number; run: { id: string } } }; note: string };
    expect(revision.design.calibration).toMatchObject({ parameter: saved.calibration.parameter, run: { id: runId } });
    expect(revision.design.calibration!.factor).toBeCloseTo(saved.calibration.factor, 9);
    expect(revision.note).toMatch(/^Calibrated to the bench run “Finished lantern on the bench”: .+ × \d\.\d\d \(95 % \d\.\d\d–\d\.\d\d\), misfit \d+\.\d K → \d+\.\d K over \d+ readings\.$/);
    const solved = await maker.post(`/api/v1/builds/${buildId}/solve`, { curves: "full", traces: "inline" });
    const after = (solved.body as unknown as { evaluation: BuildEvaluation; revision: number });
    expect(after.revision).toBe(4);
    const traces = after.evaluation.scenarios.flatMap((s) => s.thermal?.links ?? []).filter((l) => l.trace.element === "calibrated");
    expect(traces.length).toBeGreaterThan(0);
    expect(traces[0]!.trace.parts).toHaveLength(1);
    expect(traces[0]!.trace.source).toMatch(/Numerical Recipes/);
    // Working it out again on the calibrated revision: the misfit it starts from is the calibrated one.
    const again = await maker.post(`/api/v1/bench/runs/${runId}/calibration`, {});
    expect(again.status).toBe(200);
    expect((again.body as unknown as Calib).calibration.rmsBeforeK).toBeCloseTo(saved.calibration.rmsAfterK, 1);
  });

  it("a private run is its owner's: 404 to others, 401 signed out; bad bodies name the field", async () => {
    expect((await other.post(`/api/v1/bench/runs/${runId}/calibration`, {})).status).toBe(404);
    expect((await anonymous.post(`/api/v1/bench/runs/${runId}/calibration`, {})).status).toBe(401);
    const bad = await maker.post(`/api/v1/bench/runs/${runId}/calibration`, { save: "yes" });
    expect(bad.status).toBe(400);
    expect(bad.body.error?.path).toBe("save");
    expect(bad.body.error?.message).toMatch(/true or false/);
  });

  it("a run of a sink (not of a build) has nothing to calibrate, said in words", async () => {
    const sink = await maker.post("/api/v1/bench/runs", { title: "Sink only", conditions: { ambientC: 25, heatW: "7 W", massKg: "100 g", material: "aluminium-6063-t5" }, readings: [{ tS: "20 min", tempC: 60 }] });
    expect(sink.status).toBe(201);
    const r = await maker.post(`/api/v1/bench/runs/${(sink.body.run as { id: string }).id}/calibration`, {});
    expect(r.status).toBe(409);
    expect(r.body.error?.message).toMatch(/not a warm-up of a build/);
  });
});
