import "server-only";
import type { ClassWithRole } from "@/db/queries/classes";
import type { ClassAccess } from "@/lib/classroom/access";

/** A class as the API answers it: the join code only for those who teach it. */
export function classJson(cls: ClassWithRole, access: ClassAccess) {
  return {
    id: cls.id,
    name: cls.name,
    term: cls.term,
    archived: cls.archivedAt !== null,
    archivedAt: cls.archivedAt,
    createdAt: cls.createdAt,
    memberCount: cls.memberCount,
    myRole: access.role,
    canTeach: access.canTeach,
    joinCode: access.canTeach ? cls.joinCode : undefined,
  };
}
