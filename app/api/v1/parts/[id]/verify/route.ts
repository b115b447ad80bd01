import { getPart, setPartVerified } from "@/db/queries/parts";
import { ApiError } from "@/lib/http/api-error";
import { verifySchema } from "@/lib/parts";
import { requireUser } from "@/server/auth/session";
import { partJson, viewerOf, visiblePart } from "@/server/parts/api";
import { json, readJson, route } from "@/server/route";

/** Admins curate the catalogue: a verified part has been checked against its source. */
export const PATCH = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const { id } = await params;
  const user = await requireUser("admin");
  const viewer = viewerOf(user);
  await visiblePart(id, viewer);
  const { verified } = await readJson(request, verifySchema, "verify");
  await setPartVerified({ id, verified });
  const record = await getPart({ id, viewer });
  if (!record) throw new ApiError("not_found:part", "No such part.", "id");
  return json({ part: partJson(record, viewer) });
});
