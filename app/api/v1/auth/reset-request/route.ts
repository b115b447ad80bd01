import { createPasswordResetToken, getUserByEmail } from "@/db/queries/users";
import { resetRequestSchema } from "@/lib/auth/schemas";
import { env } from "@/server/env";
import { sendMail } from "@/server/mail";
import { json, readJson, route } from "@/server/route";

export const POST = route(async (request) => {
  const { email } = await readJson(request, resetRequestSchema, "reset");
  const user = await getUserByEmail({ email });
  if (user) {
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
  // Same answer whether or not the account exists.
  return json({ ok: true, message: "If an account exists for that address, a reset link is on its way." });
});
