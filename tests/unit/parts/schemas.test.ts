import { describe, expect, it } from "vitest";
import { csvHeaders, KIND_DEFINITIONS, mainFigureColumns, PART_KINDS, partNotes, partSchema, formatFieldValue, materialOptions, type Part } from "@/lib/parts";
import { describeFieldError, fieldErrors, METRIC_PREFERENCES } from "@/lib/units";
import { GOOD_PARTS } from "./fixtures";

function parse(value: unknown): Part {
  const result = partSchema.safeParse(value);
  if (!result.success) throw new Error(fieldErrors(result.error).map(describeFieldError).join("\n"));
  return result.data;
}
function errors(value: unknown): string[] {
  const result = partSchema.safeParse(value);
  return result.success ? [] : fieldErrors(result.error).map(describeFieldError);
}
const withSpecs = <K extends keyof typeof GOOD_PARTS>(kind: K, specs: Record<string, unknown>) => ({
  ...GOOD_PARTS[kind],
  specs: { ...GOOD_PARTS[kind].specs, ...specs },
});

describe("every kind has a good example that parses into storage units", () => {
  it.each(PART_KINDS)("%s", (kind) => {
    const part = parse(GOOD_PARTS[kind]);
    expect(part.kind).toBe(kind);
    expect(part.visibility).toBe(kind === "housing" ? "shared" : "private");
  });
  it("converts the values (spot checks)", () => {
    const emitter = parse(GOOD_PARTS.emitter);
    expect(emitter.specs).toMatchObject({ rthJspKPerW: 2.5, maxTjC: 150, vfRefCurrentA: 0.7, vfTempCoeffVPerK: -0.002, heatFraction: 0.7, boardLengthM: 0.016 });
    expect(emitter.curves).toEqual({ fluxVsTj: { points: [{ x: 25, y: 1 }, { x: 85, y: 0.88 }, { x: 125, y: 0.78 }] } });
    const cell = parse(GOOD_PARTS.cell);
    expect(cell.specs).toMatchObject({ capacityCoulomb: 10800, internalResistanceOhm: 0.03, massKg: 0.046 });
    const driver = parse(GOOD_PARTS.driver);
    expect(driver.kind === "driver" && driver.specs.modes[1]).toEqual({ name: "high", outputCurrentA: 2.8, efficiency: 0.85 });
    const iface = parse(GOOD_PARTS.interface);
    expect(iface.specs).toEqual({ specifiedAs: "bulk", conductivityWPerMK: 3, bondLineM: 5e-5 });
    expect(parse(GOOD_PARTS.housing).costEur).toBe(12.5);
  });
});

