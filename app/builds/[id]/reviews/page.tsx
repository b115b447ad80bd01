import { BuildNav } from "@/components/builds/build-nav";
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
      <BuildNav buildId={build.id} current="reviews" />
      <div className="max-w-xl">
        <BuildReviews build={build} viewer={user} />
      </div>
    </div>
  );
}
