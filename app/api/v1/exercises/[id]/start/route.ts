import { getRevision } from "@/db/queries/builds";
import { getCopy, putCopy } from "@/db/queries/classwork";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { copyRevision } from "@/server/classes/copy";
import { assertWritable, loadExercise } from "@/server/classes/load";
import { assertStarterOpen } from "@/server/classes/withheld";
import { json, route } from "@/server/route";

/**
 * "Start": the student's own copy of the starter revision; starting again returns the same copy.
 * Refused (409, saying why) while the starter is the build of a worked example whose values
 * are still questions for the student.
 */
export const POST = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { exercise, cls } = await loadExercise({ id: (await params).id, viewer: user });
  assertWritable(cls);
  // A copy of a build whose values are still questions would show the answers on its Budget.
  await assertStarterOpen({ exercise, cls, viewer: user });
  const existing = await getCopy({ exerciseId: exercise.id, userId: user.id });
  if (existing) return json({ build: { id: existing.buildId }, created: false });
  const revision = await getRevision({ buildId: exercise.starterBuildId, number: exercise.starterRevision });
  if (!revision) throw new ApiError("not_found:exercise", "The starter build of this exercise is gone; ask your instructor.", "id");
  const created = await copyRevision({ revision, user, title: `${exercise.title} — my copy`, summary: "", note: `Started from the exercise "${exercise.title}"` });
  await putCopy({ exerciseId: exercise.id, userId: user.id, buildId: created.id });
  return json({ build: created, created: true }, 201);
});
