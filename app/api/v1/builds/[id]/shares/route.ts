import { createShareLink, listShareLinks } from "@/db/queries/shares";
import { ApiError } from "@/lib/http/api-error";
import { createShareSchema } from "@/lib/reviews/api-schemas";
import { expiryFrom, shareState } from "@/lib/reviews/share-token";
import { requireUser } from "@/server/auth/session";
import { loadBuild, loadRevision, type LoadedBuild } from "@/server/builds/load";
import { appUrl } from "@/server/reviews/mail";
import { hashShareToken, newShareToken } from "@/server/reviews/tokens";
import { json, readJson, route } from "@/server/route";
import type { BuildViewer } from "@/lib/builds/access";

type Ctx = { params: Promise<{ id: string }> };

async function ownedBuild(id: string, viewer: NonNullable<BuildViewer>): Promise<LoadedBuild> {
  const build = await loadBuild({ id, viewer });
  if (!build.access.isOwner) throw new ApiError("forbidden:build", "Only the build's owner manages its share links.");
  return build;
}

export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const build = await ownedBuild((await params).id, user);
  const now = new Date();
  return json({ shares: (await listShareLinks({ buildId: build.id })).map((s) => ({ ...s, state: shareState(s, now) })) });
});

/** A read-only link to one revision; the token is in this answer only, the database keeps its hash. */
export const POST = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const build = await ownedBuild((await params).id, user);
  const input = await readJson(request, createShareSchema, "share");
  const revision = await loadRevision({ build, number: input.revision });
  const token = newShareToken();
  const share = await createShareLink({ buildId: build.id, revisionNumber: revision.number, tokenHash: hashShareToken(token), createdBy: user.id, expiresAt: expiryFrom(input.expiresInDays) });
  return json({ share: { ...share, state: "active", token, url: appUrl(`/share/${token}`) } }, 201);
});
