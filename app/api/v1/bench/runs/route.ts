import { listVisibleRuns } from "@/server/bench/load";
import { benchLabels } from "@/lib/bench/labels";
import { READINGS_BODY_LIMIT } from "@/lib/bench/schema";
import { saveRunSchema } from "@/lib/bench/run-schema";
import { runSummaryJson } from "@/server/bench/json";
import { saveRun } from "@/server/bench/save";
import { requireUser } from "@/server/auth/session";
import { json, readJson, route } from "@/server/route";

/** The caller's own runs and the runs others shared. */
export const GET = route(async () => {
  const user = await requireUser();
  const runs = await listVisibleRuns({ viewer: user });
  return json({ runs: runs.map((r) => runSummaryJson(r, user)) });
});

/** Records a run (fitted first when it is a warm-up of a sink; nothing is saved if the fit is refused). */
export const POST = route(async (request) => {
  const user = await requireUser();
  const input = await readJson(request, saveRunSchema, "bench_run", benchLabels);
  const { id, fit } = await saveRun({ input, viewer: user });
  return json({ run: { id, url: `/bench/${id}` }, fit }, 201);
}, READINGS_BODY_LIMIT);
