import { createPart, getPart } from "@/db/queries/parts";
import { ApiError, fromZodError } from "@/lib/http/api-error";
import { PART_SCHEMAS } from "@/lib/parts";
import { requireUser } from "@/server/auth/session";
import { partJson, toPartInput, viewerOf, visiblePart } from "@/server/parts/api";
import { json, route } from "@/server/route";

const NAME_MAX = 120;
const SUFFIX = " (copy)";

/**
 * Copies a part the caller may see into the caller's own bin: private, unverified, without
 * attachments (the datasheet stays with the original), so it can be changed freely.
 */
export const POST = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const viewer = viewerOf(user);
  const source = await visiblePart(id, viewer);
  const name = `${source.name.slice(0, NAME_MAX - SUFFIX.length)}${SUFFIX}`;
  const parsed = PART_SCHEMAS[source.kind].safeParse({ ...toPartInput(source), name, visibility: "private" });
  if (!parsed.success) throw fromZodError(parsed.error, "part");
  const copyId = await createPart({ ownerId: user.id, part: parsed.data });
  const copy = await getPart({ id: copyId, viewer });
  if (!copy) throw new ApiError("not_found:part", "The copy was saved but cannot be read back.", "id");
  return json({ part: partJson(copy, viewer) }, 201);
});
