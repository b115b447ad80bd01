import Papa from "papaparse";
import { formatPath, fromStorage, parseQuantity, QUANTITY_INFO, unitChoiceOf, type UnitChoice } from "@/lib/units";
import { CURVE_KIND_INFO, type CurveAxis, type CurveKind } from "./kinds";
import { curveSchema, type CurvePoint } from "./schema";

/** One problem in pasted text; `line` is 1-based as an editor or spreadsheet shows it. */
export interface CsvLineError {
  readonly line: number | null;
  readonly message: string;
}

export type CurveCsvResult = { ok: true; points: CurvePoint[] } | { ok: false; errors: CsvLineError[] };

const UNIT_IN_HEADER = /\[([^\]]*)\]/;
const LOOKS_NUMERIC = /^\s*[+-]?(\d|\.\d)/;

/**
 * The unit a header cell names in brackets ("Tj [°F]"), checked against the axis quantity.
 * "[]" or "[1]" on a plain axis means a bare fraction rather than a percentage.
 */
export function headerUnit(cell: string, axis: CurveAxis): { ok: true; unit: UnitChoice | undefined } | { ok: false; message: string } {
  const match = UNIT_IN_HEADER.exec(cell);
  if (!match) return { ok: true, unit: undefined };
  const label = (match[1] ?? "").trim();
  if (label === "" || label === "1") return { ok: true, unit: { math: "", label: "", scale: 1 } };
  if (label === "%") return { ok: true, unit: { math: "%", label: "%", scale: 0.01 } };
  const probe = parseQuantity(`1 ${label}`, axis.quantity);
  if (!probe.ok) return { ok: false, message: `unit [${label}]: ${probe.message}` };
  const unit = unitChoiceOf(label, axis.quantity);
  if (!unit) return { ok: false, message: `unit [${label}]: not a unit of ${QUANTITY_INFO[axis.quantity].name}` };
  return { ok: true, unit };
}

/** Semicolon- and tab-separated sheets from comma-decimal locales write 0,95 for 0.95. */
function decimalPoint(cell: string, delimiter: string): string {
  return delimiter !== "," && /^\s*[+-]?\d+,\d+\s*$/.test(cell) ? cell.replace(",", ".") : cell;
}

/**
 * Pasted two-column text (comma, semicolon or tab separated; header optional) → points in
 * storage units. Bare numbers are in the axis's default unit (°C, A, V, %) unless the header
 * names one in brackets; cells may carry their own unit ("700 mA").
 */
export function parseCurveCsv(text: string, kind: CurveKind): CurveCsvResult {
  const info = CURVE_KIND_INFO[kind];
  const parsed = Papa.parse<string[]>(text.trim(), { skipEmptyLines: "greedy" });
  const delimiter = parsed.meta.delimiter;
  const rows = parsed.data.map((cells) => cells.map((c) => c.trim()));
  const errors: CsvLineError[] = [];
  let units: [UnitChoice | undefined, UnitChoice | undefined] = [undefined, undefined];
  let start = 0;

  const first = rows[0];
  if (first && !LOOKS_NUMERIC.test(first[0] ?? "")) {
    start = 1;
    const xUnit = headerUnit(first[0] ?? "", info.x);
    const yUnit = headerUnit(first[1] ?? "", info.y);
    if (!xUnit.ok) errors.push({ line: 1, message: `x: ${xUnit.message}` });
    if (!yUnit.ok) errors.push({ line: 1, message: `y: ${yUnit.message}` });
    units = [xUnit.ok ? xUnit.unit : undefined, yUnit.ok ? yUnit.unit : undefined];
  }

  const points: CurvePoint[] = [];
  const lineOfPoint: number[] = [];
  rows.slice(start).forEach((row, offset) => {
    const line = start + offset + 1;
    const cells = row.filter((cell, index) => cell !== "" || index < 2);
    if (cells.length !== 2) {
      errors.push({ line, message: `expected 2 columns (${info.x.label.toLowerCase()}, ${info.y.label.toLowerCase()}); got ${cells.length}` });
      return;
    }
    const x = parseQuantity(decimalPoint(cells[0] ?? "", delimiter), info.x.quantity, { bareUnit: units[0] });
    const y = parseQuantity(decimalPoint(cells[1] ?? "", delimiter), info.y.quantity, { bareUnit: units[1] });
    if (!x.ok) errors.push({ line, message: `x: ${x.message}` });
    if (!y.ok) errors.push({ line, message: `y: ${y.message}` });
    if (x.ok && y.ok) {
      points.push({ x: x.si, y: y.si });
      lineOfPoint.push(line);
    }
  });
  if (errors.length > 0) return { ok: false, errors };

  // The same schema as the API checks order, count and bounds; its points[i] paths are
  // turned back into the line the person pasted.
  const checked = curveSchema(kind).safeParse({ points });
  if (!checked.success) {
    return {
      ok: false,
      errors: checked.error.issues.map((issue) => {
        const index = issue.path[1];
        const line = typeof index === "number" ? (lineOfPoint[index] ?? null) : null;
        const axis = issue.path[2];
        const where = typeof axis === "string" ? axis : formatPath(issue.path);
        return { line, message: where === "" ? issue.message : `${where}: ${issue.message}` };
      }),
    };
  }
  return { ok: true, points: checked.data.points };
}

/** Points → two-column CSV in the axis's default display units, header included. */
export function curveToCsv(points: readonly CurvePoint[], kind: CurveKind): string {
  const info = CURVE_KIND_INFO[kind];
  const xUnit = QUANTITY_INFO[info.x.quantity].bare;
  const yUnit = QUANTITY_INFO[info.y.quantity].bare;
  const header = [`${info.x.label} [${xUnit.label}]`, `${info.y.label} [${yUnit.label}]`];
  const rows = points.map((p) => [displayBare(p.x, info.x), displayBare(p.y, info.y)]);
  return Papa.unparse([header, ...rows]);
}

function displayBare(value: number, axis: CurveAxis): string {
  // 12 digits: exact enough to round-trip, short enough not to show binary noise (0.95 × 100).
  return String(Number(fromStorage(value, axis.quantity, QUANTITY_INFO[axis.quantity].bare).toPrecision(12)));
}
