import "server-only";
import { and, desc, eq, isNull, like, ne, or, sql, type SQLWrapper } from "drizzle-orm";
import { type BuildAccess, buildAccess, type BuildViewer } from "@/lib/builds/access";
import { db, pool, preparedOnce } from "../client";
import { buildInvitations, buildMembers, buildRevisions, builds, exercises, handins, reviews, revisionParts, users, userSessions, workedExamples } from "../schema";
import { snapshotPartsInTx } from "./snapshots";
import { classReaderSql, withheldExampleSql } from "./classwork";
import { parseJson } from "./json";
import { type SolveReads, solveReadColumns, toSolveReads } from "./solve-cache";
import { newId } from "./users";

export interface BuildSummary {
  id: string;
  ownerId: string;
  ownerName: string;
  title: string;
  summary: string;
  visibility: "private" | "shared";
  variantOf: string | null;
  variantNote: string | null;
  currentRevision: number;
  updatedAt: Date;
  archivedAt: Date | null;
}

export interface RevisionRow {
  id: string;
  buildId: string;
  number: number;
  design: unknown;
  note: string;
  createdBy: string;
  createdAt: Date;
}

const summaryColumns = {
  id: builds.id,
  ownerId: builds.ownerId,
  ownerName: users.displayName,
  title: builds.title,
  summary: builds.summary,
  visibility: builds.visibility,
  variantOf: builds.variantOf,
  variantNote: builds.variantNote,
  currentRevision: builds.currentRevision,
  updatedAt: builds.updatedAt,
  archivedAt: builds.archivedAt,
};

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

/**
 * The viewer's own builds and the ones shared with them (members first, then shared);
 * `q` keeps those whose title contains it. Archived builds are listed apart (`archived`:
 * the viewer's own) and left out of the shared list.
 */
export async function listBuilds({ viewer, q }: { viewer: { id: string; role: string }; q?: string }): Promise<{ mine: BuildSummary[]; shared: BuildSummary[]; archived: BuildSummary[] }> {
  const titleMatch = q ? like(builds.title, `%${escapeLike(q)}%`) : undefined;
  const own = await db()
    .select(summaryColumns)
    .from(builds)
    .innerJoin(users, eq(users.id, builds.ownerId))
    .where(and(eq(builds.ownerId, viewer.id), titleMatch))
    .orderBy(desc(builds.updatedAt))
    .limit(500);
  const mine = own.filter((b) => b.archivedAt === null);
  const archived = own.filter((b) => b.archivedAt !== null);
  const shared = await db()
    .select(summaryColumns)
    .from(builds)
    .innerJoin(users, eq(users.id, builds.ownerId))
    .leftJoin(buildMembers, and(eq(buildMembers.buildId, builds.id), eq(buildMembers.userId, viewer.id)))
    .where(and(ne(builds.ownerId, viewer.id), isNull(builds.archivedAt), titleMatch, or(eq(builds.visibility, "shared"), eq(buildMembers.userId, viewer.id))))
    .orderBy(desc(builds.updatedAt))
    .limit(500);
  return { mine, shared, archived };
}

/**
 * The columns of a build as one viewer sees it: the summary and the facts its access rule
 * needs (membership, an assigned review, a class that lets them read it, a worked example
 * that still withholds its values from them). `viewer` is the viewer's id: a placeholder, or
 * the user of the session the request names.
 */
function buildWithAccessColumns(viewer: SQLWrapper) {
  return {
    ...summaryColumns,
    memberEdit: buildMembers.canEdit,
    memberUser: buildMembers.userId,
    // Any review of this build assigned to the viewer lets them read it (never edit).
    assigned: sql<number>`exists(select 1 from ${reviews} where ${reviews.buildId} = ${builds.id} and ${reviews.reviewerId} = ${viewer})`,
    classReader: classReaderSql(builds.id, viewer),
    withheld: withheldExampleSql(builds.id, viewer),
  };
}

