import { BuildNav } from "@/components/builds/build-nav";
import { BudgetScreen } from "@/components/budget/budget-screen";
import { loadBuildPage } from "@/server/builds/load";

export const metadata = { title: "Budget" };

export default async function BudgetPage({ params }: { params: Promise<{ id: string }> }) {
  const { build, revision } = await loadBuildPage(params);
  const env = (revision.design as { environment?: { ambientC?: number } }).environment;
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-semibold">{build.title}</h1>
        <span className="text-sm text-ink-soft">Budget · revision {revision.number}</span>
      </div>
      <BuildNav buildId={build.id} current="budget" />
      <BudgetScreen buildId={build.id} ambientC={env?.ambientC ?? 25} />
    </div>
  );
}
