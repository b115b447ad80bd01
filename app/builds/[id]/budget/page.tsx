import { HoldPanel } from "@/components/bench/hold-panel";
import { MeasuredSinkPanel } from "@/components/bench/measured-sink-panel";
import { BuildNav } from "@/components/builds/build-nav";
import { BudgetScreen } from "@/components/budget/budget-screen";
import { holdForBuild } from "@/server/bench/hold";
import { measuredSinkEffect } from "@/server/bench/sink-effect";
import { loadBuildPage } from "@/server/builds/load";

export const metadata = { title: "Budget" };

export default async function BudgetPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, build, revision } = await loadBuildPage(params);
  const env = (revision.design as { environment?: { ambientC?: number } }).environment;
  const [measured, hold] = await Promise.all([measuredSinkEffect({ build, revision, viewer: user }), holdForBuild({ build, revision, viewer: user })]);
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-semibold">{build.title}</h1>
        <span className="text-sm text-ink-soft">Budget · revision {revision.number}</span>
      </div>
      <BuildNav buildId={build.id} current="budget" />
      {measured && <MeasuredSinkPanel effect={measured} />}
      {hold && <HoldPanel hold={hold} />}
      <BudgetScreen buildId={build.id} ambientC={env?.ambientC ?? 25} />
    </div>
  );
}
