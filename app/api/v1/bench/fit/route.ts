import { fitInputSchema, fitWarmUp, READINGS_BODY_LIMIT } from "@/lib/bench";
import { benchLabels } from "@/lib/bench/labels";
import { json, readJson, route } from "@/server/route";

/** Fits a heatsink's resistance and heat capacity to a warm-up: computes and stores nothing, so like the quick check it needs no account. */
export const POST = route(
  async (request) => {
    const input = await readJson(request, fitInputSchema, "bench", benchLabels);
    return json(fitWarmUp(input));
  },
  { stateless: true, ...READINGS_BODY_LIMIT },
);
