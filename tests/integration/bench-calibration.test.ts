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

type Calib = { calibration: { parameter: string; name: string; factor: number; low: number | null; high: number | null; rmsBeforeK: number; rmsAfterK: number; readingCount: number; canSave: boolean; warnings: string[] }; revision?: { number: number; url: string } };

beforeAll(async () => {
  [maker, other] = await Promise.all([signedIn("maker@sinkwise.test"), signedIn("reviewer@sinkwise.test")]);
  const parts = await createParts(maker, "private");
  const b = await maker.post("/api/v1/builds", { title: "Calibration test lantern", design: retrofitDesign(parts, "strapped", 22) });
  expect(b.status).toBe(201);
  buildId = (b.body.build as { id: string }).id;
  const solved = await maker.post(`/api/v1/builds/${buildId}/solve`, {});
  expect(solved.status).toBe(200);
  evaluation = (solved.body as unknown as { evaluation: BuildEvaluation }).evaluation;
  // The "lamp": the model's own warm-up of its highest mode, the heatsink and wall running cooler
  // than predicted in proportion to their rise (as a lamp whose inside air carries more heat would).
  const mode = evaluation.scenarios.filter((s) => s.kind === "mode" && s.warmup).at(-1)!;
  const w = mode.warmup!;
  const readings: { tS: number; tempC: number; place: string }[] = [];
  for (const [place, share] of [["heatsink", 0.85], ["housing wall", 0.93]] as const) {
    const node = mode.thermal!.nodes.find((n) => n.place === place)!;
    for (let t = 180; t <= 2700; t += 180) {
      const i = w.timesS.findIndex((x) => x >= t);
      readings.push({ tS: w.timesS[i]!, tempC: Math.round((22 + (w.temperaturesC[node.id]![i]! - 22) * share) * 10) / 10, place });
    }
  }
  const r = await maker.post("/api/v1/bench/runs", { title: "Finished lantern on the bench", powered: { kind: "build", buildId, mode: mode.name }, conditions: { ambientC: 22, volts: "7.4 V", amps: "0.9 A" }, readings });
  expect(r.status).toBe(201);
  runId = (r.body.run as { id: string }).id;
});

describe("calibrating a build to its measured warm-up", () => {
  it("works out the factor on the least certain figure without saving anything", async () => {
    const r = await maker.post(`/api/v1/bench/runs/${runId}/calibration`, {});
    expect(r.status).toBe(200);
    const c = (r.body as unknown as Calib).calibration;
    expect(["sink-rating", "inside-air", "outside-air"]).toContain(c.parameter);
    expect(c.readingCount).toBe(30);
    expect(c.rmsAfterK).toBeLessThan(c.rmsBeforeK);
    // The lamp ran cooler than the model: the corrected figure carries more heat.
    expect(c.factor).toBeGreaterThan(1);
    expect(c.low).not.toBeNull();
    expect(c.low!).toBeLessThan(c.factor);
    expect(c.high!).toBeGreaterThan(c.factor);
    const build = await maker.get(`/api/v1/builds/${buildId}`);
    expect((build.body.build as { currentRevision: number }).currentRevision).toBe(1);
  });

  it("saving makes a new revision whose corrected links trace the model's figure and the factor, and the misfit falls", async () => {
    const r = await maker.post(`/api/v1/bench/runs/${runId}/calibration`, { save: true });
    expect(r.status).toBe(201);
    const saved = r.body as unknown as Calib;
    expect(saved.revision?.number).toBe(2);
    const rev = await maker.get(`/api/v1/builds/${buildId}/revisions/2`);
    expect(rev.status).toBe(200);
    const revision = rev.body.revision as { design: { calibration?: { parameter: string; factor: number; run: { id: string } } }; note: string };
    expect(revision.design.calibration).toMatchObject({ parameter: saved.calibration.parameter, run: { id: runId } });
    expect(revision.design.calibration!.factor).toBeCloseTo(saved.calibration.factor, 9);
    expect(revision.note).toMatch(/^Calibrated to the bench run “Finished lantern on the bench”: .+ × \d\.\d\d \(95 % \d\.\d\d–\d\.\d\d\), misfit \d+\.\d K → \d+\.\d K over 30 readings\.$/);
    const solved = await maker.post(`/api/v1/builds/${buildId}/solve`, {});
    const after = (solved.body as unknown as { evaluation: BuildEvaluation; revision: number });
    expect(after.revision).toBe(2);
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
