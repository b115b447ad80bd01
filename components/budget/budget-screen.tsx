"use client";

import { useMe } from "@/components/shell/use-me";
import { BudgetReport } from "./budget-report";
import { useSolve } from "./use-solve";

/** Tells when a newer solver gave this revision other figures than the last one did. */
function SolverChangeNote({ change, current }: { change: { previousVersion: string; changes: string[] } | null | undefined; current: string }) {
  if (!change) return null;
  if (change.changes.length === 0) return <p className="text-xs text-ink-soft">Solver {current} replaced {change.previousVersion}; none of this revision's figures moved.</p>;
  return (
    <details className="rounded border border-tight/40 bg-tight/5 p-2 text-sm" data-testid="solver-change" open>
      <summary className="cursor-pointer font-medium">Solver {current} gives other figures than solver {change.previousVersion} gave this revision</summary>
      <p className="mt-1 text-xs text-ink-soft">The revision and its parts did not change; the way Sinkwise works them out did. What moved:</p>
      <ul className="mt-1 list-disc pl-5 text-xs">{change.changes.map((c) => <li key={c}>{c}</li>)}</ul>
    </details>
  );
}

/** The Budget screen's client part: fetches the solve and shows it. */
export function BudgetScreen({ buildId, ambientC }: { buildId: string; ambientC: number }) {
  const solve = useSolve(buildId);
  const me = useMe();
  if (solve.isPending) return <p className="text-sm text-ink-soft">Working out the budget…</p>;
  if (solve.isError) return <p role="alert" className="text-sm text-over">{solve.error.message}</p>;
  return (
    <div className="space-y-2">
      <p className="text-xs text-ink-soft">Revision {solve.data.revision} (parts as they were when it was saved) · worked out by solver {solve.data.solverVersion}{solve.data.cached ? " · from the cache" : ""}</p>
      <SolverChangeNote change={solve.data.solverChange} current={solve.data.solverVersion} />
      <BudgetReport evaluation={solve.data.evaluation} ambientC={ambientC} unit={me.data?.temperatureUnit ?? "C"} />
    </div>
  );
}
