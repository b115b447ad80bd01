import "server-only";
import { createSignupRequest, getUserByEmail } from "@/db/queries/users";
import type { z } from "zod";
import type { signUpSchema } from "@/lib/auth/schemas";
import { env } from "@/server/env";
import { sendMail } from "@/server/mail";
import { hashPassword } from "./password";

type SignUp = z.infer<typeof signUpSchema>;

/** What every sign-up is told, whether or not the address already has an account. */
export function signupAnswer(email: string): string {
  return `Check the mail of ${email}: we have sent a link to finish making your account. It works once, for one day.`;
}

/**
 * The work of a sign-up, done after the answer has left (so the answer takes the same time
 * either way): a new address gets a link that makes the account; an address that already has
 * one gets a note telling its owner, with the ways back in.
 */
export async function mailSignupLink(input: SignUp): Promise<void> {
  const base = env().APP_URL;
  const existing = await getUserByEmail({ email: input.email });
  if (existing) {
    await sendMail({
      to: existing.email,
      subject: "Someone tried to make a Sinkwise account with your address",
      text: [
        `Hello ${existing.displayName},`,
        "",
        "Someone (perhaps you) tried to make a new Sinkwise account with this address, which already has one.",
        "No second account was made and nothing about yours has changed.",
        "",
        `To use your account, sign in: ${base}/signin`,
        `If you have forgotten the password, reset it: ${base}/reset`,
        "",
        "If it was not you, you can ignore this mail.",
      ].join("\n"),
    });
    return;
  }
  const token = await createSignupRequest({ email: input.email, displayName: input.displayName, passwordHash: await hashPassword(input.password) });
  await sendMail({
    to: input.email,
    subject: "Finish making your Sinkwise account",
    text: [
      `Hello ${input.displayName},`,
      "",
      "Open this link within one day to finish making your Sinkwise account:",
      "",
      `${base}/signup/finish/${token}`,
      "",
      "The link works once. If you did not ask for an account, ignore this mail and none will be made.",
    ].join("\n"),
  });
}
