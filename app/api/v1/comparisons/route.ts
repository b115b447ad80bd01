import { createComparison, listComparisons } from "@/db/queries/comparisons";
import { saveComparisonSchema } from "@/lib/reviews/api-schemas";
import { requireUser } from "@/server/auth/session";
import { loadItems } from "@/server/compare/load";
import { json, readJson, route } from "@/server/route";

export const GET = route(async () => {
  const user = await requireUser();
  return json({ comparisons: await listComparisons({ ownerId: user.id }) });
});

/** Saves a comparison of builds the caller may see (all of them, or nothing is saved). */
export const POST = route(async (request) => {
  const user = await requireUser();
  const input = await readJson(request, saveComparisonSchema, "comparison");
  await loadItems({ items: input.items, viewer: user });
  const { id } = await createComparison({ ownerId: user.id, title: input.title, items: input.items });
  return json({ comparison: { id, title: input.title, items: input.items, url: `/compare?saved=${id}` } }, 201);
});
