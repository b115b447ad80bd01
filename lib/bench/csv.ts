import Papa from "papaparse";
import { MAX_READINGS } from "./schema";

/**
 * A logger's CSV → readings. The maker maps columns (time, temperature, optionally the
 * place); units written in the headers — `min`, `h`, `°F`, `K` — are understood, and
 * clock times (12:03:07) count from the first row. Problems name the CSV row or column.
 */
export interface LoggerTable {
  header: string[];
  rows: string[][];
  /** Columns where every non-empty cell reads as a number or a clock time. */
  numericColumns: number[];
  /** Row number in the file of rows[0] (1 after a header line). */
  firstRowNumber: number;
}

export interface ColumnMapping {
  time: number;
  temperature: number;
  place?: number;
}

export type TimeUnit = "s" | "min" | "h";
export type TempUnit = "C" | "F" | "K";

export class CsvProblem extends Error {
  constructor(message: string, readonly where: string) {
    super(message);
  }
}

const CLOCK = /^(\d{1,2}):(\d{2})(?::(\d{2}(?:[.,]\d+)?))?$/;

/** A cell as a number: decimal point or comma, or a clock time in seconds; null if neither. */
export function cellValue(cell: string): number | null {
  const s = cell.trim();
  if (s === "") return null;
  const clock = CLOCK.exec(s);
  if (clock) return Number(clock[1]) * 3600 + Number(clock[2]) * 60 + Number((clock[3] ?? "0").replace(",", "."));
  const normal = /^[-+]?\d+,\d+$/.test(s) ? s.replace(",", ".") : s;
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(normal)) return null;
  return Number(normal);
}

export function parseLoggerCsv(text: string): LoggerTable {
  const parsed = Papa.parse<string[]>(text.trim(), { skipEmptyLines: "greedy", delimiter: "" });
  const data = parsed.data.filter((r) => r.some((c) => c.trim() !== ""));
  if (data.length === 0) throw new CsvProblem("The file is empty.", "file");
  const hasHeader = data[0]!.some((c) => c.trim() !== "" && cellValue(c) === null);
  const header = hasHeader ? data[0]!.map((c) => c.trim()) : data[0]!.map((_, i) => `column ${i + 1}`);
  const rows = hasHeader ? data.slice(1) : data;
  if (rows.length >= MAX_READINGS + 1) {
    throw new CsvProblem(`The file has ${rows.length.toLocaleString("en-GB")} rows; a run takes at most ${MAX_READINGS.toLocaleString("en-GB")}. Keep every tenth row, or split the run.`, "file");
  }
  if (rows.length === 0) throw new CsvProblem("The file has a header but no rows of readings.", "file");
  const width = Math.max(...data.map((r) => r.length));
  const numericColumns: number[] = [];
  for (let c = 0; c < width; c++) {
    let seen = 0;
    let ok = true;
    for (const r of rows) {
      const cell = r[c] ?? "";
      if (cell.trim() === "") continue;
      if (cellValue(cell) === null) {
        ok = false;
        break;
      }
      seen++;
    }
    if (ok && seen > 0) numericColumns.push(c);
  }
  if (numericColumns.length === 0) throw new CsvProblem("No column of the file holds numbers, so there are no readings to take from it.", "file");
  return { header: Array.from({ length: width }, (_, i) => header[i] || `column ${i + 1}`), rows, numericColumns, firstRowNumber: hasHeader ? 2 : 1 };
}

/** The unit a header names: `time (min)`, `t [s]`, `Temp °F`, `sink/K`. */
export function headerTimeUnit(header: string): TimeUnit {
  const h = header.toLowerCase();
  if (/\b(min|minutes?)\b/.test(h)) return "min";
  if (/\b(h|hours?|hr)\b/.test(h)) return "h";
  return "s";
}

export function headerTempUnit(header: string): TempUnit {
  if (/°\s*f\b|\(f\)|\[f\]|\bdeg\s*f\b|fahrenheit/i.test(header)) return "F";
  if (/\(k\)|\[k\]|\bkelvin\b|\/\s*k\b/i.test(header)) return "K";
  return "C";
}

/** First guess of the mapping: a column named like time and one like temperature, else the first two numeric columns. */
export function guessMapping(table: LoggerTable): ColumnMapping {
  const named = (re: RegExp) => table.numericColumns.find((c) => re.test(table.header[c] ?? ""));
  const time = named(/time|^t\b|elapsed|seconds|min/i) ?? table.numericColumns[0]!;
  const temperature = named(/temp|°|sink|deg|celsius|fahrenheit/i) ?? table.numericColumns.find((c) => c !== time) ?? time;
  const placeColumn = table.header.findIndex((h, i) => /place|where|probe|channel|sensor/i.test(h) && !table.numericColumns.includes(i));
  return placeColumn >= 0 ? { time, temperature, place: placeColumn } : { time, temperature };
}

const toSeconds: Record<TimeUnit, number> = { s: 1, min: 60, h: 3600 };
const toCelsius = (v: number, unit: TempUnit) => (unit === "F" ? ((v - 32) * 5) / 9 : unit === "K" ? v - 273.15 : v);

/**
 * Readings from the mapped columns, times counted from the first row. Units come from the
 * headers unless given. A row with a blank or unreadable cell is named by its row number.
 */
export function readingsFromTable(table: LoggerTable, mapping: ColumnMapping, units: { time?: TimeUnit; temperature?: TempUnit } = {}): { tS: number; tempC: number; place?: string }[] {
  const used = [mapping.time, mapping.temperature, ...(mapping.place !== undefined ? [mapping.place] : [])];
  const twice = used.find((c, i) => used.indexOf(c) !== i);
  if (twice !== undefined) throw new CsvProblem(`Column “${table.header[twice]}” is mapped twice; give time and temperature a column each.`, "mapping");
  for (const [role, c] of [["time", mapping.time], ["temperature", mapping.temperature]] as const) {
    if (!table.numericColumns.includes(c)) throw new CsvProblem(`Column “${table.header[c] ?? c + 1}” (mapped to ${role}) does not hold numbers.`, "mapping");
  }
  const tu = units.time ?? headerTimeUnit(table.header[mapping.time] ?? "");
  const cu = units.temperature ?? headerTempUnit(table.header[mapping.temperature] ?? "");
  const isClock = table.rows.some((r) => CLOCK.test((r[mapping.time] ?? "").trim()));
  let t0: number | null = null;
  const out: { tS: number; tempC: number; place?: string }[] = [];
  table.rows.forEach((r, i) => {
    const row = table.firstRowNumber + i;
    const t = cellValue(r[mapping.time] ?? "");
    const v = cellValue(r[mapping.temperature] ?? "");
    if (t === null) throw new CsvProblem(`Row ${row}: the time cell is blank or does not read as a number.`, `row ${row}`);
    if (v === null) throw new CsvProblem(`Row ${row}: the temperature cell is blank or does not read as a number.`, `row ${row}`);
    const seconds = isClock ? t : t * toSeconds[tu];
    t0 ??= seconds;
    const place = mapping.place !== undefined ? (r[mapping.place] ?? "").trim() : undefined;
    out.push({ tS: Math.round((seconds - t0) * 1000) / 1000, tempC: Math.round(toCelsius(v, cu) * 1e4) / 1e4, ...(place ? { place } : {}) });
  });
  return out;
}
