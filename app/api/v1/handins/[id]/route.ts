import { getExercise } from "@/db/queries/classwork";
import { requireUser } from "@/server/auth/session";
import { loadHandin } from "@/server/classes/load";
import { handinJson } from "@/server/classes/roster";
import { ApiError } from "@/lib/http/api-error";
import { json, route } from "@/server/route";

/** One hand-in with its feedback and mark: for its student and the class's instructors only (404 for anyone else). */
export const GET = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { handin } = await loadHandin({ id: (await params).id, viewer: user });
  const exercise = await getExercise({ id: handin.exerciseId });
  if (!exercise) throw new ApiError("not_found:handin", "No such hand-in, or it is not yours to see.", "id");
  return json({ handin: { ...handinJson(handin, exercise), exerciseId: exercise.id, exerciseTitle: exercise.title, classId: exercise.classId } });
});
