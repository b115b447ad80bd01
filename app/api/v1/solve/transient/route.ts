import { solveTransient, transientRequestSchema } from "@/lib/thermal";
import { json, readJson, route } from "@/server/route";

export const runtime = "nodejs";

/** POST `{ network, durationS, stepS, initialC?, thresholds? }`; answers the warm-up curves. Computes only, so any origin may call it. */
export const POST = route(
  async (request) => {
    const { network, ...options } = await readJson(request, transientRequestSchema, "transient");
    return json(solveTransient(network, options));
  },
  { stateless: true },
);
