import { z } from "zod";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { loadBuild, loadRevision } from "@/server/builds/load";
import { json, route } from "@/server/route";

const numberSchema = z.coerce.number().int().positive();

export const GET = route<{ params: Promise<{ id: string; number: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const p = await params;
  const n = numberSchema.safeParse(p.number);
  if (!n.success) throw new ApiError("bad_request:revision", "A revision is a whole number from 1.", "number");
  const build = await loadBuild({ id: p.id, viewer: user });
  return json({ revision: await loadRevision({ build, number: n.data }) });
});
