import { BuildNav } from "@/components/builds/build-nav";
import { PrintSummary } from "@/components/budget/print-summary";
import { PrintButton } from "@/components/ui/print-button";
import { loadBuildPage } from "@/server/builds/load";
import { solveRevision } from "@/server/builds/solve";

export const metadata = { title: "Report" };

export default async function ReportPage({ params }: { params: Promise<{ id: string }> }) {
  const { build, revision } = await loadBuildPage(params);
  const { evaluation } = await solveRevision({ build, revision });
  return (
    <div className="space-y-4">
      <div className="no-print flex items-center gap-4">
        <BuildNav buildId={build.id} current="report" />
        <span className="ml-auto flex gap-3 text-sm">
          <a href={`/api/v1/builds/${build.id}/export`} className="hover:text-ember">Build file (JSON)</a>
          <PrintButton />
        </span>
      </div>
      <PrintSummary evaluation={evaluation} title={build.title} revision={revision.number} owner={build.ownerName} />
    </div>
  );
}
