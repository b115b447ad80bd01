import "server-only";
import { and, desc, eq, inArray, ne, sql } from "drizzle-orm";
import { db, type Db } from "../client";
import { parts, revisionPartSnapshots, solveCache, revisionSolverChanges, users } from "../schema";
import type { PartRecord } from "./parts";

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

// MariaDB keeps JSON as LONGTEXT: the driver returns text.
const parseJson = (value: unknown): unknown => (typeof value === "string" ? JSON.parse(value) : value);

/** A part record as kept in a snapshot (dates as ISO text). */
type StoredRecord = Omit<PartRecord, "createdAt" | "updatedAt"> & { createdAt: string; updatedAt: string };

const toStored = (r: PartRecord): StoredRecord => ({ ...r, createdAt: r.createdAt.toISOString(), updatedAt: r.updatedAt.toISOString() });
const fromStored = (s: StoredRecord): PartRecord => ({ ...s, createdAt: new Date(s.createdAt), updatedAt: new Date(s.updatedAt) });

const recordColumns = {
  id: parts.id,
  ownerId: parts.ownerId,
  ownerName: users.displayName,
  kind: parts.kind,
  name: parts.name,
  provenance: parts.provenance,
  provenanceNote: parts.provenanceNote,
  visibility: parts.visibility,
  costEur: parts.costEur,
  verified: parts.verified,
  specs: parts.specs,
  curves: parts.curves,
  createdAt: parts.createdAt,
  updatedAt: parts.updatedAt,
};

/**
 * Copies the parts a new revision uses into its snapshot, inside the transaction that saves
 * the revision (the route has checked the author may use them).
 */
export async function snapshotPartsInTx(tx: Tx, revisionId: string, partIds: readonly string[], now: Date): Promise<void> {
  if (partIds.length === 0) return;
  const rows = await tx.select(recordColumns).from(parts).innerJoin(users, eq(users.id, parts.ownerId)).where(inArray(parts.id, [...partIds]));
  if (rows.length === 0) return;
  await tx.insert(revisionPartSnapshots).values(
    rows.map((r) => ({
      revisionId,
      partId: r.id,
      record: toStored({ ...r, verified: Boolean(r.verified), specs: parseJson(r.specs) as Record<string, unknown>, curves: parseJson(r.curves) as Record<string, unknown> }),
      takenAt: now,
    })),
  );
}

/** The revision's snapshot by part id; undefined when the revision has none yet (saved before snapshots). */
export async function getSnapshot({ revisionId }: { revisionId: string }): Promise<Map<string, PartRecord> | undefined> {
  const rows = await db().select({ partId: revisionPartSnapshots.partId, record: revisionPartSnapshots.record }).from(revisionPartSnapshots).where(eq(revisionPartSnapshots.revisionId, revisionId));
  if (rows.length === 0) return undefined;
  return new Map(rows.map((r) => [r.partId, fromStored(parseJson(r.record) as StoredRecord)]));
}

/**
 * Takes a snapshot for a revision saved before snapshots existed, from the records given
 * (as its owner sees them now). A snapshot already there is kept: the first one wins.
 */
export async function putSnapshotOnce({ revisionId, records }: { revisionId: string; records: Map<string, PartRecord> }): Promise<Map<string, PartRecord>> {
  const now = new Date();
  if (records.size > 0) {
    await db()
      .insert(revisionPartSnapshots)
      .values([...records.values()].map((r) => ({ revisionId, partId: r.id, record: toStored(r), takenAt: now })))
      .onDuplicateKeyUpdate({ set: { revisionId: sql`${revisionPartSnapshots.revisionId}` } });
  }
  return (await getSnapshot({ revisionId })) ?? records;
}

/**
 * The newest cached result of this revision worked out by another solver version, as text
 * (cache keys are "<version>" or, before snapshots, "<version>:<parts fingerprint>").
 */
export async function getPreviousResultText({ revisionId, solverVersion }: { revisionId: string; solverVersion: string }): Promise<{ solverVersion: string; text: string } | undefined> {
  const keys = await db()
    .select({ key: solveCache.cacheKey })
    .from(solveCache)
    .where(and(eq(solveCache.revisionId, revisionId), ne(solveCache.cacheKey, solverVersion)))
    .orderBy(desc(solveCache.createdAt))
    .limit(20);
  const key = keys.map((k) => k.key).find((k) => (k.split(":")[0] ?? k) !== solverVersion);
  if (key === undefined) return undefined;
  const rows = await db()
    .select({ result: sql<string>`${solveCache.result}` })
    .from(solveCache)
    .where(and(eq(solveCache.revisionId, revisionId), eq(solveCache.cacheKey, key)))
    .limit(1);
  const row = rows[0];
  if (!row) return undefined;
  // The driver may hand a JSON column back parsed (MariaDB reports its type) or as text.
  const value: unknown = row.result;
  return { solverVersion: key.split(":")[0] ?? key, text: typeof value === "string" ? value : JSON.stringify(value) };
}

export interface SolverChange {
  previousVersion: string;
  changes: string[];
}

export async function getSolverChange({ revisionId, solverVersion }: { revisionId: string; solverVersion: string }): Promise<SolverChange | null> {
  const rows = await db()
    .select({ previousVersion: revisionSolverChanges.previousVersion, changes: revisionSolverChanges.changes })
    .from(revisionSolverChanges)
    .where(and(eq(revisionSolverChanges.revisionId, revisionId), eq(revisionSolverChanges.solverVersion, solverVersion)))
    .limit(1);
  const row = rows[0];
  return row ? { previousVersion: row.previousVersion, changes: parseJson(row.changes) as string[] } : null;
}

export async function putSolverChange({ revisionId, solverVersion, change }: { revisionId: string; solverVersion: string; change: SolverChange }): Promise<void> {
  await db()
    .insert(revisionSolverChanges)
    .values({ revisionId, solverVersion, previousVersion: change.previousVersion, changes: change.changes, createdAt: new Date() })
    .onDuplicateKeyUpdate({ set: { previousVersion: change.previousVersion, changes: change.changes } });
}
