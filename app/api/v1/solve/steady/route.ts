import { networkSchema, solveSteady } from "@/lib/thermal";
import { json, readJson, route } from "@/server/route";

export const runtime = "nodejs";

/** POST a network (JSON v1); answers its steady state. Computes only, so any origin may call it. */
export const POST = route(async (request) => json(solveSteady(await readJson(request, networkSchema, "network"))), { stateless: true });
