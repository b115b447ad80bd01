import { describe, expect, it } from "vitest";
import { editorFieldFor, placeProblems } from "@/components/builds/editor-problems";

// The problem field paths are the ones lib/retrofit emits (checks.ts, scenario-*.ts, compile/).
describe("editor problems: which field a problem is shown under", () => {
  it.each([
    ["pack", "pack.cell"],
    ["pack.cell", "pack.cell"],
    ["pack.cell.internalResistanceOhm", "pack.cell"],
    ["driver.modes[2]", "driver.part"],
    ["driver.selectedModes[0]", "driver.part"],
    ["driver.part.maxBoardTempC", "driver.part"],
    ["driver.cooling.adhesive", "driver.cooling.kind"],
    ["lightEngine.heatsink.finThicknessM", "lightEngine.heatsink"],
    ["lightEngine.emitter", "lightEngine.emitter"],
    ["pack.protection", "pack.protection"],
    ["pack.charger", "pack.charger"],
    ["pack.chargerBoardAreaM2", "pack.charger"],
    ["housing.enclosure", "housing"],
  ])("%s → %s", (field, target) => {
    expect(editorFieldFor(field)).toBe(target);
  });

  it("matches prefixes only at a segment boundary and leaves the rest unplaced", () => {
    expect(editorFieldFor("housingShape.characteristicLengthM")).toBeNull();
    expect(editorFieldFor("lightEngine.footprintM2")).toBeNull();
    expect(editorFieldFor("result.scenarios[0].thermal")).toBeNull();
  });

  it("groups problems by field, drops info ones, keeps the unmapped for the list on top", () => {
    const placed = placeProblems([
      { field: "pack", message: "outside the input range", severity: "error" },
      { field: "pack.cell", message: "above its rating", severity: "error" },
      { field: "pack.cell.internalResistanceOhm", message: "50 mΩ assumed", severity: "info" },
      { field: "lightEngine.footprintM2", message: "footprint assumed", severity: "warning" },
    ]);
    expect(placed.byField.get("pack.cell")?.map((p) => p.message)).toEqual(["outside the input range", "above its rating"]);
    expect(placed.unplaced.map((p) => p.field)).toEqual(["lightEngine.footprintM2"]);
  });
});
