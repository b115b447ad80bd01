import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  DASH,
  FIGURE_KINDS,
  formatAgainstLimit,
  formatDuration,
  formatFigure,
  formatHeadroom,
  formatTraceValue,
  parseShown,
  type FigureKind,
} from "@/lib/units/figures";

const NUMERIC_KINDS = FIGURE_KINDS.filter((k): k is Exclude<FigureKind, "time" | "money"> => k !== "time" && k !== "money");
const anyNumber = fc.oneof(fc.double({ noNaN: false }), fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.constantFrom(0, -0, 1e-12, -1e-12, -0.4, -0.04, 0.5, -0.5));
const finite = fc.double({ min: -2000, max: 2000, noNaN: true, noDefaultInfinity: true });
const NEGATIVE_ZERO = /(^|[^\d.])[-−]0(\.0+)?(?![.\d])/;

describe("one formatter for every figure", () => {
  it("shows each kind in its unit and precision", () => {
    expect(formatFigure(87.4, "temperature")).toBe("87 °C");
    expect(formatFigure(87.4, "temperature", { temperatureUnit: "F" })).toBe("189 °F");
    expect(formatFigure(3.44, "temperatureDifference")).toBe("3.4 K");
    expect(formatFigure(12.6, "temperatureDifference")).toBe("13 K");
    expect(formatFigure(7.0234, "power")).toBe("7.02 W");
    expect(formatFigure(2.345, "thermalResistance")).toBe("2.35 K/W");
    expect(formatFigure(812.4, "flux")).toBe("812 lm");
    expect(formatFigure(0.873, "percent")).toBe("87 %");
    expect(formatFigure(7.4, "voltage")).toBe("7.40 V");
    expect(formatFigure(0.7, "current")).toBe("0.70 A");
    expect(formatFigure(7200, "charge")).toBe("2000 mAh");
    expect(formatFigure(0.92, "dimensionless")).toBe("0.920");
    expect(formatFigure(12.5, "money")).toBe("€12.50");
    expect(formatFigure(23400, "time")).toBe("6 h 30 min");
    expect(formatFigure(null, "power")).toBe(DASH);
  });

  it("never prints NaN, Infinity or a negative zero, for any kind and any number", () => {
    fc.assert(
      fc.property(anyNumber, fc.constantFrom(...FIGURE_KINDS), fc.constantFrom<"C" | "F">("C", "F"), (v, kind, t) => {
        const s = formatFigure(v, kind, { temperatureUnit: t });
        expect(s).not.toMatch(/NaN|Infinity/);
        expect(s).not.toMatch(NEGATIVE_ZERO);
        if (!Number.isFinite(v)) expect(s).toBe(DASH);
      }),
    );
  });

  it("gives dimensionless numbers no unit, never the unit 1", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), (v) => {
        for (const kind of ["dimensionless", "fraction"] as const) expect(formatFigure(v, kind)).not.toMatch(/ 1$|\s/);
        expect(formatTraceValue(v, "1")).not.toMatch(/ 1$/);
      }),
    );
  });

  it("shows every time in hours and minutes (seconds only below a minute)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e6, noNaN: true }), (s) => {
        const text = formatDuration(s);
        expect(text).toMatch(/^(\d+ s|\d+ min|\d+ h|\d+ h \d+ min)$/);
        const seconds = text.endsWith(" s") ? Number(text.split(" ")[0]) : [...text.matchAll(/(\d+) (h|min)/g)].reduce((a, m) => a + Number(m[1]) * (m[2] === "h" ? 3600 : 60), 0);
        expect(Math.abs(seconds - s)).toBeLessThanOrEqual(30.0001);
        if (!text.endsWith(" s")) expect(Number(text.match(/(\d+) min/)?.[1] ?? 0)).toBeLessThan(60);
      }),
    );
    // A runtime reads the same from a trace in hours as from a figure in seconds.
    expect(formatTraceValue(6.5, "h")).toBe(formatDuration(6.5 * 3600));
  });

  it("stays within half a shown digit of the value", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.constantFrom(...NUMERIC_KINDS.filter((k) => !["dimensionless", "fraction", "percent", "charge", "energy", "length", "area", "resistance", "mass"].includes(k))), (v, kind) => {
        const text = formatFigure(v, kind);
        const decimals = (text.split(" ")[0]!.split(".")[1] ?? "").length;
        expect(Math.abs(parseShown(text) - v)).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-9 * Math.abs(v));
      }),
    );
  });

  it("never shows a value that fails its limit as equal to it", () => {
    fc.assert(
      fc.property(finite, finite, fc.constantFrom<"max" | "min">("max", "min"), fc.constantFrom(...NUMERIC_KINDS.filter((k) => k !== "dimensionless" && k !== "fraction")), fc.constantFrom<"C" | "F">("C", "F"), (a, b, direction, kind, t) => {
        const r = formatAgainstLimit(a, b, direction, kind, { temperatureUnit: t });
        const v = parseShown(r.value);
        const l = parseShown(r.limit);
        if (r.fails) {
          if (direction === "max") expect(v).toBeGreaterThan(l);
          else expect(v).toBeLessThan(l);
          expect(r.relation).toBe(direction === "max" ? ">" : "<");
        } else if (direction === "max") expect(v).toBeLessThanOrEqual(l);
        else expect(v).toBeGreaterThanOrEqual(l);
      }),
    );
    // The case a reader met: 100.2 °C against a 100 °C limit (both then shown to the same digit).
    expect(formatAgainstLimit(100.2, 100, "max", "temperature")).toMatchObject({ value: "100.2 °C", limit: "100.0 °C", relation: ">", fails: true });
    expect(formatAgainstLimit(100.0000001, 100, "max", "temperature")).toMatchObject({ value: "100.001 °C", limit: "100.000 °C" });
    expect(formatAgainstLimit(99.6, 100, "max", "temperature")).toMatchObject({ value: "100 °C", relation: "≤", fails: false });
  });

  it("never shows a failed headroom as zero or as a positive figure", () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: -1e-9, noNaN: true }), (h) => {
        const text = formatHeadroom(h);
        expect(parseShown(text)).toBeLessThan(0);
        expect(text).not.toMatch(NEGATIVE_ZERO);
      }),
    );
    expect(formatHeadroom(-0.2)).toBe("−0.2 K");
    expect(formatHeadroom(-0.0)).toBe("0.0 K");
  });

  it("prints a trace's quantities with their units, scientific where a number is huge", () => {
    expect(formatTraceValue(3.2e6, "1")).toBe("3.20×10⁶");
    expect(formatTraceValue(0.0254, "m")).toBe("25.40 mm");
    expect(formatTraceValue(350.15, "K")).toBe("350.1 K");
    expect(formatTraceValue(7200, "C")).toBe("2000.0 mAh");
    expect(formatTraceValue(0.1234, "W/K")).toBe("0.123 W/K");
  });
});
