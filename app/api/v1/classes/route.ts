import { createClass, isDuplicate, listClassesFor } from "@/db/queries/classes";
import { CLASS_CREATOR_ROLES, classAccess } from "@/lib/classroom/access";
import { createClassSchema } from "@/lib/classroom/api-schemas";
import { requireUser } from "@/server/auth/session";
import { newJoinCode } from "@/server/classes/tokens";
import { classJson } from "@/server/classes/views";
import { json, readJson, route } from "@/server/route";

/** The classes the caller belongs to (every class for an admin). */
export const GET = route(async () => {
  const user = await requireUser();
  const rows = await listClassesFor({ viewer: user });
  return json({ classes: rows.flatMap((c) => {
    const access = classAccess(user, c.myRole, c.archivedAt !== null);
    return access ? [classJson(c, access)] : [];
  }) });
});

/** Opens a class; the instructor (or admin) who opens it is its first instructor. */
export const POST = route(async (request) => {
  const user = await requireUser(...CLASS_CREATOR_ROLES);
  const input = await readJson(request, createClassSchema, "class");
  for (let attempt = 0; ; attempt++) {
    try {
      const row = await createClass({ name: input.name, term: input.term, createdBy: user.id, joinCode: newJoinCode() });
      return json({ class: classJson({ ...row, myRole: "instructor", memberCount: 1 }, { role: "instructor", canTeach: true, canWrite: true }) }, 201);
    } catch (e) {
      // A join code collision (about one in 10¹² per class): draw another.
      if (!isDuplicate(e) || attempt >= 3) throw e;
    }
  }
});
