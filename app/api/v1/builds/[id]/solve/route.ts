import { solveBuildSchema } from "@/lib/builds/api-schemas";
import { requireUser } from "@/server/auth/session";
import { loadBuild, loadRevision } from "@/server/builds/load";
import { solveRevisionJson } from "@/server/builds/solve";
import { readJson, route } from "@/server/route";

/**
 * Evaluates a revision (the current one unless `revision` is given): every mode and charging.
 * Warm-up curves come as the charts draw them unless `curves: "full"` is asked for; a fresh
 * evaluation says its own time in Server-Timing (`npm run bench` reads it).
 */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  const { revision: number, curves } = await readJson(request, solveBuildSchema, "solve");
  const revision = await loadRevision({ build, number });
  const { json, evaluateMs } = await solveRevisionJson({ build, revision, curves });
  const headers: Record<string, string> = { "content-type": "application/json" };
  if (evaluateMs !== undefined) headers["server-timing"] = `evaluate;dur=${evaluateMs.toFixed(2)}`;
  return new Response(json, { headers });
});
