import "server-only";
import type { CsvError, CsvRowResult, PartKind } from "@/lib/parts";

function rowJson(row: CsvRowResult) {
  const errors: CsvError[] = row.ok ? [] : row.errors;
  return { line: row.line, ok: row.ok, name: row.ok ? row.part.name : null, errors };
}

/** What a CSV import answers about the file: each row's fate and the counts (preview and commit alike). */
export function importSummary(kind: PartKind, result: { headerErrors: CsvError[]; rows: CsvRowResult[] }) {
  const rows = result.rows.map(rowJson);
  const accepted = rows.filter((r) => r.ok).length;
  return { kind, headerErrors: result.headerErrors, rows, accepted, rejected: rows.length - accepted };
}

export type ImportSummaryJson = ReturnType<typeof importSummary>;
/** The import answer: the summary, its mode, and on commit how many parts were created. */
export type ImportResultJson = ImportSummaryJson & { mode: "preview" | "commit"; created?: number; ids?: string[] };
