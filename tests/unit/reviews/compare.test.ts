import { describe, expect, it } from "vitest";
import { columnNamesFor, designDiff, figureRows, ladders, warmupSeries } from "@/lib/compare";
import { anchorLabel, anchorProblem, curvePointKey, diagramPins, heatPathAnchors } from "@/lib/reviews/anchors";
import { sharedHeatPaths } from "@/lib/reviews/shared-review";
import { buildDesignSchema, type BuildEvaluation } from "@/lib/retrofit";

const names = (id: string) => ({ tape: "Copper tape strap", pad: "Gap pad", drv: "Buck driver" })[id];
const design = (cooling: object) => buildDesignSchema.parse({ lightEngine: { count: 2 }, driver: { part: { partId: "drv" }, cooling }, environment: { ambientC: 20 } });

describe("designDiff", () => {
  it("lists the slots that differ first, with part names, and the rest after", () => {
    const rows = designDiff([design({ kind: "strapped", spreader: { partId: "tape" } }), design({ kind: "ground-plane-to-wall", interface: { partId: "pad" } }), design({ kind: "floating" })], names);
    expect(rows[0]).toEqual({
      slot: "driver.cooling",
      label: "Driver cooling",
      values: ["strapped to the housing with Copper tape strap", "ground plane pressed to the housing through Gap pad", "floating free in the housing's air"],
      differs: true,
      short: ["driver strapped to the housing", "driver pressed to the wall", "driver floating free"],
    });
    // Columns are called by the few words that set them apart; by their notes when the words repeat.
    expect(columnNamesFor(rows.filter((r) => r.differs), ["a", "b", "c"])).toEqual(["driver strapped to the housing", "driver pressed to the wall", "driver floating free"]);
    const twoStraps = designDiff([design({ kind: "strapped", spreader: { partId: "tape" } }), design({ kind: "strapped", spreader: { partId: "pad" } })], names);
    expect(columnNamesFor(twoStraps.filter((r) => r.differs), ["x", "y"])).toEqual(["strapped to the housing with Copper tape strap", "strapped to the housing with Gap pad"]);
    expect(columnNamesFor([], ["same", "same"])).toEqual(["same (column 1)", "same (column 2)"]);
    expect(rows.filter((r) => r.differs)).toHaveLength(1);
    expect(rows.find((r) => r.slot === "driver.part")?.values).toEqual(["Buck driver", "Buck driver", "Buck driver"]);
    expect(rows.find((r) => r.slot === "environment.ambientC")?.values[0]).toBe("20.0 °C");
    expect(designDiff([design({ kind: "strapped", spreader: { partId: "secret" } })], names)[0]?.values[0]).toContain("not visible");
  });
});

// A hand-made evaluation with only what the comparison reads; the figures are invented.
function evaluation(o: { driverC: number; headroomK: number; limitAtS: number | null; runtimeH: number | null; cost: number; verdict: "within budget" | "tight" | "over budget" }): BuildEvaluation {
  const scenario = {
    id: "mode:high",
    kind: "mode",
    name: "high",
    thermal: {
      nodes: [{ id: "junction", place: "LED junction", slot: "" }, { id: "driver", place: "driver board", slot: "" }],
      links: [{ index: 0, from: "driver", to: "wall", place: "strap", slot: "" }, { index: 1, from: "driver", to: "wall", place: "radiation", slot: "" }],
      byPlace: { "driver board": o.driverC },
      limits: [{ id: "driver-board", place: "driver board", node: "driver", kind: "max", limitC: 100, headroomK: o.headroomK }],
      verdict: o.verdict,
      ladder: { riseK: 40, remainderK: 0, steps: [{ place: "strap", deltaK: 40 }] },
    },
    warmup: { timesS: [0, 60, 120], temperaturesC: { driver: [20, 50, o.driverC] }, crossings: [{ limitId: "driver-board", timeS: o.limitAtS }] },
    mode: { totalFluxLm: 1000, runtime: o.runtimeH === null ? null : { value: o.runtimeH }, driveW: 8 },
    whatItTakes: null,
  };
  const e = { verdict: o.verdict, scenarios: [scenario], costs: { totalEur: o.cost, savingEur: 50 - o.cost }, electrical: { pack: null, charge: null } };
  return e as unknown as BuildEvaluation;
}

