import { listPartsForExport } from "@/db/queries/parts";
import { ApiError, fromZodError } from "@/lib/http/api-error";
import { MAX_EXPORT_ROWS, partListQuerySchema, partsToCsv, searchParamsObject } from "@/lib/parts";
import { currentViewer, queryOf, toPartInput } from "@/server/parts/api";
import { route } from "@/server/route";

/** CSV of one kind: every part the Parts bin's filter shows (not only the current page). */
export const GET = route(async (request) => {
  const viewer = await currentViewer();
  const parsed = partListQuerySchema.safeParse(searchParamsObject(queryOf(request)));
  if (!parsed.success) throw fromZodError(parsed.error, "query");
  const query = parsed.data;
  if (!query.kind) throw new ApiError("bad_request:query", "kind: an export holds one kind of part; choose a kind first", "kind");
  if (query.owner === "mine" && !viewer) throw new ApiError("unauthorized:session", "Sign in to export your own parts.", "owner");
  const rows = await listPartsForExport({ viewer, query, limit: MAX_EXPORT_ROWS });
  const csv = partsToCsv(rows.map(toPartInput), query.kind);
  return new Response(`${csv}\r\n`, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="sinkwise-${query.kind}-parts.csv"`,
      "cache-control": "no-store",
    },
  });
});
