import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "../client";
import { comparisons } from "../schema";
import { newId } from "./users";

export type ComparisonItem = { buildId: string; revision?: number };

export interface ComparisonRow {
  id: string;
  ownerId: string;
  title: string;
  items: ComparisonItem[];
  createdAt: Date;
}

// MariaDB keeps JSON as LONGTEXT: the driver returns text. Items were validated before the write.
function parseItems(value: unknown): ComparisonItem[] {
  const v: unknown = typeof value === "string" ? JSON.parse(value) : value;
  return Array.isArray(v) ? (v as ComparisonItem[]) : [];
}

export async function createComparison(input: { ownerId: string; title: string; items: readonly ComparisonItem[] }): Promise<{ id: string }> {
  const id = newId();
  await db().insert(comparisons).values({ id, ownerId: input.ownerId, title: input.title, items: input.items, createdAt: new Date() });
  return { id };
}

export async function getComparison({ id }: { id: string }): Promise<ComparisonRow | undefined> {
  const rows = await db().select().from(comparisons).where(eq(comparisons.id, id)).limit(1);
  const row = rows[0];
  return row ? { ...row, items: parseItems(row.items) } : undefined;
}

export async function listComparisons({ ownerId }: { ownerId: string }): Promise<Omit<ComparisonRow, "items">[]> {
  return db()
    .select({ id: comparisons.id, ownerId: comparisons.ownerId, title: comparisons.title, createdAt: comparisons.createdAt })
    .from(comparisons)
    .where(eq(comparisons.ownerId, ownerId))
    .orderBy(desc(comparisons.createdAt))
    .limit(100);
}
