import "server-only";
import { createHash } from "node:crypto";
import { getCachedResultText, putCachedResult, type RevisionRow } from "@/db/queries/builds";
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
export const SOLVER_VERSION = `e${EVALUATION_VERSION}.4`;

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
 * edited or made private; either gives another key, so a stale answer is never served.
 */
function cacheKey(records: Map<string, PartRecord>): string {
  const h = createHash("sha256");
  for (const [id, r] of [...records].sort(([a], [b]) => a.localeCompare(b))) h.update(`${id}@${r.updatedAt.getTime()};`);
  return `${SOLVER_VERSION}:${h.digest("hex").slice(0, 24)}`;
}

/**
 * Seven significant digits are far below what a thermal estimate can claim (0.001 K at
 * 100 °C) and halve the size of a result, most of which is warm-up curves.
 */
function roundForDisplay(_key: string, value: unknown): unknown {
  return typeof value === "number" && !Number.isInteger(value) ? Number(value.toPrecision(7)) : value;
}

/**
 * Evaluates a revision for a viewer, from the cache when it holds this key. The answer is
 * kept as JSON text: a cache hit goes to the client without being parsed and re-serialised.
 */
async function solveToText({ build, revision }: { build: LoadedBuild; revision: RevisionRow; viewer: BuildViewer }): Promise<{ head: Omit<RevisionSolve, "evaluation">; evaluationJson: string; evaluation?: BuildEvaluation }> {
  // Parts are read as the build's owner sees them: whoever may see the build (a reviewer,
  // a class member, a share link) gets the same Budget as its owner, though the owner's
  // private part records themselves stay private (only their effect on the figures shows).
  const records = await loadDesignParts({ design: revision.design, viewer: { id: build.ownerId, role: "maker" } });
  const key = cacheKey(records);
  const base = { buildId: build.id, revision: revision.number, solverVersion: SOLVER_VERSION };
  const hit = await getCachedResultText({ revisionId: revision.id, solverVersion: key });
  if (hit !== undefined) return { head: { ...base, cached: true }, evaluationJson: hit };
  const evaluation = evaluateRevision({ design: revision.design, records });
  const evaluationJson = JSON.stringify(evaluation, roundForDisplay);
  await putCachedResult({ revisionId: revision.id, solverVersion: key, resultJson: evaluationJson });
  return { head: { ...base, cached: false }, evaluationJson, evaluation };
}

export async function solveRevision(args: { build: LoadedBuild; revision: RevisionRow; viewer: BuildViewer }): Promise<RevisionSolve> {
  const r = await solveToText(args);
  return { ...r.head, evaluation: r.evaluation ?? (JSON.parse(r.evaluationJson) as BuildEvaluation) };
}

/** The solve route's body as JSON text (`RevisionSolve`), built around the cached text. */
export async function solveRevisionJson(args: { build: LoadedBuild; revision: RevisionRow; viewer: BuildViewer }): Promise<string> {
  const r = await solveToText(args);
  return `${JSON.stringify(r.head).slice(0, -1)},"evaluation":${r.evaluationJson}}`;
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
