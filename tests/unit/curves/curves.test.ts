import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { curveSchema, curvesSchema, curveToCsv, interpolate, parseCurveCsv, type CurvePoint } from "@/lib/curves";
import { describeFieldError, fieldErrors } from "@/lib/units";

// A generic white emitter's flux falling with junction temperature (invented, plausible).
const FLUX_VS_TJ: CurvePoint[] = [
  { x: 25, y: 1 },
  { x: 50, y: 0.95 },
  { x: 85, y: 0.88 },
  { x: 125, y: 0.78 },
];

function errorsOf(value: unknown, kind: Parameters<typeof curveSchema>[0] = "fluxVsTj"): string[] {
  const result = curveSchema(kind).safeParse(value);
  return result.success ? [] : fieldErrors(result.error).map(describeFieldError);
}

describe("curveSchema", () => {
  it("accepts a valid table, numbers or strings with units", () => {
    expect(errorsOf({ points: FLUX_VS_TJ })).toEqual([]);
    const parsed = curveSchema("vfVsCurrent").parse({ points: [{ x: "350 mA", y: "2.75 V" }, { x: "1.4 A", y: 3.0 }] });
    expect(parsed.points).toEqual([{ x: 0.35, y: 2.75 }, { x: 1.4, y: 3 }]);
  });
  it("names the row of a repeated x (the issue's example)", () => {
    const points = [{ x: 0, y: 1 }, { x: 10, y: 0.98 }, { x: 25, y: 0.96 }, { x: 25, y: 0.9 }];
    expect(errorsOf({ points })).toEqual(["points[3].x: must be greater than the previous x (25)"]);
  });
  it("rejects a decreasing x, one point, non-finite y and out-of-range y", () => {
    expect(errorsOf({ points: [{ x: 50, y: 1 }, { x: 25, y: 1.05 }] })).toEqual([
      "points[1].x: must be greater than the previous x (50)",
    ]);
    expect(errorsOf({ points: [{ x: 25, y: 1 }] })).toEqual(["points: a curve needs at least two points"]);
    expect(errorsOf({ points: [{ x: 25, y: 1 }, { x: 50, y: Number.NaN }] })).toEqual([
      "points[1].y: expected a number or a value with a unit",
    ]);
    expect(errorsOf({ points: [{ x: 25, y: 1 }, { x: 50, y: -0.1 }] })).toEqual(["points[1].y: must be at least 0 %"]);
    expect(errorsOf({ points: [{ x: 0, y: 0.8 }, { x: 1, y: "110 %" }] }, "efficiencyVsLoad")).toEqual([
      "points[1].y: must be at most 100 %",
    ]);
    expect(errorsOf({ points: [{ x: "25 °C", y: 1 }, { x: "3 W", y: 1 }] })).toEqual([
      "points[1].x: expected a temperature such as 85 °C; got a power (W)",
    ]);
  });
  it("curvesSchema only admits the kinds a part carries", () => {
    const schema = curvesSchema(["fluxVsTj"] as const);
    expect(schema.safeParse({ fluxVsTj: { points: FLUX_VS_TJ } }).success).toBe(true);
    expect(schema.safeParse({}).success).toBe(true);
    const wrong = schema.safeParse({ vfVsCurrent: { points: FLUX_VS_TJ } });
    expect(wrong.success).toBe(false);
  });
});

