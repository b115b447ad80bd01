import "server-only";
import { after } from "next/server";
import type { RevisionRow } from "@/db/queries/builds";
import type { PartRecord } from "@/db/queries/parts";
import { getCachedResult, getSolveReads, putCachedResult, type SolveReads } from "@/db/queries/solve-cache";
import { getSnapshot, putSnapshotOnce, putSolverChange, type SolverChange } from "@/db/queries/snapshots";
import { figureChanges } from "@/lib/builds/solver-change";
import { partSchema, type Part } from "@/lib/parts";
import { buildDesignSchema, type BuildEvaluation, EVALUATION_VERSION, evaluateBuild, forCharts, resolveBuild } from "@/lib/retrofit";
import { isTrace, type Trace, type TraceRef } from "@/lib/thermal";
import { toPartInput } from "@/server/parts/api";
import { loadDesignParts, type LoadedBuild } from "./load";

/**
 * Bump when the engine or the compiler changes what a result contains or how it is worked
 * out: cached results of another version are recomputed.
 */
export const SOLVER_VERSION = `e${EVALUATION_VERSION}.9`;

/** Warm-up curves as the charts draw them, or every node and sample. */
export type Curves = "chart" | "full";

/**
 * Where a result's traces (the working behind each number) go. "apart": each trace is a
 * TraceRef and the list of traces is read on its own ("only"), when a reader opens the working;
 * "inline": in place.
 */
export type Traces = "apart" | "inline" | "only";

/** What a solve answers with. */
export type SolveShape = { curves: Curves; traces: Traces };

/** What pages on the server read: every sample, every trace in place. */
const WHOLE: SolveShape = { curves: "full", traces: "inline" };

/**
 * The shapes every fresh evaluation is kept in, whichever was asked: what the Budget asks for
 * (the figures, then the traces when a working is opened) and what the server's pages read.
 */
const KEPT: readonly SolveShape[] = [{ curves: "chart", traces: "apart" }, { curves: "chart", traces: "only" }, WHOLE];

/** How the cache key of a list of traces ends (a result that holds no evaluation). */
const TRACES_KEY_END = ":traces";

/** The cache key of a result of this shape ("<version>[:chart][:apart]", or "<version>:traces"). */
function solveCacheKey({ curves, traces }: SolveShape): string {
  if (traces === "only") return `${SOLVER_VERSION}${TRACES_KEY_END}`;
  return `${SOLVER_VERSION}${curves === "chart" ? ":chart" : ""}${traces === "apart" ? ":apart" : ""}`;
}

/** The keys of a solve's reads (SolveReads) for this shape: its cache key, and the solver version a change is kept under. */
export function solveReadKeys(shape: SolveShape): { cacheKey: string; solverVersion: string } {
  return { cacheKey: solveCacheKey(shape), solverVersion: SOLVER_VERSION };
}

/**
 * A build the caller may see and one of its revisions; who is asking does not change the answer.
 * `reads`: the revision's solve reads under `solveReadKeys(shape)`, when the caller read them
 * with the build (else they are read here).
 */
type SolveArgs = { build: LoadedBuild; revision: RevisionRow; shape: SolveShape; reads?: SolveReads };

type SolveHead = {
  buildId: string;
  revision: number;
  solverVersion: string;
  /** Set when an older solver gave this revision other figures: its version and what moved. */
  solverChange: SolverChange | null;
  cached: boolean;
};

export type RevisionSolve = SolveHead & { evaluation: BuildEvaluation };

/** The answer to a solve that asks for the traces only: the list a result sent with its traces "apart" refers to. */
export type RevisionTraces = SolveHead & { traces: Trace[] };

/**
 * The parts a revision used, as its snapshot keeps them: editing a part in the bin never
 * moves a saved revision. A revision saved before snapshots were kept gets one now, from the
 * parts as its owner sees them (the same records its figures were worked out from until now).
 */
export async function revisionPartRecords({ build, revision }: Pick<SolveArgs, "build" | "revision">): Promise<Map<string, PartRecord>> {
  return (await getSnapshot({ revisionId: revision.id })) ?? snapshotNow({ build, revision });
}

/** A snapshot for a revision saved before snapshots were kept, from the parts as its owner sees them now. */
async function snapshotNow({ build, revision }: Pick<SolveArgs, "build" | "revision">): Promise<Map<string, PartRecord>> {
  const records = await loadDesignParts({ design: revision.design, viewer: { id: build.ownerId, role: "maker" } });
  return putSnapshotOnce({ revisionId: revision.id, records });
}

