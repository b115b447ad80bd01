import Link from "next/link";
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
      <nav className="no-print flex gap-4 text-sm" aria-label="Build">
        <Link href={`/builds/${build.id}`} className="hover:text-ember">Heat path</Link>
        <span className="font-medium text-ember">Budget</span>
        <Link href={`/builds/${build.id}/report`} className="hover:text-ember">Report</Link>
      </nav>
      <BudgetScreen buildId={build.id} ambientC={env?.ambientC ?? 25} />
    </div>
  );
}
