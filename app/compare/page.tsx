import Link from "next/link";
import { type Candidate, ComparePicker } from "@/components/compare/compare-picker";
import { CompareView } from "@/components/compare/compare-view";
import { listBuilds } from "@/db/queries/builds";
import { listComparisons } from "@/db/queries/comparisons";
import { listReviewsForReviewer } from "@/db/queries/reviews";
import { ApiError } from "@/lib/http/api-error";
import { compareQuerySchema, type CompareItem } from "@/lib/reviews/api-schemas";
import { requirePageUser } from "@/server/auth/session";
import { loadComparison } from "@/server/compare/load";

export const metadata = { title: "Side by side" };

type Search = Promise<{ items?: string | string[]; saved?: string | string[] }>;

export default async function ComparePage({ searchParams }: { searchParams: Search }) {
  const user = await requirePageUser();
  const sp = await searchParams;
  const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);
  let items: CompareItem[] = [];
  let savedTitle: string | null = null;
  let problem: string | null = null;
  const savedId = one(sp.saved);
  if (savedId) {
    // A refusal is shown as a problem; a database outage is an error page, never "not visible".
    const saved = await loadComparison({ id: savedId, viewer: user }).catch((e: unknown) => {
      if (e instanceof ApiError) return e;
      throw e;
    });
    if (saved instanceof ApiError) problem = saved.message;
    else {
      items = saved.items;
      savedTitle = saved.title;
    }
  } else if (one(sp.items)) {
    const parsed = compareQuerySchema.safeParse({ items: one(sp.items) });
    if (parsed.success) items = parsed.data.items;
    else problem = parsed.error.issues[0]?.message ?? "The list of builds does not read.";
  }
  const [{ mine, shared }, savedList, asked] = await Promise.all([listBuilds({ viewer: user }), listComparisons({ ownerId: user.id }), listReviewsForReviewer({ reviewerId: user.id })]);
  // Builds the viewer was asked to review come first (a private build is listed through its review).
  const toReview = new Map(asked.map((r) => [r.buildId, r]));
  const listed: Candidate[] = [...mine.map((b) => ({ ...b, mine: true })), ...shared.map((b) => ({ ...b, mine: false }))].map((b) => ({ id: b.id, title: b.title, variantNote: b.variantNote, ownerName: b.ownerName, currentRevision: b.currentRevision, mine: b.mine, toReview: toReview.has(b.id) }));
  const onlyByReview: Candidate[] = [...toReview.values()].filter((r) => !listed.some((c) => c.id === r.buildId)).map((r) => ({ id: r.buildId, title: r.buildTitle, variantNote: r.variantNote, ownerName: r.requesterName, currentRevision: r.currentRevision, mine: false, toReview: true }));
  const candidates = [...onlyByReview, ...listed].sort((a, b) => Number(b.toReview) - Number(a.toReview));
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-semibold">Side by side</h1>
        {savedTitle && <span className="text-sm text-ink-soft">{savedTitle}</span>}
      </div>
      <ComparePicker key={items.map((i) => `${i.buildId}@${i.revision ?? ""}`).join(",")} candidates={candidates} selected={items} />
      {problem && <p role="alert" className="rounded border border-over/30 bg-over/5 p-3 text-sm text-over">{problem}</p>}
      {items.length >= 2 ? <CompareView items={items} savedTitle={savedTitle} /> : !problem && <p className="text-sm text-ink-soft">Pick two to four builds or revisions: the parts and mounting that differ come first, then every figure with its delta against the first column.</p>}
      {savedList.length > 0 && (
        <section className="no-print text-sm">
          <h2 className="mb-1 font-medium">Saved comparisons</h2>
          <ul className="space-y-0.5">
            {savedList.map((c) => (
              <li key={c.id}><Link href={`/compare?saved=${c.id}`} className="hover:text-ember">{c.title}</Link> <span className="text-xs text-ink-soft">{c.createdAt.toISOString().slice(0, 10)}</span></li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
