import { solveBuildSchema } from "@/lib/builds/api-schemas";
import { requireUser } from "@/server/auth/session";
import { loadBuildToSolve } from "@/server/builds/load";
import { solveReadKeys, solveRevisionJson } from "@/server/builds/solve";
import { readJson, route } from "@/server/route";

/**
 * Evaluates a revision (the current one unless `revision` is given): every mode and charging.
 * Warm-up curves come as the charts draw them unless `curves: "full"` is asked for; the traces
 * come apart (`traces: "only"` reads them) unless `traces: "inline"` is asked for. Server-Timing
 * says the handler's time and, for a fresh evaluation, its own and its serialisation's
 * (`npm run bench` reads them).
 */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const t0 = performance.now();
  // The session is checked while the body is read and the build with it; without a session
  // the answer is 401, whatever the body or the build.
  const viewer = requireUser();
  viewer.catch(() => undefined);
  const { revision: number, ...shape } = await readJson(request, solveBuildSchema, "solve").catch(async (e: unknown) => {
    await viewer;
    throw e;
  });
  const { build, revision, reads } = await loadBuildToSolve({ id: (await params).id, viewer, number, ...solveReadKeys(shape) });
  const { body, evaluateMs, serializeMs } = await solveRevisionJson({ build, revision, shape, reads });
  const headers: Record<string, string> = { "content-type": "application/json" };
  // The handler's whole time, and of it the evaluation and its serialisation when they ran.
  const timing = [`handler;dur=${(performance.now() - t0).toFixed(2)}`];
  if (evaluateMs !== undefined) timing.push(`evaluate;dur=${evaluateMs.toFixed(2)}`);
  if (serializeMs !== undefined) timing.push(`serialize;dur=${serializeMs.toFixed(2)}`);
  headers["server-timing"] = timing.join(", ");
  return new Response(body, { headers });
});
