import { acceptInvitationsForEmail } from "@/db/queries/classes";
import { getUserByEmail } from "@/db/queries/users";
import { signInSchema } from "@/lib/auth/schemas";
import { ApiError } from "@/lib/http/api-error";
import { dummyPasswordHash, verifyPassword } from "@/server/auth/password";
import { startSession } from "@/server/auth/session";
import { clientAddress } from "@/server/http/client-address";
import { consumeSignInAttempt, signInSucceeded } from "@/server/rate-limit";
import { json, readJson, route } from "@/server/route";

export const POST = route(async (request) => {
  const input = await readJson(request, signInSchema, "signin");
  const address = clientAddress(request);
  await consumeSignInAttempt(input.email, address);
  const user = await getUserByEmail({ email: input.email });
  // Verify against a dummy hash for unknown accounts so both cases take the same time.
  const ok = await verifyPassword(user?.passwordHash ?? (await dummyPasswordHash()), input.password);
  if (!user || !ok) {
    // The attempt was already counted above. One message for both: it must not tell whether the account exists.
    throw new ApiError("unauthorized:signin", "The e-mail address or the password is not right.");
  }
  await signInSucceeded(input.email, address);
  await startSession(user.id);
  // Invitations to this address join their classes now: an existing account joins on sign-in.
  const joinedClasses = await acceptInvitationsForEmail({ email: user.email, userId: user.id });
  return json({ user: { id: user.id, email: user.email, displayName: user.displayName, role: user.role }, joinedClasses });
});