const revisionColumns = {
  id: buildRevisions.id,
  buildId: buildRevisions.buildId,
  number: buildRevisions.number,
  design: buildRevisions.design,
  note: buildRevisions.note,
  createdBy: buildRevisions.createdBy,
  createdAt: buildRevisions.createdAt,
};

/**
 * The build reads every build page and route starts with, as prepared statements: their SQL is
 * built once per process, not on every request. "withRevision" also reads one revision (the
 * `number` given, or the current one when it is null) in the same round trip; "toSolve" reads
 * that and the revision's solve reads, for the user of the session the request names (none when
 * it names no live one: the caller checks the session meanwhile and compares the two).
 */
const buildStatements = preparedOnce(() => {
  const viewer = sql.placeholder("viewer");
  const sessionUser = sql`${userSessions.userId}`;
  const revisionAsked = and(eq(buildRevisions.buildId, builds.id), sql`${buildRevisions.number} = coalesce(${sql.placeholder("number")}, ${builds.currentRevision})`);
  return {
    build: db()
      .select(buildWithAccessColumns(viewer))
      .from(builds)
      .innerJoin(users, eq(users.id, builds.ownerId))
      .leftJoin(buildMembers, and(eq(buildMembers.buildId, builds.id), eq(buildMembers.userId, viewer)))
      .where(eq(builds.id, sql.placeholder("id")))
      .limit(1)
      .prepare(),
    withRevision: db()
      .select({ ...buildWithAccessColumns(viewer), revision: revisionColumns })
      .from(builds)
      .innerJoin(users, eq(users.id, builds.ownerId))
      .leftJoin(buildMembers, and(eq(buildMembers.buildId, builds.id), eq(buildMembers.userId, viewer)))
      .leftJoin(buildRevisions, revisionAsked)
      .where(eq(builds.id, sql.placeholder("id")))
      .limit(1)
      .prepare(),
    toSolve: db()
      .select({ ...buildWithAccessColumns(sessionUser), viewerId: userSessions.userId, revision: revisionColumns, ...solveReadColumns(sql`${buildRevisions.id}`) })
      .from(builds)
      .innerJoin(users, eq(users.id, builds.ownerId))
      .leftJoin(userSessions, eq(userSessions.id, sql.placeholder("session")))
      .leftJoin(buildMembers, and(eq(buildMembers.buildId, builds.id), eq(buildMembers.userId, sessionUser)))
      .leftJoin(buildRevisions, revisionAsked)
      .where(eq(builds.id, sql.placeholder("id")))
      .limit(1)
      .prepare(),
  };
});

type BuildWithAccessRow = Awaited<ReturnType<ReturnType<typeof buildStatements>["build"]["execute"]>>[number];

/** The build of a row read with its access facts, when the viewer may see it. */
function visibleBuild(viewer: BuildViewer, row: BuildWithAccessRow | undefined): (BuildSummary & { access: BuildAccess }) | undefined {
  if (!row) return undefined;
  const { memberEdit, memberUser, assigned, classReader, withheld, ...build } = row;
  const access = buildAccess(viewer, {
    ownerId: build.ownerId,
    visibility: build.visibility,
    member: memberUser ? { canEdit: Boolean(memberEdit) } : null,
    assignedReviewer: Number(assigned) === 1,
    classReader: Number(classReader) === 1,
    withheld: Number(withheld) === 1,
  });
  return access.canView ? { ...build, access } : undefined;
}

/** A build with the viewer's access; undefined when it does not exist or may not be seen. */
export async function getBuild({ id, viewer }: { id: string; viewer: BuildViewer }): Promise<(BuildSummary & { access: BuildAccess }) | undefined> {
  const rows = await buildStatements().build.execute({ id, viewer: viewer?.id ?? "" });
  return visibleBuild(viewer, rows[0]);
}

/**
 * A build with the viewer's access and one of its revisions (`number`, or the current one),
 * read in one round trip; undefined when the build does not exist or may not be seen. The
 * revision is undefined when the build has no revision of that number.
 */
