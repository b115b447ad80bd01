import { createBuild } from "@/db/queries/builds";
import { forkBuildSchema, MAX_TITLE_CHARS } from "@/lib/builds/api-schemas";
import { collectPartIds } from "@/lib/builds/part-ids";
import { requireUser } from "@/server/auth/session";
import { loadBuild, loadDesignParts, loadRevision } from "@/server/builds/load";
import { json, readJson, route } from "@/server/route";
import { ApiError } from "@/lib/http/api-error";

/** Copies a revision into a new build of the caller's; with a variantNote it is a variant. */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  const input = await readJson(request, forkBuildSchema, "fork");
  const revision = await loadRevision({ build, number: input.revision });
  const visible = await loadDesignParts({ design: revision.design, viewer: user });
  const partIds = collectPartIds(revision.design);
  const hidden = partIds.filter((id) => !visible.has(id));
  if (hidden.length) throw new ApiError("forbidden:part", `This build uses parts that are private to their owner (${hidden.join(", ")}); it cannot be copied.`);
  const isVariant = input.variantNote !== undefined && build.access.isOwner;
  const title = input.title ?? (isVariant ? `${build.title} — ${input.variantNote}` : `${build.title} (copy)`);
  if (title.length > MAX_TITLE_CHARS) {
    throw new ApiError(
      "bad_request:fork",
      `title: the copy's title would be "${title.slice(0, 40)}…", ${title.length} characters; titles hold at most ${MAX_TITLE_CHARS}. Give the copy a shorter title.`,
      "title",
    );
  }
  const created = await createBuild({
    ownerId: user.id,
    title,
    summary: build.summary,
    visibility: "private",
    design: revision.design,
    partIds,
    note: `Copied from "${build.title}" revision ${revision.number}`,
    variantOf: isVariant ? (build.variantOf ?? build.id) : null,
    variantNote: input.variantNote ?? null,
  });
  return json({ build: created }, 201);
});
