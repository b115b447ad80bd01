import type { BuildEvaluation, Verdict } from "@/lib/retrofit";

/** The figures the roster lines up against the starter: the hottest over every driver mode. */
export interface KeyFigures {
  verdict: Verdict | null;
  junctionC: number | null;
  driverBoardC: number | null;
  housingC: number | null;
  /** Runtime of the first driver mode, h. */
  runtimeH: number | null;
}

export function keyFigures(evaluation: BuildEvaluation): KeyFigures {
  const modes = evaluation.scenarios.filter((s) => s.kind === "mode" && s.thermal);
  const hottest = (id: string): number | null => {
    const values = modes.flatMap((s) => s.thermal!.limits.filter((l) => l.id === id).map((l) => l.temperatureC));
    return values.length ? Math.max(...values) : null;
  };
  return {
    verdict: evaluation.verdict,
    junctionC: hottest("junction"),
    driverBoardC: hottest("driver-board"),
    housingC: hottest("touch"),
    runtimeH: evaluation.modes[0]?.runtime?.value ?? null,
  };
}
