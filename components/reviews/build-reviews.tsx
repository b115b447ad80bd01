import Link from "next/link";
import type { BuildViewer } from "@/lib/builds/access";
import type { LoadedBuild } from "@/server/builds/load";
import { linkWarning } from "@/server/classes/withheld";
import { loadBuildReviews } from "@/server/reviews/load";
import { age, OlderRevisionBadge, StatusBadge } from "./review-badges";
import { RequestReviewForm } from "./request-review-form";
import { SharePanel } from "./share-panel";

/**
 * Reviews of a build with their verdicts, and for its owner the "Request a review" form and
 * the share-link panel. A server component: place it on a build page with the build its
 * loader gave (`loadBuildPage`) and the viewer; it applies no access rule of its own.
 */
export async function BuildReviews({ build, viewer }: { build: LoadedBuild; viewer: NonNullable<BuildViewer> }) {
  const [reviews, warning] = await Promise.all([loadBuildReviews({ build, viewer }), build.access.isOwner ? linkWarning({ buildId: build.id }) : null]);
  return (
    <section aria-label="Reviews" className="no-print space-y-4 rounded-lg border border-line bg-white/60 p-3 text-sm" data-testid="build-reviews">
      <h2 className="font-medium">Reviews</h2>
      {reviews.length === 0 ? (
        <p className="text-ink-soft">No reviews yet.</p>
      ) : (
        <ul className="space-y-3">
          {reviews.map((r) => (
            <li key={r.id} className="space-y-1" data-testid="build-review">
              <div className="flex flex-wrap items-center gap-1.5">
                <StatusBadge status={r.status} />
                {r.olderRevision && <OlderRevisionBadge revision={r.revisionNumber} current={r.currentRevision} />}
              </div>
              <div>
                <Link href={`/reviews/${r.id}`} className="hover:text-ember">
                  r{r.revisionNumber} · {r.reviewerName}
                </Link>{" "}
                <span className="text-xs text-ink-soft">{age(r.decidedAt ?? r.createdAt)}</span>
              </div>
              {r.summary && <p className="text-ink">{r.summary}</p>}
            </li>
          ))}
        </ul>
      )}
      {build.access.isOwner && (
        <>
          <RequestReviewForm buildId={build.id} currentRevision={build.currentRevision} />
          <SharePanel scope={{ kind: "build", buildId: build.id }} currentRevision={build.currentRevision} warning={warning} />
        </>
      )}
    </section>
  );
}
