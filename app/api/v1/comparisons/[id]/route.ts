import { requireUser } from "@/server/auth/session";
import { loadComparison } from "@/server/compare/load";
import { json, route } from "@/server/route";

/** A saved comparison: its owner, or anyone who may see every build in it; else 404. */
export const GET = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  return json({ comparison: await loadComparison({ id: (await params).id, viewer: user }) });
});
