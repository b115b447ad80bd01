import { after } from "next/server";
import { createPasswordResetToken, getUserByEmail } from "@/db/queries/users";
import { resetRequestSchema } from "@/lib/auth/schemas";
import { env } from "@/server/env";
import { clientAddress } from "@/server/http/client-address";
import { sendMail } from "@/server/mail";
import { consumeResetRequest } from "@/server/rate-limit";
import { json, readJson, route } from "@/server/route";

async function mailResetLink(email: string): Promise<void> {
  const user = await getUserByEmail({ email });
  if (!user) return;
  const token = await createPasswordResetToken({ userId: user.id });
  const link = `${env().APP_URL}/reset/${token}`;
  await sendMail({
    to: user.email,
    subject: "Reset your Sinkwise password",
    text: [
      `Hello ${user.displayName},`,
      "",
      "Someone (hopefully you) asked to reset the password of your Sinkwise account.",
      `Open this link within one hour to choose a new password:`,
      "",
      link,
      "",
      "The link works once. If you did not ask for it, ignore this mail; your password stays as it is.",
    ].join("\n"),
  });
}

/**
 * Same answer, in the same time, whether or not the account exists: the look-up, the token
 * and the mail happen after the answer has been sent.
 */
export const POST = route(async (request) => {
  const { email } = await readJson(request, resetRequestSchema, "reset");
  await consumeResetRequest(email, clientAddress(request));
  after(() =>
    mailResetLink(email).catch((error: unknown) => {
      console.error("[reset] could not send the reset mail:", error);
    }),
  );
  return json({ ok: true, message: "If an account exists for that address, a reset link is on its way." });
});
