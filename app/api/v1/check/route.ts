import { quickCheck, quickCheckInputSchema } from "@/lib/retrofit";
import { json, readJson, route } from "@/server/route";

/** The quick check: no account needed; stateless, so it is open to any origin. */
export const POST = route(
  async (request) => {
    const input = await readJson(request, quickCheckInputSchema, "check");
    return json(quickCheck(input));
  },
  { stateless: true },
);
