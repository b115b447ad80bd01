"use client";

import { type FormEvent, useState } from "react";
import { ApiClientError } from "@/components/ui/fetch-json";
import { type ShareScope, useCreateShare, useRevokeShare, useShares } from "./use-reviews";

/**
 * Read-only links: to a revision's Budget (a build's scope, with a revision to choose) or to
 * a review (the reviewed revision with its verdict and comments). Create with an optional
 * expiry, copy, revoke. `warning` says why links do not open now (a worked example's questions).
 */
export function SharePanel({ scope, currentRevision, warning }: { scope: ShareScope; currentRevision?: number; warning?: string | null }) {
  const shares = useShares(scope);
  const create = useCreateShare(scope);
  const revoke = useRevokeShare(scope);
  const [fresh, setFresh] = useState<{ id: string; url: string } | null>(null);
  const [copied, setCopied] = useState(false);
  const err = create.error instanceof ApiClientError ? create.error : null;

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const days = String(data.get("expiresInDays") ?? "").trim();
    const revision = Number(data.get("revision") ?? "");
    setCopied(false);
    create.mutate(
      { revision: Number.isInteger(revision) && revision > 0 ? revision : undefined, expiresInDays: days === "" ? undefined : Number(days) },
      { onSuccess: (r) => setFresh({ id: r.share.id, url: r.share.url }) },
    );
  }

  async function copy(url: string) {
    try {
      await navigator.clipboard.writeText(url);
      setCopied(true);
    } catch {
      setCopied(false);
    }
  }

  return (
    <section className="space-y-2 text-sm" aria-label="Share links">
      <h3 className="font-medium">Share links</h3>
      <p className="text-xs text-ink-soft">
        {scope.kind === "build"
          ? "Anyone with the link sees this revision's Budget, read-only, without signing in. Revoking stops it at once."
          : "Anyone with the link sees the reviewed revision's verdict, comments and limits, read-only, without signing in — no e-mail addresses and no values of private parts. Revoking stops it at once."}
      </p>
      {warning && <p role="note" data-testid="share-warning" className="rounded border border-tight/40 bg-tight/10 p-2 text-xs">{warning}</p>}
      <form onSubmit={onSubmit} noValidate className="flex flex-wrap items-end gap-2">
        {scope.kind === "build" && (
          <label className="block">
            <span className="mb-0.5 block text-ink-soft">Revision</span>
            <input name="revision" type="number" min={1} max={currentRevision} defaultValue={currentRevision} className="w-20 rounded border border-line bg-white px-2 py-1" />
          </label>
        )}
        <label className="block">
          <span className="mb-0.5 block text-ink-soft">Expires after (days)</span>
          <input name="expiresInDays" type="number" min={1} max={365} placeholder="never" className="w-28 rounded border border-line bg-white px-2 py-1" aria-invalid={err?.path === "expiresInDays" ? true : undefined} />
        </label>
        <button type="submit" disabled={create.isPending} className="rounded border border-ember px-3 py-1 text-ember disabled:opacity-50">
          Create a link
        </button>
      </form>
      {err && <p role="alert" className="text-over">{err.message}</p>}
      {fresh && (
        <div className="rounded border border-ok/30 bg-ok/5 p-2">
          <p className="mb-1 text-xs text-ink-soft">Copy it now: Sinkwise keeps only a fingerprint of the link and cannot show it again.</p>
          <div className="flex gap-2">
            <input readOnly value={fresh.url} aria-label="Share URL" data-testid="share-url" className="min-w-0 flex-1 rounded border border-line bg-white px-2 py-1 font-mono text-xs" onFocus={(e) => e.currentTarget.select()} />
            <button type="button" onClick={() => copy(fresh.url)} className="rounded border border-line px-2 py-1 hover:border-ember">
              {copied ? "Copied" : "Copy"}
            </button>
          </div>
        </div>
      )}
      <ul className="space-y-1">
        {shares.data?.shares.map((s) => (
          <li key={s.id} className="flex flex-wrap items-center gap-2 text-xs">
            {s.revisionNumber !== undefined && <span>r{s.revisionNumber}</span>}
            <span className="text-ink-soft">made {new Date(s.createdAt).toLocaleDateString()}</span>
            <span className="text-ink-soft">{s.expiresAt ? `expires ${new Date(s.expiresAt).toLocaleDateString()}` : "no expiry"}</span>
            <span className={s.state === "active" ? "text-ok" : "text-ink-soft"}>{s.state}</span>
            {s.state === "active" && (
              <button type="button" onClick={() => revoke.mutate(s.id)} disabled={revoke.isPending} className="ml-auto text-over hover:underline">
                Revoke
              </button>
            )}
          </li>
        ))}
      </ul>
      {shares.isError && <p className="text-over">{shares.error.message}</p>}
    </section>
  );
}
