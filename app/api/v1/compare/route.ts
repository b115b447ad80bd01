import { fromZodError } from "@/lib/http/api-error";
import { compareQuerySchema } from "@/lib/reviews/api-schemas";
import { requireUser } from "@/server/auth/session";
import { compareItems } from "@/server/compare/load";
import { json, route } from "@/server/route";

/** GET ?items=buildId[@revision],… (two to four): the whole comparison, or a refusal of all of it. */
export const GET = route(async (request) => {
  const user = await requireUser();
  const parsed = compareQuerySchema.safeParse({ items: new URL(request.url).searchParams.get("items") ?? undefined });
  if (!parsed.success) throw fromZodError(parsed.error, "compare");
  return json(await compareItems({ items: parsed.data.items, viewer: user }));
});
