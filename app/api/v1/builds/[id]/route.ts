import { buildReferences, deleteBuild, saveRevision, setBuildArchived, updateBuildMeta } from "@/db/queries/builds";
import { updateBuildSchema } from "@/lib/builds/api-schemas";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { assertDesignParts, loadBuild, loadBuildRevision, loadEditableBuild } from "@/server/builds/load";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { build, revision } = await loadBuildRevision({ id: (await params).id, viewer: user });
  return json({ build, revision });
});

export const PATCH = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const build = await loadEditableBuild({ id: (await params).id, viewer: user });
  const input = await readJson(request, updateBuildSchema, "build");
  if (input.visibility !== undefined && !build.access.isOwner) {
    throw new ApiError("forbidden:build", "Only the owner changes who can see the build.", "visibility");
  }
  if (input.archived !== undefined && !build.access.isOwner) {
    throw new ApiError("forbidden:build", "Only the owner archives a build.", "archived");
  }
  let revision = build.currentRevision;
  if (input.design) {
    const partIds = await assertDesignParts({ design: input.design, viewer: user });
    revision = await saveRevision({ buildId: build.id, userId: user.id, design: input.design, partIds, note: input.note });
  }
  await updateBuildMeta({ id: build.id, title: input.title, summary: input.summary, visibility: input.visibility });
  if (input.archived !== undefined) await setBuildArchived({ id: build.id, archived: input.archived });
  return json({ build: { id: build.id, currentRevision: revision } });
});

export const DELETE = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  if (!build.access.isOwner) throw new ApiError("forbidden:build", "Only the owner deletes a build.");
  // A review or a class points at exactly what was checked: such a build is archived, not destroyed.
  const refs = await buildReferences({ id: build.id });
  if (refs.reviews > 0 || refs.classwork > 0) {
    await setBuildArchived({ id: build.id, archived: true });
    const who = [refs.reviews > 0 ? (refs.reviews === 1 ? "a review" : `${refs.reviews} reviews`) : null, refs.classwork > 0 ? "a class" : null].filter(Boolean).join(" and ");
    return json({ ok: true, deleted: false, archived: true, message: `“${build.title}” was archived, not deleted: ${who} ${refs.reviews + refs.classwork === 1 ? "points" : "point"} at its revisions.` });
  }
  await deleteBuild({ id: build.id });
  return json({ ok: true, deleted: true, archived: false });
});