export async function getBuildAndRevision({ id, viewer, number }: { id: string; viewer: BuildViewer; number?: number }): Promise<{ build: BuildSummary & { access: BuildAccess }; revision: RevisionRow | undefined } | undefined> {
  const rows = await buildStatements().withRevision.execute({ id, viewer: viewer?.id ?? "", number: number ?? null });
  const row = rows[0];
  if (!row) return undefined;
  const { revision, ...rest } = row;
  const build = visibleBuild(viewer, rest);
  if (!build) return undefined;
  return { build, revision: revision ? { ...revision, design: parseJson(revision.design) } : undefined };
}

/**
 * What a solve reads before it can evaluate, in one round trip: the build with the access facts
 * of the user of session `sessionId`, one of its revisions (`number`, or the current one) and
 * that revision's solve reads (see SolveReads). `build(viewer)` gives the build only to the
 * viewer whose session that is (`viewerId`) and when they may see it: the caller compares it
 * with the session it has checked. Undefined when there is no such build.
 */
export async function getBuildToSolve({ id, sessionId, number, cacheKey, solverVersion }: { id: string; sessionId: string; number?: number; cacheKey: string; solverVersion: string }): Promise<
  | { viewerId: string | null; build: (viewer: NonNullable<BuildViewer>) => (BuildSummary & { access: BuildAccess }) | undefined; revision: RevisionRow | undefined; reads: SolveReads | undefined }
  | undefined
> {
  const rows = await buildStatements().toSolve.execute({ id, session: sessionId, number: number ?? null, cacheKey, solverVersion });
  const row = rows[0];
  if (!row) return undefined;
  const { revision, viewerId, hit, keys, snapshot, snapshotCount, changePrevious, changeList, ...rest } = row;
  return {
    viewerId,
    build: (viewer) => (viewer.id === viewerId ? visibleBuild(viewer, rest) : undefined),
    revision: revision ? { ...revision, design: parseJson(revision.design) } : undefined,
    reads: revision ? await toSolveReads({ hit, keys, snapshot, snapshotCount, changePrevious, changeList }, revision.id) : undefined,
  };
}

export async function getRevision({ buildId, number }: { buildId: string; number: number }): Promise<RevisionRow | undefined> {
  const rows = await db()
    .select()
    .from(buildRevisions)
    .where(and(eq(buildRevisions.buildId, buildId), eq(buildRevisions.number, number)))
    .limit(1);
  const row = rows[0];
  return row ? { ...row, design: parseJson(row.design) } : undefined;
}

export async function listRevisions({ buildId }: { buildId: string }): Promise<Omit<RevisionRow, "design">[]> {
  return db()
    .select({
      id: buildRevisions.id,
      buildId: buildRevisions.buildId,
      number: buildRevisions.number,
      note: buildRevisions.note,
      createdBy: buildRevisions.createdBy,
      createdAt: buildRevisions.createdAt,
    })
    .from(buildRevisions)
    .where(eq(buildRevisions.buildId, buildId))
    .orderBy(desc(buildRevisions.number));
}

type NewBuild = {
  ownerId: string;
  title: string;
  summary: string;
  visibility: "private" | "shared";
  design: unknown;
  partIds: readonly string[];
  note: string;
  variantOf?: string | null;
  variantNote?: string | null;
};

/** Creates a build with its first revision, in one transaction. */
export async function createBuild(input: NewBuild): Promise<{ id: string; revision: number }> {
  const id = newId();
  const now = new Date();
  await db().transaction(async (tx) => {
    await tx.insert(builds).values({
      id,
      ownerId: input.ownerId,
      title: input.title,
      summary: input.summary,
      visibility: input.visibility,
      variantOf: input.variantOf ?? null,
      variantNote: input.variantNote ?? null,
      currentRevision: 1,
      createdAt: now,
      updatedAt: now,
    });
    const revisionId = newId();
    await tx.insert(buildRevisions).values({ id: revisionId, buildId: id, number: 1, design: input.design, note: input.note, createdBy: input.ownerId, createdAt: now });
    if (input.partIds.length) await tx.insert(revisionParts).values(input.partIds.map((partId) => ({ revisionId, partId })));
    await snapshotPartsInTx(tx, revisionId, input.partIds, now);
  });
  return { id, revision: 1 };
}

