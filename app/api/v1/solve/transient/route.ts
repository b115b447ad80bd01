import { solveTransient, transientRequestSchema } from "@/lib/thermal";
import { handleSolve } from "../_shared/handle-solve";

export const runtime = "nodejs";

/** POST `{ network, durationS, stepS, initialC?, thresholds? }`; answers the warm-up curves. */
export async function POST(request: Request): Promise<Response> {
  return handleSolve(request, transientRequestSchema, "transient", ({ network, ...options }) => solveTransient(network, options));
}
