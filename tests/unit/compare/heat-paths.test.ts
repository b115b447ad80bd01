import { describe, expect, it } from "vitest";
import { sideBySide, summarise } from "@/lib/compare";
import { evaluateBuild, type BuildDesignInput } from "@/lib/retrofit";
import { lanternDesign, resolved } from "../retrofit/fixtures/builds";
import { COPPER_TAPE, PASTE } from "../retrofit/fixtures/parts";

// The fixture lantern (invented parts) with its driver cooled three ways, evaluated by the engine.
const withCooling = (cooling: BuildDesignInput["driver"] extends infer D ? (D extends { cooling?: infer C } ? C : never) : never): BuildDesignInput => ({ ...lanternDesign, driver: { ...lanternDesign.driver!, cooling } });
const evals = [withCooling({ kind: "strapped", spreader: COPPER_TAPE }), withCooling({ kind: "ground-plane-to-wall", interface: PASTE }), withCooling({ kind: "floating" })].map((d) => evaluateBuild(resolved(d), { skipWarmup: true, skipWhatItTakes: true }));

describe("heat paths and ladders side by side", () => {
  const sbs = sideBySide(evals);

  it("gives every column the same scenario, with watts and K/W on every link", () => {
    expect(sbs.map((s) => s.scenarioId)).toEqual(evals[0]!.scenarios.map((s) => s.id));
    for (const s of sbs) {
      expect(s.heatPaths).toHaveLength(3);
      for (const h of s.heatPaths) for (const l of h?.links ?? []) {
        expect(Number.isFinite(l.watts)).toBe(true);
        expect(Number.isFinite(l.kelvinPerWatt)).toBe(true);
      }
    }
  });

  it("has a ladder for every limited place, whose steps add up to the place's rise above ambient", () => {
    const high = sbs.find((s) => s.scenarioId === "mode:high")!;
    const places = high.ladders.map((l) => l.place);
    expect(places).toEqual(expect.arrayContaining(["LED junction", "driver board", "housing surface"]));
    for (const ladder of high.ladders) {
      for (const [i, c] of ladder.columns.entries()) {
        if (!c) continue;
        const sum = c.steps.reduce((a, st) => a + st.deltaK, 0) + c.remainderK;
        // The drops telescope to the rise: T(place) − T(ambient) (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., §3.1: resistances in series).
        expect(sum).toBeCloseTo(c.riseK, 6);
        expect(c.temperatureC - c.riseK).toBeCloseTo(evals[i]!.scenarios.find((s) => s.id === "mode:high")!.network!.ambientC, 6);
      }
    }
    // Floating free, the driver board's ladder differs from strapped: the heat leaves by another way.
    const driver = high.ladders.find((l) => l.place === "driver board")!;
    expect(driver.columns[2]!.temperatureC).toBeGreaterThan(driver.columns[0]!.temperatureC);
  });

  it("summarises the engine's own numbers without NaN and names a winner in each mode it can", () => {
    const s = summarise({ names: ["strapped", "pressed", "floating"], differsIn: ["Driver cooling"], evaluations: evals });
    expect(s.lines.join(" ")).not.toMatch(/NaN|Infinity/);
    expect(s.lines[0]).toMatch(/ wins in | no variant wins|No variant wins/i);
    expect(s.scenarios).toHaveLength(evals[0]!.scenarios.length);
  });
});
