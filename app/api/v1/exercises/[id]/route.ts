import { getCopy, listHandins } from "@/db/queries/classwork";
import { requireUser } from "@/server/auth/session";
import { loadExercise } from "@/server/classes/load";
import { handinJson, roster } from "@/server/classes/roster";
import { json, route } from "@/server/route";

/** An exercise: an instructor gets the roster, a student their own copy and hand-ins (with feedback). */
export const GET = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { exercise, cls } = await loadExercise({ id: (await params).id, viewer: user });
  const base = {
    id: exercise.id,
    classId: cls.id,
    className: cls.name,
    title: exercise.title,
    instructions: exercise.instructions,
    dueAt: exercise.dueAt,
    starter: { buildId: exercise.starterBuildId, revision: exercise.starterRevision, title: exercise.starterTitle },
    canTeach: cls.access.canTeach,
  };
  if (cls.access.canTeach) return json({ exercise: base, roster: await roster(exercise) });
  const [copy, mine] = await Promise.all([getCopy({ exerciseId: exercise.id, userId: user.id }), listHandins({ exerciseId: exercise.id, studentId: user.id })]);
  return json({ exercise: base, myCopy: copy?.buildId ?? null, handins: mine.map((h) => handinJson(h, exercise)) });
});
