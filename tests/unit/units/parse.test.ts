import { unit as globalUnit } from "mathjs";
import { describe, expect, it } from "vitest";
import { parseQuantity, type ParseResult, type Quantity } from "@/lib/units";

function si(result: ParseResult): number {
  if (!result.ok) throw new Error(`expected ok, got: ${result.message}`);
  return result.si;
}
const value = (text: string | number, quantity: Quantity) => si(parseQuantity(text, quantity));
const message = (text: string, quantity: Quantity) => {
  const result = parseQuantity(text, quantity);
  if (result.ok) throw new Error(`expected an error, got ${result.si}`);
  return result.message;
};

describe("parseQuantity: the issue's examples, against mathjs's own conversions", () => {
  // The global mathjs instance is the reference; our private instance must agree with it.
  const cases: Array<[string, Quantity, string]> = [
    ["20 mm", "length", "m"],
    ["0.8 in", "length", "m"],
    ["2.5 K/W", "thermalResistance", "K/W"],
    ["2000 mAh", "charge", "C"],
    ["45 g", "mass", "kg"],
    ["1.2 W/(m K)", "conductivity", "W/(m K)"],
    ["3.7 V", "voltage", "V"],
    ["700 mA", "current", "A"],
    ["5 W/(m^2 K)", "heatTransferCoefficient", "W/(m^2 K)"],
    ["85 degC", "temperature", "degC"],
    ["185 degF", "temperature", "degC"],
    ["40 mohm", "resistance", "ohm"],
    ["900 J/(kg K)", "specificHeat", "J/(kg K)"],
    ["2700 kg/m^3", "density", "kg/m^3"],
    ["9.6 Wh", "energy", "J"],
    ["30 min", "time", "s"],
    ["12 cm^2", "area", "m^2"],
    ["-2 mV/K", "voltageTempCoefficient", "V/K"],
  ];
  it.each(cases)("%s as %s", (text, quantity, storage) => {
    expect(value(text, quantity)).toBeCloseTo(globalUnit(text).toNumber(storage), 12);
  });
});

describe("parseQuantity: handbook conversion factors", () => {
  it("1 in = 25.4 mm exactly (international yard and pound agreement 1959; NIST SP 811 B.8)", () => {
    expect(value("1 in", "length")).toBe(0.0254);
    expect(value("0.8 in", "length")).toBeCloseTo(0.02032, 15);
  });
  it("1 in² = 645.16 mm² exactly (square of the inch above)", () => {
    expect(value("1 in^2", "area")).toBeCloseTo(645.16e-6, 15);
  });
  it("1 lb = 0.45359237 kg and 1 oz = 1/16 lb = 28.349523125 g (1959 agreement; NIST SP 811 B.8)", () => {
    expect(value("1 lb", "mass")).toBe(0.45359237);
    expect(value("1 oz", "mass")).toBeCloseTo(0.028349523125, 14);
  });
  it("°F = °C × 9/5 + 32 by definition (NIST SP 811 B.9): 185 °F = 85 °C, −40 °F = −40 °C", () => {
    expect(value("185 degF", "temperature")).toBeCloseTo(85, 9);
    expect(value("-40 °F", "temperature")).toBeCloseTo(-40, 9);
    expect(value("32 °F", "temperature")).toBeCloseTo(0, 9);
  });
  it("0 °C = 273.15 K (SI Brochure, 9th ed., 2.3.1)", () => {
    expect(value("358.15 K", "temperature")).toBeCloseTo(85, 9);
    expect(value("0 K", "temperature")).toBeCloseTo(-273.15, 9);
  });
  it("a temperature difference has no offset: 18 °F = 10 K = 10 °C of difference", () => {
    expect(value("18 degF", "temperatureDifference")).toBeCloseTo(10, 9);
    expect(value("10 degC", "temperatureDifference")).toBe(10);
    expect(value("10 K", "temperatureDifference")).toBe(10);
  });
  it("1 mAh = 3.6 C, since 1 C = 1 A·s (SI Brochure, table 4)", () => {
    expect(value("2000 mAh", "charge")).toBe(7200);
    expect(value("2.5 Ah", "charge")).toBe(9000);
  });
  it("1 Wh = 3600 J; 1 K·cm²/W = 1e-4 K·m²/W; 1 rad = 180/π degrees", () => {
    expect(value("9.6 Wh", "energy")).toBeCloseTo(34560, 9);
    expect(value("0.5 K cm^2/W", "resistancePerArea")).toBeCloseTo(5e-5, 15);
    expect(value("1 rad", "angle")).toBeCloseTo(180 / Math.PI, 9);
  });
  it("lumen is defined here (mathjs lacks it): 150 lm/W stays 150 lm/W", () => {
    expect(value("150 lm/W", "luminousEfficacy")).toBe(150);
    expect(value("0.15 klm/W", "luminousEfficacy")).toBe(150);
  });
});

