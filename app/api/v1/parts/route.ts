import { createPart, getPart, listParts } from "@/db/queries/parts";
import { ApiError, fromZodError } from "@/lib/http/api-error";
import { partListQuerySchema, partSchema, searchParamsObject } from "@/lib/parts";
import { requireUser } from "@/server/auth/session";
import { currentViewer, partJson, queryOf, summaryJson, viewerOf } from "@/server/parts/api";
import { json, readJson, route } from "@/server/route";

/** The Parts bin: what the viewer may see, filtered, searched, sorted and paged in SQL. */
export const GET = route(async (request) => {
  const viewer = await currentViewer();
  const parsed = partListQuerySchema.safeParse(searchParamsObject(queryOf(request)));
  if (!parsed.success) throw fromZodError(parsed.error, "query");
  const query = parsed.data;
  if (query.owner === "mine" && !viewer) throw new ApiError("unauthorized:session", "Sign in to see your own parts.", "owner");
  const page = await listParts({ viewer, query });
  return json({ ...page, items: page.items.map((item) => summaryJson(item, viewer)) });
});

export const POST = route(async (request) => {
  const user = await requireUser();
  const part = await readJson(request, partSchema, "part");
  const id = await createPart({ ownerId: user.id, part });
  const record = await getPart({ id, viewer: viewerOf(user) });
  if (!record) throw new ApiError("not_found:part", "The part was saved but cannot be read back.", "id");
  return json({ part: partJson(record, viewerOf(user)) }, 201);
});
