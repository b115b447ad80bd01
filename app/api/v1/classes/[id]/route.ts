import { isDuplicate, listMembers, listPendingInvitations, updateClass } from "@/db/queries/classes";
import { patchClassSchema } from "@/lib/classroom/api-schemas";
import { requireUser } from "@/server/auth/session";
import { assertTeaching, loadClass } from "@/server/classes/load";
import { newJoinCode } from "@/server/classes/tokens";
import { classJson } from "@/server/classes/views";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

/** A class with its members; instructors also get the join code and the open invitations. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const cls = await loadClass({ id: (await params).id, viewer: user });
  const members = await listMembers({ classId: cls.id });
  return json({
    class: classJson(cls, cls.access),
    // Students see who is in the class by name; addresses are for its instructors.
    members: members.map((m) => ({ userId: m.userId, displayName: m.displayName, role: m.role, joinedAt: m.joinedAt, email: cls.access.canTeach ? m.email : undefined })),
    invitations: cls.access.canTeach ? await listPendingInvitations({ classId: cls.id }) : undefined,
  });
});

/** Renames, archives (read-only) or un-archives a class, or rotates its join code (the old one stops at once). */
export const PATCH = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const cls = await loadClass({ id: (await params).id, viewer: user });
  const input = await readJson(request, patchClassSchema, "class");
  // Un-archiving is the one change an archived class takes.
  assertTeaching(cls, { allowArchived: input.archived === false });
  const archivedAt = input.archived === undefined ? undefined : input.archived ? (cls.archivedAt ?? new Date()) : null;
  for (let attempt = 0; ; attempt++) {
    try {
      await updateClass({ id: cls.id, name: input.name, term: input.term, archivedAt, joinCode: input.rotateJoinCode ? newJoinCode() : undefined });
      break;
    } catch (e) {
      if (!isDuplicate(e) || attempt >= 3) throw e;
    }
  }
  const fresh = await loadClass({ id: cls.id, viewer: user });
  return json({ class: classJson(fresh, fresh.access) });
});
