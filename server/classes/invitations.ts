import "server-only";
import { consumeInvitation, findInvitation, getClassFor } from "@/db/queries/classes";
import { INVITE_TOKEN_PATTERN } from "@/lib/classroom/api-schemas";
import { ApiError } from "@/lib/http/api-error";
import { hashToken } from "./tokens";

export type OpenInvitation = { id: string; classId: string; className: string; term: string; email: string };

/**
 * What an invitation token opens, or a refusal that says why: unknown, already used,
 * expired, or the class was archived since.
 */
export async function openInvitation(token: string): Promise<OpenInvitation> {
  const unknown = new ApiError("not_found:invitation", "This invitation link is not valid. Check that the whole link was copied.", "token");
  if (!INVITE_TOKEN_PATTERN.test(token)) throw unknown;
  const found = await findInvitation({ tokenHash: hashToken(token) });
  if (found.state === "unknown") throw unknown;
  if (found.state === "used") throw new ApiError("conflict:invitation", "This invitation was already used. Ask your instructor for a new one, or for the class's join code.", "token");
  if (found.state === "expired") throw new ApiError("conflict:invitation", "This invitation has expired (they last 7 days). Ask your instructor for a new one, or for the class's join code.", "token");
  const cls = await getClassFor({ id: found.classId, userId: "" });
  if (!cls) throw unknown;
  if (cls.archivedAt) throw new ApiError("conflict:class", "This class is archived: it takes no new members.", "token");
  return { id: found.id, classId: cls.id, className: cls.name, term: cls.term, email: found.email };
}

/** Uses the invitation for the user; a second use racing this one is refused. */
export async function acceptInvitation(invitation: OpenInvitation, userId: string): Promise<string> {
  const joined = await consumeInvitation({ id: invitation.id, userId });
  if (!joined) throw new ApiError("conflict:invitation", "This invitation was already used. Ask your instructor for a new one, or for the class's join code.", "token");
  return joined.classId;
}
