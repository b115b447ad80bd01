import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { partSchema, partsToCsv, parsePartsCsv, type Part } from "@/lib/parts";
import { GOOD_PARTS } from "./fixtures";

// CSV injection: a cell starting with =, +, -, @, tab or CR is run as a formula by common
// spreadsheets (OWASP, "CSV Injection"); the usual safe form prefixes a single quote.
describe("CSV export neutralises formula-like cells, and the import reads them back", () => {
  const hostile: Part = partSchema.parse({
    ...GOOD_PARTS.emitter,
    name: '=HYPERLINK("http://evil.example","datasheet")',
    provenanceNote: "@SUM(A1:A9)",
  });

  it("prefixes every cell that starts with =, +, -, @, tab or CR with a single quote", () => {
    const csv = partsToCsv([hostile], "emitter");
    const [header, row] = Papa.parse<string[]>(csv).data;
    const cell = (key: string) => row?.[header?.indexOf(key) ?? -1];
    expect(cell("name")).toBe(`'${hostile.name}`);
    expect(cell("provenanceNote")).toBe("'@SUM(A1:A9)");
    // A negative number is a formula start too ("-2+3"): it is quoted like any other.
    expect(cell("vfTempCoeffVPerK [mV/K]")).toBe("'-2");
    for (const value of row ?? []) expect(value).not.toMatch(/^[=+\-@\t\r]/);
  });

  it("imports an export unchanged: the quote comes off again", () => {
    const result = parsePartsCsv(partsToCsv([hostile], "emitter"), "emitter");
    expect(result.headerErrors).toEqual([]);
    const row = result.rows[0];
    expect(row?.ok).toBe(true);
    if (!row?.ok) return;
    expect(row.part.name).toBe(hostile.name);
    expect(row.part.provenanceNote).toBe("@SUM(A1:A9)");
    expect((row.part.specs as Record<string, unknown>).vfTempCoeffVPerK).toBeCloseTo(-0.002, 12);
  });
});
