import "server-only";
import { and, asc, desc, eq, sql, type SQLWrapper } from "drizzle-orm";
import { db } from "../client";
import { builds, classMembers, exerciseCopies, exercises, handins, notifications, users, workedExamples } from "../schema";
import { parseJson } from "./json";
import { newId } from "./users";

type ExampleDbRow = typeof workedExamples.$inferSelect;
export type ExampleRow = Omit<ExampleDbRow, "hidden"> & { hidden: string[]; buildTitle: string };

const exampleColumns = { e: workedExamples, buildTitle: builds.title };
const toExample = (r: { e: ExampleDbRow; buildTitle: string }): ExampleRow => ({ ...r.e, hidden: (parseJson(r.e.hidden) as string[]) ?? [], buildTitle: r.buildTitle });

export async function createExample(input: Omit<ExampleDbRow, "id" | "createdAt" | "revealedAt" | "linkTokenHash"> & { linkTokenHash: string | null }): Promise<string> {
  const id = newId();
  await db().insert(workedExamples).values({ ...input, id, revealedAt: null, createdAt: new Date() });
  return id;
}

export async function listExamples({ classId }: { classId: string }): Promise<ExampleRow[]> {
  const rows = await db().select(exampleColumns).from(workedExamples).innerJoin(builds, eq(builds.id, workedExamples.buildId)).where(eq(workedExamples.classId, classId)).orderBy(asc(workedExamples.createdAt)).limit(200);
  return rows.map(toExample);
}

export async function getExample({ id }: { id: string }): Promise<ExampleRow | undefined> {
  const rows = await db().select(exampleColumns).from(workedExamples).innerJoin(builds, eq(builds.id, workedExamples.buildId)).where(eq(workedExamples.id, id)).limit(1);
  return rows[0] ? toExample(rows[0]) : undefined;
}

export async function findExampleByLink({ tokenHash }: { tokenHash: string }): Promise<ExampleRow | undefined> {
  const rows = await db().select(exampleColumns).from(workedExamples).innerJoin(builds, eq(builds.id, workedExamples.buildId)).where(eq(workedExamples.linkTokenHash, tokenHash)).limit(1);
  return rows[0] ? toExample(rows[0]) : undefined;
}

export async function updateExample({ id, ...set }: { id: string } & Partial<Pick<ExampleDbRow, "title" | "narrative" | "hidden" | "tolerancePercent" | "revealAt" | "revealedAt" | "visibility" | "linkTokenHash">>): Promise<void> {
  const values = Object.fromEntries(Object.entries(set).filter(([, v]) => v !== undefined));
  if (Object.keys(values).length) await db().update(workedExamples).set(values).where(eq(workedExamples.id, id));
}

export type ExerciseRow = typeof exercises.$inferSelect & { starterTitle: string };

export async function createExercise(input: Omit<typeof exercises.$inferInsert, "id" | "createdAt">): Promise<string> {
  const id = newId();
  await db().insert(exercises).values({ ...input, id, createdAt: new Date() });
  return id;
}

export async function listExercises({ classId }: { classId: string }): Promise<ExerciseRow[]> {
  const rows = await db().select({ x: exercises, starterTitle: builds.title }).from(exercises).innerJoin(builds, eq(builds.id, exercises.starterBuildId)).where(eq(exercises.classId, classId)).orderBy(asc(exercises.dueAt)).limit(200);
  return rows.map((r) => ({ ...r.x, starterTitle: r.starterTitle }));
}

export async function getExercise({ id }: { id: string }): Promise<ExerciseRow | undefined> {
  const rows = await db().select({ x: exercises, starterTitle: builds.title }).from(exercises).innerJoin(builds, eq(builds.id, exercises.starterBuildId)).where(eq(exercises.id, id)).limit(1);
  return rows[0] ? { ...rows[0].x, starterTitle: rows[0].starterTitle } : undefined;
}

