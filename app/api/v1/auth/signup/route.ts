import { after } from "next/server";
import { signUpSchema } from "@/lib/auth/schemas";
import { mailSignupLink, signupAnswer } from "@/server/auth/signup";
import { clientAddress } from "@/server/http/client-address";
import { consumeMailRequest } from "@/server/rate-limit";
import { json, readJson, route } from "@/server/route";

/**
 * Same answer, in the same time, whether or not the address has an account: the look-up, the
 * password hash, the pending sign-up and the mail happen after the answer has been sent.
 */
export const POST = route(async (request) => {
  const input = await readJson(request, signUpSchema, "signup");
  await consumeMailRequest("signup", input.email, clientAddress(request));
  after(() =>
    mailSignupLink(input).catch((error: unknown) => {
      console.error("[signup] could not send the sign-up mail:", error);
    }),
  );
  return json({ ok: true, message: signupAnswer(input.email) }, 202);
});
