import { describe, expect, it } from "vitest";
import { summarise, type EvaluationLike } from "@/lib/compare";
import type { ScenarioLike } from "@/lib/compare/summary";

// Hand-made comparisons: only what the summary reads. The figures are invented for the test.
type L = { id: "junction" | "driver-board" | "cells-max" | "cells-min" | "touch" | "charger-board"; place: string; headroomK: number; limitC: number; kind?: "max" | "min" };
const verdict = (h: number) => (h < 0 ? "over budget" : h < 10 ? "tight" : "within budget") as "over budget" | "tight" | "within budget";
const limit = (l: L) => ({ id: l.id, place: l.place, kind: l.kind ?? "max", headroomK: l.headroomK, limitC: l.limitC, temperatureC: (l.kind ?? "max") === "max" ? l.limitC - l.headroomK : l.limitC + l.headroomK, verdict: verdict(l.headroomK) });
const junction = (h: number) => limit({ id: "junction", place: "LED junction", headroomK: h, limitC: 125 });
const driver = (h: number) => limit({ id: "driver-board", place: "driver board", headroomK: h, limitC: 100 });
const touch = (h: number) => limit({ id: "touch", place: "housing surface", headroomK: h, limitC: 48 });
function mode(name: string, limits: ReturnType<typeof limit>[], o: { flux?: number; runtimeH?: number; crossings?: { limitId: string; timeS: number | null }[] } = {}): ScenarioLike {
  return { id: `mode:${name}`, kind: "mode", name, thermal: { limits }, mode: { totalFluxLm: o.flux ?? 500, runtime: { value: o.runtimeH ?? 3 } }, warmup: o.crossings ? { crossings: o.crossings } : null };
}
const charging = (limits: ReturnType<typeof limit>[]): ScenarioLike => ({ id: "charging", kind: "charging", name: "Charging", thermal: { limits }, mode: null });
const evaluation = (scenarios: ScenarioLike[], cost = 20): EvaluationLike => ({ scenarios, costs: { totalEur: cost } });
const NAMES = ["copper strap", "pressed to the wall", "floating free"];

