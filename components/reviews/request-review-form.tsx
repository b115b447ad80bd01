"use client";

import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { ApiClientError } from "@/components/ui/fetch-json";
import { useRequestReview } from "./use-reviews";

/** "Request a review": a reviewer's e-mail, which revision, and a note for them. */
export function RequestReviewForm({ buildId, currentRevision }: { buildId: string; currentRevision: number }) {
  const router = useRouter();
  const request = useRequestReview(buildId);
  const [done, setDone] = useState<string | null>(null);
  const err = request.error instanceof ApiClientError ? request.error : null;

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    const revision = Number(data.get("revision"));
    setDone(null);
    request.mutate(
      { reviewerEmail: String(data.get("reviewerEmail") ?? ""), revision: Number.isInteger(revision) && revision > 0 ? revision : undefined, message: String(data.get("message") ?? "") },
      {
        onSuccess: (r) => {
          setDone(`Review requested from ${r.review.reviewerName} (revision ${r.review.revisionNumber})${r.mailed ? "; they have been e-mailed." : "; the e-mail could not be sent, but the request is on their desk."}`);
          form.reset();
          router.refresh();
        },
      },
    );
  }

  const fieldError = (name: string) => (err && err.path === name ? err.message : null);
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-2 text-sm" aria-label="Request a review">
      <h3 className="font-medium">Request a review</h3>
      <label className="block">
        <span className="mb-0.5 block text-ink-soft">Reviewer&apos;s e-mail</span>
        <input name="reviewerEmail" type="email" required className="w-full rounded border border-line bg-white px-2 py-1 focus:border-ember focus:outline-none" aria-invalid={fieldError("reviewerEmail") ? true : undefined} />
        {fieldError("reviewerEmail") && <span role="alert" className="mt-0.5 block text-over">{fieldError("reviewerEmail")}</span>}
      </label>
      <label className="block">
        <span className="mb-0.5 block text-ink-soft">Revision</span>
        <select key={currentRevision} name="revision" defaultValue={String(currentRevision)} className="rounded border border-line bg-white px-2 py-1">
          {Array.from({ length: currentRevision }, (_, k) => currentRevision - k).map((n) => (
            <option key={n} value={n}>{n === currentRevision ? `latest (revision ${n})` : `revision ${n}`}</option>
          ))}
        </select>
        {fieldError("revision") && <span role="alert" className="mt-0.5 block text-over">{fieldError("revision")}</span>}
      </label>
      <label className="block">
        <span className="mb-0.5 block text-ink-soft">Note for the reviewer</span>
        <textarea name="message" rows={2} maxLength={2000} className="w-full rounded border border-line bg-white px-2 py-1" />
      </label>
      {err && !["reviewerEmail", "revision"].includes(err.path) && <p role="alert" className="text-over">{err.message}</p>}
      {request.error && !err && <p role="alert" className="text-over">Network error; try again.</p>}
      {done && <p role="status" className="text-ok">{done}</p>}
      <button type="submit" disabled={request.isPending} className="rounded bg-ember px-3 py-1 font-medium text-white hover:opacity-90 disabled:opacity-50">
        {request.isPending ? "Sending…" : "Request the review"}
      </button>
    </form>
  );
}
