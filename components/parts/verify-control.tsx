"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { buttonClass, inputClass, quietButtonClass } from "./labels";
import { useAttachments } from "./use-attachments";
import { usePartAction } from "./use-parts";

/**
 * An admin records a check of the part's values against a datasheet or a measurement
 * (cited, and optionally one of the part's attachments), or withdraws the mark. Estimates
 * cannot be verified: there is nothing to check them against.
 */
export function VerifyControl({ id, verified, provenance }: { id: string; verified: boolean; provenance: string }) {
  const router = useRouter();
  const { verify } = usePartAction(id);
  const attachments = useAttachments(id);
  const [open, setOpen] = useState(false);
  const [against, setAgainst] = useState("");
  const [attachmentId, setAttachmentId] = useState("");
  const [error, setError] = useState<string | null>(null);
  const fail = (e: unknown) => setError(e instanceof Error ? e.message : "That did not work.");
  const done = () => {
    setOpen(false);
    setError(null);
    router.refresh();
  };

  if (verified) {
    return (
      <div className="space-y-1">
        <button type="button" className={quietButtonClass} disabled={verify.isPending} onClick={() => verify.mutate({ verified: false }, { onSuccess: done, onError: fail })}>
          Remove verified mark
        </button>
        {error && <p role="alert" className="text-sm text-over">{error}</p>}
      </div>
    );
  }
  if (provenance === "estimate") {
    return <p className="text-xs text-ink-soft">An estimate cannot be marked verified. Set its provenance to datasheet or measured and cite that source first.</p>;
  }
  if (!open) {
    return (
      <button type="button" className={quietButtonClass} onClick={() => setOpen(true)}>
        Record a check…
      </button>
    );
  }
  return (
    <form
      className="max-w-xl space-y-2 rounded border border-line bg-white p-3 text-sm"
      onSubmit={(e) => {
        e.preventDefault();
        verify.mutate({ verified: true, against, ...(attachmentId ? { attachmentId } : {}) }, { onSuccess: done, onError: fail });
      }}
    >
      <label className="block">
        <span className="mb-1 block">Checked against</span>
        <input className={`${inputClass} w-full`} value={against} onChange={(e) => setAgainst(e.target.value)} placeholder="Datasheet rev. C, 2021, table 2 and figure 7" aria-label="Checked against" />
      </label>
      <label className="block">
        <span className="mb-1 block">Attachment (optional)</span>
        <select className={`${inputClass} w-full`} value={attachmentId} onChange={(e) => setAttachmentId(e.target.value)} aria-label="Attachment (optional)">
          <option value="">none — the source is cited above</option>
          {(attachments.data ?? []).map((a) => (
            <option key={a.id} value={a.id}>{a.filename}</option>
          ))}
        </select>
      </label>
      <div className="flex gap-2">
        <button type="submit" className={buttonClass} disabled={verify.isPending}>Mark verified</button>
        <button type="button" className={quietButtonClass} onClick={() => setOpen(false)}>Cancel</button>
      </div>
      {error && <p role="alert" className="text-over">{error}</p>}
    </form>
  );
}
