import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { createComparison } from "@/db/queries/comparisons";
import { addComment, createReview, decideReview } from "@/db/queries/reviews";
import { builds, comparisons, reviews } from "@/db/schema";

/**
 * The demo's review story: the workshop volunteer asks the senior tech which way of cooling
 * the square lantern's driver holds; he pins comments to the heat path and asks for changes.
 * A second request (the brass headlamp variant) waits in his queue, and the three lantern
 * variants are saved as a Side by side comparison. Idempotent: nothing is added twice.
 */
export interface SeedReviewsInput {
  ids: { maker: string; reviewer: string };
  /** Build ids by demo key (seedBuilds' answer): the reviewed build and its variants. */
  builds: Record<string, string>;
  keys?: { reviewed: string; variants: readonly string[]; queued?: string };
}

const DEFAULT_KEYS = { reviewed: "lantern-strap", variants: ["lantern-pressed", "lantern-floating"], queued: "headlamp-pressed" } as const;

const COMMENTS = [
  { by: "reviewer", anchor: { kind: "node", key: "driver" }, target: "driver board", body: "Strapped, the driver board keeps its headroom at low and mid. Floating free (the other variant) it passes its rating at mid after about half an hour; pressed to the wall it has the most margin of the three." },
  { by: "reviewer", anchor: { kind: "link", key: "driver->wall-driver" }, target: "strap from the driver to the housing wall", body: "This is the strap and its adhesive: thin copper tape is the weak step. A wider strap, or the ground plane pressed to the wall through a pad, lowers the driver by tens of kelvin." },
  { by: "reviewer", anchor: { kind: "node", key: "junction" }, target: "LED junction", body: "High mode is over budget at the junction in all three variants: the emitter's path to the case sets that limit, not the driver. Time-limit high or step it down to mid." },
  { by: "maker", anchor: { kind: "figure", key: "mode:high/headroom" }, target: "headroom table, high mode", body: "Understood: I'll try the ground plane pressed to the wall and cap high mode with a step-down." },
] as const;

async function existing(buildId: string, reviewerId: string): Promise<string | undefined> {
  const rows = await db().select({ id: reviews.id }).from(reviews).where(and(eq(reviews.buildId, buildId), eq(reviews.reviewerId, reviewerId))).limit(1);
  return rows[0]?.id;
}

async function currentRevision(buildId: string): Promise<number> {
  const rows = await db().select({ n: builds.currentRevision }).from(builds).where(eq(builds.id, buildId)).limit(1);
  return rows[0]?.n ?? 1;
}

export async function seedReviews({ ids, builds: byKey, keys = DEFAULT_KEYS }: SeedReviewsInput): Promise<{ reviewId: string | null; queuedId: string | null; comparisonId: string | null }> {
  const reviewed = byKey[keys.reviewed];
  if (!reviewed) return { reviewId: null, queuedId: null, comparisonId: null };
  let reviewId = (await existing(reviewed, ids.reviewer)) ?? null;
  if (!reviewId) {
    const revision = await currentRevision(reviewed);
    reviewId = (
      await createReview({
        buildId: reviewed,
        revisionNumber: revision,
        requestedBy: ids.maker,
        reviewerId: ids.reviewer,
        message: "Three ways to cool the driver: strapped with copper tape, pressed to the wall, floating free. Which one holds, and at which modes?",
        notify: { text: `Mara Quayle asks for your review of the square lantern (revision ${revision}).` },
      })
    ).id;
    for (const c of COMMENTS) {
      const author = c.by === "reviewer" ? ids.reviewer : ids.maker;
      const other = c.by === "reviewer" ? ids.maker : ids.reviewer;
      await addComment({ reviewId, buildId: reviewed, authorId: author, anchor: c.anchor, body: c.body, notify: { userId: other, text: `New comment on the ${c.target} in the review of the square lantern.` } });
    }
    await decideReview({
      id: reviewId,
      buildId: reviewed,
      status: "changes_requested",
      summary: "Driver cooling: keep it bonded to the case — pressed to the wall is best, the copper strap is acceptable, floating free fails at mid. High mode is over budget at the junction in every variant: add a step-down or drop high before this lantern goes to the hut.",
      notify: { userId: ids.maker, text: "Ravi Tamsin: changes requested — the square lantern." },
    });
  }

  const queued = keys.queued ? byKey[keys.queued] : undefined;
  let queuedId: string | null = null;
  if (queued) {
    queuedId = (await existing(queued, ids.reviewer)) ?? null;
    if (!queuedId) {
      const revision = await currentRevision(queued);
      queuedId = (await createReview({ buildId: queued, revisionNumber: revision, requestedBy: ids.maker, reviewerId: ids.reviewer, message: "Is the brass shell too hot to hold once the sink bears on it?", notify: { text: `Mara Quayle asks for your review of the brass headlamp (revision ${revision}).` } })).id;
    }
  }

  const variantIds = keys.variants.map((k) => byKey[k]).filter((x): x is string => Boolean(x));
  const title = "Square lantern: three ways to cool the driver";
  const saved = await db().select({ id: comparisons.id }).from(comparisons).where(and(eq(comparisons.ownerId, ids.maker), eq(comparisons.title, title))).limit(1);
  let comparisonId = saved[0]?.id ?? null;
  if (!comparisonId && variantIds.length) comparisonId = (await createComparison({ ownerId: ids.maker, title, items: [reviewed, ...variantIds].map((buildId) => ({ buildId })) })).id;
  return { reviewId, queuedId, comparisonId };
}
