import "server-only";
import { createHash } from "node:crypto";
import { getCachedResult, putCachedResult, type RevisionRow } from "@/db/queries/builds";
import type { PartRecord } from "@/db/queries/parts";
import type { BuildViewer } from "@/lib/builds/access";
import { partSchema, type Part } from "@/lib/parts";
import { buildDesignSchema, type BuildEvaluation, EVALUATION_VERSION, evaluateBuild, resolveBuild } from "@/lib/retrofit";
import { toPartInput } from "@/server/parts-api";
import { loadDesignParts, type LoadedBuild } from "./load";

/**
 * Bump when the engine or the compiler changes what a result contains or how it is worked
 * out: cached results of another version are recomputed.
 */
export const SOLVER_VERSION = `e${EVALUATION_VERSION}.1`;

export type RevisionSolve = {
  buildId: string;
  revision: number;
  solverVersion: string;
  cached: boolean;
  evaluation: BuildEvaluation;
};

/**
 * The cache key of a revision's result: the solver version and a fingerprint of the parts
 * as read now (id + last change). A revision is immutable, but a part it names by id can be
 * edited, and a viewer may not see every part; either gives another key, so a stale or
 * someone else's answer is never served.
 */
function cacheKey(records: Map<string, PartRecord>): string {
  const h = createHash("sha256");
  for (const [id, r] of [...records].sort(([a], [b]) => a.localeCompare(b))) h.update(`${id}@${r.updatedAt.getTime()};`);
  return `${SOLVER_VERSION}:${h.digest("hex").slice(0, 24)}`;
}

/** Evaluates a revision for a viewer, from the cache when it holds this key. */
export async function solveRevision({ build, revision, viewer }: { build: LoadedBuild; revision: RevisionRow; viewer: BuildViewer }): Promise<RevisionSolve> {
  const records = await loadDesignParts({ design: revision.design, viewer });
  const key = cacheKey(records);
  const hit = await getCachedResult({ revisionId: revision.id, solverVersion: key });
  const base = { buildId: build.id, revision: revision.number, solverVersion: SOLVER_VERSION };
  if (hit) return { ...base, cached: true, evaluation: hit as BuildEvaluation };
  const evaluation = evaluateRevision({ design: revision.design, records });
  await putCachedResult({ revisionId: revision.id, solverVersion: key, result: evaluation });
  return { ...base, cached: false, evaluation };
}

/** Resolves the design against the part records and runs the evaluation (pure from here on). */
export function evaluateRevision({ design: stored, records }: { design: unknown; records: Map<string, PartRecord> }): BuildEvaluation {
  const design = buildDesignSchema.parse(stored);
  const parts = new Map<string, Part>();
  for (const [id, record] of records) {
    const parsed = partSchema.safeParse(toPartInput(record));
    if (parsed.success) parts.set(id, parsed.data);
  }
  const resolved = resolveBuild(design, (id) => parts.get(id));
  const evaluation = evaluateBuild(resolved.build);
  return { ...evaluation, problems: [...resolved.problems, ...evaluation.problems] };
}
