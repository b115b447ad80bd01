import "server-only";
import { and, asc, desc, eq, gt, isNull, sql } from "drizzle-orm";
import type { ClassRole } from "@/lib/classroom/access";
import { db, mysqlErrorCode } from "../client";
import { classInvitations, classMembers, classes, users } from "../schema";
import { newId } from "./users";

export type ClassRow = typeof classes.$inferSelect;
export type ClassWithRole = ClassRow & { myRole: ClassRole | null; memberCount: number };

const memberCount = sql<number>`(select count(*) from ${classMembers} cm2 where cm2.class_id = ${classes.id})`;

/** Opens a class with its creator as the first instructor, in one transaction. */
export async function createClass(input: { name: string; term: string; createdBy: string; joinCode: string }): Promise<ClassRow> {
  const now = new Date();
  const row: ClassRow = { id: newId(), name: input.name, term: input.term, joinCode: input.joinCode, createdBy: input.createdBy, archivedAt: null, createdAt: now };
  await db().transaction(async (tx) => {
    await tx.insert(classes).values(row);
    await tx.insert(classMembers).values({ classId: row.id, userId: input.createdBy, role: "instructor", joinedAt: now });
  });
  return row;
}

/** Classes the user belongs to (every class for an admin), newest first. */
export async function listClassesFor({ viewer }: { viewer: { id: string; role: string } }): Promise<ClassWithRole[]> {
  const rows = await db()
    .select({ c: classes, myRole: classMembers.role, memberCount })
    .from(classes)
    .leftJoin(classMembers, and(eq(classMembers.classId, classes.id), eq(classMembers.userId, viewer.id)))
    .where(viewer.role === "admin" ? undefined : eq(classMembers.userId, viewer.id))
    .orderBy(desc(classes.createdAt))
    .limit(500);
  return rows.map((r) => ({ ...r.c, myRole: r.myRole, memberCount: Number(r.memberCount) }));
}

/** A class and the user's role in it (null when not a member); undefined when no such class. */
export async function getClassFor({ id, userId }: { id: string; userId: string }): Promise<ClassWithRole | undefined> {
  const rows = await db()
    .select({ c: classes, myRole: classMembers.role, memberCount })
    .from(classes)
    .leftJoin(classMembers, and(eq(classMembers.classId, classes.id), eq(classMembers.userId, userId)))
    .where(eq(classes.id, id))
    .limit(1);
  const r = rows[0];
  return r ? { ...r.c, myRole: r.myRole, memberCount: Number(r.memberCount) } : undefined;
}

export async function updateClass({ id, ...set }: { id: string; name?: string; term?: string; archivedAt?: Date | null; joinCode?: string }): Promise<void> {
  const values = Object.fromEntries(Object.entries(set).filter(([, v]) => v !== undefined));
  if (Object.keys(values).length) await db().update(classes).set(values).where(eq(classes.id, id));
}

export async function findClassByCode({ code }: { code: string }): Promise<ClassRow | undefined> {
  const rows = await db().select().from(classes).where(eq(classes.joinCode, code)).limit(1);
  return rows[0];
}

export interface MemberRow {
  userId: string;
  displayName: string;
  email: string;
  role: ClassRole;
  joinedAt: Date;
}

export async function listMembers({ classId }: { classId: string }): Promise<MemberRow[]> {
  return db()
    .select({ userId: classMembers.userId, displayName: users.displayName, email: users.email, role: classMembers.role, joinedAt: classMembers.joinedAt })
    .from(classMembers)
    .innerJoin(users, eq(users.id, classMembers.userId))
    .where(eq(classMembers.classId, classId))
    .orderBy(asc(classMembers.role), asc(users.displayName))
    .limit(1000);
}

/** Adds a member; joining a class one already belongs to keeps the role one has. */
export async function addMember({ classId, userId, role }: { classId: string; userId: string; role: ClassRole }): Promise<void> {
  await db().insert(classMembers).values({ classId, userId, role, joinedAt: new Date() }).onDuplicateKeyUpdate({ set: { userId: sql`${classMembers.userId}` } });
}

export async function removeMember({ classId, userId }: { classId: string; userId: string }): Promise<boolean> {
  const [result] = await db().delete(classMembers).where(and(eq(classMembers.classId, classId), eq(classMembers.userId, userId)));
  return result.affectedRows > 0;
}

export async function countInstructors({ classId }: { classId: string }): Promise<number> {
  const rows = await db().select({ n: sql<number>`count(*)` }).from(classMembers).where(and(eq(classMembers.classId, classId), eq(classMembers.role, "instructor")));
  return Number(rows[0]?.n ?? 0);
}

