import fc from "fast-check";
import { z } from "zod";
import { describe, expect, it } from "vitest";
import {
  formatQuantity,
  METRIC_PREFERENCES,
  parseQuantity,
  QUANTITIES,
  QUANTITY_INFO,
  toDisplay,
  unitChoiceOf,
  unitField,
  fieldErrors,
  type Quantity,
  type UnitPreferences,
} from "@/lib/units";

const IMPERIAL_F: UnitPreferences = { length: "imperial", temperature: "F" };

describe("formatQuantity", () => {
  it("shows each quantity in a sensible unit", () => {
    expect(formatQuantity(0.0254, "length", METRIC_PREFERENCES)).toBe("25.4 mm");
    expect(formatQuantity(0.0254, "length", IMPERIAL_F)).toBe("1 in");
    expect(formatQuantity(85, "temperature", METRIC_PREFERENCES)).toBe("85 °C");
    expect(formatQuantity(85, "temperature", IMPERIAL_F)).toBe("185 °F");
    expect(formatQuantity(10, "temperatureDifference", IMPERIAL_F)).toBe("18 °F");
    expect(formatQuantity(7200, "charge", METRIC_PREFERENCES)).toBe("2 Ah");
    expect(formatQuantity(0.7, "current", METRIC_PREFERENCES)).toBe("700 mA");
    expect(formatQuantity(2.8, "current", METRIC_PREFERENCES)).toBe("2.8 A");
    expect(formatQuantity(0.045, "mass", METRIC_PREFERENCES)).toBe("45 g");
    expect(formatQuantity(0.8, "percent", METRIC_PREFERENCES)).toBe("80 %");
    expect(formatQuantity(0.9, "fraction", METRIC_PREFERENCES)).toBe("0.9");
    expect(formatQuantity(0.04, "resistance", METRIC_PREFERENCES)).toBe("40 mΩ");
    expect(formatQuantity(120, "angle", METRIC_PREFERENCES)).toBe("120°");
    expect(formatQuantity(1.2, "conductivity", IMPERIAL_F)).toBe("1.2 W/(m·K)");
    expect(formatQuantity(-0.002, "voltageTempCoefficient", METRIC_PREFERENCES)).toBe("-2 mV/K");
  });
  it("rounds to significant digits and never prints NaN", () => {
    expect(formatQuantity(1 / 3, "thermalResistance", METRIC_PREFERENCES)).toBe("0.3333 K/W");
    expect(formatQuantity(1 / 3, "thermalResistance", METRIC_PREFERENCES, { digits: 2 })).toBe("0.33 K/W");
    expect(formatQuantity(Number.NaN, "length", METRIC_PREFERENCES)).toBe("—");
  });
  it("a forced unit keeps a table column in one unit", () => {
    const mm = { math: "mm", label: "mm", scale: 1e-3 };
    expect(formatQuantity(1.5, "length", METRIC_PREFERENCES, { unit: mm })).toBe("1500 mm");
    expect(toDisplay(0.0254, "length", METRIC_PREFERENCES, mm).value).toBeCloseTo(25.4, 12);
  });
});

describe("display units without a unit library", () => {
  // The browser shows stored values with each unit's scale and offset; the server's parser
  // (mathjs) is the reference they must agree with, for every display unit of every quantity.
  it("every display unit's scale and offset agree with the parser", () => {
    for (const quantity of QUANTITIES) {
      const info = QUANTITY_INFO[quantity];
      for (const unit of [...info.metric, ...(info.imperial ?? []), info.bare]) {
        if (unit.label === "") continue;
        const zero = parseQuantity(`0 ${unit.label}`, quantity);
        const one = parseQuantity(`1 ${unit.label}`, quantity);
        if (!zero.ok || !one.ok) throw new Error(`${quantity} ${unit.label} does not parse`);
        const offset = quantity === "temperature" ? (unit.offset ?? 0) : 0;
        // The parser keeps 12 significant digits, so agreement is to about 1e-10 relative.
        expect(Math.abs(one.si - zero.si - unit.scale) / unit.scale, `${quantity} in ${unit.label}`).toBeLessThan(1e-9);
        expect(zero.si, `${quantity} zero in ${unit.label}`).toBeCloseTo(offset, 9);
      }
    }
  });
  it("a stored value shown in any unit parses back to itself", () => {
    for (const quantity of QUANTITIES) {
      const info = QUANTITY_INFO[quantity];
      if (info.storage === "") continue;
      fc.assert(
        fc.property(fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (stored) => {
          for (const unit of [...info.metric, ...(info.imperial ?? [])]) {
            const shown = toDisplay(stored, quantity, METRIC_PREFERENCES, unit).value;
            const back = parseQuantity(`${shown} ${unit.label}`, quantity);
            expect(back.ok && Math.abs(back.si - stored) <= 1e-9 * Math.max(1, Math.abs(stored))).toBe(true);
          }
        }),
        { numRuns: 50 },
      );
    }
  });
  it("a unit named in a header reads its scale and offset from the parser", () => {
    const f = unitChoiceOf("°F", "temperature");
    expect(f && toDisplay(100, "temperature", METRIC_PREFERENCES, f).value).toBeCloseTo(212, 6);
    const g = unitChoiceOf("g", "mass");
    expect(g?.scale).toBeCloseTo(1e-3, 15);
    expect(unitChoiceOf("g", "length")).toBeNull();
  });
});

