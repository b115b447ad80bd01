import { z } from "zod";
import { listBuildMembers, putBuildMember } from "@/db/queries/builds";
import { getUserByEmail } from "@/db/queries/users";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { loadBuild } from "@/server/builds/load";
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

/** Anyone who may see the build sees who it is shared with; only the owner sees their e-mails. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  const members = await listBuildMembers({ buildId: build.id });
  return json({ members: build.access.isOwner ? members : members.map(({ email: _email, ...m }) => m) });
});

export const POST = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  if (!build.access.isOwner) throw new ApiError("forbidden:build", "Only the build's owner shares it.");
  const input = await readJson(request, addMemberSchema, "member");
  const member = await getUserByEmail({ email: input.email });
  // Said plainly: the owner must know whether the person they meant has an account yet.
  if (!member) throw new ApiError("bad_request:member", `No Sinkwise account uses ${input.email}.`, "email");
  if (member.id === build.ownerId) throw new ApiError("bad_request:member", "That is the owner's own address: the owner always edits.", "email");
  if (input.canEdit && member.role === "reviewer") {
    throw new ApiError("bad_request:member", "A reviewer never edits someone else's build: share it with them view-only.", "canEdit");
  }
  await putBuildMember({ buildId: build.id, userId: member.id, canEdit: input.canEdit });
  return json({ member: { userId: member.id, email: member.email, displayName: member.displayName, role: member.role, canEdit: input.canEdit } }, 201);
});
