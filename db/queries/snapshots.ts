import "server-only";
import { eq, inArray, sql } from "drizzle-orm";
import { db, type Db, preparedOnce } from "../client";
import { parts, revisionPartSnapshots, revisionSolverChanges, users } from "../schema";
import { parseJson } from "./json";
import { type PartRecord, recordColumns, toRecord } from "./parts";

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

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

/** A revision's snapshot on its own (a solve reads it with the rest: db/queries/solve-cache.ts). */
const statements = preparedOnce(() => ({
  snapshot: db()
    .select({ partId: revisionPartSnapshots.partId, record: revisionPartSnapshots.record })
    .from(revisionPartSnapshots)
    .where(eq(revisionPartSnapshots.revisionId, sql.placeholder("revision")))
    .prepare(),
}));

/** The revision's snapshot by part id; undefined when the revision has none yet (saved before snapshots). */
export async function getSnapshot({ revisionId }: { revisionId: string }): Promise<Map<string, PartRecord> | undefined> {
  const rows = await statements().snapshot.execute({ revision: revisionId });
  if (rows.length === 0) return undefined;
  return new Map(rows.map((r) => [r.partId, fromStored(parseJson(r.record) as StoredRecord)]));
}

/**
 * A snapshot read as one JSON array of `{ partId, record }` (see db/queries/solve-cache.ts);
 * undefined when it is empty or not such an array.
 */
export function snapshotFromJson(value: unknown): Map<string, PartRecord> | undefined {
  const rows = parseJson(value);
  if (!Array.isArray(rows) || rows.length === 0) return undefined;
  const out = new Map<string, PartRecord>();
  for (const row of rows as { partId?: unknown; record?: unknown }[]) {
    if (typeof row?.partId !== "string" || row.record === null || typeof row.record !== "object") return undefined;
    out.set(row.partId, fromStored(row.record as StoredRecord));
  }
  return out;
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

export async function putSolverChange({ revisionId, solverVersion, change }: { revisionId: string; solverVersion: string; change: SolverChange }): Promise<void> {
  await db()
    .insert(revisionSolverChanges)
    .values({ revisionId, solverVersion, previousVersion: change.previousVersion, changes: change.changes, createdAt: new Date() })
    .onDuplicateKeyUpdate({ set: { previousVersion: change.previousVersion, changes: change.changes } });
}