describe("unitField", () => {
  const body = z.object({
    massKg: unitField("mass", { gt: 0 }),
    emissivity: unitField("fraction", { min: 0, max: 1, required: false }),
    finCount: unitField("count", { min: 1, required: false }),
  });

  it("accepts SI numbers and unit strings alike", () => {
    expect(body.parse({ massKg: 0.045 })).toEqual({ massKg: 0.045 });
    expect(body.parse({ massKg: "45 g", emissivity: "85 %", finCount: "12" })).toEqual({
      massKg: 0.045,
      emissivity: 0.85,
      finCount: 12,
    });
  });
  it("treats '' and null as 'not given' in optional fields", () => {
    expect(body.parse({ massKg: "1 oz", emissivity: "", finCount: null })).toEqual({
      massKg: 0.028349523125,
      emissivity: undefined,
      finCount: undefined,
    });
  });
  it("names the field and the reason", () => {
    const result = body.safeParse({ massKg: "-5 g", emissivity: 1.2, finCount: "2.5" });
    expect(result.success).toBe(false);
    if (result.success) return;
    expect(fieldErrors(result.error)).toEqual([
      { path: "massKg", message: "must be greater than 0 g" },
      { path: "emissivity", message: "must be at most 1" },
      { path: "finCount", message: "must be a whole number" },
    ]);
  });
  it("reports a missing required field, a wrong dimension and a wrong type", () => {
    const missing = body.safeParse({});
    expect(missing.success || fieldErrors(missing.error)).toEqual([{ path: "massKg", message: "required" }]);
    const wrong = body.safeParse({ massKg: "3 W" });
    expect(wrong.success || fieldErrors(wrong.error)).toEqual([
      { path: "massKg", message: "expected a mass such as 45 g; got a power (W)" },
    ]);
    const typed = body.safeParse({ massKg: true });
    expect(typed.success || fieldErrors(typed.error)).toEqual([
      { path: "massKg", message: "expected a number or a value with a unit" },
    ]);
  });
  it("shows percentage bounds in percent", () => {
    const efficiency = unitField("percent", { gt: 0, max: 1 });
    const result = efficiency.safeParse("120 %");
    expect(result.success || result.error.issues[0]?.message).toBe("must be at most 100 %");
  });
});

// Values a part might hold, in storage units, kept away from the extremes where a display
// unit would need an exponent no person types.
const magnitude = fc.double({ min: 1e-6, max: 1e6, noNaN: true, noDefaultInfinity: true });
const signed = fc.tuple(magnitude, fc.boolean()).map(([m, negative]) => (negative ? -m : m));
const prefsArb = fc.record({
  length: fc.constantFrom("metric" as const, "imperial" as const),
  temperature: fc.constantFrom("C" as const, "F" as const),
});

describe("properties", () => {
  it("parse(format(x)) ≈ x for every quantity and preference (4 significant digits)", () => {
    const quantity = fc.constantFrom<Quantity>(...QUANTITIES.filter((q) => q !== "count"));
    fc.assert(
      fc.property(quantity, signed, prefsArb, (q, raw, prefs) => {
        // Absolute temperatures cannot go below absolute zero; keep them in a physical band.
        const stored = q === "temperature" ? (((raw % 1000) + 1000) % 1000) - 200 : raw;
        const text = formatQuantity(stored, q, prefs);
        const back = parseQuantity(text, q);
        expect(back.ok, `${text}: ${back.ok ? "" : back.message}`).toBe(true);
        if (!back.ok) return;
        // Half a unit in the 4th digit of what was shown; in °F the shown number is |1.8 t + 32|.
        const shown = q === "temperature" ? Math.abs(stored) * 1.8 + 32 : Math.abs(stored);
        const tolerance = 6e-4 * shown;
        expect(Math.abs(back.si - stored)).toBeLessThanOrEqual(tolerance + 1e-9);
      }),
      { numRuns: 400 },
    );
  });
  it("parseQuantity never yields NaN or Infinity, whatever the text", () => {
    const quantity = fc.constantFrom<Quantity>(...QUANTITIES);
    const text = fc.oneof(
      fc.string(),
      fc.tuple(fc.double(), fc.constantFrom("mm", "in", "K/W", "%", "degF", "mAh", "")).map(([n, unit]) => `${n} ${unit}`),
    );
    fc.assert(
      fc.property(text, quantity, (t, q) => {
        const result = parseQuantity(t, q);
        if (result.ok) expect(Number.isFinite(result.si)).toBe(true);
        else expect(result.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 600 },
    );
  });
});