describe("interpolate", () => {
  it("is linear between points (worked by hand: 25→1, 50→0.95 gives 0.97 at 40)", () => {
    expect(interpolate(FLUX_VS_TJ, 40).y).toBeCloseTo(0.97, 12);
    expect(interpolate(FLUX_VS_TJ, 105)).toEqual({ y: expect.closeTo(0.83, 12), extrapolated: false });
    expect(interpolate(FLUX_VS_TJ, 85)).toEqual({ y: 0.88, extrapolated: false });
  });
  it("holds the end values outside the table and says so", () => {
    expect(interpolate(FLUX_VS_TJ, -20)).toEqual({ y: 1, extrapolated: true });
    expect(interpolate(FLUX_VS_TJ, 150)).toEqual({ y: 0.78, extrapolated: true });
    expect(interpolate(FLUX_VS_TJ, 25)).toEqual({ y: 1, extrapolated: false });
    expect(interpolate(FLUX_VS_TJ, 125)).toEqual({ y: 0.78, extrapolated: false });
  });
  it("refuses a non-finite x and an empty table instead of answering NaN", () => {
    expect(() => interpolate(FLUX_VS_TJ, Number.NaN)).toThrow(RangeError);
    expect(() => interpolate([], 1)).toThrow(RangeError);
  });

  const table = fc
    .uniqueArray(fc.double({ min: -1e4, max: 1e4, noNaN: true, noDefaultInfinity: true }), { minLength: 2, maxLength: 30 })
    .chain((xs) =>
      fc
        .array(fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }), { minLength: xs.length, maxLength: xs.length })
        .map((ys) => {
          const sorted = [...new Set(xs.map((x) => (x === 0 ? 0 : x)))].sort((a, b) => a - b);
          return sorted.map((x, i) => ({ x, y: ys[i] ?? 0 }));
        }),
    )
    .filter((points) => points.length >= 2);

  it("stays between the neighbouring y's and is never NaN (property)", () => {
    fc.assert(
      fc.property(table, fc.double({ min: -2e4, max: 2e4, noNaN: true, noDefaultInfinity: true }), (points, x) => {
        const { y, extrapolated } = interpolate(points, x);
        expect(Number.isFinite(y)).toBe(true);
        const first = points[0]!;
        const last = points[points.length - 1]!;
        expect(extrapolated).toBe(x < first.x || x > last.x);
        const i = points.findIndex((p) => p.x >= x);
        const lo = i <= 0 ? (i === 0 ? first : last) : points[i - 1]!;
        const hi = i < 0 ? last : points[i]!;
        expect(y).toBeGreaterThanOrEqual(Math.min(lo.y, hi.y));
        expect(y).toBeLessThanOrEqual(Math.max(lo.y, hi.y));
      }),
      { numRuns: 500 },
    );
  });
  it("passes through every point of the table (property)", () => {
    fc.assert(
      fc.property(table, (points) => {
        for (const p of points) expect(interpolate(points, p.x).y).toBe(p.y);
      }),
    );
  });
});

describe("parseCurveCsv", () => {
  it("reads pasted text with a header naming units", () => {
    const text = "Tj [°F], flux [%]\n77, 100\n185, 88\n257, 78\n";
    const result = parseCurveCsv(text, "fluxVsTj");
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.points.map((p) => p.x)).toEqual([expect.closeTo(25, 9), expect.closeTo(85, 9), expect.closeTo(125, 9)]);
    expect(result.points.map((p) => p.y)).toEqual([1, 0.88, 0.78]);
  });
  it("reads headerless text in the axis defaults, tabs, and comma decimals after semicolons", () => {
    expect(parseCurveCsv("0.35\t2.75\n1.4\t3.0", "vfVsCurrent")).toEqual({
      ok: true,
      points: [{ x: 0.35, y: 2.75 }, { x: 1.4, y: 3 }],
    });
    expect(parseCurveCsv("25;100\n85;88,5", "fluxVsTj")).toEqual({ ok: true, points: [{ x: 25, y: 1 }, { x: 85, y: 0.885 }] });
    expect(parseCurveCsv("current [A], flux []\n0.35, 0.5\n700 mA, 1", "fluxVsCurrent")).toEqual({
      ok: true,
      points: [{ x: 0.35, y: 0.5 }, { x: 0.7, y: 1 }],
    });
  });
  it("names the line of every bad row", () => {
    const text = "Tj [°C], flux [%]\n25, 100\n50, lots\n75\n85, 88";
    expect(parseCurveCsv(text, "fluxVsTj")).toEqual({
      ok: false,
      errors: [
        { line: 3, message: 'y: expected a percentage such as 80 %; got "lots"' },
        { line: 4, message: "expected 2 columns (junction temperature, relative flux); got 1" },
      ],
    });
  });
  it("maps a repeated x back to its line, and checks header units", () => {
    expect(parseCurveCsv("Tj, flux\n25, 100\n25, 95", "fluxVsTj")).toEqual({
      ok: false,
      errors: [{ line: 3, message: "x: must be greater than the previous x (25)" }],
    });
    expect(parseCurveCsv("Tj [W], flux\n25, 100\n50, 95", "fluxVsTj")).toEqual({
      ok: false,
      errors: [{ line: 1, message: "x: unit [W]: expected a temperature such as 85 °C; got a power (W)" }],
    });
    expect(parseCurveCsv("25, 100", "fluxVsTj")).toEqual({
      ok: false,
      errors: [{ line: null, message: "points: a curve needs at least two points" }],
    });
  });
  it("round-trips through curveToCsv", () => {
    const csv = curveToCsv(FLUX_VS_TJ, "fluxVsTj");
    expect(csv.split("\r\n")[0]).toBe("Junction temperature [°C],Relative flux [%]");
    expect(parseCurveCsv(csv, "fluxVsTj")).toEqual({ ok: true, points: FLUX_VS_TJ });
  });
});