/**
 * Seven significant digits are far below what a thermal estimate can claim (0.001 K at
 * 100 °C) and halve the size of a result, most of which is warm-up curves.
 *
 * The same value as `Number(v.toPrecision(7))`, worked out without strings: m, the seven
 * digits, is an exact integer below 10⁷ and 10^k is exact for k ≤ 22, so m / 10^k is the
 * double nearest the decimal toPrecision writes — which is what parsing that decimal gives.
 * The product a·10^k is off by ~1e-9 at most, so only a digit that sits on a half (or an
 * exponent outside the table) can round differently: those take the string path.
 */
const POW10 = [1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22];

function roundNumber(v: number): number {
  if (Number.isInteger(v)) return v;
  const a = Math.abs(v);
  const k = 6 - Math.floor(Math.log10(a));
  if (k >= 0 && k <= 22) {
    const scaled = a * POW10[k]!;
    const m = Math.round(scaled);
    if (m >= 1e6 && m < 1e7 && Math.abs(scaled - Math.floor(scaled) - 0.5) > 1e-6) return (v < 0 ? -m : m) / POW10[k]!;
  }
  return Number(v.toPrecision(7));
}

/** The traces taken out of a result (as they are, not rounded), in the order their TraceRefs number them; a trace met twice is kept once. */
type TracesApart = { list: Trace[]; index: Map<object, number> };

/**
 * A rounded copy of a result for JSON.stringify: a replacer function takes the serialiser
 * off its fast path for every key, which cost more than the copy does. The copy (not the
 * result itself) is rounded because a miss also hands the unrounded evaluation back. With
 * `apart`, each trace is replaced by a TraceRef and goes to the list as it is (rounded when the
 * list is sent: not on the way of the figures).
 */
function roundedForDisplay(value: unknown, apart?: TracesApart): unknown {
  if (typeof value === "number") return roundNumber(value);
  if (value === null || typeof value !== "object") return value;
  const withJson = value as { toJSON?: unknown };
  if (typeof withJson.toJSON === "function") return roundedForDisplay((withJson.toJSON as () => unknown).call(value), apart);
  if (Array.isArray(value)) {
    const out = new Array<unknown>(value.length);
    for (let i = 0; i < value.length; i++) {
      const x: unknown = value[i];
      out[i] = typeof x === "number" ? roundNumber(x) : roundedForDisplay(x, apart);
    }
    return out;
  }
  if (apart && isTrace(value)) {
    let traceRef = apart.index.get(value);
    if (traceRef === undefined) {
      traceRef = apart.list.push(value) - 1;
      apart.index.set(value, traceRef);
    }
    return { traceRef } satisfies TraceRef;
  }
  const src = value as Record<string, unknown>;
  const out: Record<string, unknown> = {};
  for (const k of Object.keys(src)) {
    const x = src[k];
    out[k] = typeof x === "number" ? roundNumber(x) : roundedForDisplay(x, apart);
  }
  return out;
}

/**
 * A result in each shape as JSON text, made when asked for: the figures and the traces they
 * refer to come from one walk.
 */
function shapesOf(full: BuildEvaluation): (shape: SolveShape) => string {
  const curvesOf = (curves: Curves) => (curves === "chart" ? forCharts(full) : full);
  const splits = new Map<Curves, { lean: unknown; traces: Trace[] }>();
  const split = (curves: Curves): { lean: unknown; traces: Trace[] } => {
    let made = splits.get(curves);
    if (!made) {
      const taken: TracesApart = { list: [], index: new Map() };
      made = { lean: roundedForDisplay(curvesOf(curves), taken), traces: taken.list };
      splits.set(curves, made);
    }
    return made;
  };
  return ({ curves, traces }) => JSON.stringify(traces === "inline" ? roundedForDisplay(curvesOf(curves)) : traces === "only" ? roundedForDisplay(split(curves).traces) : split(curves).lean);
}

/**
 * Work for after the answer has left (Next's `after`): its CPU time and database writes cost
 * the caller nothing. Outside a request (a script) it runs on the next turn instead.
 */
function afterAnswer(work: () => Promise<void>): void {
  const run = () =>
    work().catch((e: unknown) => {
      console.error("[solve] after the answer:", e instanceof Error ? e.message : e);
    });
  try {
    after(run);
  } catch {
    setImmediate(run);
  }
}

/** The solver version a cache key was written by (see `solveCacheKey`; before snapshots, "<version>:<parts fingerprint>"). */
const versionOfKey = (key: string): string => key.split(":")[0] ?? key;

/** A cached result that holds an evaluation (every key but a list of traces). */
const holdsEvaluation = (key: string): boolean => !key.endsWith(TRACES_KEY_END);

/**
 * Evaluates a revision (the caller has checked that the viewer may see it), from the cache when
 * it holds this key. A cached answer is read as its JSON bytes: a hit goes to the client without
 * being decoded, parsed or re-serialised. Everything a request needs before it can evaluate
 * (the cache's keys and a hit, the parts snapshot, a recorded solver change) is read in one
 * round trip, the route's together with the build itself.
 */
