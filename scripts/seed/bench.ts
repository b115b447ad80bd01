import "server-only";
import { and, eq } from "drizzle-orm";
import { fitWarmUp } from "@/lib/bench/fit";
import { partFromFit } from "@/lib/bench/keep-part";
import { saveRunSchema, type SaveRunInputRaw } from "@/lib/bench/run-schema";
import { partSchema } from "@/lib/parts";
import { db } from "@/db/client";
import { createBenchRun, keepFitAsPart } from "@/db/queries/bench";
import { getRevision, saveRevision } from "@/db/queries/builds";
import { getParts } from "@/db/queries/parts";
import { collectPartIds } from "@/lib/builds/part-ids";
import { buildDesignSchema, evaluateBuild, resolveBuild } from "@/lib/retrofit";
import { type Part } from "@/lib/parts";
import { benchRuns, builds } from "@/db/schema";
import { calibrateBuild, calibrationRevisionNote } from "@/lib/bench/calibrate";
import { calibrationSchema } from "@/lib/retrofit/design-schema";
import { CALIBRATION_LABELS } from "@/lib/retrofit/compile/calibration";
import type { CatalogueKey } from "./catalogue";

const TITLE = "Salvaged projector sink, COB at 6.2 V";

/**
 * The workshop's bench run of the salvaged sink (invented demo readings): Mara clamped the
 * 6 V COB emitter to the projector sink, stood it upright on the bench in still air, ran it
 * at 6.2 V and 1.15 A, and read a thermocouple on the base every minute for 35 minutes.
 */
const TEMPS_C = [19.5, 24.3, 28.3, 32.3, 35.4, 38.1, 41, 43, 44.8, 46.7, 48.2, 49.1, 50.3, 51.2, 51.7, 52.6, 53.2, 53.5, 54, 54.6, 54.6, 54.9, 55.3, 55.3, 55.5, 55.7, 55.8, 55.7, 56, 56, 56, 56.2, 56.2, 56.1, 56.3, 56.3];

function demoRun(ids: Record<CatalogueKey, string>): SaveRunInputRaw {
  return {
    title: TITLE,
    visibility: "shared",
    powered: { kind: "part", partId: ids["emitter-6v-cob"] },
    air: "still",
    notes: "Thermocouple taped to the base between the fins; sink upright on a wooden block.",
    conditions: { ambientC: "19.5 °C", volts: "6.2 V", amps: "1.15 A", heatFraction: "70 %", massKg: "62 g", material: "aluminium-6063-t5", finish: "black-anodised", orientation: "upright" },
    readings: TEMPS_C.map((tempC, i) => ({ tS: `${i} min`, tempC, place: "heatsink" })),
  };
}

/** Seeds the bench run, fitted, and keeps the fit as the maker's measured heatsink part (idempotent). */
export async function seedBench({ makerId, ids }: { makerId: string; ids: Record<CatalogueKey, string> }): Promise<{ runId: string; sinkToAirKPerW: number; low: number; high: number; heatCapacityJPerK: number } | null> {
  const found = await db().select({ id: benchRuns.id, fit: benchRuns.fit }).from(benchRuns).where(and(eq(benchRuns.ownerId, makerId), eq(benchRuns.title, TITLE))).limit(1);
  const run = saveRunSchema.parse(demoRun(ids));
  const fit = fitWarmUp({ ...run.conditions, readings: run.readings });
  const summary = { sinkToAirKPerW: fit.sinkToAirKPerW.value, low: fit.sinkToAirKPerW.low, high: fit.sinkToAirKPerW.high, heatCapacityJPerK: fit.heatCapacityJPerK.value };
  if (found[0]) return { runId: found[0].id, ...summary };
  const { id } = await createBenchRun({ ownerId: makerId, title: run.title, visibility: run.visibility, poweredPartId: ids["emitter-6v-cob"], run, fit });
  const part = partSchema.parse(partFromFit({ name: "Salvaged projector sink (measured on the bench)", visibility: "shared", runTitle: run.title, runDate: new Date(), run, fit }));
  await keepFitAsPart({ runId: id, ownerId: makerId, part });
  return { runId: id, ...summary };
}

const HOLD_TITLE = "Finished lantern, warm-up on the workbench";

/**
 * The seed runs outside the app (no request, no session), so it reads the owner's parts
 * itself and resolves the design the way the solve route does.
 */
async function resolvedAsOwner(raw: unknown, makerId: string) {
  const design = buildDesignSchema.parse(raw);
  const records = await getParts({ ids: collectPartIds(design), viewer: { id: makerId, role: "maker" } });
  const parts = new Map<string, Part>();
  for (const r of records) {
    const parsed = partSchema.safeParse({ kind: r.kind, name: r.name, provenance: r.provenance, visibility: r.visibility, specs: r.specs, curves: r.curves, ...(r.provenanceNote !== null ? { provenanceNote: r.provenanceNote } : {}) });
    if (parsed.success) parts.set(r.id, parsed.data);
  }
  const sink = design.lightEngine.heatsink;
  const sinkMeasured = !!sink && "partId" in sink && parts.get(sink.partId)?.provenance === "measured";
  return { build: resolveBuild(design, (id) => parts.get(id)).build, sinkMeasured };
}

/**
 * The finished lantern (driver strapped with copper tape) held against its measured warm-up.
 * The readings are invented for the demo: the model's own warm-up of the highest mode,
 * with the real lamp a little cooler at the sink and the wall and warmer at the driver, as
 * a thermocouple on a real lamp might show, read every two minutes for half an hour.
 */
