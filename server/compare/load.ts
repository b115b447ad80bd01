import "server-only";
import type { RevisionRow } from "@/db/queries/builds";
import { getComparison } from "@/db/queries/comparisons";
import type { BuildViewer } from "@/lib/builds/access";
import { columnNamesFor, designDiff, figureRows, ladders, sideBySide, summarise, summaryWithTraces, warmupSeries, withTraces } from "@/lib/compare";
import { ApiError } from "@/lib/http/api-error";
import type { CompareItem } from "@/lib/reviews/api-schemas";
import { buildDesignSchema, type BuildDesign } from "@/lib/retrofit";
import { loadBuild, loadDesignParts, loadRevision, type LoadedBuild } from "@/server/builds/load";
import { solveRevision } from "@/server/builds/solve";
import { reviewsAsReviewer } from "@/server/reviews/load";

type Viewer = NonNullable<BuildViewer>;

/**
 * Every item's build and revision, or a refusal of the whole list: an item the viewer may
 * not see stops the comparison before anything about the other items is read or returned.
 */
export async function loadItems({ items, viewer }: { items: readonly CompareItem[]; viewer: Viewer }): Promise<{ build: LoadedBuild; revision: RevisionRow }[]> {
  const out: { build: LoadedBuild; revision: RevisionRow }[] = [];
  for (const [i, item] of items.entries()) {
    // The builds' own loaders apply the rule; only their words change here (which item, and that nothing is compared).
    const build = await loadBuild({ id: item.buildId, viewer }).catch(refuse(new ApiError("not_found:build", `Builds to compare: build ${item.buildId} does not exist or is not shared with you, so nothing is compared.`, `items[${i}]`)));
    const number = item.revision ?? build.currentRevision;
    const revision = await loadRevision({ build, number }).catch(refuse(new ApiError("not_found:revision", `Builds to compare: build ${item.buildId} has no revision ${number}, so nothing is compared.`, `items[${i}]`)));
    out.push({ build, revision });
  }
  return out;
}

/** Replaces a refusal (ApiError) with `instead`; anything else (an outage) goes on as it is. */
function refuse(instead: ApiError): (e: unknown) => never {
  return (e: unknown) => {
    throw e instanceof ApiError ? instead : e;
  };
}

/** A saved comparison: its owner's, or anyone's who may see every build in it; else 404. */
export async function loadComparison({ id, viewer }: { id: string; viewer: Viewer }) {
  const notFound = new ApiError("not_found:comparison", "No such saved comparison, or it compares builds you may not see.", "id");
  const saved = await getComparison({ id });
  if (!saved) throw notFound;
  if (saved.ownerId !== viewer.id) await loadItems({ items: saved.items, viewer }).catch(refuse(notFound));
  return saved;
}

export type Comparison = Awaited<ReturnType<typeof compareItems>>;

/** Solves each revision through the one solver path (cached per revision) and lines the results up. */
export async function compareItems({ items, viewer }: { items: readonly CompareItem[]; viewer: Viewer }) {
  const loaded = await loadItems({ items, viewer });
  const designs: BuildDesign[] = loaded.map(({ build, revision }, i) => {
    const parsed = buildDesignSchema.safeParse(revision.design);
    if (!parsed.success) throw new ApiError("unprocessable:design", `The stored design of ${build.title} (revision ${revision.number}) no longer reads: ${parsed.error.issues[0]?.message ?? "invalid"}.`, `items[${i}]`);
    return parsed.data;
  });
  const solved = await Promise.all(loaded.map(({ build, revision }) => solveRevision({ build, revision })));
  const names = new Map<string, string>();
  for (const { revision } of loaded) for (const [id, p] of await loadDesignParts({ design: revision.design, viewer })) names.set(id, p.name);
  const evals = solved.map((s) => s.evaluation);
  const differences = designDiff(designs, (id) => names.get(id));
  const differing = differences.filter((d) => d.differs);
  const columnNames = columnNamesFor(differing, loaded.map(({ build }) => build.variantNote ?? build.title));
  const summary = summarise({ names: columnNames, differsIn: differing.map((d) => d.label), evaluations: evals });
  const scenarioIds = [...new Set(evals.flatMap((e) => e.scenarios.map((s) => s.id)))];
  const reviews = await reviewsAsReviewer({ viewer, revisions: loaded.map(({ build, revision }) => ({ buildId: build.id, revision: revision.number })) });
  return {
    columns: loaded.map(({ build, revision }, i) => ({
      buildId: build.id,
      revision: revision.number,
      currentRevision: build.currentRevision,
      title: build.title,
      variantNote: build.variantNote,
      ownerName: build.ownerName,
      verdict: evals[i]?.verdict ?? null,
      problems: (evals[i]?.problems ?? []).filter((p) => p.severity !== "info"),
      /** The viewer's review of this revision (they are its reviewer): comments may be pinned on its heat path here. */
      review: reviews[i] ?? null,
    })),
    columnNames,
    summary: summaryWithTraces(summary, evals),
    differences,
    sideBySide: sideBySide(evals),
    ambientC: designs.map((d) => d.environment.ambientC),
    figures: withTraces(figureRows(evals), evals),
    warmups: warmupSeries(evals),
    ladders: scenarioIds.map((id) => ({ scenarioId: id, scenarioName: evals.flatMap((e) => e.scenarios).find((s) => s.id === id)?.name ?? id, columns: ladders(evals, id) })),
  };
}
