import Link from "next/link";
import { notFound } from "next/navigation";
import { BudgetReport } from "@/components/budget/budget-report";
import { CommentPinboard } from "@/components/reviews/comment-pinboard";
import { age, OlderRevisionBadge, StatusBadge } from "@/components/reviews/review-badges";
import type { CommentItem } from "@/components/reviews/types";
import { SharePanel } from "@/components/reviews/share-panel";
import { VerdictForm } from "@/components/reviews/verdict-form";
import { listComments } from "@/db/queries/reviews";
import { ApiError } from "@/lib/http/api-error";
import { anchorLabel, heatPathAnchors } from "@/lib/reviews/anchors";
import { requirePageUser } from "@/server/auth/session";
import { linkWarning } from "@/server/classes/withheld";
import { reviewedSolve } from "@/server/reviews/anchors";
import { loadReview } from "@/server/reviews/load";

export const metadata = { title: "Review" };

export default async function ReviewPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser();
  const { id } = await params;
  const { review, role } = await loadReview({ id, viewer: user }).catch((e: unknown) => {
    if (e instanceof ApiError) notFound();
    throw e;
  });
  const [comments, solved] = await Promise.all([listComments({ reviewId: review.id }), reviewedSolve({ review }).catch((e: unknown) => {
      // A revision that no longer evaluates shows without figures; a database outage is an error, not "nothing".
      if (e instanceof ApiError) return null;
      throw e;
    })]);
  const evaluation = solved?.evaluation ?? null;
  const shareWarning = role !== "admin" ? await linkWarning({ buildId: review.buildId }) : null;
  const anchors = evaluation ? heatPathAnchors(evaluation) : { nodes: [], links: [], figures: [] };
  const thread: CommentItem[] = comments.map((c) => ({ ...c, target: anchorLabel(anchors, { kind: c.anchorKind, key: c.anchorKey }), createdAt: c.createdAt.toISOString() }));
  const ambientC = evaluation?.scenarios[0]?.network?.ambientC ?? 25;
  return (
    <div className="space-y-6">
      <header className="space-y-2">
        <p className="text-sm text-ink-soft"><Link href="/reviews" className="hover:text-ember">Review desk</Link> / review</p>
        <div className="flex flex-wrap items-baseline gap-3">
          <h1 className="text-2xl font-semibold">{review.buildTitle}</h1>
          <span className="text-sm text-ink-soft">revision {review.revisionNumber} · by {review.requesterName} · reviewer {review.reviewerName} · asked {age(review.createdAt)}</span>
        </div>
        <div className="flex flex-wrap items-center gap-2 text-sm">
          <StatusBadge status={review.status} />
          {review.olderRevision && <OlderRevisionBadge revision={review.revisionNumber} current={review.currentRevision} />}
          {review.variantNote && <span className="rounded bg-ember-soft px-1.5 text-ember">variant: {review.variantNote}</span>}
          <Link href={`/builds/${review.buildId}/budget`} className="ml-auto text-ember hover:underline">Open the Budget</Link>
          <Link href={`/builds/${review.buildId}`} className="text-ember hover:underline">Heat path</Link>
        </div>
        {review.message && <p className="rounded border border-line bg-white/60 p-2 text-sm"><span className="text-ink-soft">The maker asks: </span>{review.message}</p>}
      </header>

      {review.status !== "requested" && (
        <section aria-label="Verdict" data-testid="verdict" className="rounded-lg border border-line bg-white/70 p-3 text-sm">
          <div className="mb-1 flex items-center gap-2"><span className="font-medium">Verdict</span><StatusBadge status={review.status} /></div>
          <p className="whitespace-pre-wrap">{review.summary}</p>
        </section>
      )}

      <section className="rounded-lg border border-line bg-white/60 p-4">
        <h2 className="mb-3 font-semibold">Heat path and comments</h2>
        <CommentPinboard reviewId={review.id} anchors={anchors} comments={thread} canComment={role !== "admin"} evaluation={evaluation} ambientC={ambientC} unit={user.temperatureUnit} />
      </section>

      {role === "reviewer" && review.status === "requested" && (
        <section className="rounded-lg border border-ember/30 bg-white/70 p-4">
          <VerdictForm reviewId={review.id} />
        </section>
      )}

      {role !== "admin" && (
        <section className="rounded-lg border border-line bg-white/60 p-4" data-testid="review-share">
          <SharePanel scope={{ kind: "review", reviewId: review.id }} warning={shareWarning} />
        </section>
      )}

      <section className="space-y-2">
        <h2 className="font-semibold">Budget of revision {review.revisionNumber}</h2>
        {evaluation ? <BudgetReport evaluation={evaluation} ambientC={ambientC} unit={user.temperatureUnit} /> : <p className="text-sm text-over">The Budget of this revision could not be worked out.</p>}
      </section>
    </div>
  );
}
