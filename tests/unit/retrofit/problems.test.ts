import { describe, expect, it } from "vitest";
import { partSchema } from "@/lib/parts";
import { buildDesignSchema, evaluateBuild, resolveBuild, type BuildDesignInput } from "@/lib/retrofit";
import { lanternDesign, resolved } from "./fixtures/builds";
import { CELL, DRIVER, EMITTER, FINNED_SINK, PROTECTION } from "./fixtures/parts";

const evaluate = (d: BuildDesignInput) => evaluateBuild(resolved(d), { skipWarmup: true, skipWhatItTakes: true });
const fieldsOf = (d: BuildDesignInput) => evaluate(d).problems;

describe("bad input becomes a named problem, and the rest is still evaluated", () => {
  it("a build without a heatsink in the housing air: light-engine scenarios null, charging still solved", () => {
    const r = evaluate({ ...lanternDesign, lightEngine: { emitter: EMITTER } });
    expect(r.problems).toContainEqual(expect.objectContaining({ field: "lightEngine.heatsink", severity: "error" }));
    expect(r.scenarios.find((s) => s.kind === "mode")!.thermal).toBeNull();
    expect(r.scenarios.find((s) => s.kind === "charging")!.thermal).not.toBeNull();
    expect(r.electrical.pack).not.toBeNull();
  });

  it("a pack outside the driver's input range", () => {
    const p = fieldsOf({ ...lanternDesign, pack: { ...lanternDesign.pack, series: 2 } });
    expect(p).toContainEqual({ field: "pack", severity: "error", message: "the pack's nominal 7.20 V (2S1P) is outside the driver's input range 2.80 V–4.20 V" });
  });

  it("a mode current above the emitter's absolute maximum names the mode", () => {
    const p = fieldsOf({ ...lanternDesign, lightEngine: { ...lanternDesign.lightEngine, maxCurrentA: 2 } });
    expect(p).toContainEqual({ field: "driver.modes[1]", severity: "error", message: 'mode "high" drives each emitter at 2.80 A, above its absolute maximum of 2.00 A' });
    expect(p.some((x) => x.field === "driver.modes[0]")).toBe(false);
  });

  it("a protection trip below the mode's pack current", () => {
    const p = fieldsOf({ ...lanternDesign, pack: { ...lanternDesign.pack, protection: { ...PROTECTION, inline: { ...PROTECTION.inline, overCurrentTripA: 1 } } } });
    const hit = p.find((x) => x.field === "pack.protection")!;
    expect(hit.severity).toBe("error");
    expect(hit.message).toMatch(/^mode "high" draws \d\.\d\d A from the pack, above the protection's 1\.00 A trip: the light will cut out$/);
  });

  it("fins thicker than their spacing warn; fins that cannot fit on the base stop the heat path", () => {
    const thick = { ...FINNED_SINK, inline: { ...FINNED_SINK.inline, finThicknessM: 0.004, finSpacingM: 0.003 } };
    const p = fieldsOf({ ...lanternDesign, lightEngine: { ...lanternDesign.lightEngine, heatsink: thick } });
    expect(p).toContainEqual(expect.objectContaining({ field: "lightEngine.heatsink.finThicknessM", severity: "warning" }));
    const tooMany = { ...FINNED_SINK, inline: { ...FINNED_SINK.inline, finCount: 12, finThicknessM: 0.004, finSpacingM: 0.003 } };
    const r = evaluate({ ...lanternDesign, lightEngine: { ...lanternDesign.lightEngine, heatsink: tooMany } });
    expect(r.problems).toContainEqual({ field: "lightEngine.heatsink.finCount", severity: "error", message: "12 fins of 4.00 mm do not fit on a 40.0 mm base" });
    expect(r.scenarios.find((s) => s.kind === "mode")!.thermal).toBeNull();
  });

  it("missing driver, cells and housing are each named", () => {
    expect(fieldsOf({ ...lanternDesign, driver: {} })).toContainEqual(expect.objectContaining({ field: "driver.part", severity: "error" }));
    expect(fieldsOf({ ...lanternDesign, pack: {} })).toContainEqual(expect.objectContaining({ field: "pack.cell" }));
    const noHousing = evaluate({ ...lanternDesign, housing: undefined });
    expect(noHousing.problems).toContainEqual(expect.objectContaining({ field: "housing", severity: "error" }));
    expect(noHousing.verdict).toBeNull();
  });

  it("a selected mode the driver does not have", () => {
    expect(fieldsOf({ ...lanternDesign, driver: { part: DRIVER, selectedModes: ["turbo"] } })).toContainEqual({
      field: "driver.selectedModes[0]",
      severity: "error",
      message: 'the driver "Generic single-cell buck driver" has no mode "turbo" (it has low, high)',
    });
  });

  it("resolveBuild names a slot whose part is missing or of the wrong kind", () => {
    const design = buildDesignSchema.parse({ ...lanternDesign, housing: { partId: "p-gone" }, pack: { cell: { partId: "p-driver" } } });
    const driverPart = partSchema.parse({ kind: "driver", name: "A driver", provenance: "estimate", specs: DRIVER.inline });
    const r = resolveBuild(design, (id) => (id === "p-driver" ? driverPart : undefined));
    expect(r.ok).toBe(false);
    expect(r.problems).toEqual([
      { field: "housing", severity: "error", message: 'part "p-gone" was not found (deleted, or not visible to you)' },
      { field: "pack.cell", severity: "error", message: 'part "A driver" is a driver, this slot needs a cell' },
    ]);
    expect(r.build.housing).toBeUndefined();
  });

  it("the design schema rejects inline specs that break their kind's rules, naming the field", () => {
    const bad = buildDesignSchema.safeParse({ ...lanternDesign, pack: { cell: { inline: { ...CELL.inline, cutoffVoltageV: 3.9 } } } });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues[0]!.path.join(".")).toBe("pack.cell.inline.cutoffVoltageV");
  });
});
