import "server-only";
import { createBenchRun, keepFitAsPart, type BenchRunRow } from "@/db/queries/bench";
import type { BenchViewer } from "@/lib/bench/access";
import { fitWarmUp, type FitResult } from "@/lib/bench/fit";
import { partFromFit } from "@/lib/bench/keep-part";
import { DEFAULT_PLACE, type SaveRunInput } from "@/lib/bench/run-schema";
import { ApiError } from "@/lib/http/api-error";
import { partSchema } from "@/lib/parts";
import { loadBuild } from "@/server/builds/load";
import { visiblePart } from "@/server/parts/api";

/** The heatsink readings of a run with their places in the full list (a run of one place is all heatsink). */
function sinkReadings(input: SaveRunInput): { tS: number; tempC: number; at: number }[] {
  const places = new Set(input.readings.map((r) => r.place.toLowerCase()));
  const all = input.readings.map((r, at) => ({ tS: r.tS, tempC: r.tempC, at, place: r.place.toLowerCase() }));
  return places.size === 1 ? all : all.filter((r) => r.place === DEFAULT_PLACE);
}

/** Fits the run's heatsink readings; errors name the reading by its place in the whole run. */
export function fitRun(input: SaveRunInput): FitResult {
  const readings = sinkReadings(input);
  if (readings.length === 0) throw new ApiError("unprocessable:bench", `No readings at the heatsink: name the place of the sink's readings "${DEFAULT_PLACE}".`, "readings");
  try {
    return fitWarmUp({ ...input.conditions, readings: readings.map(({ tS, tempC }) => ({ tS, tempC })) });
  } catch (e) {
    if (e instanceof ApiError) {
      const m = /^readings\[(\d+)\](.*)$/.exec(e.path);
      const at = m ? readings[Number(m[1])]?.at : undefined;
      if (m && at !== undefined) {
        const message = e.message.replace(/Reading (\d+)/g, (_, k: string) => `Reading ${(readings[Number(k) - 1]?.at ?? 0) + 1}`);
        throw new ApiError(e.code, message, `readings[${at}]${m[2]}`);
      }
    }
    throw e;
  }
}

/** Times must increase at each place of a build's warm-up. */
function checkPlaces(input: SaveRunInput): void {
  const last = new Map<string, { tS: number; i: number }>();
  input.readings.forEach((r, i) => {
    const key = r.place.toLowerCase();
    const prev = last.get(key);
    if (prev && !(r.tS > prev.tS)) throw new ApiError("unprocessable:bench", `Reading ${i + 1} (${r.place}): its time is not later than reading ${prev.i + 1}'s at the same place; times must increase.`, `readings[${i}].tS`);
    last.set(key, { tS: r.tS, i });
  });
}

/**
 * Saves a run after checking what was powered (a part or build the viewer may see). A run
 * of a sink is fitted first: if the fit is refused, nothing is saved.
 */
export async function saveRun({ input, viewer }: { input: SaveRunInput; viewer: NonNullable<BenchViewer> }): Promise<{ id: string; fit: FitResult | null }> {
  const powered = input.powered;
  let conditions = input.conditions;
  if (powered.kind === "part") {
    const part = await visiblePart(powered.partId, viewer).catch(() => {
      throw new ApiError("not_found:part", "The part that was powered does not exist or is not shared with you.", "powered.partId");
    });
    const fraction = part.kind === "emitter" ? part.specs.heatFraction : undefined;
    if (conditions.heatW === undefined && conditions.heatFraction === undefined && typeof fraction === "number") conditions = { ...conditions, heatFraction: fraction };
  }
  if (powered.kind === "build") {
    const build = await loadBuild({ id: powered.buildId, viewer }).catch(() => {
      throw new ApiError("not_found:build", "The build that was powered does not exist or is not shared with you.", "powered.buildId");
    });
    if (powered.revision !== undefined && powered.revision > build.currentRevision) throw new ApiError("not_found:revision", `The build has no revision ${powered.revision}.`, "powered.revision");
  }
  if (powered.kind !== "build" && conditions.heatW === undefined && conditions.heatFraction === undefined) {
    throw new ApiError("bad_request:bench", "Heat fraction: required with volts and amps (the emitter part gives it, or type it, e.g. 70 %).", "conditions.heatFraction");
  }
  const run = { ...input, conditions };
  checkPlaces(run);
  const fit = powered.kind === "build" ? null : fitRun(run);
  const { id } = await createBenchRun({
    ownerId: viewer.id,
    title: input.title,
    visibility: input.visibility,
    poweredPartId: powered.kind === "part" ? powered.partId : undefined,
    poweredBuildId: powered.kind === "build" ? powered.buildId : undefined,
    poweredRevision: powered.kind === "build" ? powered.revision : undefined,
    run,
    fit,
  });
  return { id, fit };
}

/** Keeps a run's fit as a measured heatsink part of the run's owner, the run attached as its evidence. */
export async function keepPart({ run, name, visibility }: { run: BenchRunRow; name: string; visibility: "private" | "shared" | "public" }): Promise<string> {
  if (!run.fit) throw new ApiError("conflict:bench_run", "This run has no heatsink fit to keep (it is a warm-up of a build).", "id");
  if (run.fittedPartId) throw new ApiError("conflict:bench_run", "A part was already kept from this run.", "id");
  const part = partSchema.parse(partFromFit({ name, visibility, runTitle: run.title, runDate: run.createdAt, run: run.run as SaveRunInput, fit: run.fit as FitResult }));
  return keepFitAsPart({ runId: run.id, ownerId: run.ownerId, part });
}
