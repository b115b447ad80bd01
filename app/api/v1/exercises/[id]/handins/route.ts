import { getRevision } from "@/db/queries/builds";
import { createHandin, listHandins } from "@/db/queries/classwork";
import { isLate } from "@/lib/classroom/access";
import { handinSchema } from "@/lib/classroom/api-schemas";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { loadBuild } from "@/server/builds/load";
import { assertWritable, loadExercise } from "@/server/classes/load";
import { handinJson } from "@/server/classes/roster";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

/** Hand-ins of the exercise: every student's for an instructor, only one's own for a student. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { exercise, cls } = await loadExercise({ id: (await params).id, viewer: user });
  const rows = await listHandins({ exerciseId: exercise.id, studentId: cls.access.canTeach ? undefined : user.id });
  return json({ handins: rows.map((h) => handinJson(h, exercise)) });
});

/**
 * Hands in one saved revision of the student's own build (the current one unless given).
 * Again before the due date replaces the counting one; after it the hand-in is marked late.
 */
export const POST = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const { exercise, cls } = await loadExercise({ id: (await params).id, viewer: user });
  const input = await readJson(request, handinSchema, "handin");
  assertWritable(cls);
  if (cls.access.role !== "student") throw new ApiError("forbidden:class", "Only the class's students hand in.");
  const notYours = new ApiError("bad_request:handin", "Hand in a revision of one of your own builds: this build is not yours.", "buildId");
  const build = await loadBuild({ id: input.buildId, viewer: user }).catch((e: unknown) => {
    if (e instanceof ApiError) throw notYours;
    throw e;
  });
  if (!build.access.isOwner) throw notYours;
  const number = input.revision ?? build.currentRevision;
  if (!(await getRevision({ buildId: build.id, number }))) throw new ApiError("bad_request:handin", `Your build has no revision ${number}: save it first.`, "revision");
  const now = new Date();
  const id = await createHandin({ exerciseId: exercise.id, studentId: user.id, buildId: build.id, revisionNumber: number, late: isLate(now, exercise.dueAt), submittedAt: now });
  const mine = await listHandins({ exerciseId: exercise.id, studentId: user.id });
  const row = mine.find((h) => h.id === id)!;
  return json({ handin: handinJson(row, exercise) }, 201);
});