describe("the comparison summary", () => {
  it("names the winner of each scenario, by how much, and why the others lose", () => {
    const s = summarise({
      names: NAMES,
      differsIn: ["Driver cooling"],
      evaluations: [evaluation([mode("High", [junction(30), driver(12), touch(15)])]), evaluation([mode("High", [junction(30), driver(40), touch(20)])]), evaluation([mode("High", [junction(30), driver(-45), touch(25)])])],
    });
    const high = s.scenarios[0]!;
    expect(high.winners).toEqual([1]);
    // The winner's deciding limit is the housing surface (20 K); the runner-up's is the driver board (12 K).
    expect(high.cells[1]!.deciding).toMatchObject({ id: "touch", headroomK: 20 });
    expect(high.cells[0]!.deciding).toMatchObject({ id: "driver-board", headroomK: 12 });
    expect(high.leadK).toBeCloseTo(8, 9);
    expect(s.lines[0]).toBe("Pressed to the wall wins in high mode.");
    expect(s.lines[1]).toContain("Pressed to the wall wins in high mode: 20 K headroom on the housing surface");
    expect(s.lines[1]).toContain("8.0 K more than copper strap");
    expect(s.lines[1]).toContain("floating free is over budget on the driver board (145 °C against a limit of 100 °C)");
  });

  it("says a limit every variant shares once, for every scenario it applies to, and lets the differing limits decide", () => {
    const s = summarise({
      names: NAMES,
      differsIn: ["Driver cooling"],
      evaluations: [
        evaluation([mode("High", [junction(-8), driver(12)]), mode("Mid", [junction(-2.5), driver(30)]), charging([limit({ id: "cells-max", place: "cells", headroomK: 15, limitC: 45 })])]),
        evaluation([mode("High", [junction(-8.4), driver(40)]), mode("Mid", [junction(-2), driver(50)]), charging([limit({ id: "cells-max", place: "cells", headroomK: 15.2, limitC: 45 })])]),
        evaluation([mode("High", [junction(-7.9), driver(-45)]), mode("Mid", [junction(-2.2), driver(-10)]), charging([limit({ id: "cells-max", place: "cells", headroomK: 14.9, limitC: 45 })])]),
      ],
    });
    const shared = s.lines.filter((l) => l.includes("LED junction"));
    expect(shared).toHaveLength(1);
    expect(shared[0]).toBe("All three are over budget on the LED junction in high and mid mode (over by 2.0–8.4 K): it is the same in every variant, so the driver cooling is not what limits it.");
    // Within budget alike while charging: not worth a line.
    expect(s.lines.filter((l) => l.startsWith("All three"))).toHaveLength(1);
    expect(s.scenarios.map((x) => x.winners)).toEqual([[1], [1], [0, 1, 2]]);
    // Each scenario's winner is decided on the driver board, not on the junction they share.
    expect(s.scenarios[0]!.cells.map((c) => c.deciding?.id)).toEqual(["driver-board", "driver-board", "driver-board"]);
    expect(s.lines[0]).toBe("Pressed to the wall wins in high and mid mode; no single winner while charging.");
    expect(s.lines.find((l) => l.startsWith("Charging:"))).toContain("no variant wins");
  });

  it("takes a limit every variant is over out of the ranking even when the variants move it, and says so once", () => {
    // High mode as in a lantern: the junction is over in all three (the driver's heat moves it a little);
    // pressing the driver to the wall keeps the board cool but warms the housing surface.
    const s = summarise({
      names: NAMES,
      differsIn: ["Driver cooling"],
      evaluations: [evaluation([mode("High", [junction(-55), driver(-40), touch(12)])]), evaluation([mode("High", [junction(-47), driver(30), touch(-6)], { crossings: [{ limitId: "touch", timeS: 610 }] })]), evaluation([mode("High", [junction(-58), driver(-120), touch(15)])])],
    });
    const high = s.scenarios[0]!;
    expect(high.cells.map((c) => c.deciding?.id)).toEqual(["driver-board", "touch", "driver-board"]);
    expect(high.winners).toEqual([1]);
    // Even the best is over a limit there: it is the least over budget, not a winner, and a housing past its burn threshold is said in those words.
    expect(s.lines[0]).toBe("Pressed to the wall is the least over budget in high mode.");
    expect(s.lines[1]).toMatch(/^Pressed to the wall is the least over budget in high mode: the housing surface is too hot to touch safely, over its limit by 6\.0 K \(54 °C against a limit of 48 °C, reached after 10 min\), 34 K less over than copper strap;/);
    expect(s.lines.find((l) => l.startsWith("Caution, hot surface:"))).toBe("Caution, hot surface: pressed to the wall takes the housing past the burn threshold for the way it is held in high mode; add a warning, a handle or a time limit on that mode.");
    expect(s.lines[1]).toContain("copper strap is over budget on the driver board (140 °C against a limit of 100 °C)");
    expect(s.lines).toContain("All three are over budget on the LED junction in high mode (over by 47–58 K): the driver cooling moves it, but none of them clears it.");
  });

  it("calls a difference under the significance a tie and names both", () => {
    const s = summarise({ names: NAMES, differsIn: ["Driver cooling"], evaluations: [evaluation([mode("Low", [driver(50.4)])]), evaluation([mode("Low", [driver(50)])]), evaluation([mode("Low", [driver(20)])])] });
    expect(s.scenarios[0]!.winners).toEqual([0, 1]);
    expect(s.scenarios[0]!.leadK).toBeCloseTo(30, 9);
    expect(s.lines[1]).toMatch(/^Copper strap and pressed to the wall tie in low mode \(within 1 K\)/);
    expect(s.lines[0]).toBe("No variant wins any scenario by 1 K or more of headroom.");
  });

  it("lets a variant win one mode and lose another", () => {
    const s = summarise({
      names: ["strap", "wall"],
      differsIn: ["Driver cooling"],
      evaluations: [evaluation([mode("High", [driver(5), touch(30)]), mode("Low", [driver(60), touch(40)])]), evaluation([mode("High", [driver(35), touch(20)]), mode("Low", [driver(70), touch(6)])])],
    });
    expect(s.scenarios.map((x) => x.winners)).toEqual([[1], [0]]);
    expect(s.lines[0]).toBe("Wall wins in high mode and strap wins in low mode.");
    expect(s.lines[2]).toContain("Strap wins in low mode: 40 K headroom on the housing surface");
    expect(s.lines[2]).toContain("wall is tight on the housing surface (6.0 K headroom");
  });

  it("says what the winner costs in light and runtime, and the parts cost once", () => {
    const s = summarise({
      names: ["strap", "wall"],
      differsIn: ["Driver cooling"],
      evaluations: [evaluation([mode("High", [driver(5)], { flux: 600, runtimeH: 2 })], 18.5), evaluation([mode("High", [driver(35)], { flux: 560, runtimeH: 2.005 })], 21)],
    });
    expect(s.lines).toContain("In high mode, wall gives 40 lm less light than strap.");
    expect(s.lines).toContain("Parts cost: strap €18.50 and wall €21.00.");
    // No masses given: nothing said about mass.
    expect(s.lines.some((l) => l.startsWith("Mass"))).toBe(false);
  });

  it("says what each variant weighs when the masses differ, and once when they do not", () => {
    const heavy = summarise({
      names: ["strap", "wall"],
      differsIn: ["Driver cooling"],
      evaluations: [{ ...evaluation([mode("High", [driver(5)])]), mass: { totalKg: 0.412 } }, { ...evaluation([mode("High", [driver(35)])]), mass: { totalKg: 0.455 } }],
    });
    expect(heavy.lines).toContain("Mass: strap 412 g and wall 455 g.");
    expect(heavy.massesKg).toEqual([0.412, 0.455]);
    // A strap of copper tape weighs under a gram: within 2 % of the lantern's mass, said once.
    const alike = summarise({
      names: NAMES,
      differsIn: ["Driver cooling"],
      evaluations: [0.4123, 0.4117, 0.4117].map((kg) => ({ ...evaluation([mode("High", [driver(20)])]), mass: { totalKg: kg } })),
    });
    expect(alike.lines).toContain("Mass: 412 g for all three (within 2 %).");
    // One column without a mass: no mass line rather than a partial one.
    const partial = summarise({ names: ["a", "b"], differsIn: [], evaluations: [{ ...evaluation([mode("High", [driver(5)])]), mass: { totalKg: 0.4 } }, evaluation([mode("High", [driver(5)])])] });
    expect(partial.lines.some((l) => l.startsWith("Mass"))).toBe(false);
    expect(partial.massesKg).toEqual([0.4, null]);
  });

  it("says when a limit is reached in the warm-up, and when a column could not be worked out", () => {
    const s = summarise({
      names: ["strap", "wall", "free"],
      differsIn: ["Driver cooling"],
      evaluations: [
        evaluation([mode("High", [touch(-6)], { crossings: [{ limitId: "touch", timeS: 600 }] })]),
        evaluation([mode("High", [touch(4)])]),
        { scenarios: [{ ...mode("High", []), thermal: null }], costs: { totalEur: 20 } },
      ],
    });
    expect(s.lines[1]).toContain("strap makes the housing surface too hot to touch safely (54 °C against a limit of 48 °C, reached after 10 min)");
    expect(s.lines[1]).toContain("Free could not be worked out in high mode.");
    expect(s.scenarios[0]!.cells[2]!.deciding).toBeNull();
  });

  it("never shows a failing temperature equal to its limit", () => {
    // 0.3 K over a 100 °C limit would round to "100 °C against a limit of 100 °C" at whole degrees.
    const s = summarise({ names: ["a", "b"], differsIn: ["Driver cooling"], evaluations: [evaluation([mode("High", [driver(-0.3)])]), evaluation([mode("High", [driver(20)])])] });
    expect(s.lines[1]).toContain("a is over budget on the driver board (100.3 °C against a limit of 100.0 °C)");
  });

  it("never prints NaN, Infinity or a negative zero", () => {
    const s = summarise({ names: ["a", "b"], differsIn: [], evaluations: [evaluation([mode("High", [driver(0)])]), evaluation([mode("High", [driver(-0.0001)])])] });
    const text = s.lines.join(" ");
    expect(text).not.toMatch(/NaN|Infinity|-0(?![.\d])|−0(?![.\d])/);
  });
});