async function solveToJson({ build, revision, shape, reads }: SolveArgs): Promise<{ head: SolveHead; json: string | Buffer; evaluation?: BuildEvaluation; evaluateMs?: number; serializeMs?: number }> {
  const base = { buildId: build.id, revision: revision.number, solverVersion: SOLVER_VERSION };
  const found = reads ?? (await getSolveReads({ revisionId: revision.id, ...solveReadKeys(shape) }));
  if (found.hit !== undefined) {
    return { head: { ...base, solverChange: found.change, cached: true }, json: found.hit };
  }
  // The snapshot holds the parts as the owner saw them: whoever may see the build (a
  // reviewer, a class member, a share link) gets the owner's Budget, though the owner's
  // private part records themselves stay private (only their effect on the figures shows).
  const records = found.snapshot ?? (await snapshotNow({ build, revision }));
  // The newest result an older solver gave this revision, to say what moved (rare: once per
  // revision after the solver changes).
  const previousKey = found.keys.find((k) => versionOfKey(k) !== SOLVER_VERSION && holdsEvaluation(k));
  const previousRead = previousKey === undefined ? undefined : getCachedResult({ revisionId: revision.id, cacheKey: previousKey });
  previousRead?.catch(() => undefined);
  const t0 = performance.now();
  const full = evaluateRevision({ design: revision.design, records });
  const evaluateMs = performance.now() - t0;
  const shapes = shapesOf(full);
  const json = shapes(shape);
  const serializeMs = performance.now() - t0 - evaluateMs;
  const previous = previousKey === undefined ? undefined : await previousRead;
  const solverChange = previousKey !== undefined && previous ? solverChangeFrom({ solverVersion: versionOfKey(previousKey), text: previous.toString("utf8") }, full) : null;
  // What moved and every kept shape are written after the answer has left: a slow or failed
  // write costs the next caller a recomputation, never this caller time or an error. The change
  // goes first, so whoever reads the cached result finds it; then the shape asked for (text
  // already), then the others, one at a time, so the work is spread out rather than done in
  // one block.
  afterAnswer(async () => {
    if (solverChange) await putSolverChange({ revisionId: revision.id, solverVersion: SOLVER_VERSION, change: solverChange });
    const asked = solveCacheKey(shape);
    for (const kept of [shape, ...KEPT.filter((k) => solveCacheKey(k) !== asked)]) {
      await putCachedResult({ revisionId: revision.id, cacheKey: solveCacheKey(kept), resultJson: shapes(kept) }).catch((e: unknown) => {
        console.error("[solve] cache write failed:", e instanceof Error ? e.message : e);
      });
    }
  });
  return { head: { ...base, solverChange, cached: false }, json, evaluation: full, evaluateMs, serializeMs };
}

/** Compares a fresh result with the last one an older solver gave: what moved, or null when there was none. */
function solverChangeFrom(previous: { solverVersion: string; text: string }, evaluation: BuildEvaluation): SolverChange | null {
  let before: unknown;
  try {
    before = JSON.parse(previous.text);
  } catch {
    return null;
  }
  return { previousVersion: previous.solverVersion, changes: figureChanges(before, evaluation) };
}

/** A revision's evaluation, every sample and trace in place (for the server's pages). */
export async function solveRevision(args: Omit<SolveArgs, "shape">): Promise<RevisionSolve> {
  const r = await solveToJson({ ...args, shape: WHOLE });
  const json = typeof r.json === "string" ? r.json : r.json.toString("utf8");
  return { ...r.head, evaluation: r.evaluation ?? (JSON.parse(json) as BuildEvaluation) };
}

/**
 * The solve route's body in UTF-8, built around the cached bytes: a `RevisionSolve` (its
 * traces as TraceRefs when they go apart) or, for the traces only, a `RevisionTraces`; and how
 * long the evaluation itself and its serialisation (rounded) took when they ran (not on a
 * cache hit).
 */
export async function solveRevisionJson(args: SolveArgs): Promise<{ body: Uint8Array<ArrayBuffer>; evaluateMs?: number; serializeMs?: number }> {
  const r = await solveToJson(args);
  const head = `${JSON.stringify(r.head).slice(0, -1)},"${args.shape.traces === "only" ? "traces" : "evaluation"}":`;
  const body = typeof r.json === "string" ? Buffer.from(`${head}${r.json}}`) : Buffer.concat([Buffer.from(head), r.json, Buffer.from("}")]);
  return { body: body as Uint8Array<ArrayBuffer>, evaluateMs: r.evaluateMs, serializeMs: r.serializeMs };
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
