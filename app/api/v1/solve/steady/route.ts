import { networkSchema, solveSteady } from "@/lib/thermal";
import { handleSolve } from "../_shared/handle-solve";

export const runtime = "nodejs";

/** POST a network (JSON v1); answers its steady state. */
export async function POST(request: Request): Promise<Response> {
  return handleSolve(request, networkSchema, "network", (network) => solveSteady(network));
}