export async function getCopy({ exerciseId, userId }: { exerciseId: string; userId: string }): Promise<{ buildId: string } | undefined> {
  const rows = await db().select({ buildId: exerciseCopies.buildId }).from(exerciseCopies).innerJoin(builds, eq(builds.id, exerciseCopies.buildId)).where(and(eq(exerciseCopies.exerciseId, exerciseId), eq(exerciseCopies.userId, userId))).limit(1);
  return rows[0];
}

export async function putCopy({ exerciseId, userId, buildId }: { exerciseId: string; userId: string; buildId: string }): Promise<void> {
  await db().insert(exerciseCopies).values({ exerciseId, userId, buildId, createdAt: new Date() }).onDuplicateKeyUpdate({ set: { buildId } });
}

export type HandinRow = typeof handins.$inferSelect & { studentName: string; buildTitle: string };

const handinColumns = { h: handins, studentName: users.displayName, buildTitle: builds.title };
const toHandin = (r: { h: typeof handins.$inferSelect; studentName: string; buildTitle: string }): HandinRow => ({ ...r.h, late: Boolean(r.h.late), studentName: r.studentName, buildTitle: r.buildTitle });

export async function createHandin(input: { exerciseId: string; studentId: string; buildId: string; revisionNumber: number; late: boolean; submittedAt: Date }): Promise<string> {
  const id = newId();
  await db().insert(handins).values({ id, ...input });
  return id;
}

/** Hand-ins of an exercise, newest first; only one student's when `studentId` is given. */
export async function listHandins({ exerciseId, studentId }: { exerciseId: string; studentId?: string }): Promise<HandinRow[]> {
  const rows = await db()
    .select(handinColumns)
    .from(handins)
    .innerJoin(users, eq(users.id, handins.studentId))
    .innerJoin(builds, eq(builds.id, handins.buildId))
    .where(and(eq(handins.exerciseId, exerciseId), studentId ? eq(handins.studentId, studentId) : undefined))
    .orderBy(desc(handins.submittedAt), desc(handins.id))
    .limit(2000);
  return rows.map(toHandin);
}

export async function getHandin({ id }: { id: string }): Promise<(HandinRow & { classId: string; exerciseTitle: string }) | undefined> {
  const rows = await db()
    .select({ ...handinColumns, classId: exercises.classId, exerciseTitle: exercises.title })
    .from(handins)
    .innerJoin(users, eq(users.id, handins.studentId))
    .innerJoin(builds, eq(builds.id, handins.buildId))
    .innerJoin(exercises, eq(exercises.id, handins.exerciseId))
    .where(eq(handins.id, id))
    .limit(1);
  const r = rows[0];
  return r ? { ...toHandin(r), classId: r.classId, exerciseTitle: r.exerciseTitle } : undefined;
}

/** Records feedback (and a mark) on a hand-in and notifies the student, in one transaction. */
export async function setFeedback(input: { id: string; feedback: string; mark: string | null; by: string; notify: { userId: string; text: string; href: string } }): Promise<void> {
  const now = new Date();
  await db().transaction(async (tx) => {
    await tx.update(handins).set({ feedback: input.feedback, mark: input.mark, feedbackBy: input.by, feedbackAt: now }).where(eq(handins.id, input.id));
    await tx.insert(notifications).values({ id: newId(), userId: input.notify.userId, kind: "feedback", text: input.notify.text, href: input.notify.href, createdAt: now });
  });
}

/** The students of a class (for the roster). */
export async function listStudents({ classId }: { classId: string }): Promise<{ userId: string; displayName: string }[]> {
  return db()
    .select({ userId: classMembers.userId, displayName: users.displayName })
    .from(classMembers)
    .innerJoin(users, eq(users.id, classMembers.userId))
    .where(and(eq(classMembers.classId, classId), eq(classMembers.role, "student")))
    .orderBy(asc(users.displayName))
    .limit(1000);
}

