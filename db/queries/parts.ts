import "server-only";
import { and, asc, count, desc, eq, inArray, like, or, type SQL, sql } from "drizzle-orm";
import type { PartKind, PartListQuery, PartViewer, Provenance, Visibility } from "@/lib/parts";
import type { Part } from "@/lib/parts";
import { db } from "../client";
import { parts, users } from "../schema";
import { buildsUsingPart } from "./builds";
import { newId } from "./users";

/** A stored part as the API returns it: common columns, owner, specs and curves (storage units). */
export interface PartRecord {
  id: string;
  ownerId: string;
  ownerName: string;
  kind: PartKind;
  name: string;
  provenance: Provenance;
  provenanceNote: string | null;
  visibility: Visibility;
  costEur: number | null;
  verified: boolean;
  specs: Record<string, unknown>;
  curves: Record<string, unknown>;
  createdAt: Date;
  updatedAt: Date;
}

export type PartSummary = Omit<PartRecord, "curves">;

const summaryColumns = {
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
  createdAt: parts.createdAt,
  updatedAt: parts.updatedAt,
};

/** Every column of a part record, with its owner's name. */
export const recordColumns = { ...summaryColumns, curves: parts.curves };

// MariaDB keeps JSON as LONGTEXT, so the driver hands back text; MySQL hands back objects.
export function jsonObject(value: unknown): Record<string, unknown> {
  const parsed: unknown = typeof value === "string" ? JSON.parse(value) : value;
  return parsed && typeof parsed === "object" && !Array.isArray(parsed) ? (parsed as Record<string, unknown>) : {};
}

function toSummary(row: Omit<PartSummary, "specs"> & { specs: unknown }): PartSummary {
  return { ...row, verified: Boolean(row.verified), specs: jsonObject(row.specs) };
}

/** A part record from a row selected with recordColumns. */
export function toRecord(row: Omit<PartSummary, "specs"> & { specs: unknown; curves: unknown }): PartRecord {
  return { ...toSummary(row), curves: jsonObject(row.curves) };
}

/** The visibility rule in SQL (see lib/parts/access.ts): admins see every part. */
function visibleTo(viewer: PartViewer): SQL | undefined {
  if (viewer === null) return eq(parts.visibility, "public");
  if (viewer.role === "admin") return undefined;
  return or(eq(parts.ownerId, viewer.id), inArray(parts.visibility, ["shared", "public"]));
}

type ListFilter = Pick<PartListQuery, "kind" | "provenance" | "visibility" | "owner" | "verified" | "q">;

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

function filterWhere(viewer: PartViewer, filter: ListFilter): SQL | undefined {
  const conditions: (SQL | undefined)[] = [visibleTo(viewer)];
  if (filter.kind) conditions.push(eq(parts.kind, filter.kind));
  if (filter.provenance) conditions.push(eq(parts.provenance, filter.provenance));
  if (filter.visibility) conditions.push(eq(parts.visibility, filter.visibility));
  if (filter.verified !== undefined) conditions.push(eq(parts.verified, filter.verified));
  // "mine" without a session matches nothing rather than everything.
  if (filter.owner === "mine") conditions.push(viewer ? eq(parts.ownerId, viewer.id) : sql`false`);
  if (filter.q) {
    const pattern = `%${escapeLike(filter.q)}%`;
    conditions.push(or(like(parts.name, pattern), like(parts.provenanceNote, pattern)));
  }
  return and(...conditions);
}

const SAFE_KEY = /^[A-Za-z][A-Za-z0-9]*$/;

/** ORDER BY for a sort key; spec keys were checked against the kind's main figures by the schema. */
function orderBy(sort: PartListQuery["sort"], dir: PartListQuery["dir"]): SQL[] {
  const by = dir === "desc" ? desc : asc;
  const column = (() => {
    switch (sort) {
      case "name":
        return by(parts.name);
      case "kind":
        return by(parts.kind);
      case "provenance":
        return by(parts.provenance);
      case "owner":
        return by(users.displayName);
      case "updated":
        return by(parts.updatedAt);
      case "cost":
        return by(parts.costEur);
      default: {
        const key = sort.slice("spec:".length);
        if (!SAFE_KEY.test(key)) return by(parts.name);
        const path = `$.${key}`;
        // Numbers sort as numbers (JSON_VALUE returns text; +0 converts), choices as text,
        // a driver's modes by how many there are.
        const value =
          key === "modes"
            ? sql`JSON_LENGTH(${parts.specs}, ${path})`
            : sql`CASE WHEN JSON_TYPE(JSON_EXTRACT(${parts.specs}, ${path})) IN ('INTEGER','DOUBLE','DECIMAL') THEN JSON_VALUE(${parts.specs}, ${path}) + 0 END`;
        const text = sql`JSON_VALUE(${parts.specs}, ${path})`;
        return dir === "desc" ? sql`${value} DESC, ${text} DESC` : sql`${value} ASC, ${text} ASC`;
      }
    }
  })();
  // The id makes the order total, so a page boundary never repeats or skips a row.
  return [column, asc(parts.id)];
}

