import { previewDesignSchema } from "@/lib/builds/api-schemas";
import { requireUser } from "@/server/auth/session";
import { loadEditableBuild } from "@/server/builds/load";
import { previewDesign } from "@/server/builds/preview";
import { json, readJson, route } from "@/server/route";

/**
 * The live editor's check of an unsaved design: problems, verdict per mode, headroom and
 * heat path, with nothing written. A design that does not read answers 200 with its
 * issues in plain words (a draft with mistakes is the normal case while typing).
 */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const build = await loadEditableBuild({ id: (await params).id, viewer: user });
  const { design } = await readJson(request, previewDesignSchema, "preview");
  return json(await previewDesign({ build, design, viewer: user }));
});