describe("figureRows", () => {
  const rows = figureRows([
    evaluation({ driverC: 80, headroomK: 20, limitAtS: null, runtimeH: 2, cost: 30, verdict: "within budget" }),
    evaluation({ driverC: 70, headroomK: 30, limitAtS: null, runtimeH: 2, cost: 31, verdict: "within budget" }),
    evaluation({ driverC: 110, headroomK: -10, limitAtS: 1800, runtimeH: null, cost: 29, verdict: "over budget" }),
  ]);
  const row = (key: string) => rows.find((r) => r.key === key)!;

  it("gives deltas against the first column and judges them by direction", () => {
    expect(row("mode:high/temperature:driver board")).toMatchObject({ values: [80, 70, 110], deltas: [null, -10, 30], judgements: [null, "better", "worse"] });
    expect(row("mode:high/headroom:driver-board")).toMatchObject({ deltas: [null, 10, -30], judgements: [null, "better", "worse"] });
    expect(row("build/cost")).toMatchObject({ deltas: [null, 1, -1], judgements: [null, "worse", "better"] });
    expect(row("build/verdict").judgements).toEqual([null, "same", "worse"]);
    expect(row("mode:high/verdict").values).toEqual(["within budget", "within budget", "over budget"]);
  });

  it("counts a limit never reached as better than any time, in minutes", () => {
    expect(row("mode:high/time:driver-board")).toMatchObject({ unit: "min", values: [null, null, 30], judgements: [null, "same", "worse"] });
  });

  it("leaves a figure a column cannot give as null, never NaN", () => {
    expect(row("mode:high/runtime")).toMatchObject({ values: [2, 2, null], deltas: [null, 0, null], judgements: [null, "same", null] });
    expect(row("build/capacity").values).toEqual([null, null, null]);
    for (const r of rows) for (const d of r.deltas) if (d !== null) expect(Number.isFinite(d)).toBe(true);
  });

  it("lines warm-up curves and ladders up by column", () => {
    const evals = [evaluation({ driverC: 80, headroomK: 20, limitAtS: null, runtimeH: 2, cost: 30, verdict: "tight" }), evaluation({ driverC: 90, headroomK: 10, limitAtS: null, runtimeH: 2, cost: 30, verdict: "tight" })];
    const w = warmupSeries(evals);
    expect(w).toHaveLength(1);
    expect(w[0]).toMatchObject({ node: "driver", limitC: 100 });
    expect(w[0]!.columns[1]).toEqual({ timesMin: [0, 1, 2], temperaturesC: [20, 50, 90] });
    expect(ladders(evals, "mode:high")[0]?.steps).toEqual([{ place: "strap", deltaK: 40 }]);
    expect(ladders(evals, "charging")).toEqual([null, null]);
  });
});

describe("review anchors", () => {
  it("offers the heat path's nodes, links by from->to (parallel links merged) and the figures", () => {
    const a = heatPathAnchors(evaluation({ driverC: 80, headroomK: 20, limitAtS: null, runtimeH: 2, cost: 30, verdict: "tight" }));
    expect(a.nodes.map((n) => n.key)).toEqual(["junction", "driver", "junction#mode:high", "driver#mode:high"]);
    // Every target reads as words, with its scenario: "driver board, high mode".
    expect(a.nodes.map((n) => n.label)).toEqual(["LED junction", "driver board", "LED junction, high mode", "driver board, high mode"]);
    expect(a.links).toEqual([{ key: "driver->wall", label: "strap + radiation" }, { key: "driver->wall#mode:high", label: "strap + radiation, high mode", scenarioId: "mode:high" }]);
    expect(a.figures.map((f) => f.key)).toEqual(expect.arrayContaining(["build/verdict", "mode:high/headroom", "mode:high/headroom/driver-board", "mode:high/warmup", "mode:high/warmup/driver-board"]));
    expect(anchorLabel(a, { kind: "figure", key: "mode:high/headroom/driver-board" })).toBe("headroom of the driver board, high mode");
    expect(anchorLabel(a, { kind: "node", key: "wall-engine" })).toBe("a place no longer in the heat path");
    expect(anchorProblem(a, { kind: "link", key: "driver->wall" })).toBeNull();
    expect(anchorProblem(a, { kind: "node", key: "driver#mode:high" })).toBeNull();
    expect(anchorProblem(a, { kind: "node", key: "driver#mode:turbo" })).toBe("Pinned to: that place in the heat path does not exist in this revision; click a place, a link or a row that is shown, then pin the comment.");
    expect(anchorProblem(a, { kind: "node", key: "sink" }, 3)).toBe("Pinned to: that place in the heat path does not exist in revision 3; click a place, a link or a row that is shown, then pin the comment.");
  });
});

