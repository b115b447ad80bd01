import { acceptInvitationsForEmail } from "@/db/queries/classes";
import { completeSignupRequest, getUserById } from "@/db/queries/users";
import { signupConfirmSchema } from "@/lib/auth/schemas";
import { ApiError } from "@/lib/http/api-error";
import { startSession } from "@/server/auth/session";
import { json, readJson, route } from "@/server/route";

const REFUSED = {
  unknown: "This sign-up link has already been used or is not one we sent. If your account is made, sign in; otherwise sign up again.",
  expired: "This sign-up link is more than a day old. Sign up again to get a new one.",
  taken: "This address already has an account. Sign in, or reset the password if you have forgotten it.",
} as const;

/** Makes the account of a mailed sign-up link and signs its owner in. */
export const POST = route(async (request) => {
  const { token } = await readJson(request, signupConfirmSchema, "signup");
  const outcome = await completeSignupRequest({ token });
  if (outcome.status !== "ok") throw new ApiError(`bad_request:signup`, REFUSED[outcome.status], "token");
  await startSession(outcome.userId);
  const user = await getUserById({ id: outcome.userId });
  // Invitations to this address (classes; builds were taken over with the account) apply now.
  const joinedClasses = user ? await acceptInvitationsForEmail({ email: user.email, userId: outcome.userId }) : [];
  return json({ user: { id: outcome.userId, email: user?.email, displayName: user?.displayName, role: user?.role ?? "maker" }, joinedClasses }, 201);
});
