import { countInstructors, removeMember } from "@/db/queries/classes";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { assertTeaching, loadClass } from "@/server/classes/load";
import { json, route } from "@/server/route";

/** Removes a member (their access ends with this request); a student may also leave. */
export const DELETE = route<{ params: Promise<{ id: string; userId: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { id, userId } = await params;
  const cls = await loadClass({ id, viewer: user });
  if (userId !== user.id) assertTeaching(cls);
  const members = await countInstructors({ classId: cls.id });
  if (members <= 1 && cls.myRole === "instructor" && userId === user.id) {
    throw new ApiError("conflict:class", "You are the class's only instructor: it would be left without one.", "userId");
  }
  if (!(await removeMember({ classId: cls.id, userId }))) throw new ApiError("not_found:member", "This person is not a member of the class.", "userId");
  return json({ removed: userId });
});