describe("parseQuantity: spellings people type", () => {
  it.each([
    ["1.2 W/mK", "conductivity", 1.2],
    ["1.2 W/(m·K)", "conductivity", 1.2],
    ["5 W/m²K", "heatTransferCoefficient", 5],
    ["85 °C", "temperature", 85],
    ["85℃", "temperature", 85],
    ["40 mΩ", "resistance", 0.04],
    ["120°", "angle", 120],
    ["20mm", "length", 0.02],
    ["3 µm", "length", 3e-6],
    ["12 cm²", "area", 12e-4],
  ] as Array<[string, Quantity, number]>)("%s", (text, quantity, expected) => {
    expect(value(text, quantity)).toBeCloseTo(expected, 12);
  });
  it("cleans conversion noise: 700 mA is exactly 0.7 A", () => {
    expect(value("700 mA", "current")).toBe(0.7);
  });
});

describe("parseQuantity: bare numbers and plain quantities", () => {
  it("a bare number string is in the quantity's bare unit", () => {
    expect(value("20", "length")).toBe(0.02); // mm
    expect(value("45", "mass")).toBe(0.045); // g
    expect(value("2000", "charge")).toBe(7200); // mAh
    expect(value("85", "temperature")).toBe(85); // °C
    expect(value("12", "area")).toBeCloseTo(12e-4, 15); // cm²
  });
  it("the caller can say what a bare number means", () => {
    expect(si(parseQuantity("0.8", "length", { bareUnit: "in" }))).toBeCloseTo(0.02032, 15);
    expect(si(parseQuantity("185", "temperature", { bareUnit: "degF" }))).toBeCloseTo(85, 9);
  });
  it("a JS number is already in the storage unit", () => {
    expect(value(0.02, "length")).toBe(0.02);
    expect(value(85, "temperature")).toBe(85);
  });
  it("fractions: 0.9 is 0.9, 80 % is 0.8; percentages: a bare 90 is 90 %", () => {
    expect(value("0.9", "fraction")).toBe(0.9);
    expect(value("80 %", "fraction")).toBe(0.8);
    expect(value("80%", "percent")).toBe(0.8);
    expect(value("90", "percent")).toBe(0.9);
    expect(value("0.9", "dimensionless")).toBe(0.9);
    expect(value("12", "count")).toBe(12);
  });
});

describe("parseQuantity: errors", () => {
  it("names the expected quantity and what was given (the issue's example)", () => {
    expect(message("3 W", "length")).toBe("expected a length such as 20 mm; got a power (W)");
    expect(message("2 kW", "thermalResistance")).toBe("expected a thermal resistance such as 2.5 K/W; got a power (kW)");
    expect(message("20 mm", "fraction")).toBe("expected a fraction such as 0.9; got a length (mm)");
    expect(message("80 %", "length")).toBe("expected a length such as 20 mm; got a percentage (%)");
    expect(message("5 m/s", "length")).toBe('expected a length such as 20 mm; got "m / s"');
  });
  it("a temperature typed with C (the coulomb) gets a hint", () => {
    expect(message("85 C", "temperature")).toBe(
      "expected a temperature such as 85 °C; got a charge (C); write °C or degC for degrees",
    );
  });
  it("unknown units, words and missing numbers", () => {
    expect(message("3 xyz", "length")).toBe('unknown unit "xyz"; expected a length such as 20 mm');
    expect(message("abc", "length")).toBe('expected a length such as 20 mm; got "abc"');
    expect(message("mm", "length")).toBe('expected a length such as 20 mm (a number before the unit); got "mm"');
    expect(message("   ", "length")).toBe("required");
  });
  it("never returns NaN or Infinity", () => {
    const notFinite = "expected a length such as 20 mm; got a value that is not a finite number";
    expect(message("1e400 mm", "length")).toBe(notFinite);
    expect(message("1e400", "length")).toBe(notFinite);
    expect(parseQuantity(Number.NaN, "length").ok).toBe(false);
    expect(parseQuantity(Number.POSITIVE_INFINITY, "mass").ok).toBe(false);
    expect(message("NaN mm", "length")).toContain("expected a length");
  });
  it("rejects temperatures below absolute zero", () => {
    expect(message("-300 °C", "temperature")).toBe("must not be below absolute zero (−273.15 °C)");
  });
});