describe("bad input names the field", () => {
  it("emissivity above 1 and a negative mass (the issue's examples)", () => {
    expect(errors(withSpecs("housing", { emissivity: 1.2, massKg: "-350 g" }))).toEqual([
      "specs.emissivity: must be at most 1",
      "specs.massKg: must be greater than 0 g",
    ]);
  });
  it("a wrong dimension and a missing required field", () => {
    expect(errors(withSpecs("heatsink", { baseThicknessM: "3 W", baseLengthM: "" }))).toEqual([
      "specs.baseLengthM: required",
      "specs.baseThicknessM: expected a length such as 20 mm; got a power (W)",
    ]);
    const { name: _name, ...nameless } = GOOD_PARTS.spreader;
    expect(errors(nameless)).toEqual(["name: required"]);
  });
  it("common fields: kind, provenance, visibility, cost", () => {
    expect(errors({ ...GOOD_PARTS.cell, kind: "lamp" })).toEqual([
      "kind: must be one of: emitter, driver, heatsink, interface, spreader, housing, cell, charger, protection",
    ]);
    expect(errors({ ...GOOD_PARTS.cell, provenance: "guess", visibility: "everyone", costEur: -1 })).toEqual([
      "provenance: must be one of: datasheet, measured, estimate",
      "visibility: must be one of: private, shared, public",
      "costEur: must be at least 0",
    ]);
  });
  it("emitter: Rth must be positive, Tj below 250 °C, a curve with a repeated x", () => {
    expect(errors({ ...withSpecs("emitter", { rthJspKPerW: 0, maxTjC: "600 °F" }), curves: { fluxVsTj: { points: [{ x: 25, y: 1 }, { x: 25, y: 0.9 }] } } })).toEqual([
      "specs.rthJspKPerW: must be greater than 0 K/W",
      "specs.maxTjC: must be at most 250 °C",
      "curves.fluxVsTj.points[1].x: must be greater than the previous x (25)",
    ]);
  });
  it("emitter: a curve kind the kind does not carry is refused", () => {
    const result = errors({ ...GOOD_PARTS.emitter, curves: { efficiencyVsLoad: { points: [{ x: 0, y: 0.8 }, { x: 1, y: 0.9 }] } } });
    expect(result).toEqual(["curves: does not belong here"]);
  });
  it("driver: input range, modes with both or neither output, repeated names, efficiency over 100 %", () => {
    expect(errors(withSpecs("driver", { inputVoltageMinV: "5 V" }))).toEqual(["specs.inputVoltageMaxV: must not be below the minimum input voltage"]);
    expect(
      errors(
        withSpecs("driver", {
          modes: [
            { name: "low", efficiency: 0.9 },
            { name: "Low", outputCurrentA: 1, outputPowerW: "3 W", efficiency: "120 %" },
          ],
        }),
      ),
    ).toEqual([
      "specs.modes[0].outputCurrentA: give an output current or power, or the current or power drawn from the battery",
      "specs.modes[1].efficiency: must be at most 100 %",
    ]);
    expect(errors(withSpecs("driver", { modes: [{ name: "a", outputPowerW: "3 W", efficiency: 0.9 }, { name: "A", outputPowerW: "1 W", efficiency: 0.9 }] }))).toEqual([
      'specs.modes[1].name: mode name "A" is used twice',
    ]);
    expect(errors(withSpecs("driver", { modes: [] }))).toEqual(["specs.modes: a driver needs at least one mode"]);
    expect(errors(withSpecs("driver", { topology: "flyback" }))).toEqual(["specs.topology: must be one of: linear, buck, boost"]);
  });
  it("heatsink: the two ways to describe it are exclusive", () => {
    expect(errors({ ...GOOD_PARTS.heatsink, specs: { rating: "declared", sinkToAirKPerW: "8 K/W", ratedAirflow: "natural", finCount: 3 } })).toEqual([
      "specs: does not belong here",
    ]);
    expect(errors({ ...GOOD_PARTS.heatsink, specs: { rating: "rated", sinkToAirKPerW: 8 } })).toEqual(["specs.rating: must be one of: declared, geometry"]);
    expect(errors(withSpecs("heatsink", { finHeightM: undefined, material: undefined }))).toEqual([
      "specs.material: required when the heatsink is described by its geometry",
      "specs.finHeightM: required when there are fins",
    ]);
    expect(errors({ ...GOOD_PARTS.heatsink, specs: { rating: "declared", sinkToAirKPerW: "8 K/W" } })).toEqual(["specs.ratedAirflow: required"]);
  });
  it("heatsink: a gap between fins left empty is worked out from the base width, fin count and fin thickness", () => {
    // 12 fins of 1.5 mm on a 60 mm base leave 42 mm for 11 gaps.
    const part = parse(withSpecs("heatsink", { baseWidthM: "60 mm", finCount: 12, finThicknessM: "1.5 mm", finSpacingM: undefined }));
    expect((part.specs as { finSpacingM: number }).finSpacingM).toBeCloseTo(0.042 / 11, 9);
    // A gap that is given is kept as given.
    const given = parse(withSpecs("heatsink", { baseWidthM: "60 mm", finCount: 12, finThicknessM: "1.5 mm", finSpacingM: "3 mm" }));
    expect((given.specs as { finSpacingM: number }).finSpacingM).toBeCloseTo(0.003, 9);
    // Fins that do not fit get no gap from here.
    const crowded = parse(withSpecs("heatsink", { baseWidthM: "40 mm", finCount: 12, finThicknessM: "4 mm", finSpacingM: undefined }));
    expect((crowded.specs as { finSpacingM?: number }).finSpacingM).toBeUndefined();
  });
  it("interface, spreader, housing: variant, material id, inner vs outer area", () => {
    expect(errors({ ...GOOD_PARTS.interface, specs: { specifiedAs: "perArea", resistancePerAreaKM2PerW: "0.3 K cm^2/W" } })).toEqual([]);
    expect(errors({ ...GOOD_PARTS.interface, specs: { specifiedAs: "perArea" } })).toEqual(["specs.resistancePerAreaKM2PerW: required"]);
    expect(errors(withSpecs("spreader", { material: "unobtainium" }))[0]).toMatch(/^specs\.material: unknown material "unobtainium"; choose one of: .*copper-pure/);
    expect(errors(withSpecs("housing", { innerAreaM2: "700 cm^2" }))).toEqual(["specs.innerAreaM2: must not exceed the outer area"]);
  });
  it("cell, charger, protection: voltage order, windows, whole numbers", () => {
    expect(errors(withSpecs("cell", { cutoffVoltageV: "3.7 V", chargeTempMaxC: -5 }))).toEqual([
      "specs.cutoffVoltageV: must be below the nominal voltage",
      "specs.chargeTempMaxC: must be above the minimum of the window",
    ]);
    expect(errors(withSpecs("charger", { parallelCount: 1.5 }))).toEqual(["specs.parallelCount: must be a whole number"]);
    expect(errors(withSpecs("protection", { overChargeCutoffV: "2 V" }))).toEqual(["specs.overChargeCutoffV: must be above the over-discharge cut-off"]);
  });
});

