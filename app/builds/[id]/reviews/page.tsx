import Link from "next/link";
import { BuildReviews } from "@/components/reviews/build-reviews";
import { loadBuildPage } from "@/server/builds/load";

export const metadata = { title: "Reviews and sharing" };

/** A build's reviews, verdicts and share links (the same panel the Heat path page can show). */
export default async function BuildReviewsPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, build } = await loadBuildPage(params);
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-semibold">{build.title}</h1>
        <span className="text-sm text-ink-soft">Reviews and sharing · revision {build.currentRevision}</span>
      </div>
      <nav className="no-print flex gap-4 text-sm" aria-label="Build">
        <Link href={`/builds/${build.id}`} className="hover:text-ember">Heat path</Link>
        <Link href={`/builds/${build.id}/budget`} className="hover:text-ember">Budget</Link>
        <Link href={`/builds/${build.id}/report`} className="hover:text-ember">Report</Link>
        <span className="font-medium text-ember">Reviews</span>
      </nav>
      <div className="max-w-xl">
        <BuildReviews buildId={build.id} viewer={user} />
      </div>
    </div>
  );
}
