"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";

/** Copy / variant / export for a build. */
export function BuildActions({ buildId, isOwner }: { buildId: string; isOwner: boolean }) {
  const router = useRouter();
  const [variantNote, setVariantNote] = useState("");
  const [error, setError] = useState<string | null>(null);

  async function fork(body: Record<string, string>) {
    setError(null);
    try {
      const r = await fetchJson<{ build: { id: string } }>(`/api/v1/builds/${buildId}/fork`, { method: "POST", body });
      router.push(`/builds/${r.build.id}`);
    } catch (e) {
      setError(e instanceof ApiClientError ? e.message : "Could not copy the build.");
    }
  }

  return (
    <section className="no-print space-y-3 rounded-lg border border-line bg-white/60 p-3 text-sm">
      {isOwner ? (
        <div className="space-y-2">
          <h2 className="font-medium">Try a variant</h2>
          <input value={variantNote} onChange={(e) => setVariantNote(e.target.value)} placeholder="What it changes" aria-label="What the variant changes" className="w-full rounded border border-line bg-white px-2 py-1" />
          <button type="button" disabled={!variantNote.trim()} onClick={() => fork({ variantNote: variantNote.trim() })} className="rounded border border-ember px-3 py-1 text-ember disabled:opacity-40">
            Make the variant
          </button>
        </div>
      ) : (
        <button type="button" onClick={() => fork({})} className="rounded border border-ember px-3 py-1 text-ember">Copy to my builds</button>
      )}
      <a href={`/api/v1/builds/${buildId}/export`} className="block text-ink-soft hover:text-ember">Download the build file (JSON)</a>
      {error && <p role="alert" className="text-over">{error}</p>}
    </section>
  );
}
