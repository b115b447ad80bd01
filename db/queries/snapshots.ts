import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db, type Db, preparedOnce } from "../client";
import { parts, revisionPartSnapshots, revisionSolverChanges, users } from "../schema";
import { type PartRecord, recordColumns, toRecord } from "./parts";

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

// MariaDB keeps JSON as LONGTEXT: the driver returns text.
const parseJson = (value: unknown): unknown => (typeof value === "string" ? JSON.parse(value) : value);

/** A part record as kept in a snapshot (dates as ISO text). */
type StoredRecord = Omit<PartRecord, "createdAt" | "updatedAt"> & { createdAt: string; updatedAt: string };

const toStored = (r: PartRecord): StoredRecord => ({ ...r, createdAt: r.createdAt.toISOString(), updatedAt: r.updatedAt.toISOString() });
const fromStored = (s: StoredRecord): PartRecord => ({ ...s, createdAt: new Date(s.createdAt), updatedAt: new Date(s.updatedAt) });


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
      record: toStored(toRecord(r)),
      takenAt: now,
    })),
  );
}

/** The reads every solve makes, prepared once (see preparedOnce). */
const statements = preparedOnce(() => ({
  snapshot: db()
    .select({ partId: revisionPartSnapshots.partId, record: revisionPartSnapshots.record })
    .from(revisionPartSnapshots)
    .where(eq(revisionPartSnapshots.revisionId, sql.placeholder("revision")))
    .prepare(),
  solverChange: db()
    .select({ previousVersion: revisionSolverChanges.previousVersion, changes: revisionSolverChanges.changes })
    .from(revisionSolverChanges)
    .where(and(eq(revisionSolverChanges.revisionId, sql.placeholder("revision")), eq(revisionSolverChanges.solverVersion, sql.placeholder("version"))))
    .limit(1)
    .prepare(),
}));

/** The revision's snapshot by part id; undefined when the revision has none yet (saved before snapshots). */
export async function getSnapshot({ revisionId }: { revisionId: string }): Promise<Map<string, PartRecord> | undefined> {
  const rows = await statements().snapshot.execute({ revision: revisionId });
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

export interface SolverChange {
  previousVersion: string;
  changes: string[];
}

export async function getSolverChange({ revisionId, solverVersion }: { revisionId: string; solverVersion: string }): Promise<SolverChange | null> {
  const rows = await statements().solverChange.execute({ revision: revisionId, version: solverVersion });
  const row = rows[0];
  return row ? { previousVersion: row.previousVersion, changes: parseJson(row.changes) as string[] } : null;
}

export async function putSolverChange({ revisionId, solverVersion, change }: { revisionId: string; solverVersion: string; change: SolverChange }): Promise<void> {
  await db()
    .insert(revisionSolverChanges)
    .values({ revisionId, solverVersion, previousVersion: change.previousVersion, changes: change.changes, createdAt: new Date() })
    .onDuplicateKeyUpdate({ set: { previousVersion: change.previousVersion, changes: change.changes } });
}
