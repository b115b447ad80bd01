import "server-only";
import { notFound } from "next/navigation";
import { getClassFor, type ClassWithRole } from "@/db/queries/classes";
import { getExample, getExercise, getHandin, type ExampleRow, type ExerciseRow, type HandinRow } from "@/db/queries/classwork";
import { type ClassAccess, classAccess } from "@/lib/classroom/access";
import { ApiError } from "@/lib/http/api-error";

type Viewer = { id: string; role: string };
export type LoadedClass = ClassWithRole & { access: ClassAccess };

const noClass = () => new ApiError("not_found:class", "No such class, or you are not a member of it.", "id");

/**
 * A class the viewer belongs to (any class for an admin), else 404 — a class one is not in
 * is not told apart from one that does not exist. Membership is read on every request, so a
 * removed member loses access at once.
 */
export async function loadClass({ id, viewer }: { id: string; viewer: Viewer }): Promise<LoadedClass> {
  const cls = await getClassFor({ id, userId: viewer.id });
  const access = cls ? classAccess(viewer, cls.myRole, cls.archivedAt !== null) : null;
  if (!cls || !access) throw noClass();
  return { ...cls, access };
}

/** For an instructor's change: 403 for a student, 409 when the class is archived (read-only). */
export function assertTeaching(cls: LoadedClass, { allowArchived = false } = {}): void {
  if (!cls.access.canTeach) throw new ApiError("forbidden:class", "Only the class's instructors do this.");
  if (!allowArchived && !cls.access.canWrite) throw new ApiError("conflict:class", "This class is archived: it is read-only. Un-archive it first.");
}

export function assertWritable(cls: LoadedClass): void {
  if (!cls.access.canWrite) throw new ApiError("conflict:class", "This class is archived: it is read-only.");
}

export async function loadExample({ id, viewer }: { id: string; viewer: Viewer }): Promise<{ example: ExampleRow; cls: LoadedClass }> {
  const example = await getExample({ id });
  const missing = new ApiError("not_found:example", "No such worked example, or it is not in a class of yours.", "id");
  if (!example) throw missing;
  try {
    return { example, cls: await loadClass({ id: example.classId, viewer }) };
  } catch (e) {
    if (e instanceof ApiError) throw missing;
    throw e;
  }
}

export async function loadExercise({ id, viewer }: { id: string; viewer: Viewer }): Promise<{ exercise: ExerciseRow; cls: LoadedClass }> {
  const exercise = await getExercise({ id });
  const missing = new ApiError("not_found:exercise", "No such exercise, or it is not in a class of yours.", "id");
  if (!exercise) throw missing;
  try {
    return { exercise, cls: await loadClass({ id: exercise.classId, viewer }) };
  } catch (e) {
    if (e instanceof ApiError) throw missing;
    throw e;
  }
}

/**
 * A hand-in for its student or an instructor of its class; anyone else gets 404 (another
 * student's hand-in, feedback and mark are not told to exist).
 */
export async function loadHandin({ id, viewer }: { id: string; viewer: Viewer }): Promise<{ handin: HandinRow & { classId: string; exerciseTitle: string }; cls: LoadedClass }> {
  const handin = await getHandin({ id });
  const missing = new ApiError("not_found:handin", "No such hand-in, or it is not yours to see.", "id");
  if (!handin) throw missing;
  let cls: LoadedClass;
  try {
    cls = await loadClass({ id: handin.classId, viewer });
  } catch (e) {
    if (e instanceof ApiError) throw missing;
    throw e;
  }
  if (!cls.access.canTeach && handin.studentId !== viewer.id) throw missing;
  return { handin, cls };
}

/** For pages: the same loaders, with the not-found page for any refusal. */
export async function orNotFound<T>(p: Promise<T>): Promise<T> {
  try {
    return await p;
  } catch (e) {
    if (e instanceof ApiError) notFound();
    throw e;
  }
}
