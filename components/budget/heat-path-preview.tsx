"use client";

import { useMe } from "@/components/shell/use-me";
import { formatFigure } from "@/lib/units/figures";
import { HeatPathDiagram } from "./heat-path-diagram";
import { useSolve } from "./use-solve";

/** The saved revision's heat path as the compiler built it, shown beside the editor. */
export function HeatPathPreview({ buildId, revision, ambientC }: { buildId: string; revision: number; ambientC: number }) {
  const solve = useSolve(buildId, revision);
  const me = useMe();
  if (solve.isPending) return <p className="text-sm text-ink-soft">Compiling the heat path…</p>;
  if (solve.isError) return <p className="text-sm text-over">{solve.error.message}</p>;
  const scenario = solve.data.evaluation.scenarios.find((s) => s.kind === "mode") ?? solve.data.evaluation.scenarios[0];
  if (!scenario?.thermal) return <p className="text-sm text-ink-soft">Add an emitter and a driver (or cells and a charger) to see the heat path.</p>;
  return (
    <figure className="space-y-2">
      <figcaption className="text-xs text-ink-soft">
        Revision {revision}, mode “{scenario.name}”: each box is a place that holds a temperature, each line a way the heat crosses (thicker: more watts).
      </figcaption>
      <HeatPathDiagram scenario={scenario} ambientC={ambientC} unit={me.data?.temperatureUnit ?? "C"} />
      <ul className="grid gap-x-4 text-xs text-ink-soft sm:grid-cols-2">
        {scenario.thermal.links.filter((l) => Math.abs(l.watts) > 1e-6).map((l) => (
          <li key={l.index}>{l.place}: {formatFigure(l.watts, "power")}</li>
        ))}
      </ul>
    </figure>
  );
}