/** Saves a new immutable revision and makes it current; the build row is locked meanwhile. */
export async function saveRevision(input: { buildId: string; userId: string; design: unknown; partIds: readonly string[]; note: string }): Promise<number> {
  return db().transaction(async (tx) => {
    const rows = await tx.select({ current: builds.currentRevision }).from(builds).where(eq(builds.id, input.buildId)).for("update");
    const next = (rows[0]?.current ?? 0) + 1;
    const revisionId = newId();
    const now = new Date();
    await tx.insert(buildRevisions).values({ id: revisionId, buildId: input.buildId, number: next, design: input.design, note: input.note, createdBy: input.userId, createdAt: now });
    if (input.partIds.length) await tx.insert(revisionParts).values(input.partIds.map((partId) => ({ revisionId, partId })));
    await snapshotPartsInTx(tx, revisionId, input.partIds, now);
    await tx.update(builds).set({ currentRevision: next, updatedAt: now }).where(eq(builds.id, input.buildId));
    return next;
  });
}

export async function updateBuildMeta({ id, title, summary, visibility }: { id: string; title?: string; summary?: string; visibility?: "private" | "shared" }): Promise<void> {
  const set = { ...(title !== undefined && { title }), ...(summary !== undefined && { summary }), ...(visibility !== undefined && { visibility }) };
  if (Object.keys(set).length === 0) return;
  await db().update(builds).set({ ...set, updatedAt: new Date() }).where(eq(builds.id, id));
}

/** Archives (or brings back) a build: it leaves the lists but keeps every revision. */
export async function setBuildArchived({ id, archived }: { id: string; archived: boolean }): Promise<void> {
  await db().update(builds).set({ archivedAt: archived ? new Date() : null }).where(eq(builds.id, id));
}

/**
 * What points at a build's revisions from outside it (reviews): such a build is archived
 * rather than destroyed, so what was checked stays.
 */
export async function buildReferences({ id }: { id: string }): Promise<{ reviews: number; classwork: number }> {
  const count = (r: { n: number }[]) => Number(r[0]?.n ?? 0);
  const n = sql<number>`count(*)`;
  const [rv, ex, st, hi] = await Promise.all([
    db().select({ n }).from(reviews).where(eq(reviews.buildId, id)),
    db().select({ n }).from(workedExamples).where(eq(workedExamples.buildId, id)),
    db().select({ n }).from(exercises).where(eq(exercises.starterBuildId, id)),
    db().select({ n }).from(handins).where(eq(handins.buildId, id)),
  ]);
  return { reviews: count(rv), classwork: count(ex) + count(st) + count(hi) };
}

/** Deletes a build; its revisions, part usage and cached results go with it (cascade). */
export async function deleteBuild({ id }: { id: string }): Promise<void> {
  await db().transaction(async (tx) => {
    await tx.update(builds).set({ variantOf: null }).where(eq(builds.variantOf, id));
    await tx.delete(builds).where(eq(builds.id, id));
  });
}

/** Builds that are variants of `id` (or siblings sharing its origin), for the variants list. */
export async function listVariants({ id, viewer }: { id: string; viewer: { id: string; role: string } }): Promise<BuildSummary[]> {
  const root = await db().select({ variantOf: builds.variantOf }).from(builds).where(eq(builds.id, id)).limit(1);
  const origin = root[0]?.variantOf ?? id;
  const rows = await db()
    .select(summaryColumns)
    .from(builds)
    .innerJoin(users, eq(users.id, builds.ownerId))
    .where(or(eq(builds.id, origin), eq(builds.variantOf, origin)))
    .orderBy(builds.createdAt);
  return rows.filter((b) => b.ownerId === viewer.id || b.visibility === "shared" || viewer.role === "admin");
}

