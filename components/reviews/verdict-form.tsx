"use client";

import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { ApiClientError } from "@/components/ui/fetch-json";
import { REVIEW_STATUS_LABELS, VERDICT_STATUSES, type VerdictStatus } from "@/lib/reviews/words";
import { useVerdict } from "./use-reviews";

/** The reviewer's verdict: approved / changes requested / rejected, with a summary. */
export function VerdictForm({ reviewId }: { reviewId: string }) {
  const router = useRouter();
  const verdict = useVerdict(reviewId);
  const [status, setStatus] = useState<VerdictStatus | null>(null);
  const [summary, setSummary] = useState("");
  const err = verdict.error instanceof ApiClientError ? verdict.error : null;
  const missing = !status && !summary.trim() ? "Choose a verdict and write its summary to record it." : !status ? "Choose a verdict to record it." : !summary.trim() ? "Summary: every verdict needs a sentence or two saying why." : null;

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (!status) return;
    verdict.mutate({ status, summary }, { onSuccess: () => router.refresh() });
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Verdict" className="space-y-2 text-sm">
      <h3 className="font-medium">Verdict</h3>
      <fieldset className="flex flex-wrap gap-3">
        <legend className="sr-only">Verdict</legend>
        {VERDICT_STATUSES.map((s) => (
          <label key={s} className="flex items-center gap-1.5">
            <input type="radio" name="status" value={s} checked={status === s} onChange={() => setStatus(s)} className="accent-ember" />
            {REVIEW_STATUS_LABELS[s]}
          </label>
        ))}
      </fieldset>
      <label className="block">
        <span className="mb-0.5 block text-ink-soft">Summary</span>
        <textarea value={summary} onChange={(e) => setSummary(e.target.value)} rows={3} maxLength={4000} className="w-full rounded border border-line bg-white px-2 py-1 focus:border-ember focus:outline-none" />
      </label>
      {missing && <p id="verdict-needs" className="text-ink-soft" data-testid="verdict-needs">{missing}</p>}
      {err && <p role="alert" className="text-over">{err.message}</p>}
      <button type="submit" aria-describedby={missing ? "verdict-needs" : undefined} disabled={!status || !summary.trim() || verdict.isPending} className="rounded bg-ember px-3 py-1 font-medium text-white hover:opacity-90 disabled:opacity-50">
        Record the verdict
      </button>
    </form>
  );
}
