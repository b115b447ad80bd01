import { createExercise, getCopy, listExercises, listHandins } from "@/db/queries/classwork";
import { createExerciseSchema } from "@/lib/classroom/api-schemas";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { loadBuild, loadRevision } from "@/server/builds/load";
import { assertTeaching, loadClass } from "@/server/classes/load";
import { starterWarning } from "@/server/classes/withheld";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

/** The class's exercises; a student sees their own copy and latest hand-in, an instructor how many handed in. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const cls = await loadClass({ id: (await params).id, viewer: user });
  const rows = await listExercises({ classId: cls.id });
  const exercises = await Promise.all(
    rows.map(async (x) => {
      const base = { id: x.id, title: x.title, dueAt: x.dueAt, starterTitle: x.starterTitle, starterBuildId: x.starterBuildId, starterRevision: x.starterRevision };
      if (cls.access.canTeach) {
        const all = await listHandins({ exerciseId: x.id });
        return { ...base, handedIn: new Set(all.map((h) => h.studentId)).size };
      }
      const [copy, mine] = await Promise.all([getCopy({ exerciseId: x.id, userId: user.id }), listHandins({ exerciseId: x.id, studentId: user.id })]);
      return { ...base, myCopy: copy?.buildId ?? null, myLatest: mine[0] ? { submittedAt: mine[0].submittedAt, late: mine[0].late, hasFeedback: mine[0].feedback !== null } : null };
    }),
  );
  return json({ exercises });
});

/** Sets an exercise: instructions, a starter revision of a build the instructor may see, a due date ahead. */
export const POST = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const cls = await loadClass({ id: (await params).id, viewer: user });
  const input = await readJson(request, createExerciseSchema, "exercise");
  assertTeaching(cls);
  const dueAt = new Date(input.dueAt);
  if (dueAt.getTime() <= Date.now()) throw new ApiError("bad_request:exercise", "The due date is in the past: choose a date and time after now.", "dueAt");
  const build = await loadBuild({ id: input.buildId, viewer: user });
  const revision = await loadRevision({ build, number: input.revision });
  const id = await createExercise({ classId: cls.id, title: input.title, instructions: input.instructions, starterBuildId: build.id, starterRevision: revision.number, dueAt, createdBy: user.id });
  const warning = await starterWarning({ exercise: { starterBuildId: build.id, classId: cls.id } });
  return json({ exercise: { id, classId: cls.id, dueAt, starterBuildId: build.id, starterRevision: revision.number }, warning }, 201);
});
