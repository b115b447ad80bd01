import { createParts } from "@/db/queries/parts";
import { ApiError } from "@/lib/http/api-error";
import { MAX_IMPORT_ROWS, parsePartsCsv, partImportSchema, type CsvError } from "@/lib/parts";
import { requireUser } from "@/server/auth/session";
import { importSummary, type ImportResultJson } from "@/server/parts/import";
import { json, readJson, route } from "@/server/route";

function describe(error: CsvError): string {
  return `line ${error.line}${error.column ? `, ${error.column}` : ""}: ${error.message}`;
}

/**
 * CSV import of one kind. `preview` says which rows would be created and which are refused
 * and why; `commit` creates every row in one transaction, or nothing when any row is bad.
 */
export const POST = route(async (request) => {
  const user = await requireUser();
  const { kind, csv, mode } = await readJson(request, partImportSchema, "import");
  const result = parsePartsCsv(csv, kind);
  if (result.rows.length > MAX_IMPORT_ROWS) {
    throw new ApiError("payload_too_large:import", `The file has ${result.rows.length} rows; import at most ${MAX_IMPORT_ROWS} at a time.`, "csv");
  }
  const summary = importSummary(kind, result);
  const { rows, accepted, rejected } = summary;
  if (mode === "preview") return json({ mode, ...summary } satisfies ImportResultJson);

  const problems = [...result.headerErrors, ...result.rows.flatMap((r) => (r.ok ? [] : r.errors))];
  if (problems.length > 0 || accepted === 0) {
    const message =
      result.headerErrors.length > 0
        ? `Nothing was imported: the header does not fit a ${kind} (${result.headerErrors.map(describe).join("; ")}).`
        : accepted === 0 && rejected === 0
          ? "Nothing was imported: the file has a header but no rows."
          : `Nothing was imported: ${rejected} of ${rows.length} rows are rejected (${problems.slice(0, 5).map(describe).join("; ")}${problems.length > 5 ? "; …" : ""}). Fix them or remove them, then import again.`;
    const error = new ApiError("unprocessable:import", message, "csv");
    return json({ ...error.toBody(), ...summary }, error.status);
  }
  const ids = await createParts({ ownerId: user.id, parts: result.rows.flatMap((r) => (r.ok ? [r.part] : [])) });
  return json({ mode, ...summary, created: ids.length, ids } satisfies ImportResultJson, 201);
});
