import Link from "next/link";
import { PrintSummary } from "@/components/budget/print-summary";
import { PrintButton } from "@/components/ui/print-button";
import { loadBuildPage } from "@/server/builds/load";
import { solveRevision } from "@/server/builds/solve";

export const metadata = { title: "Report" };

export default async function ReportPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, build, revision } = await loadBuildPage(params);
  const { evaluation } = await solveRevision({ build, revision, viewer: user });
  return (
    <div className="space-y-4">
      <nav className="no-print flex items-center gap-4 text-sm" aria-label="Build">
        <Link href={`/builds/${build.id}`} className="hover:text-ember">Heat path</Link>
        <Link href={`/builds/${build.id}/budget`} className="hover:text-ember">Budget</Link>
        <span className="font-medium text-ember">Report</span>
        <span className="ml-auto flex gap-3">
          <a href={`/api/v1/builds/${build.id}/export`} className="hover:text-ember">Build file (JSON)</a>
          <PrintButton />
        </span>
      </nav>
      <PrintSummary evaluation={evaluation} title={build.title} revision={revision.number} owner={build.ownerName} />
    </div>
  );
}
