import "server-only";
import { saveRevision } from "@/db/queries/builds";
import { calibrateBuild, CalibrationError, calibrationRevisionNote, type CalibrationResult } from "@/lib/bench/calibrate";
import type { BenchViewer } from "@/lib/bench/access";
import type { SaveRunInput } from "@/lib/bench/run-schema";
import { ApiError } from "@/lib/http/api-error";
import { partSchema, type Part } from "@/lib/parts";
import { buildDesignSchema, resolveBuild } from "@/lib/retrofit";
import { assertDesignParts, loadDesignParts, loadEditableBuild, loadRevision } from "@/server/builds/load";
import { toPartInput } from "@/server/parts/api";
import type { BenchRunRow } from "@/db/queries/bench";

/** The calibration in the words the bench screen and the Budget show (the API's answer). */
export function calibrationJson(r: CalibrationResult) {
  return {
    parameter: r.choice.parameter,
    name: r.choice.name,
    why: r.choice.why,
    mode: r.mode,
    factor: r.factor,
    low: r.low,
    high: r.high,
    readingCount: r.readingCount,
    places: r.places,
    rmsBeforeK: r.rmsBeforeK,
    rmsAfterK: r.rmsAfterK,
    atEdge: r.atEdge,
    warnings: r.warnings,
    verdictAfter: r.after.verdict,
    canSave: !r.atEdge && r.low !== null,
  };
}
export type CalibrationJson = ReturnType<typeof calibrationJson>;

/**
 * Works out the calibration of the build a warm-up was recorded of, against the build's
 * current revision with its parts as they are now (what a new revision would keep). Only
 * someone who may edit the build calibrates it.
 */
export async function calibrationForRun({ run, viewer }: { run: BenchRunRow; viewer: NonNullable<BenchViewer> }) {
  if (!run.poweredBuildId) throw new ApiError("conflict:bench_run", "This run is not a warm-up of a build: calibrating needs readings of a finished build.", "id");
  const build = await loadEditableBuild({ id: run.poweredBuildId, viewer }).catch((e: unknown) => {
    if (e instanceof ApiError && e.code.startsWith("forbidden")) throw e;
    throw new ApiError("not_found:build", "The build this run was recorded of no longer exists or is not shared with you.", "id");
  });
  const revision = await loadRevision({ build });
  const records = await loadDesignParts({ design: revision.design, viewer });
  const parts = new Map<string, Part>();
  for (const [id, record] of records) {
    const parsed = partSchema.safeParse(toPartInput(record));
    if (parsed.success) parts.set(id, parsed.data);
  }
  const design = buildDesignSchema.parse(revision.design);
  const sinkSlot = design.lightEngine.heatsink;
  const sinkMeasured = !!sinkSlot && "partId" in sinkSlot && parts.get(sinkSlot.partId)?.provenance === "measured";
  const input = run.run as SaveRunInput;
  const mode = input.powered.kind === "build" ? input.powered.mode : undefined;
  try {
    const result = calibrateBuild({
      build: resolveBuild(design, (id) => parts.get(id)).build,
      run: { id: run.id, title: run.title, ambientC: input.conditions.ambientC, ...(mode ? { mode } : {}), readings: input.readings },
      sinkMeasured,
    });
    return { build, revision, result };
  } catch (e) {
    if (e instanceof CalibrationError) throw new ApiError("unprocessable:calibration", e.message, "id");
    throw e;
  }
}

/** Saves the calibration as a new revision of the build, the fit in its note and in every corrected link's trace. */
export async function saveCalibration({ run, viewer }: { run: BenchRunRow; viewer: NonNullable<BenchViewer> }): Promise<{ result: CalibrationResult; revision: number; buildId: string }> {
  const { build, revision, result } = await calibrationForRun({ run, viewer });
  if (result.atEdge) throw new ApiError("conflict:calibration", `Not saved: the model misses the lamp by more than ${result.choice.name} can explain (the best factor is at the end of the range tried). Check where the readings were taken and the build's parts.`, "save");
  if (result.low === null) throw new ApiError("conflict:calibration", `Not saved: the run does not pin ${result.choice.name} down. A longer run, or readings at more places, would.`, "save");
  const design = { ...(revision.design as Record<string, unknown>), calibration: result.calibration };
  const partIds = await assertDesignParts({ design, viewer });
  const number = await saveRevision({ buildId: build.id, userId: viewer.id, design, partIds, note: calibrationRevisionNote(run.title, result) });
  return { result, revision: number, buildId: build.id };
}
