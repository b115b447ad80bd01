"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";

type Change = { partId: string; name: string; kind: string; changes: string[] };

/**
 * Says that parts behind the latest revision changed in the bin since it was saved, shows
 * what changed, and offers a new revision with the current parts. The saved revision (and
 * its Budget, reviews and worked examples) keeps the parts as they were.
 */
export function PartsChangedNotice({ buildId, revision, design, changes, canEdit }: { buildId: string; revision: number; design: unknown; changes: Change[]; canEdit: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (changes.length === 0) return null;
  const save = async () => {
    setBusy(true);
    setError(null);
    try {
      await fetchJson(`/api/v1/builds/${buildId}`, { method: "PATCH", body: { design, note: `Revision ${revision} with the parts as they are now` } });
      router.refresh();
    } catch (e) {
      setError(e instanceof ApiClientError ? e.message : "The new revision could not be saved; try again.");
    } finally {
      setBusy(false);
    }
  };
  return (
    <section className="space-y-2 rounded-lg border border-tight/40 bg-tight/5 p-3 text-sm" data-testid="parts-changed" aria-label="Parts changed since this revision">
      <h2 className="font-medium">Parts changed since revision {revision} was saved</h2>
      <p className="text-ink-soft">Revision {revision} keeps the parts as they were when it was saved, so its Budget and reviews do not move. A new revision picks up the parts as they are now:</p>
      <ul className="list-disc space-y-1 pl-5">
        {changes.map((c) => (
          <li key={c.partId}>
            <span className="font-medium">{c.name}</span> <span className="text-ink-soft">({c.kind})</span>
            <ul className="pl-3 text-xs text-ink-soft">
              {c.changes.map((line) => <li key={line}>{line}</li>)}
            </ul>
          </li>
        ))}
      </ul>
      {canEdit && (
        <button type="button" onClick={save} disabled={busy} className="rounded bg-ember px-3 py-1.5 text-sm font-medium text-white hover:opacity-90 disabled:opacity-60">
          {busy ? "Saving…" : `Save revision ${revision + 1} with the current parts`}
        </button>
      )}
      {error && <p role="alert" className="text-over">{error}</p>}
    </section>
  );
}
