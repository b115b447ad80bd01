import { solveBuildSchema } from "@/lib/builds/api-schemas";
import { requireUser } from "@/server/auth/session";
import { loadBuildRevision } from "@/server/builds/load";
import { solveRevisionJson } from "@/server/builds/solve";
import { readJson, route } from "@/server/route";

/**
 * Evaluates a revision (the current one unless `revision` is given): every mode and charging.
 * Warm-up curves come as the charts draw them unless `curves: "full"` is asked for. Server-Timing
 * says the handler's time and, for a fresh evaluation, its own and its serialisation's
 * (`npm run bench` reads them).
 */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const t0 = performance.now();
  const user = await requireUser();
  const { revision: number, curves } = await readJson(request, solveBuildSchema, "solve");
  const { build, revision } = await loadBuildRevision({ id: (await params).id, viewer: user, number });
  const { body, evaluateMs, serializeMs } = await solveRevisionJson({ build, revision, curves });
  const headers: Record<string, string> = { "content-type": "application/json" };
  // The handler's whole time, and of it the evaluation and its serialisation when they ran.
  const timing = [`handler;dur=${(performance.now() - t0).toFixed(2)}`];
  if (evaluateMs !== undefined) timing.push(`evaluate;dur=${evaluateMs.toFixed(2)}`);
  if (serializeMs !== undefined) timing.push(`serialize;dur=${serializeMs.toFixed(2)}`);
  headers["server-timing"] = timing.join(", ");
  return new Response(body, { headers });
});