describe("pins on a point of a warm-up curve", () => {
  const a = heatPathAnchors(evaluation({ driverC: 80, headroomK: 20, limitAtS: null, runtimeH: 2, cost: 30, verdict: "tight" }));
  it("names the place, the time and the scenario in words", () => {
    const key = curvePointKey("mode:high/warmup/driver-board", 1.04);
    expect(key).toBe("mode:high/warmup/driver-board/at/1");
    expect(anchorProblem(a, { kind: "figure", key })).toBeNull();
    expect(anchorLabel(a, { kind: "figure", key })).toBe("warm-up of the driver board at 1 min, high mode");
    // The hand-made warm-up runs 2 min: its last point may be pinned, a later one may not.
    expect(anchorProblem(a, { kind: "figure", key: "mode:high/warmup/driver-board/at/2" })).toBeNull();
  });
  it("refuses a point past the warm-up or on a curve the revision does not have, in words", () => {
    const past = "Pinned to: that point is not on a warm-up curve of revision 2; click a point on the curve that is shown, then pin the comment.";
    expect(anchorProblem(a, { kind: "figure", key: "mode:high/warmup/driver-board/at/5" }, 2)).toBe(past);
    expect(anchorProblem(a, { kind: "figure", key: "mode:high/warmup/touch/at/1" }, 2)).toBe(past);
    expect(anchorProblem(a, { kind: "figure", key: "mode:turbo/warmup/driver-board/at/1" }, 2)).toBe(past);
    expect(anchorLabel(a, { kind: "figure", key: "mode:high/warmup/driver-board/at/5" })).toBe("a figure no longer on the Budget");
  });
  it("draws the heat path's pins of one scenario and of the heat path as a whole", () => {
    const comments = [
      { anchorKind: "node" as const, anchorKey: "driver#mode:high" },
      { anchorKind: "node" as const, anchorKey: "driver#mode:high" },
      { anchorKind: "node" as const, anchorKey: "driver#mode:low" },
      { anchorKind: "link" as const, anchorKey: "driver->wall" },
      { anchorKind: "figure" as const, anchorKey: "mode:high/warmup/driver-board/at/1" },
    ];
    expect(diagramPins(comments, "mode:high")).toEqual({ "node:driver": 2, "link:driver->wall": 1 });
    expect(diagramPins(comments, "charging")).toEqual({ "link:driver->wall": 1 });
  });
});

describe("a review link's heat path", () => {
  // Slots as the compiler names them; the driver is the owner's private part, the rest public or absent.
  function withSlots(): BuildEvaluation {
    const e = evaluation({ driverC: 80, headroomK: 20, limitAtS: null, runtimeH: 2, cost: 30, verdict: "tight" }) as unknown as { scenarios: { thermal: { links: object[]; temperaturesC?: object }; network?: object }[] };
    const s = e.scenarios[0]!;
    s.thermal.temperaturesC = { junction: 90, driver: 80 };
    s.network = { ambientC: 20 };
    s.thermal.links = [
      { index: 0, from: "junction", to: "sink", place: "emitter to heatsink", slot: "lightEngine.emitter", watts: 3, kelvinPerWatt: 4.2 },
      { index: 1, from: "driver", to: "wall", place: "copper strap", slot: "driver.cooling", watts: 0.8, kelvinPerWatt: 12.5 },
      { index: 2, from: "wall", to: "ambient", place: "housing to air", slot: "environment.air", watts: 3.8, kelvinPerWatt: 9 },
    ];
    return e as unknown as BuildEvaluation;
  }
  const designWith = (driver: object, housing: object = { partId: "box" }) => ({ lightEngine: { emitter: { partId: "led" } }, driver: { part: driver, cooling: { kind: "strapped", spreader: { partId: "tape" } } }, housing, environment: { ambientC: 20 } });
  const isPublic = (id: string) => ["led", "tape", "box"].includes(id);

  it("withholds the figures of links through a part that is not published, and keeps the rest", () => {
    const [h] = sharedHeatPaths(withSlots(), designWith({ partId: "secret-driver" }), isPublic);
    expect(h).toMatchObject({ scenarioId: "mode:high", label: "high mode", ambientC: 20 });
    expect(h!.thermal.links.map((l) => [l.place, l.watts, l.kelvinPerWatt])).toEqual([["emitter to heatsink", 3, 4.2], ["copper strap", null, null], ["housing to air", 3.8, 9]]);
    expect(JSON.stringify(h)).not.toContain("12.5");
    expect(h!.thermal.temperaturesC).toEqual({ junction: 90, driver: 80 });
  });

  it("treats a part typed in place as unpublished, and the air around a private housing as the housing's", () => {
    const [typed] = sharedHeatPaths(withSlots(), designWith({ inline: { topology: "buck" } }), isPublic);
    expect(typed!.thermal.links[1]).toMatchObject({ watts: null, kelvinPerWatt: null });
    const [box] = sharedHeatPaths(withSlots(), designWith({ partId: "led" }, { partId: "my-box" }), isPublic);
    expect(box!.thermal.links.map((l) => l.kelvinPerWatt)).toEqual([4.2, 12.5, null]);
  });
});
