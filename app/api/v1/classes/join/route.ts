import { addMember, findClassByCode } from "@/db/queries/classes";
import { createUser } from "@/db/queries/users";
import { joinSchema } from "@/lib/classroom/api-schemas";
import { ApiError } from "@/lib/http/api-error";
import { hashPassword } from "@/server/auth/password";
import { currentUser, startSession } from "@/server/auth/session";
import { acceptInvitation, openInvitation } from "@/server/classes/invitations";
import { json, readJson, route } from "@/server/route";

/**
 * Joins a class as a student, by its join code (signed in) or by an e-mail invitation's
 * token. An invitation to an address without an account makes the account on the way in
 * when a name and password are given.
 */
export const POST = route(async (request) => {
  const input = await readJson(request, joinSchema, "join");
  const user = await currentUser();
  if ("code" in input) {
    if (!user) throw new ApiError("unauthorized:session", "Sign in to join a class.");
    const cls = await findClassByCode({ code: input.code });
    if (!cls) throw new ApiError("not_found:class", "No class has this join code. Codes are 8 letters and digits; your instructor may have replaced it with a new one.", "code");
    if (cls.archivedAt) throw new ApiError("conflict:class", "This class is archived: it takes no new members.", "code");
    await addMember({ classId: cls.id, userId: user.id, role: "student" });
    return json({ class: { id: cls.id, name: cls.name } });
  }
  const invitation = await openInvitation(input.token);
  if (user) {
    const classId = await acceptInvitation(invitation, user.id);
    return json({ class: { id: classId, name: invitation.className } });
  }
  if (!input.displayName || !input.password) {
    throw new ApiError("unauthorized:session", "Sign in to join, or give your name and a password to create your account.", input.displayName ? "password" : "displayName");
  }
  const created = await createUser({ email: invitation.email, displayName: input.displayName, passwordHash: await hashPassword(input.password) });
  // The invitation went to this address, so saying it has an account tells its owner only.
  if (!created) throw new ApiError("conflict:email", "An account with this e-mail address already exists: sign in, then open the invitation link again.", "email");
  const classId = await acceptInvitation(invitation, created.id);
  await startSession(created.id);
  return json({ class: { id: classId, name: invitation.className }, user: { id: created.id, email: invitation.email, displayName: input.displayName, role: "maker" } }, 201);
});