export async function seedBenchHold({ makerId, buildId }: { makerId: string; buildId: string | undefined }): Promise<string | null> {
  if (!buildId) return null;
  const found = await db().select({ id: benchRuns.id }).from(benchRuns).where(and(eq(benchRuns.ownerId, makerId), eq(benchRuns.title, HOLD_TITLE))).limit(1);
  if (found[0]) return found[0].id;
  const revision = await getRevision({ buildId, number: 1 });
  if (!revision) return null;
  const evaluation = evaluateBuild((await resolvedAsOwner(revision.design, makerId)).build);
  const modes = evaluation.scenarios.filter((s) => s.kind === "mode" && s.warmup && s.thermal);
  const mode = modes[modes.length - 1];
  if (!mode?.warmup || !mode.thermal) return null;
  const warmup = mode.warmup;
  const offsets: Record<string, number> = { heatsink: -3.2, "housing wall": -1.4, "driver board": 1.1 };
  const wobble = [0.1, -0.1, 0, 0.2, -0.1, 0, 0.1, -0.2, 0, 0.1, -0.1, 0.1, 0, -0.1, 0.1, 0];
  const readings: { tS: number; tempC: number; place: string }[] = [];
  const env = (revision.design as { environment?: { ambientC?: number } }).environment;
  const ambientC = env?.ambientC ?? 20;
  for (const [place, offset] of Object.entries(offsets)) {
    const node = mode.thermal.nodes.find((n) => n.place === place);
    const series = node ? warmup.temperaturesC[node.id] : undefined;
    if (!series) continue;
    for (let k = 0; k <= 15; k++) {
      const t = k * 120;
      const i = warmup.timesS.findIndex((x) => x >= t);
      if (i < 0) break;
      const model = series[i]!;
      const progress = (model - ambientC) / Math.max((series[series.length - 1] ?? model) - ambientC, 1e-9);
      readings.push({ tS: warmup.timesS[i]!, tempC: Math.round((model + offset * progress + wobble[k]!) * 10) / 10, place });
    }
  }
  readings.sort((a, b) => a.tS - b.tS);
  const run = saveRunSchema.parse({
    title: HOLD_TITLE,
    visibility: "shared",
    powered: { kind: "build", buildId, revision: 1, mode: mode.name },
    air: "still",
    notes: "Three thermocouples: heatsink base, case wall beside the emitter, driver board. Lid closed.",
    conditions: { ambientC, volts: "7.4 V", amps: "0.95 A", orientation: "upright" },
    readings,
  });
  const { id } = await createBenchRun({ ownerId: makerId, title: run.title, visibility: run.visibility, poweredBuildId: buildId, poweredRevision: 1, run, fit: null });
  return id;
}

export type SeededCalibration = { revision: number; name: string; factor: number; low: number | null; high: number | null; rmsBeforeK: number; rmsAfterK: number; readingCount: number };

/**
 * The finished lantern calibrated to its warm-up: the one least certain figure of its model
 * fitted to the readings, saved as the next revision (the fit in its note and its links'
 * traces), as "Calibrate the model to this run" does. Idempotent: a build whose current
 * revision already carries a calibration is left as it is (and that calibration answered).
 */
export async function seedCalibration({ makerId, buildId, runId }: { makerId: string; buildId: string | undefined; runId: string | null }): Promise<SeededCalibration | null> {
  if (!buildId || !runId) return null;
  const current = await db().select({ n: builds.currentRevision }).from(builds).where(eq(builds.id, buildId)).limit(1);
  const revision = current[0] ? await getRevision({ buildId, number: current[0].n }) : undefined;
  const runRow = await db().select({ title: benchRuns.title, run: benchRuns.run }).from(benchRuns).where(eq(benchRuns.id, runId)).limit(1);
  if (!revision || !runRow[0]) return null;
  const raw = revision.design as Record<string, unknown>;
  const kept = calibrationSchema.safeParse(raw.calibration);
  if (kept.success) {
    const k = kept.data;
    return { revision: revision.number, name: CALIBRATION_LABELS[k.parameter].name, factor: k.factor, low: k.low, high: k.high, rmsBeforeK: k.rmsBeforeK, rmsAfterK: k.rmsAfterK, readingCount: k.readingCount };
  }
  const run = saveRunSchema.parse(typeof runRow[0].run === "string" ? JSON.parse(runRow[0].run) : runRow[0].run);
  const { build, sinkMeasured } = await resolvedAsOwner(raw, makerId);
  const mode = run.powered.kind === "build" ? run.powered.mode : undefined;
  const result = calibrateBuild({ build, run: { id: runId, title: runRow[0].title, ambientC: run.conditions.ambientC, ...(mode ? { mode } : {}), readings: run.readings }, sinkMeasured });
  if (result.atEdge || result.low === null) throw new Error(`the demo calibration does not pin ${result.choice.name} down (factor ${result.factor})`);
  const design = { ...raw, calibration: result.calibration };
  const number = await saveRevision({ buildId, userId: makerId, design, partIds: collectPartIds(design), note: calibrationRevisionNote(runRow[0].title, result) });
  return { revision: number, name: result.choice.name, factor: result.factor, low: result.low, high: result.high, rmsBeforeK: result.rmsBeforeK, rmsAfterK: result.rmsAfterK, readingCount: result.readingCount };
}
