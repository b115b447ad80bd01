import { getComparison } from "@/db/queries/comparisons";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { loadItems } from "@/server/compare/load";
import { json, route } from "@/server/route";

/** A saved comparison: its owner, or anyone who may see every build in it; else 404. */
export const GET = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const saved = await getComparison({ id: (await params).id });
  const notFound = new ApiError("not_found:comparison", "No such saved comparison, or it compares builds you may not see.", "id");
  if (!saved) throw notFound;
  if (saved.ownerId !== user.id) await loadItems({ items: saved.items, viewer: user }).catch(() => Promise.reject(notFound));
  return json({ comparison: saved });
});
