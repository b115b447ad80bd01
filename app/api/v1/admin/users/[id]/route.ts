import { countAdmins, getUserById, setUserRole } from "@/db/queries/users";
import { roleChangeSchema } from "@/lib/auth/schemas";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { json, readJson, route } from "@/server/route";

export const PATCH = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  await requireUser("admin");
  const { id } = await params;
  const { role } = await readJson(request, roleChangeSchema, "role");
  const target = await getUserById({ id });
  if (!target) throw new ApiError("not_found:user", "No such user.", "id");
  if (target.role === "admin" && role !== "admin" && (await countAdmins()) <= 1) {
    throw new ApiError("conflict:last_admin", "This is the last admin; make someone else admin first.", "role");
  }
  await setUserRole({ id, role });
  return json({ user: { ...target, role } });
});
