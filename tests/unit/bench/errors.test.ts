import { describe, expect, it } from "vitest";
import { fitInputSchema, fitWarmUp, type FitInputRaw } from "@/lib/bench";
import { ApiError } from "@/lib/http/api-error";

const base = (over: Partial<FitInputRaw> = {}): FitInputRaw => ({
  ambientC: 25,
  heatW: 7,
  readings: [
    { tS: 0, tempC: 25 },
    { tS: 300, tempC: 42 },
    { tS: 600, tempC: 51 },
    { tS: 1200, tempC: 58 },
  ],
  ...over,
});

function fitError(raw: FitInputRaw): ApiError {
  const parsed = fitInputSchema.safeParse(raw);
  if (!parsed.success) throw new Error(`schema refused: ${parsed.error.issues[0]?.message}`);
  try {
    fitWarmUp(parsed.data);
  } catch (e) {
    if (e instanceof ApiError) return e;
    throw e;
  }
  throw new Error("no error");
}

function schemaIssue(raw: unknown): { path: string; message: string } {
  const parsed = fitInputSchema.safeParse(raw);
  if (parsed.success) throw new Error("accepted");
  const issue = parsed.error.issues[0]!;
  return { path: issue.path.join("."), message: issue.message };
}

describe("bad bench input is refused with the field named, never NaN", () => {
  it("times that do not increase name the reading", () => {
    const e = fitError(base({ readings: [{ tS: 0, tempC: 25 }, { tS: 300, tempC: 40 }, { tS: 300, tempC: 45 }] }));
    expect(e.status).toBe(422);
    expect(e.path).toBe("readings[2].tS");
    expect(e.message).toBe("Reading 3: its time (5 min) is not later than reading 2's (5 min); times must increase.");
  });

  it("a reading below ambient with the heat on names the reading", () => {
    const e = fitError(base({ readings: [{ tS: 60, tempC: 30 }, { tS: 120, tempC: 22 }] }));
    expect(e.path).toBe("readings[1].tempC");
    expect(e.message).toMatch(/^Reading 2: 22 °C is below the ambient 25 °C/);
  });

  it("one reading without a mass", () => {
    const e = fitError(base({ readings: [{ tS: 1200, tempC: 60 }] }));
    expect(e.path).toBe("readings");
    expect(e.message).toMatch(/give the mass or at least two readings/);
  });

  it("readings that never rise", () => {
    const e = fitError(base({ readings: [{ tS: 60, tempC: 25.1 }, { tS: 120, tempC: 25.2 }] }));
    expect(e.message).toMatch(/never rise above the ambient/);
  });

  it("a warm-up still climbing in a straight line cannot pin the sink down", () => {
    const e = fitError(base({ readings: Array.from({ length: 10 }, (_, i) => ({ tS: 10 * (i + 1), tempC: 25 + 0.078 * 10 * (i + 1) })) }));
    expect(e.path).toBe("readings");
    expect(e.message).toMatch(/straight line|cannot tell/);
  });

  it("a heat input of zero", () => {
    expect(schemaIssue(base({ heatW: 0 }))).toMatchObject({ path: "heatW", message: expect.stringMatching(/^must be greater than 0 /) });
    expect(schemaIssue(base({ heatW: undefined, volts: 3, amps: "0 A", heatFraction: 0.7 }))).toMatchObject({ path: "amps", message: expect.stringMatching(/^must be greater than 0 /) });
  });

  it("volts and amps need the heat fraction; watts and volts together are refused", () => {
    expect(schemaIssue(base({ heatW: undefined, volts: 3, amps: 2 }))).toEqual({ path: "heatFraction", message: "required when the heat is not given in watts" });
    expect(schemaIssue(base({ volts: 3, amps: 2 })).path).toBe("heatW");
  });

  it("no readings, a bad unit, an unknown material", () => {
    expect(schemaIssue(base({ readings: [] }))).toEqual({ path: "readings", message: "at least one reading is needed" });
    expect(schemaIssue(base({ readings: [{ tS: "20 kg", tempC: 30 }] })).path).toBe("readings.0.tS");
    expect(schemaIssue(base({ material: "cheese" })).path).toBe("material");
  });

  it("unit-aware strings are read like everywhere else (°F, min)", () => {
    const parsed = fitInputSchema.parse(base({ ambientC: "77 °F", readings: [{ tS: "20 min", tempC: "140 °F" }], massKg: "100 g" }));
    expect(parsed.ambientC).toBeCloseTo(25, 9);
    expect(parsed.readings[0]!.tS).toBe(1200);
    expect(parsed.readings[0]!.tempC).toBeCloseTo(60, 9);
    expect(parsed.massKg).toBeCloseTo(0.1, 12);
  });
});
