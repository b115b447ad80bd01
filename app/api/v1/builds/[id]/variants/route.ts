import { listVariants } from "@/db/queries/builds";
import { requireUser } from "@/server/auth/session";
import { loadBuild } from "@/server/builds/load";
import { json, route } from "@/server/route";

export const GET = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  return json({ variants: await listVariants({ id: build.id, viewer: user }) });
});
