import Link from "next/link";
import { listReviewsForReviewer, listReviewsRequestedBy } from "@/db/queries/reviews";
import { age, OlderRevisionBadge, StatusBadge } from "@/components/reviews/review-badges";
import type { ReviewView } from "@/server/reviews/load";
import { reviewView } from "@/server/reviews/load";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Review desk" };

function ReviewTable({ rows, who }: { rows: ReviewView[]; who: "maker" | "reviewer" }) {
  return (
    <table className="w-full text-left text-sm">
      <thead className="text-xs uppercase tracking-wide text-ink-soft">
        <tr>
          <th className="py-1 pr-3 font-medium">Build</th>
          <th className="py-1 pr-3 font-medium">Revision</th>
          <th className="py-1 pr-3 font-medium">{who === "maker" ? "Maker" : "Reviewer"}</th>
          <th className="py-1 pr-3 font-medium">Asked</th>
          <th className="py-1 font-medium">State</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.id} className="border-t border-line" data-testid="queue-row">
            <td className="py-1.5 pr-3">
              <Link href={`/reviews/${r.id}`} className="font-medium hover:text-ember">{r.buildTitle}</Link>
              {r.variantNote && <span className="ml-2 text-xs text-ink-soft">variant: {r.variantNote}</span>}
            </td>
            <td className="py-1.5 pr-3">
              r{r.revisionNumber} {r.olderRevision && <OlderRevisionBadge revision={r.revisionNumber} current={r.currentRevision} />}
            </td>
            <td className="py-1.5 pr-3">{who === "maker" ? r.requesterName : r.reviewerName}</td>
            <td className="py-1.5 pr-3 text-ink-soft">{age(r.createdAt)}</td>
            <td className="py-1.5"><StatusBadge status={r.status} /></td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export default async function ReviewDeskPage() {
  const user = await requirePageUser();
  const [assigned, requested] = await Promise.all([listReviewsForReviewer({ reviewerId: user.id }), listReviewsRequestedBy({ userId: user.id })]);
  const open = assigned.filter((r) => r.status === "requested").map(reviewView);
  const decided = assigned.filter((r) => r.status !== "requested").map(reviewView);
  const isReviewer = user.role === "reviewer" || assigned.length > 0;
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-semibold">Review desk</h1>
      {isReviewer && (
        <section className="space-y-2" aria-label="Waiting for your verdict">
          <h2 className="font-medium">Waiting for your verdict <span className="text-ink-soft">({open.length})</span></h2>
          {open.length ? <ReviewTable rows={open} who="maker" /> : <p className="text-sm text-ink-soft">Nothing waiting. Makers ask for a review from the build page with your e-mail address.</p>}
        </section>
      )}
      {decided.length > 0 && (
        <section className="space-y-2" aria-label="Decided">
          <h2 className="font-medium">Decided</h2>
          <ReviewTable rows={decided} who="maker" />
        </section>
      )}
      {(requested.length > 0 || !isReviewer) && (
        <section className="space-y-2" aria-label="Reviews you asked for">
          <h2 className="font-medium">Reviews you asked for</h2>
          {requested.length ? <ReviewTable rows={requested.map(reviewView)} who="reviewer" /> : <p className="text-sm text-ink-soft">None yet: ask for one from a build&apos;s page.</p>}
        </section>
      )}
    </div>
  );
}
