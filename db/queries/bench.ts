import "server-only";
import { and, desc, eq, or } from "drizzle-orm";
import type { Part } from "@/lib/parts";
import { db } from "../client";
import { benchRuns, parts, users } from "../schema";
import { partColumns } from "./parts";
import { newId } from "./users";

export interface BenchRunRow {
  id: string;
  ownerId: string;
  ownerName: string;
  title: string;
  visibility: "private" | "shared";
  poweredPartId: string | null;
  poweredBuildId: string | null;
  poweredRevision: number | null;
  run: unknown;
  fit: unknown;
  fittedPartId: string | null;
  createdAt: Date;
}

// MariaDB keeps JSON as LONGTEXT: the driver returns text. Values were validated before the write.
const parsed = (value: unknown): unknown => (typeof value === "string" ? JSON.parse(value) : value);

const columns = {
  id: benchRuns.id,
  ownerId: benchRuns.ownerId,
  ownerName: users.displayName,
  title: benchRuns.title,
  visibility: benchRuns.visibility,
  poweredPartId: benchRuns.poweredPartId,
  poweredBuildId: benchRuns.poweredBuildId,
  poweredRevision: benchRuns.poweredRevision,
  run: benchRuns.run,
  fit: benchRuns.fit,
  fittedPartId: benchRuns.fittedPartId,
  createdAt: benchRuns.createdAt,
};

export async function createBenchRun(input: {
  ownerId: string;
  title: string;
  visibility: "private" | "shared";
  poweredPartId?: string;
  poweredBuildId?: string;
  poweredRevision?: number;
  run: unknown;
  fit: unknown;
}): Promise<{ id: string }> {
  const id = newId();
  await db()
    .insert(benchRuns)
    .values({
      id,
      ownerId: input.ownerId,
      title: input.title,
      visibility: input.visibility,
      poweredPartId: input.poweredPartId ?? null,
      poweredBuildId: input.poweredBuildId ?? null,
      poweredRevision: input.poweredRevision ?? null,
      run: input.run,
      fit: input.fit ?? null,
      createdAt: new Date(),
    });
  return { id };
}

/** One run by id, with no access rule: callers go through server/bench/load.ts. */
export async function getBenchRun({ id }: { id: string }): Promise<BenchRunRow | undefined> {
  const rows = await db().select(columns).from(benchRuns).innerJoin(users, eq(users.id, benchRuns.ownerId)).where(eq(benchRuns.id, id)).limit(1);
  const row = rows[0];
  return row ? { ...row, run: parsed(row.run), fit: parsed(row.fit) } : undefined;
}

/** The viewer's own runs and the runs others shared, newest first (the same rule as lib/bench/access.ts). */
export async function listBenchRuns({ viewerId }: { viewerId: string }): Promise<BenchRunRow[]> {
  const rows = await db()
    .select(columns)
    .from(benchRuns)
    .innerJoin(users, eq(users.id, benchRuns.ownerId))
    .where(or(eq(benchRuns.ownerId, viewerId), eq(benchRuns.visibility, "shared")))
    .orderBy(desc(benchRuns.createdAt))
    .limit(200);
  return rows.map((row) => ({ ...row, run: parsed(row.run), fit: parsed(row.fit) }));
}

/** The runs a part was fitted from (its evidence), newest first; the caller filters by access. */
export async function runsForFittedPart({ partId }: { partId: string }): Promise<BenchRunRow[]> {
  const rows = await db().select(columns).from(benchRuns).innerJoin(users, eq(users.id, benchRuns.ownerId)).where(eq(benchRuns.fittedPartId, partId)).orderBy(desc(benchRuns.createdAt)).limit(20);
  return rows.map((row) => ({ ...row, run: parsed(row.run), fit: parsed(row.fit) }));
}

/** Inserts the heatsink part kept from a run's fit and attaches the run to it as evidence, in one transaction. */
export async function keepFitAsPart({ runId, ownerId, part }: { runId: string; ownerId: string; part: Part }): Promise<string> {
  const id = newId();
  const now = new Date();
  await db().transaction(async (tx) => {
    await tx.insert(parts).values({ id, ownerId, verified: false, createdAt: now, updatedAt: now, ...partColumns(part) });
    await tx.update(benchRuns).set({ fittedPartId: id }).where(and(eq(benchRuns.id, runId), eq(benchRuns.ownerId, ownerId)));
  });
  return id;
}

/** Warm-ups recorded of a build, newest first; the caller filters by access. */
export async function runsForBuild({ buildId }: { buildId: string }): Promise<BenchRunRow[]> {
  const rows = await db().select(columns).from(benchRuns).innerJoin(users, eq(users.id, benchRuns.ownerId)).where(eq(benchRuns.poweredBuildId, buildId)).orderBy(desc(benchRuns.createdAt)).limit(20);
  return rows.map((row) => ({ ...row, run: parsed(row.run), fit: parsed(row.fit) }));
}
