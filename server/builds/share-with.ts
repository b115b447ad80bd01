import "server-only";
import { putBuildInvitation, putBuildMember } from "@/db/queries/builds";
import { getUserByEmail } from "@/db/queries/users";
import { env } from "@/server/env";
import { sendMail } from "@/server/mail";
import type { LoadedBuild } from "./load";

/** What the owner is told after sharing, the same whether or not an account uses the address. */
export function sharedAnswer({ email, canEdit }: { email: string; canEdit: boolean }): string {
  return `Shared with ${email} (${canEdit ? "can edit" : "views"}). We mail them a link; if no account uses that address yet, the build opens once they make one with it. Reviewers only ever view.`;
}

/**
 * Shares the build with an address: a membership when an account uses it, otherwise an
 * invitation that becomes one when an account is made with it. Returns the mail to send after
 * the answer has left (so the answer takes the same time either way).
 */
export async function shareBuild({ build, owner, email, canEdit }: { build: LoadedBuild; owner: { displayName: string }; email: string; canEdit: boolean }): Promise<() => Promise<void>> {
  const person = await getUserByEmail({ email });
  if (person) await putBuildMember({ buildId: build.id, userId: person.id, canEdit });
  else await putBuildInvitation({ buildId: build.id, email, canEdit });
  const base = env().APP_URL;
  const opening = person
    ? [`Open it here (signed in as ${email}):`, `${base}/builds/${build.id}`]
    : ["To open it, make a Sinkwise account with this address:", `${base}/signup`, "", "The build appears among your builds once the account is made."];
  return () =>
    sendMail({
      to: email,
      subject: `${owner.displayName} shared a Sinkwise build with you`,
      text: [`Hello,`, "", `${owner.displayName} shared the build "${build.title}" with you on Sinkwise (${canEdit ? "you may edit it" : "you may view it"}).`, "", ...opening].join("\n"),
    });
}
