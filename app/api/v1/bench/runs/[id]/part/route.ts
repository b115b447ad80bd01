import { keepPartSchema } from "@/lib/bench/run-schema";
import { requireUser } from "@/server/auth/session";
import { loadOwnBenchRun } from "@/server/bench/load";
import { keepPart } from "@/server/bench/save";
import { json, readJson, route } from "@/server/route";

/** Keeps the run's fit as a measured heatsink part, the run attached as its evidence (the run's owner only). */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const run = await loadOwnBenchRun({ id: (await params).id, viewer: user });
  const input = await readJson(request, keepPartSchema, "part");
  const partId = await keepPart({ run, name: input.name, visibility: input.visibility });
  return json({ part: { id: partId, url: `/parts/${partId}` } }, 201);
});
