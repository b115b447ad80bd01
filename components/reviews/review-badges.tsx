import { REVIEW_STATUS_LABELS } from "@/lib/reviews/api-schemas";
import type { ReviewStatus } from "./types";

const STATUS_STYLE: Record<ReviewStatus, string> = {
  requested: "border-line text-ink-soft",
  approved: "border-ok/40 bg-ok/10 text-ok",
  changes_requested: "border-tight/40 bg-tight/10 text-tight",
  rejected: "border-over/40 bg-over/10 text-over",
};

/** Our verdict words: approved / changes requested / rejected (or still waiting). */
export function StatusBadge({ status }: { status: ReviewStatus }) {
  return <span data-testid="review-status" className={`inline-block rounded border px-1.5 py-0.5 text-xs font-medium ${STATUS_STYLE[status]}`}>{REVIEW_STATUS_LABELS[status]}</span>;
}

export function OlderRevisionBadge({ revision, current }: { revision: number; current: number }) {
  return (
    <span title={`Reviewed revision ${revision}; the build is now at revision ${current}.`} className="inline-block rounded border border-ember/40 bg-ember-soft px-1.5 py-0.5 text-xs text-ember">
      older revision
    </span>
  );
}

/** "3 h ago", "2 d ago": the age of a request in the queue. */
export function age(from: Date | string, now: Date = new Date()): string {
  const s = Math.max(0, (now.getTime() - new Date(from).getTime()) / 1000);
  if (s < 60) return "just now";
  if (s < 3600) return `${Math.floor(s / 60)} min ago`;
  if (s < 86_400) return `${Math.floor(s / 3600)} h ago`;
  return `${Math.floor(s / 86_400)} d ago`;
}
