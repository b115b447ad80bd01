import { revokeShareLink } from "@/db/queries/shares";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { loadBuild } from "@/server/builds/load";
import { json, route } from "@/server/route";

/** Revokes a share link: the next request with its token is refused. */
export const DELETE = route<{ params: Promise<{ id: string; shareId: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const p = await params;
  const build = await loadBuild({ id: p.id, viewer: user });
  if (!build.access.isOwner) throw new ApiError("forbidden:build", "Only the build's owner manages its share links.");
  const revoked = await revokeShareLink({ id: p.shareId, buildId: build.id });
  if (!revoked) throw new ApiError("not_found:share", "No such active share link on this build.", "shareId");
  return json({ ok: true });
});
