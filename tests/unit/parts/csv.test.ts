import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { csvHeaders, PART_KINDS, partSchema, partsToCsv, parsePartsCsv, partToCsvRow, type Part } from "@/lib/parts";
import { GOOD_PARTS } from "./fixtures";

const parse = (value: unknown): Part => partSchema.parse(value);

describe("CSV headers", () => {
  it("name the key and the unit of bare numbers", () => {
    expect(csvHeaders("emitter")).toEqual([
      "name",
      "provenance",
      "provenanceNote",
      "visibility",
      "costEur",
      "rthJspKPerW [K/W]",
      "maxTjC [°C]",
      "vfV [V]",
      "vfRefCurrentA [A]",
      "vfTempCoeffVPerK [mV/K]",
      "efficacyLmPerW [lm/W]",
      "heatFraction",
      "beamAngleDeg [°]",
      "boardLengthM [mm]",
      "boardWidthM [mm]",
    ]);
    expect(csvHeaders("cell")).toContain("capacityCoulomb [mAh]");
    expect(csvHeaders("cell")).toContain("internalResistanceOhm [mΩ]");
  });
});

describe("CSV round trip", () => {
  it.each(PART_KINDS)("%s: part → CSV → part is the same part", (kind) => {
    const part = parse(GOOD_PARTS[kind]);
    const text = partsToCsv([part], kind);
    const back = parsePartsCsv(text, kind);
    expect(back.headerErrors).toEqual([]);
    expect(back.rows).toHaveLength(1);
    const row = back.rows[0]!;
    expect(row.ok, JSON.stringify(row)).toBe(true);
    // Curves are not carried by the CSV.
    if (row.ok) expect(row.part).toEqual({ ...part, curves: {} });
  });
  it("writes cells in the column units", () => {
    const row = partToCsvRow(parse(GOOD_PARTS.cell));
    expect(row["capacityCoulomb [mAh]"]).toBe("3000");
    expect(row["internalResistanceOhm [mΩ]"]).toBe("30");
    expect(row["massKg [g]"]).toBe("46");
    expect(partToCsvRow(parse(GOOD_PARTS.driver))["modes"]).toBe("low: 0.35 A, 90 %; high: 2.8 A, 85 %");
  });
});

function csvOf(rows: string[][]): string {
  return Papa.unparse(rows);
}

describe("CSV import preview", () => {
  const header = ["name", "provenance", "specifiedAs", "conductivityWPerMK [W/(m·K)]", "bondLineM [mm]", "resistancePerAreaKM2PerW [K·cm²/W]"];

  it("sorts good rows from bad ones, naming line, column and reason", () => {
    const text = csvOf([
      header,
      ["Grey paste", "datasheet", "bulk", "3", "0.05", ""],
      ["Pad", "estimate", "perArea", "", "", "0.8"],
      ["Bad paste", "datasheet", "bulk", "3 W", "", ""],
      ["", "", "", "", "", ""],
      ["Mixed", "guess", "perArea", "3", "", "0.5"],
    ]);
    const result = parsePartsCsv(text, "interface");
    expect(result.headerErrors).toEqual([]);
    expect(result.rows.map((r) => [r.line, r.ok])).toEqual([
      [2, true],
      [3, true],
      [4, false],
      [6, false],
    ]);
    const [good, perArea, bad, mixed] = result.rows;
    expect(good?.ok && good.part.specs).toEqual({ specifiedAs: "bulk", conductivityWPerMK: 3, bondLineM: 5e-5 });
    expect(perArea?.ok && perArea.part.specs).toEqual({ specifiedAs: "perArea", resistancePerAreaKM2PerW: 8e-5 });
    expect(bad?.ok === false && bad.errors).toEqual([
      { line: 4, column: "conductivityWPerMK [W/(m·K)]", message: "expected a thermal conductivity such as 1.2 W/(m K); got a power (W)" },
      { line: 4, column: "bondLineM [mm]", message: "required" },
    ]);
    expect(mixed?.ok === false && mixed.errors).toEqual([
      { line: 6, column: "provenance", message: "must be one of: datasheet, measured, estimate" },
      { line: 6, column: "conductivityWPerMK [W/(m·K)]", message: "does not apply to this interface" },
    ]);
  });
  it("honours a unit changed in the header, and units written in cells", () => {
    const text = csvOf([
      ["name", "provenance", "material", "thicknessM [in]", "widthM [mm]", "lengthM"],
      ["Strap", "measured", "copper-pure", "0.004", "1 in", "60 mm"],
    ]);
    const row = parsePartsCsv(text, "spreader").rows[0];
    expect(row?.ok && row.part.specs).toEqual({ material: "copper-pure", thicknessM: 0.0001016, widthM: 0.0254, lengthM: 0.06 });
  });
  it("rejects wrong headers before reading any row", () => {
    const text = csvOf([
      ["name", "provenance", "colour", "thicknessM [W]"],
      ["x", "estimate", "red", "1"],
    ]);
    const result = parsePartsCsv(text, "spreader");
    expect(result.rows).toEqual([]);
    expect(result.headerErrors.map((e) => e.message)).toEqual([
      expect.stringMatching(/^unknown column "colour" for a spreader; expected: name, provenance/),
      "unit [W]: expected a length such as 20 mm; got a power (W)",
    ]);
    expect(parsePartsCsv(csvOf([["provenance", "material"]]), "spreader").headerErrors).toEqual([
      { line: 1, column: "name", message: "missing column name" },
    ]);
    expect(parsePartsCsv("", "spreader").headerErrors[0]?.message).toMatch(/^the file is empty/);
  });
  it("reads driver modes from one cell and reports a malformed one", () => {
    const header = ["name", "provenance", "topology", "inputVoltageMinV [V]", "inputVoltageMaxV [V]", "modes"];
    const text = csvOf([
      header,
      ["Boost", "estimate", "boost", "0.9", "1.5", "low: 100 mA, 80 %; high: 1 W, 75 %"],
      ["Broken", "estimate", "boost", "0.9", "1.5", "turbo 3 A"],
    ]);
    const [good, bad] = parsePartsCsv(text, "driver").rows;
    expect(good?.ok && good.part.kind === "driver" && good.part.specs.modes).toEqual([
      { name: "low", outputCurrentA: 0.1, efficiency: 0.8 },
      { name: "high", outputPowerW: 1, efficiency: 0.75 },
    ]);
    expect(bad?.ok === false && bad.errors).toEqual([
      { line: 3, column: "modes", message: 'mode 1 ("turbo 3 A"): write it as name: output, efficiency (e.g. high: 2.8 A, 85 %)' },
    ]);
  });
});
