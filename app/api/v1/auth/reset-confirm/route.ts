import { consumePasswordResetToken } from "@/db/queries/users";
import { resetConfirmSchema } from "@/lib/auth/schemas";
import { ApiError } from "@/lib/http/api-error";
import { hashPassword } from "@/server/auth/password";
import { json, readJson, route } from "@/server/route";

const REFUSALS = {
  unknown: "This reset link is not valid. Ask for a new one.",
  used: "This reset link has already been used. Ask for a new one.",
  expired: "This reset link has expired (links last one hour). Ask for a new one.",
} as const;

export const POST = route(async (request) => {
  const { token, password } = await readJson(request, resetConfirmSchema, "reset");
  const outcome = await consumePasswordResetToken({ token, passwordHash: await hashPassword(password) });
  if (outcome !== "ok") throw new ApiError(`bad_request:reset_${outcome}`, REFUSALS[outcome], "token");
  return json({ ok: true, message: "Your password is changed. Sign in with the new one." });
});
