import { createInvitations } from "@/db/queries/classes";
import { EMAIL_PATTERN, invitationsSchema } from "@/lib/classroom/api-schemas";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { assertTeaching, loadClass } from "@/server/classes/load";
import { mailInvitation } from "@/server/classes/mail";
import { hashToken, newToken } from "@/server/classes/tokens";
import { json, readJson, route } from "@/server/route";

const INVITATION_DAYS = 7;

/**
 * Invites addresses by e-mail. The whole list is checked first: one malformed address
 * refuses the request (naming it) and nothing is stored or sent. The answer is the same
 * whether or not an address has an account.
 */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const cls = await loadClass({ id: (await params).id, viewer: user });
  const { emails } = await readJson(request, invitationsSchema, "invitations");
  assertTeaching(cls);
  emails.forEach((email, i) => {
    if (!EMAIL_PATTERN.safeParse(email).success) {
      throw new ApiError("bad_request:invitations", `"${email}" is not an e-mail address: nobody was invited. Correct it and send the list again.`, `emails[${i}]`);
    }
  });
  const unique = [...new Set(emails)];
  const items = unique.map((email) => ({ email, token: newToken() }));
  await createInvitations({
    classId: cls.id,
    invitedBy: user.id,
    expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
    items: items.map((i) => ({ email: i.email, tokenHash: hashToken(i.token) })),
  });
  const sent = await Promise.all(items.map((i) => mailInvitation({ to: i.email, token: i.token, className: cls.name, term: cls.term, instructorName: user.displayName })));
  return json({ invited: unique.length, mailed: sent.filter(Boolean).length }, 201);
});