export async function createInvitations(input: { classId: string; invitedBy: string; expiresAt: Date; items: readonly { email: string; tokenHash: string }[] }): Promise<void> {
  const now = new Date();
  await db().transaction(async (tx) => {
    await tx.insert(classInvitations).values(input.items.map((i) => ({ id: newId(), classId: input.classId, email: i.email, tokenHash: i.tokenHash, invitedBy: input.invitedBy, expiresAt: input.expiresAt, createdAt: now })));
  });
}

export interface PendingInvitation {
  id: string;
  email: string;
  expiresAt: Date;
  createdAt: Date;
}

export async function listPendingInvitations({ classId }: { classId: string }): Promise<PendingInvitation[]> {
  return db()
    .select({ id: classInvitations.id, email: classInvitations.email, expiresAt: classInvitations.expiresAt, createdAt: classInvitations.createdAt })
    .from(classInvitations)
    .where(and(eq(classInvitations.classId, classId), isNull(classInvitations.usedAt), gt(classInvitations.expiresAt, new Date())))
    .orderBy(desc(classInvitations.createdAt))
    .limit(500);
}

export type InvitationLookup = { state: "unknown" } | { state: "used" | "expired" | "open"; id: string; classId: string; email: string };

export async function findInvitation({ tokenHash }: { tokenHash: string }): Promise<InvitationLookup> {
  const rows = await db().select().from(classInvitations).where(eq(classInvitations.tokenHash, tokenHash)).limit(1);
  const r = rows[0];
  if (!r) return { state: "unknown" };
  const state = r.usedAt ? "used" : r.expiresAt.getTime() <= Date.now() ? "expired" : "open";
  return { state, id: r.id, classId: r.classId, email: r.email };
}

/**
 * Uses an invitation and adds the member in one transaction. The update only matches an
 * unused, unexpired row, so two requests racing with one token cannot both join.
 */
export async function consumeInvitation({ id, userId }: { id: string; userId: string }): Promise<{ classId: string } | null> {
  return db().transaction(async (tx) => {
    const now = new Date();
    const [result] = await tx
      .update(classInvitations)
      .set({ usedAt: now, usedBy: userId })
      .where(and(eq(classInvitations.id, id), isNull(classInvitations.usedAt), gt(classInvitations.expiresAt, now)));
    if (result.affectedRows !== 1) return null;
    const rows = await tx.select({ classId: classInvitations.classId }).from(classInvitations).where(eq(classInvitations.id, id)).limit(1);
    const classId = rows[0]!.classId;
    await tx.insert(classMembers).values({ classId, userId, role: "student", joinedAt: now }).onDuplicateKeyUpdate({ set: { userId: sql`${classMembers.userId}` } });
    return { classId };
  });
}

/**
 * An existing account signing in joins every class that invited its address and is not
 * archived: each open invitation is used (only an unused, unexpired row matches, so a
 * racing use of the link cannot join twice) and the membership added, in one transaction.
 * Returns the classes joined.
 */
export async function acceptInvitationsForEmail({ email, userId }: { email: string; userId: string }): Promise<{ id: string; name: string }[]> {
  return db().transaction(async (tx) => {
    const now = new Date();
    const open = await tx
      .select({ id: classInvitations.id, classId: classInvitations.classId, name: classes.name })
      .from(classInvitations)
      .innerJoin(classes, eq(classes.id, classInvitations.classId))
      .where(and(sql`lower(${classInvitations.email}) = ${email.toLowerCase()}`, isNull(classInvitations.usedAt), gt(classInvitations.expiresAt, now), isNull(classes.archivedAt)))
      .limit(100);
    const joined: { id: string; name: string }[] = [];
    for (const inv of open) {
      const [result] = await tx
        .update(classInvitations)
        .set({ usedAt: now, usedBy: userId })
        .where(and(eq(classInvitations.id, inv.id), isNull(classInvitations.usedAt), gt(classInvitations.expiresAt, now)));
      if (result.affectedRows !== 1) continue;
      await tx.insert(classMembers).values({ classId: inv.classId, userId, role: "student", joinedAt: now }).onDuplicateKeyUpdate({ set: { userId: sql`${classMembers.userId}` } });
      if (!joined.some((j) => j.id === inv.classId)) joined.push({ id: inv.classId, name: inv.name });
    }
    return joined;
  });
}

/** True when the join code is taken (codes are unique so one code opens one class). */
export function isDuplicate(error: unknown): boolean {
  return mysqlErrorCode(error) === "ER_DUP_ENTRY";
}
