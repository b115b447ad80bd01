import { deletePart, getPart, updatePart } from "@/db/queries/parts";
import { attachmentKeys } from "@/db/queries/part-attachments";
import { unverifyPart } from "@/db/queries/part-verifications";
import { ApiError, fromZodError } from "@/lib/http/api-error";
import { PART_SCHEMAS, partPatchSchema } from "@/lib/parts";
import { requireUser } from "@/server/auth/session";
import { partUsageFor } from "@/server/builds/load";
import { currentViewer, editablePart, partJson, toPartInput, viewerOf, visiblePart } from "@/server/parts/api";
import { json, readJson, route } from "@/server/route";
import { deleteObject } from "@/server/storage";

type Context = { params: Promise<{ id: string }> };

export const GET = route<Context>(async (_request, { params }) => {
  const { id } = await params;
  const viewer = await currentViewer();
  return json({ part: partJson(await visiblePart(id, viewer), viewer) });
});

/** Common fields merge into the stored part; specs and curves replace it whole; then one validation. */
export const PATCH = route<Context>(async (request, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const viewer = viewerOf(user);
  const record = await editablePart(id, viewer);
  const patch = await readJson(request, partPatchSchema, "part");
  if (patch.kind !== undefined && patch.kind !== record.kind) {
    throw new ApiError("bad_request:part", `kind: a part's kind cannot change (this is a ${record.kind}); create a new part instead`, "kind");
  }
  const stored: Record<string, unknown> = { ...toPartInput(record) };
  for (const [key, value] of Object.entries(patch)) if (value !== undefined) stored[key] = value;
  const parsed = PART_SCHEMAS[record.kind].safeParse(stored);
  if (!parsed.success) throw fromZodError(parsed.error, "part");
  await updatePart({ id, part: parsed.data });
  // A check holds for the values that were checked: new values (or a new provenance) are unchecked.
  if (record.verified && (patch.specs !== undefined || patch.curves !== undefined || patch.provenance !== undefined)) await unverifyPart({ partId: id });
  const updated = await getPart({ id, viewer });
  if (!updated) throw new ApiError("not_found:part", "No such part.", "id");
  return json({ part: partJson(updated, viewer) });
});

export const DELETE = route<Context>(async (_request, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const record = await editablePart(id, viewerOf(user));
  const usage = await partUsageFor({ partId: id, viewer: viewerOf(user) });
  if (usage.count > 0) throw new ApiError("conflict:part_in_use", partInUseMessage(usage), "id");
  const keys = await attachmentKeys({ partId: id });
  await deletePart({ id });
  // The rows are gone (and cascaded); the stored bytes follow, best effort.
  await Promise.all(keys.map((key) => deleteObject({ key })));
  return json({ deleted: { id: record.id, name: record.name } });
});

/** "used by 3 builds ("Lantern" and 2 you cannot see)" — never the title of a build the caller may not see. */
function partInUseMessage({ count, visibleTitles }: { count: number; visibleTitles: string[] }): string {
  const builds = `${count} ${count === 1 ? "build" : "builds"}`;
  const unnamed = count - visibleTitles.length;
  if (visibleTitles.length === 0) return `This part is used by ${builds} that you cannot see; their owners would have to take it out first.`;
  const named = visibleTitles.map((t) => `"${t}"`);
  if (unnamed > 0) named.push(`${unnamed} you cannot see`);
  const list = named.length > 1 ? `${named.slice(0, -1).join(", ")} and ${named.at(-1)}` : named[0];
  return `This part is used by ${builds} (${list}); take it out of them first.`;
}
