import Papa from "papaparse";
import type { z } from "zod";
import { BARE_NUMBER, formatNumber, formatPath, fromStorage, parseQuantity, QUANTITY_INFO, unitChoiceOf, type UnitChoice } from "@/lib/units";
import { COMMON_FIELDS, type PartKind } from "./common";
import type { FieldDef } from "./fields";
import { formatModesCell, parseModesCell, type DriverMode } from "./modes";
import { KIND_DEFINITIONS } from "./registry";
import { PART_SCHEMAS, type Part, type PartInput } from "./schema";

/**
 * CSV of one kind of part. Columns are the common fields then the kind's specs fields;
 * a header is the field key with the unit of its bare numbers in brackets, e.g.
 * `rthJspKPerW [K/W]`, `baseLengthM [mm]`, `capacityCoulomb [mAh]`. The key names the stored
 * unit, the bracket the unit of the column (a person may change `[mm]` to `[in]`). A cell
 * may also carry its own unit ("0.8 in"). Curves are not part of the CSV.
 */
export interface CsvColumn {
  readonly header: string;
  readonly key: string;
  readonly scope: "common" | "specs";
  readonly field: FieldDef;
  /** Unit of bare numbers in this column; undefined for non-quantity fields. */
  readonly unit?: UnitChoice;
}

function defaultUnit(field: FieldDef): UnitChoice | undefined {
  return field.type === "quantity" ? (field.bareUnit ?? QUANTITY_INFO[field.quantity].bare) : undefined;
}

function headerOf(field: FieldDef, unit: UnitChoice | undefined): string {
  return unit && unit.label !== "" ? `${field.key} [${unit.label}]` : field.key;
}

export function csvColumns(kind: PartKind): CsvColumn[] {
  const common = COMMON_FIELDS.map((field): CsvColumn => ({ header: headerOf(field, defaultUnit(field)), key: field.key, scope: "common", field, unit: defaultUnit(field) }));
  const specs = KIND_DEFINITIONS[kind].fields.map((field: FieldDef): CsvColumn => ({ header: headerOf(field, defaultUnit(field)), key: field.key, scope: "specs", field, unit: defaultUnit(field) }));
  return [...common, ...specs];
}

export function csvHeaders(kind: PartKind): string[] {
  return csvColumns(kind).map((column) => column.header);
}

export interface CsvError {
  /** 1-based line as a spreadsheet numbers it (the header is line 1). */
  readonly line: number;
  /** The column header, when the error belongs to one cell. */
  readonly column?: string;
  readonly message: string;
}

export type CsvRowResult = { line: number; ok: true; part: Part } | { line: number; ok: false; errors: CsvError[] };

export interface CsvImport {
  /** Problems with the header itself; when present no row is read. */
  readonly headerErrors: CsvError[];
  readonly rows: CsvRowResult[];
}

const MAX_HEADER_CHARS = 200;

/**
 * "key [unit]" → its key and bracket (without a pattern that could backtrack on a long run
 * of spaces: this reads any header in one pass).
 */
function splitHeader(cell: string): { key: string; bracket: string | undefined } {
  const text = cell.trim();
  const open = text.indexOf("[");
  if (open < 0 || !text.endsWith("]") || text.indexOf("]") !== text.length - 1) return { key: text, bracket: undefined };
  return { key: text.slice(0, open).trim(), bracket: text.slice(open + 1, -1).trim() };
}

/** Matches the file's header against the kind's columns, honouring changed bracket units. */
function readHeader(cells: readonly string[], kind: PartKind): { columns: (CsvColumn | undefined)[]; errors: CsvError[] } {
  const known = csvColumns(kind);
  const errors: CsvError[] = [];
  const seen = new Set<string>();
  const columns = cells.map((cell): CsvColumn | undefined => {
    if (cell.length > MAX_HEADER_CHARS) {
      errors.push({ line: 1, column: `${cell.trim().slice(0, 40)}…`, message: `a column header is longer than ${MAX_HEADER_CHARS} characters; expected: ${known.map((c) => c.header).join(", ")}` });
      return undefined;
    }
    const { key, bracket } = splitHeader(cell);
    const column = known.find((c) => c.key.toLowerCase() === key.toLowerCase());
    if (!column) {
      errors.push({ line: 1, column: cell, message: `unknown column "${cell}" for a ${kind}; expected: ${known.map((c) => c.header).join(", ")}` });
      return undefined;
    }
    if (seen.has(column.key)) errors.push({ line: 1, column: cell, message: `column ${column.key} appears twice` });
    seen.add(column.key);
    if (bracket === undefined || column.field.type !== "quantity") return column;
    const probe = parseQuantity(`1 ${bracket}`, column.field.quantity);
    const plain = bracket === "" || bracket === "%";
    if (!plain && !probe.ok) {
      errors.push({ line: 1, column: cell, message: `unit [${bracket}]: ${probe.message}` });
      return undefined;
    }
    const unit = plain ? { math: bracket, label: bracket, scale: bracket === "%" ? 0.01 : 1 } : unitChoiceOf(bracket, column.field.quantity);
    if (!unit) {
      errors.push({ line: 1, column: cell, message: `unit [${bracket}]: not a unit of ${QUANTITY_INFO[column.field.quantity].name}` });
      return undefined;
    }
    return { ...column, header: cell.trim(), unit };
  });
  for (const column of known) {
    if (column.field.required && !seen.has(column.key) && column.scope === "common") {
      errors.push({ line: 1, column: column.header, message: `missing column ${column.header}` });
    }
  }
  return { columns, errors };
}

