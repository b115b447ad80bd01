import "server-only";
import { sendMail } from "@/server/mail";
import { appUrl } from "@/server/reviews/mail";

/** Sends one Classroom e-mail; a failure is logged and reported, the stored change stands. */
async function trySend(mail: { to: string; subject: string; text: string }): Promise<boolean> {
  try {
    await sendMail(mail);
    return true;
  } catch (error) {
    console.error("[mail] class mail not sent:", error instanceof Error ? error.message : error);
    return false;
  }
}

/** One text for every address, whether or not it has an account: the link handles both. */
export function mailInvitation(input: { to: string; token: string; className: string; term: string; instructorName: string }): Promise<boolean> {
  const link = appUrl(`/join/${input.token}`);
  return trySend({
    to: input.to,
    subject: `Invitation to the class ${input.className}`,
    text: [
      `${input.instructorName} invites you to the class "${input.className}"${input.term ? ` (${input.term})` : ""} on Sinkwise.`,
      "",
      `Join the class: ${link}`,
      "",
      "If you have no Sinkwise account yet, the link makes one for this address. If you have one, signing in with this address adds you to the class (or open the link once signed in).",
      "The link works once and for 7 days.",
    ].join("\n"),
  });
}

export function mailFeedback(input: { to: string; classId: string; exerciseId: string; exerciseTitle: string; instructorName: string; mark: string | null }): Promise<boolean> {
  return trySend({
    to: input.to,
    subject: `Feedback on your hand-in: ${input.exerciseTitle}`,
    text: [
      `${input.instructorName} left feedback on your hand-in for "${input.exerciseTitle}"${input.mark ? ` (mark: ${input.mark})` : ""}.`,
      "",
      `Read it: ${appUrl(`/classes/${input.classId}/exercises/${input.exerciseId}`)}`,
    ].join("\n"),
  });
}
