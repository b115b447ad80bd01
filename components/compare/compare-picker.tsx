"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { CompareItem } from "@/lib/reviews/api-schemas";
import { itemsParam, MAX_COMPARE, MIN_COMPARE } from "@/lib/reviews/words";

export interface Candidate {
  id: string;
  title: string;
  variantNote: string | null;
  ownerName: string;
  currentRevision: number;
  mine: boolean;
  /** The viewer was asked to review it. */
  toReview: boolean;
}

/** A build's family: its title before a variant's " — note" (the variants of a build sit together). */
const family = (c: Candidate) => c.title.split(" — ")[0]!.trim();

/**
 * The builds you were asked to review come first, each with its variants beside it; then
 * the rest by family and title.
 */
function ordered(candidates: readonly Candidate[]): Candidate[] {
  const asked = new Set(candidates.filter((c) => c.toReview).map(family));
  return [...candidates].sort(
    (a, b) =>
      Number(asked.has(family(b))) - Number(asked.has(family(a))) ||
      family(a).localeCompare(family(b)) ||
      Number(b.toReview) - Number(a.toReview) ||
      a.title.localeCompare(b.title),
  );
}

/** Pick two to four of your builds and the ones shared with you, each at a revision. */
export function ComparePicker({ candidates, selected }: { candidates: Candidate[]; selected: CompareItem[] }) {
  const router = useRouter();
  const [items, setItems] = useState<CompareItem[]>(selected);
  const has = (id: string) => items.some((i) => i.buildId === id);
  const toggle = (id: string) => setItems((xs) => (has(id) ? xs.filter((x) => x.buildId !== id) : xs.length >= MAX_COMPARE ? xs : [...xs, { buildId: id }]));
  const setRevision = (id: string, revision: number | undefined) => setItems((xs) => xs.map((x) => (x.buildId === id ? (revision ? { buildId: id, revision } : { buildId: id }) : x)));

  return (
    <details className="no-print rounded-lg border border-line bg-white/60 p-3 text-sm" open={selected.length < MIN_COMPARE}>
      <summary className="cursor-pointer font-medium">Pick builds ({items.length} of {MIN_COMPARE}–{MAX_COMPARE})</summary>
      <ul className="mt-2 grid gap-1 sm:grid-cols-2">
        {ordered(candidates).map((c) => {
          const item = items.find((i) => i.buildId === c.id);
          return (
            <li key={c.id} className="flex items-center gap-2">
              <label className="flex min-w-0 flex-1 items-center gap-2">
                <input type="checkbox" checked={Boolean(item)} onChange={() => toggle(c.id)} disabled={!item && items.length >= MAX_COMPARE} className="accent-ember" aria-label={`Compare ${c.title}`} />
                {c.toReview && <span className="shrink-0 rounded bg-ember-soft px-1 text-xs text-ember">asked to review</span>}
                <span className="truncate" title={[c.title, c.variantNote, c.mine ? null : c.ownerName].filter(Boolean).join(" · ")}>
                  {c.title}
                  {c.variantNote && <span className="text-ink-soft"> · {c.variantNote}</span>}
                  {!c.mine && <span className="text-ink-soft"> · {c.ownerName}</span>}
                </span>
              </label>
              {item && c.currentRevision > 1 && (
                <select value={item.revision ?? ""} onChange={(e) => setRevision(c.id, e.target.value ? Number(e.target.value) : undefined)} aria-label={`Revision of ${c.title}`} className="rounded border border-line bg-white px-1 text-xs">
                  <option value="">current (r{c.currentRevision})</option>
                  {Array.from({ length: c.currentRevision }, (_, k) => c.currentRevision - k).map((n) => (
                    <option key={n} value={n}>r{n}</option>
                  ))}
                </select>
              )}
            </li>
          );
        })}
      </ul>
      {candidates.length === 0 && <p className="text-ink-soft">You have no builds yet, and none is shared with you.</p>}
      <button type="button" disabled={items.length < MIN_COMPARE} onClick={() => router.push(`/compare?items=${encodeURIComponent(itemsParam(items))}`)} className="mt-3 rounded bg-ember px-3 py-1 font-medium text-white hover:opacity-90 disabled:opacity-50">
        Compare side by side
      </button>
    </details>
  );
}