export interface PartPage {
  items: PartSummary[];
  total: number;
  page: number;
  pageSize: number;
}

/** One page of the Parts bin: filter, search, sort and paginate in SQL. */
export async function listParts({ viewer, query }: { viewer: PartViewer; query: PartListQuery }): Promise<PartPage> {
  const where = filterWhere(viewer, query);
  const [rows, totals] = await Promise.all([
    db()
      .select(summaryColumns)
      .from(parts)
      .innerJoin(users, eq(users.id, parts.ownerId))
      .where(where)
      .orderBy(...orderBy(query.sort, query.dir))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db().select({ n: count() }).from(parts).where(where),
  ]);
  return { items: rows.map(toSummary), total: Number(totals[0]?.n ?? 0), page: query.page, pageSize: query.pageSize };
}

/** Every part the filter shows (for CSV export), in the table's order, capped at `limit`. */
export async function listPartsForExport({ viewer, query, limit }: { viewer: PartViewer; query: PartListQuery; limit: number }): Promise<PartSummary[]> {
  const rows = await db()
    .select(summaryColumns)
    .from(parts)
    .innerJoin(users, eq(users.id, parts.ownerId))
    .where(filterWhere(viewer, query))
    .orderBy(...orderBy(query.sort, query.dir))
    .limit(limit);
  return rows.map(toSummary);
}

/** One part when the viewer may see it; undefined otherwise (callers answer 404 either way). */
export async function getPart({ id, viewer }: { id: string; viewer: PartViewer }): Promise<PartRecord | undefined> {
  return (await getParts({ ids: [id], viewer }))[0];
}

/** The parts among `ids` the viewer may see (one query; a build names up to a dozen). */
export async function getParts({ ids, viewer }: { ids: readonly string[]; viewer: PartViewer }): Promise<PartRecord[]> {
  if (ids.length === 0) return [];
  const rows = await db()
    .select(recordColumns)
    .from(parts)
    .innerJoin(users, eq(users.id, parts.ownerId))
    .where(and(inArray(parts.id, [...ids]), visibleTo(viewer)))
    .limit(ids.length);
  return rows.map(toRecord);
}

/** The columns of a validated part (also used by a bench run keeping its fit as a part). */
export function partColumns(part: Part) {
  return {
    kind: part.kind,
    name: part.name,
    provenance: part.provenance,
    provenanceNote: part.provenanceNote ?? null,
    visibility: part.visibility ?? "private",
    costEur: part.costEur ?? null,
    specs: part.specs,
    curves: part.curves,
  };
}

/** Inserts validated parts for one owner in one transaction; returns their ids in order. */
export async function createParts({ ownerId, parts: input }: { ownerId: string; parts: readonly Part[] }): Promise<string[]> {
  const now = new Date();
  const rows = input.map((part) => ({ id: newId(), ownerId, verified: false, createdAt: now, updatedAt: now, ...partColumns(part) }));
  if (rows.length === 0) return [];
  await db().transaction(async (tx) => {
    // Batches keep one statement well under max_allowed_packet for a 2,000-row import.
    for (let i = 0; i < rows.length; i += 200) await tx.insert(parts).values(rows.slice(i, i + 200));
  });
  return rows.map((r) => r.id);
}

export async function createPart({ ownerId, part }: { ownerId: string; part: Part }): Promise<string> {
  const [id] = await createParts({ ownerId, parts: [part] });
  if (!id) throw new Error("createPart: nothing inserted");
  return id;
}

/** Replaces the editable fields of a part (already validated and merged by the caller). */
export async function updatePart({ id, part }: { id: string; part: Part }): Promise<void> {
  await db()
    .update(parts)
    .set({ ...partColumns(part), updatedAt: new Date() })
    .where(eq(parts.id, id));
}

export async function setPartVerified({ id, verified }: { id: string; verified: boolean }): Promise<void> {
  await db().update(parts).set({ verified, updatedAt: new Date() }).where(eq(parts.id, id));
}

export async function deletePart({ id }: { id: string }): Promise<void> {
  await db().delete(parts).where(eq(parts.id, id));
}

/** A build that uses a part; deleting the part is refused while any exist. */
export interface PartUsage {
  buildId: string;
  buildName: string;
}

/** The builds whose revisions use a part (any revision: revisions are immutable). */
export async function partUsage({ partId }: { partId: string }): Promise<PartUsage[]> {
  return buildsUsingPart({ partId });
}
