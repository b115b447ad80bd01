import { after } from "next/server";
import { z } from "zod";
import { listBuildMembers, listBuildShares } from "@/db/queries/builds";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { loadBuild } from "@/server/builds/load";
import { shareBuild, sharedAnswer } from "@/server/builds/share-with";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

// Same normalisation as sign-up stores the address, so a differently cased e-mail still finds the user.
const addMemberSchema = z.object({
  email: z
    .string({ error: "Enter the e-mail address of the person to share with." })
    .trim()
    .toLowerCase()
    .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.org." })),
  canEdit: z.boolean({ error: "canEdit is true or false." }).default(false),
});

/**
 * The owner sees every address the build is shared with (whether or not an account uses it
 * yet, so the list does not tell); anyone else who may see the build sees the members' names.
 */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  if (build.access.isOwner) return json({ members: await listBuildShares({ buildId: build.id }) });
  const members = await listBuildMembers({ buildId: build.id });
  return json({ members: members.map(({ email: _email, userId: _id, ...m }) => m) });
});

/** Shares with an address: the same answer whether or not an account uses it; the mail goes after the answer. */
export const POST = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  if (!build.access.isOwner) throw new ApiError("forbidden:build", "Only the build's owner shares it.");
  const input = await readJson(request, addMemberSchema, "member");
  if (input.email === user.email) throw new ApiError("bad_request:member", "That is your own address: the owner always edits.", "email");
  const mail = await shareBuild({ build, owner: user, email: input.email, canEdit: input.canEdit });
  after(() =>
    mail().catch((error: unknown) => {
      console.error("[members] could not send the share mail:", error);
    }),
  );
  return json({ member: { email: input.email, canEdit: input.canEdit }, message: sharedAnswer(input) }, 201);
});