/** Builds (by title) whose revisions use a part: such a part cannot be deleted. */
export async function buildsUsingPart({ partId }: { partId: string }): Promise<{ buildId: string; buildName: string }[]> {
  return db()
    .selectDistinct({ buildId: builds.id, buildName: builds.title })
    .from(revisionParts)
    .innerJoin(buildRevisions, eq(buildRevisions.id, revisionParts.revisionId))
    .innerJoin(builds, eq(builds.id, buildRevisions.buildId))
    .where(eq(revisionParts.partId, partId));
}

export interface BuildMemberRow {
  userId: string;
  email: string;
  displayName: string;
  role: string;
  canEdit: boolean;
}

/** The people a build is shared with, by name. */
export async function listBuildMembers({ buildId }: { buildId: string }): Promise<BuildMemberRow[]> {
  const rows = await db()
    .select({ userId: buildMembers.userId, email: users.email, displayName: users.displayName, role: users.role, canEdit: buildMembers.canEdit })
    .from(buildMembers)
    .innerJoin(users, eq(users.id, buildMembers.userId))
    .where(eq(buildMembers.buildId, buildId))
    .orderBy(users.displayName)
    .limit(500);
  return rows.map((r) => ({ ...r, canEdit: Boolean(r.canEdit) }));
}

/** Adds a member, or changes an existing member's edit right (sharing twice is not an error). */
export async function putBuildMember({ buildId, userId, canEdit }: { buildId: string; userId: string; canEdit: boolean }): Promise<void> {
  await db().insert(buildMembers).values({ buildId, userId, canEdit }).onDuplicateKeyUpdate({ set: { canEdit } });
}

/** Shares a build with an address no account uses yet (sharing twice only changes the edit right). */
export async function putBuildInvitation({ buildId, email, canEdit }: { buildId: string; email: string; canEdit: boolean }): Promise<void> {
  await db().insert(buildInvitations).values({ buildId, email, canEdit, createdAt: new Date() }).onDuplicateKeyUpdate({ set: { canEdit } });
}

/** Everyone the build is shared with, by address, whether or not an account uses it yet (the owner's view). */
export async function listBuildShares({ buildId }: { buildId: string }): Promise<{ email: string; canEdit: boolean }[]> {
  const [members, invited] = await Promise.all([
    db().select({ email: users.email, canEdit: buildMembers.canEdit }).from(buildMembers).innerJoin(users, eq(users.id, buildMembers.userId)).where(eq(buildMembers.buildId, buildId)).limit(500),
    db().select({ email: buildInvitations.email, canEdit: buildInvitations.canEdit }).from(buildInvitations).where(eq(buildInvitations.buildId, buildId)).limit(500),
  ]);
  return [...members, ...invited].map((r) => ({ email: r.email, canEdit: Boolean(r.canEdit) })).sort((a, b) => a.email.localeCompare(b.email));
}

/** Stops sharing with a person, named by account id or by address; false when the build was not shared with them. */
export async function removeBuildMember({ buildId, userId }: { buildId: string; userId: string }): Promise<boolean> {
  if (userId.includes("@")) {
    const email = userId.trim().toLowerCase();
    const [invited] = await db().delete(buildInvitations).where(and(eq(buildInvitations.buildId, buildId), eq(buildInvitations.email, email)));
    const [member] = await db()
      .delete(buildMembers)
      .where(and(eq(buildMembers.buildId, buildId), sql`${buildMembers.userId} IN (SELECT ${users.id} FROM ${users} WHERE ${users.email} = ${email})`));
    return invited.affectedRows + member.affectedRows > 0;
  }
  const [result] = await db().delete(buildMembers).where(and(eq(buildMembers.buildId, buildId), eq(buildMembers.userId, userId)));
  return result.affectedRows > 0;
}
