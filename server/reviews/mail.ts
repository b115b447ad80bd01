import "server-only";
import { env } from "@/server/env";
import { REVIEW_STATUS_LABELS, type VerdictStatus } from "@/lib/reviews/api-schemas";
import { sendMail } from "@/server/mail";

export function appUrl(path: string): string {
  return `${env().APP_URL.replace(/\/$/, "")}${path}`;
}

/**
 * Sends a review e-mail. The review is already stored and notified in the app, so an SMTP
 * failure is logged and reported as `mailed: false` rather than failing the request.
 */
async function trySend(mail: { to: string; subject: string; text: string }): Promise<boolean> {
  try {
    await sendMail(mail);
    return true;
  } catch (error) {
    console.error("[mail] review mail not sent:", error instanceof Error ? error.message : error);
    return false;
  }
}

export function mailReviewRequest(input: { to: string; reviewId: string; buildTitle: string; revision: number; makerName: string; message: string }): Promise<boolean> {
  const link = appUrl(`/reviews/${input.reviewId}`);
  return trySend({
    to: input.to,
    subject: `Review requested: ${input.buildTitle} (revision ${input.revision})`,
    text: [
      `${input.makerName} asks you to review revision ${input.revision} of "${input.buildTitle}" on Sinkwise.`,
      ...(input.message ? ["", `Their note: ${input.message}`] : []),
      "",
      `Open the review: ${link}`,
      "",
      "You can read the build and its Budget, pin comments to the heat path and record a verdict.",
    ].join("\n"),
  });
}

export function mailVerdict(input: { to: string; reviewId: string; buildId: string; buildTitle: string; revision: number; reviewerName: string; status: VerdictStatus; summary: string }): Promise<boolean> {
  return trySend({
    to: input.to,
    subject: `Verdict on ${input.buildTitle}: ${REVIEW_STATUS_LABELS[input.status]}`,
    text: [
      `${input.reviewerName} reviewed revision ${input.revision} of "${input.buildTitle}": ${REVIEW_STATUS_LABELS[input.status]}.`,
      "",
      input.summary,
      "",
      `Read the review: ${appUrl(`/reviews/${input.reviewId}`)}`,
      `Open the build: ${appUrl(`/builds/${input.buildId}`)}`,
    ].join("\n"),
  });
}
