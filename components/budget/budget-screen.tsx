"use client";

import { useMe } from "@/components/shell/use-me";
import { BudgetReport } from "./budget-report";
import { useSolve } from "./use-solve";

/** The Budget screen's client part: fetches the solve and shows it. */
export function BudgetScreen({ buildId, ambientC }: { buildId: string; ambientC: number }) {
  const solve = useSolve(buildId);
  const me = useMe();
  if (solve.isPending) return <p className="text-sm text-ink-soft">Working out the budget…</p>;
  if (solve.isError) return <p role="alert" className="text-sm text-over">{solve.error.message}</p>;
  return (
    <div className="space-y-2">
      <p className="text-xs text-ink-soft">Revision {solve.data.revision} · solver {solve.data.solverVersion}{solve.data.cached ? " · from the cache" : ""}</p>
      <BudgetReport evaluation={solve.data.evaluation} ambientC={ambientC} unit={me.data?.temperatureUnit ?? "C"} />
    </div>
  );
}
