import "server-only";
import { runsForBuild } from "@/db/queries/bench";
import type { RevisionRow } from "@/db/queries/builds";
import { canSeeRun } from "@/lib/bench/access";
import { holdAgainst, type HoldResult } from "@/lib/bench/hold";
import type { SaveRunInput } from "@/lib/bench/run-schema";
import type { BuildViewer } from "@/lib/builds/access";
import type { LoadedBuild } from "@/server/builds/load";
import { solveRevision } from "@/server/builds/solve";

export interface BuildHold {
  run: { id: string; title: string; revision: number | null };
  mode: string;
  result: HoldResult;
}

/**
 * The newest warm-up recorded of this build that the viewer may see, held against the
 * predicted warm-up of the mode it was run in (the highest mode when the run does not say).
 */
export async function holdForBuild({ build, revision, viewer }: { build: LoadedBuild; revision: RevisionRow; viewer: BuildViewer }): Promise<BuildHold | null> {
  const runs = (await runsForBuild({ buildId: build.id })).filter((r) => canSeeRun(viewer, r));
  const row = runs[0];
  if (!row) return null;
  const run = row.run as SaveRunInput;
  const solved = await solveRevision({ build, revision });
  const modes = solved.evaluation.scenarios.filter((s) => s.kind === "mode" && s.warmup && s.thermal);
  const wanted = run.powered.kind === "build" ? run.powered.mode : undefined;
  const scenario = modes.find((s) => wanted !== undefined && s.name.toLowerCase() === wanted.toLowerCase()) ?? modes[modes.length - 1];
  if (!scenario?.warmup || !scenario.thermal) return null;
  const env = (revision.design as { environment?: { ambientC?: number } }).environment;
  const result = holdAgainst({ readings: run.readings, runAmbientC: run.conditions.ambientC, modelAmbientC: env?.ambientC ?? 25, nodes: scenario.thermal.nodes, warmup: scenario.warmup });
  return { run: { id: row.id, title: row.title, revision: row.poweredRevision }, mode: scenario.name, result };
}