/** A bare number gets the column's unit written on, so the one part schema reads every cell. */
function cellValue(cell: string, column: CsvColumn): string {
  const text = cell.trim();
  if (!column.unit || !BARE_NUMBER.test(text) || column.unit.math === "") return text;
  return `${text} ${column.unit.math}`;
}

/** Maps a zod issue on the part back to the column it came from. */
function issueToError(issue: z.core.$ZodIssue, line: number, columns: readonly CsvColumn[], kind: PartKind): CsvError[] {
  const [first, second, ...rest] = issue.path;
  const key = first === "specs" ? second : first;
  if (issue.code === "unrecognized_keys") {
    return issue.keys.map((k) => ({ line, column: columns.find((c) => c.key === k)?.header ?? k, message: `does not apply to this ${kind}` }));
  }
  const column = columns.find((c) => c.key === key);
  const inner = first === "specs" ? formatPath(rest) : formatPath([second, ...rest].filter((p) => p !== undefined));
  return [{ line, column: column?.header ?? (typeof key === "string" ? key : undefined), message: inner ? `${inner}: ${issue.message}` : issue.message }];
}

/** One CSV row (header → cell) → a validated part of `kind`, or the errors of its cells. */
export function parsePartRow(row: Readonly<Record<string, string>>, kind: PartKind, line: number, columns: readonly CsvColumn[] = csvColumns(kind)): CsvRowResult {
  const common: Record<string, unknown> = {};
  const specs: Record<string, unknown> = {};
  const errors: CsvError[] = [];
  for (const column of columns) {
    const cell = row[column.header];
    // Empty cells are left out, so the other variant's columns of a heatsink stay silent.
    if (cell === undefined || cell.trim() === "") continue;
    const target = column.scope === "common" ? common : specs;
    if (column.field.type === "modes") {
      const modes = parseModesCell(cell);
      if (modes.ok) target[column.key] = modes.modes;
      else errors.push({ line, column: column.header, message: modes.message });
    } else {
      target[column.key] = cellValue(cell, column);
    }
  }
  if (errors.length > 0) return { line, ok: false, errors };
  const parsed = PART_SCHEMAS[kind].safeParse({ ...common, kind, specs } satisfies Record<string, unknown>);
  if (parsed.success) return { line, ok: true, part: parsed.data };
  return { line, ok: false, errors: parsed.error.issues.flatMap((issue) => issueToError(issue, line, columns, kind)) };
}

/**
 * Reads a whole CSV file of one kind for the import preview: which rows would be created
 * and which are rejected and why. The caller imports all-or-nothing.
 */
export function parsePartsCsv(text: string, kind: PartKind): CsvImport {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: false });
  const [headerCells, ...records] = parsed.data;
  if (!headerCells || headerCells.every((c) => c.trim() === "")) {
    return { headerErrors: [{ line: 1, message: `the file is empty; expected the header: ${csvHeaders(kind).join(", ")}` }], rows: [] };
  }
  const { columns, errors } = readHeader(headerCells, kind);
  if (errors.length > 0) return { headerErrors: errors, rows: [] };
  const present = columns.filter((c): c is CsvColumn => c !== undefined);
  const rows: CsvRowResult[] = [];
  records.forEach((cells, index) => {
    if (cells.every((c) => c.trim() === "")) return;
    const line = index + 2;
    if (cells.length > headerCells.length) {
      rows.push({ line, ok: false, errors: [{ line, message: `${cells.length} cells but the header has ${headerCells.length} columns` }] });
      return;
    }
    const row: Record<string, string> = {};
    columns.forEach((column, i) => {
      if (column) row[column.header] = unquoteFormulaCell(cells[i] ?? "");
    });
    rows.push(parsePartRow(row, kind, line, present));
  });
  return { headerErrors: [], rows };
}

function cellOf(value: unknown, column: CsvColumn): string {
  if (value === undefined || value === null) return "";
  if (column.field.type === "modes") return formatModesCell(value as DriverMode[]);
  if (column.field.type === "quantity" && typeof value === "number" && column.unit) {
    // 12 digits: the round trip returns the stored number, without binary noise.
    return formatNumber(fromStorage(value, column.field.quantity, column.unit), 12);
  }
  return String(value);
}

/** A part → one CSV row keyed by header, in the column units. */
export function partToCsvRow(part: Part | PartInput): Record<string, string> {
  const specs = part.specs as Readonly<Record<string, unknown>>;
  const common = part as unknown as Readonly<Record<string, unknown>>;
  return Object.fromEntries(
    csvColumns(part.kind).map((column) => [column.header, cellOf(column.scope === "common" ? common[column.key] : specs[column.key], column)]),
  );
}

/**
 * Cells a spreadsheet would run as a formula start with one of these (OWASP, "CSV
 * Injection"). On export such a cell gets a leading single quote, the usual spreadsheet-safe
 * form; the import takes that quote off again, so a file round-trips unchanged.
 */
const FORMULA_START = /^[=+\-@\t\r]/;

/** The import's half of the formula guard: "'-40" (as exported) reads as "-40". */
export function unquoteFormulaCell(cell: string): string {
  return cell.startsWith("'") && FORMULA_START.test(cell.slice(1)) ? cell.slice(1) : cell;
}

/** Parts of one kind → CSV text with the kind's header; formula-like cells are neutralised. */
export function partsToCsv(parts: readonly (Part | PartInput)[], kind: PartKind): string {
  const headers = csvHeaders(kind);
  const rows = parts.filter((p) => p.kind === kind).map((p) => headers.map((h) => partToCsvRow(p)[h] ?? ""));
  return Papa.unparse({ fields: headers, data: rows }, { escapeFormulae: FORMULA_START });
}
