import "server-only";
import { sql, type SQLWrapper } from "drizzle-orm";
import { pool, preparedOnce, db } from "../client";
import { revisionPartSnapshots, revisionSolverChanges, solveCache } from "../schema";
import { parseJson } from "./json";
import type { PartRecord } from "./parts";
import { getSnapshot, snapshotFromJson, type SolverChange } from "./snapshots";

/**
 * Everything a solve needs from the database before it can evaluate a revision: the cached
 * result under the key asked for (its JSON as bytes, sent on as they are: never decoded,
 * parsed or serialised again), every key the cache holds for the revision (newest first), the
 * parts snapshot and what moved when this solver version first gave other figures.
 */
export type SolveReads = {
  hit: Buffer | undefined;
  keys: string[];
  /** Undefined for a revision saved before snapshots were kept. */
  snapshot: Map<string, PartRecord> | undefined;
  change: SolverChange | null;
};

/**
 * The reads of `SolveReads` as scalar subqueries on a revision id (a column of the outer query
 * or a placeholder), with the cache key and solver version as placeholders `cacheKey` and
 * `solverVersion`: one round trip for all of them, alone or beside the build's own read.
 */
export function solveReadColumns(revisionId: SQLWrapper) {
  const key = sql.placeholder("cacheKey");
  const version = sql.placeholder("solverVersion");
  const change = sql`from ${revisionSolverChanges} where ${revisionSolverChanges.revisionId} = ${revisionId} and ${revisionSolverChanges.solverVersion} = ${version}`;
  const snapshot = sql`from ${revisionPartSnapshots} where ${revisionPartSnapshots.revisionId} = ${revisionId}`;
  return {
    // As bytes: the driver would decode text, and parse what MariaDB marks as JSON.
    hit: sql<Buffer | null>`(select cast(${solveCache.result} as binary) from ${solveCache} where ${solveCache.revisionId} = ${revisionId} and ${solveCache.cacheKey} = ${key})`,
    keys: sql<string | null>`(select group_concat(${solveCache.cacheKey} order by ${solveCache.createdAt} desc separator ' ' limit 50) from ${solveCache} where ${solveCache.revisionId} = ${revisionId})`,
    snapshot: sql<unknown>`(select json_arrayagg(json_object('partId', ${revisionPartSnapshots.partId}, 'record', json_compact(${revisionPartSnapshots.record}))) ${snapshot})`,
    snapshotCount: sql<number>`(select count(*) ${snapshot})`,
    changePrevious: sql<string | null>`(select ${revisionSolverChanges.previousVersion} ${change})`,
    changeList: sql<unknown>`(select ${revisionSolverChanges.changes} ${change})`,
  };
}

type SolveReadRow = { [K in keyof ReturnType<typeof solveReadColumns>]: ReturnType<typeof solveReadColumns>[K]["_"]["type"] };

/**
 * The reads from their row. A snapshot that did not come whole (an aggregate cut short by the
 * server's length limit) is read again on its own.
 */
export async function toSolveReads(row: SolveReadRow, revisionId: string): Promise<SolveReads> {
  let snapshot: Map<string, PartRecord> | undefined;
  try {
    snapshot = snapshotFromJson(row.snapshot);
  } catch {
    snapshot = undefined;
  }
  const count = Number(row.snapshotCount);
  if (count > 0 && snapshot?.size !== count) snapshot = await getSnapshot({ revisionId });
  return {
    hit: row.hit ?? undefined,
    keys: row.keys ? row.keys.split(" ") : [],
    snapshot,
    change: row.changePrevious === null ? null : { previousVersion: row.changePrevious, changes: (parseJson(row.changeList) as string[]) ?? [] },
  };
}

const statements = preparedOnce(() => {
  const columns = solveReadColumns(sql.placeholder("revision"));
  const one = sql`(select 1) as one`;
  return {
    reads: db().select(columns).from(one).prepare(),
    hit: db().select({ hit: columns.hit }).from(one).prepare(),
  };
});

/** The reads of a solve for a revision whose build was read already. */
export async function getSolveReads({ revisionId, cacheKey, solverVersion }: { revisionId: string; cacheKey: string; solverVersion: string }): Promise<SolveReads> {
  const rows = await statements().reads.execute({ revision: revisionId, cacheKey, solverVersion });
  return toSolveReads(rows[0]!, revisionId);
}

/** One cached result as its JSON bytes, or undefined. */
export async function getCachedResult({ revisionId, cacheKey }: { revisionId: string; cacheKey: string }): Promise<Buffer | undefined> {
  const rows = await statements().hit.execute({ revision: revisionId, cacheKey });
  return rows[0]?.hit ?? undefined;
}

/**
 * Keeps a result (its JSON text) under a key. The text, a few hundred kB, goes as a parameter of
 * a server-side prepared statement: it is neither escaped into the SQL nor parsed out of it
 * again, which costs the server and MariaDB several milliseconds of CPU each on the text path.
 */
export async function putCachedResult({ revisionId, cacheKey, resultJson }: { revisionId: string; cacheKey: string; resultJson: string }): Promise<void> {
  await pool().execute(
    "INSERT INTO solve_cache (revision_id, cache_key, result, created_at) VALUES (?, ?, ?, ?) ON DUPLICATE KEY UPDATE result = VALUES(result), created_at = VALUES(created_at)",
    [revisionId, cacheKey, resultJson, new Date()],
  );
}
