import { removeBuildMember } from "@/db/queries/builds";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { loadBuild } from "@/server/builds/load";
import { json, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string; userId: string }> };

export const DELETE = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { id, userId } = await params;
  const build = await loadBuild({ id, viewer: user });
  if (!build.access.isOwner) throw new ApiError("forbidden:build", "Only the build's owner changes whom it is shared with.");
  if (!(await removeBuildMember({ buildId: build.id, userId }))) throw new ApiError("not_found:member", "This build is not shared with that person.", "userId");
  return json({ ok: true });
});