describe("notes are advice, not errors", () => {
  it("fins thicker than their spacing are saved but noted", () => {
    const part = parse(withSpecs("heatsink", { finThicknessM: "4 mm", finSpacingM: "3 mm", finCount: 4 }));
    expect(partNotes(part).map((n) => n.field)).toEqual(["finThicknessM", "finSpacingM"]);
    expect(partNotes(part)[0]?.message).toBe("the fins are thicker than the gaps between them; check the measurements");
  });
  it("the good examples carry no notes, except where one is due", () => {
    expect(partNotes(parse(GOOD_PARTS.heatsink))).toEqual([]);
    expect(partNotes(parse(GOOD_PARTS.emitter))).toEqual([]);
    expect(partNotes(parse(withSpecs("cell", { chargeTempMinC: -10 })))[0]?.field).toBe("chargeTempMinC");
  });
});

describe("field tables drive columns and headers", () => {
  it("each kind has 2–4 main figures, all real fields", () => {
    for (const kind of PART_KINDS) {
      const columns = mainFigureColumns(kind);
      expect(columns.length, kind).toBeGreaterThanOrEqual(2);
      expect(columns.length, kind).toBeLessThanOrEqual(4);
      expect(columns.map((c) => c.key)).toEqual(KIND_DEFINITIONS[kind].mainFigures);
    }
  });
  it("field keys are unique within a kind and never clash with common fields", () => {
    for (const kind of PART_KINDS) {
      const headers = csvHeaders(kind).map((h) => h.split(" ")[0]);
      expect(new Set(headers).size, kind).toBe(headers.length);
    }
  });
  it("formats main figures for a table cell", () => {
    const driver = parse(GOOD_PARTS.driver);
    const [topology, vmin, , modes] = mainFigureColumns("driver");
    const specs = driver.specs as Record<string, unknown>;
    expect(formatFieldValue(topology!.field, specs.topology, METRIC_PREFERENCES)).toBe("buck");
    expect(formatFieldValue(vmin!.field, specs.inputVoltageMinV, METRIC_PREFERENCES)).toBe("2.8 V");
    expect(formatFieldValue(modes!.field, specs.modes, METRIC_PREFERENCES)).toBe("low 350 mA · high 2.8 A");
    expect(formatFieldValue(vmin!.field, undefined, METRIC_PREFERENCES)).toBe("—");
  });
  it("materials come from the engine's handbook table, each with its source", () => {
    const options = materialOptions();
    expect(options.find((o) => o.value === "copper-pure")?.source).toMatch(/Incropera/);
    expect(options.every((o) => o.label.length > 0 && o.source.length > 0)).toBe(true);
  });
});
