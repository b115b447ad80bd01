import { solveBuildSchema } from "@/lib/builds/api-schemas";
import { requireUser } from "@/server/auth/session";
import { loadBuild, loadRevision } from "@/server/builds/load";
import { solveRevisionJson } from "@/server/builds/solve";
import { readJson, route } from "@/server/route";

/** Evaluates a revision (the current one unless `revision` is given): every mode and charging. */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  const { revision: number } = await readJson(request, solveBuildSchema, "solve");
  const revision = await loadRevision({ build, number });
  return new Response(await solveRevisionJson({ build, revision }), { headers: { "content-type": "application/json" } });
});
