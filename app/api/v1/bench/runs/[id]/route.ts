import { requireUser } from "@/server/auth/session";
import { runJson } from "@/server/bench/json";
import { loadBenchRun } from "@/server/bench/load";
import { json, route } from "@/server/route";

/** One run: its owner's, or anyone signed in when it is shared; else 404. */
export const GET = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const run = await loadBenchRun({ id: (await params).id, viewer: user });
  return json({ run: runJson(run, user) });
});
