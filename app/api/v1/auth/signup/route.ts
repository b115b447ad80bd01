import { createUser } from "@/db/queries/users";
import { signUpSchema } from "@/lib/auth/schemas";
import { ApiError } from "@/lib/http/api-error";
import { hashPassword } from "@/server/auth/password";
import { startSession } from "@/server/auth/session";
import { json, readJson, route } from "@/server/route";

export const POST = route(async (request) => {
  const input = await readJson(request, signUpSchema, "signup");
  const created = await createUser({
    email: input.email,
    displayName: input.displayName,
    passwordHash: await hashPassword(input.password),
  });
  if (!created) {
    throw new ApiError("conflict:email", "An account with this e-mail address already exists. Sign in or reset the password.", "email");
  }
  await startSession(created.id);
  return json({ user: { id: created.id, email: input.email, displayName: input.displayName, role: "maker" } }, 201);
});