/**
 * Whether the viewer may read a build through a class: it is a worked example or an
 * exercise starter of a class they belong to, or a hand-in in a class they teach.
 */
export function classReaderSql(buildId: typeof builds.id, viewerId: string | SQLWrapper) {
  // A student never reads, through a class, the build behind a worked example of theirs whose
  // values are still questions (hidden, not revealed by hand, reveal date not reached): its
  // Budget would give the answers away (the same rule as valuesWithheld in lib/classroom/access).
  return sql<number>`((
    exists(select 1 from worked_example we join class_member cm on cm.class_id = we.class_id where we.build_id = ${buildId} and cm.user_id = ${viewerId})
    or exists(select 1 from exercise ex join class_member cm on cm.class_id = ex.class_id where ex.starter_build_id = ${buildId} and cm.user_id = ${viewerId})
    or exists(select 1 from handin h join exercise ex on ex.id = h.exercise_id join class_member cm on cm.class_id = ex.class_id and cm.role = 'instructor' where h.build_id = ${buildId} and cm.user_id = ${viewerId})
  ) and not ${withheldExampleSql(buildId, viewerId)})`;
}

/** The build is behind a worked example of a class where the viewer is a student and the example's values are still questions. */
export function withheldExampleSql(buildId: typeof builds.id, viewerId: string | SQLWrapper) {
  return sql<number>`exists(
    select 1 from worked_example wh join class_member cs on cs.class_id = wh.class_id and cs.role = 'student'
    where wh.build_id = ${buildId} and cs.user_id = ${viewerId} and ${stillQuestionsSql("wh")}
  )`;
}

/** A worked example (table or alias `t`) whose values are still questions: hidden, not revealed by hand, reveal date not reached. */
function stillQuestionsSql(t: string) {
  return sql.raw(`(json_length(${t}.hidden) > 0 and ${t}.revealed_at is null and (${t}.reveal_at is null or ${t}.reveal_at > now(3)))`);
}

/** The owner of a build, to read an example or starter as its author sees it. */
export async function buildOwner({ buildId }: { buildId: string }): Promise<string | undefined> {
  const rows = await db().select({ ownerId: builds.ownerId }).from(builds).where(eq(builds.id, buildId)).limit(1);
  return rows[0]?.ownerId;
}

/**
 * Worked examples on this build whose values are still questions (hidden, not revealed by
 * hand, reveal date not reached); with `studentId`, only those of classes where that user is
 * a student.
 */
export async function withholdingExamples({ buildId, studentId }: { buildId: string; studentId?: string }): Promise<{ id: string; title: string; classId: string }[]> {
  const rows = await db()
    .select({ id: workedExamples.id, title: workedExamples.title, classId: workedExamples.classId })
    .from(workedExamples)
    .where(
      and(
        eq(workedExamples.buildId, buildId),
        stillQuestionsSql("worked_example"),
        studentId ? sql`exists(select 1 from class_member cs where cs.class_id = ${workedExamples.classId} and cs.user_id = ${studentId} and cs.role = 'student')` : undefined,
      ),
    )
    .orderBy(asc(workedExamples.createdAt))
    .limit(50);
  return rows;
}

/** How many students hold their own copy of this build through an exercise of their class that starts from it. */
export async function countStarterCopies({ buildId }: { buildId: string }): Promise<number> {
  const rows = await db()
    .select({ n: sql<number>`count(distinct ${exerciseCopies.userId})` })
    .from(exerciseCopies)
    .innerJoin(exercises, eq(exercises.id, exerciseCopies.exerciseId))
    .innerJoin(classMembers, and(eq(classMembers.classId, exercises.classId), eq(classMembers.userId, exerciseCopies.userId), eq(classMembers.role, "student")))
    .where(eq(exercises.starterBuildId, buildId));
  return Number(rows[0]?.n ?? 0);
}
