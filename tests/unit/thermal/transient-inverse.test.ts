import { describe, expect, it } from "vitest";
import { breakdownRise, explainLinks, maxLinkResistance, maxSourcePower, solveSteady, solveTransient } from "@/lib/thermal";
import { net } from "./helpers";

const lamp = (opts: { junctionCapacity?: number; watts?: number } = {}) =>
  net({
    ambientC: 25,
    nodes: [
      { id: "junction", ...(opts.junctionCapacity ? { heatCapacityJPerK: opts.junctionCapacity } : {}) },
      { id: "sink", heatCapacityJPerK: 60 },
      { id: "case", heatCapacityJPerK: 120 },
    ],
    links: [
      { from: "junction", to: "sink", type: "resistance", kelvinPerWatt: 2.5 },
      { from: "sink", to: "case", type: "resistance", kelvinPerWatt: 0.8 },
      { from: "case", to: "ambient", type: "natural-convection", areaM2: 0.02, surface: "vertical-plate", characteristicLengthM: 0.12 },
      { from: "case", to: "ambient", type: "radiation", areaM2: 0.02, emissivity: 0.85 },
    ],
    sources: [{ node: "junction", watts: opts.watts ?? 5 }],
  });

describe("warm-up", () => {
  it("a node without heat capacity follows its neighbours at once: T_j = T_sink + P·R at every instant, t = 0 included", () => {
    const tr = solveTransient(lamp(), { durationS: 300, stepS: 5 });
    tr.timesS.forEach((_, k) => expect(tr.temperaturesC.junction![k]! - tr.temperaturesC.sink![k]!).toBeCloseTo(5 * 2.5, 6));
    expect(tr.temperaturesC.sink![0]).toBe(25);
  });

  it("converges to the steady answer (non-linear network, 6 h)", () => {
    const n = lamp({ junctionCapacity: 0.05 });
    const s = solveSteady(n);
    const tr = solveTransient(n, { durationS: 6 * 3600, stepS: 10 });
    for (const id of ["junction", "sink", "case"]) expect(tr.temperaturesC[id]!.at(-1)!).toBeCloseTo(s.temperaturesC[id]!, 3);
  });

  it("timesS has one entry per stepS from 0 and ends exactly at durationS, also when it is not a whole number of steps", () => {
    const tr = solveTransient(lamp(), { durationS: 10.5, stepS: 1 });
    expect(tr.timesS).toHaveLength(12);
    expect(tr.timesS[1]).toBe(1);
    expect(tr.timesS.at(-1)).toBe(10.5);
    expect(tr.temperaturesC.case).toHaveLength(12);
  });

  it("initialC as a number starts every node there; as a map only the named ones", () => {
    const all = solveTransient(lamp(), { durationS: 10, stepS: 1, initialC: 40 });
    expect(all.temperaturesC.case![0]).toBe(40);
    const some = solveTransient(lamp(), { durationS: 10, stepS: 1, initialC: { case: 35 } });
    expect(some.temperaturesC.case![0]).toBe(35);
    expect(some.temperaturesC.sink![0]).toBe(25);
  });

  it("threshold crossing of a single RC node matches the exact time −τ·ln(1 − ΔT_lim/(P·R)) within a tenth of a step", () => {
    const n = net({
      ambientC: 25,
      nodes: [{ id: "m", heatCapacityJPerK: 50 }],
      links: [{ from: "m", to: "ambient", type: "resistance", kelvinPerWatt: 2 }],
      sources: [{ node: "m", watts: 5 }],
    });
    // τ = 100 s, final rise 10 K; reaching 31 °C (6 K rise): t = −100·ln(1 − 0.6) = 91.63 s
    const tr = solveTransient(n, { durationS: 300, stepS: 1, thresholds: [{ node: "m", limitC: 31 }, { node: "m", limitC: 40 }, { node: "m", limitC: 20 }] });
    expect(Math.abs(tr.crossings![0]!.timeS! - 91.629)).toBeLessThan(0.1);
    expect(tr.crossings![1]!.timeS).toBeNull();
    expect(tr.crossings![2]!.timeS).toBe(0);
  });
});

describe("inverse problems", () => {
  const series = net({
    ambientC: 25,
    nodes: [{ id: "junction" }, { id: "sink" }],
    links: [
      { from: "junction", to: "sink", type: "resistance", kelvinPerWatt: 2.5 },
      { from: "sink", to: "ambient", type: "resistance", kelvinPerWatt: 4 },
    ],
    sources: [{ node: "junction", watts: 3 }],
  });

  it("largest power for a limit on a linear series path: P = (T_lim − T∞)/ΣR", () => {
    // (90 − 25)/(2.5 + 4) = 10 W
    const r = maxSourcePower(series, { node: "junction", limitC: 90 });
    expect(r.watts).toBeCloseTo(10, 6);
    expect(r.scale).toBeCloseTo(10 / 3, 6);
    expect(r.feasible).toBe(true);
  });

  it("largest power on a non-linear network lands on the limit when re-solved", () => {
    const n = lamp();
    const r = maxSourcePower(n, { node: "junction", limitC: 100, sourceNode: "junction" });
    expect(r.converged).toBe(true);
    const check = solveSteady(net({ ...n, sources: [{ node: "junction", watts: r.watts }] }));
    expect(check.temperaturesC.junction!).toBeCloseTo(100, 4);
  });

  it("required sink-to-air resistance: R_max = (T_lim − T∞)/P − R_js", () => {
    // 7 W, junction limit 100 °C: (100 − 25)/7 − 2.5 = 8.2143 K/W
    const r = maxLinkResistance(net({ ...series, sources: [{ node: "junction", watts: 7 }] }), { node: "junction", limitC: 100, link: 1 });
    expect(r.kelvinPerWatt!).toBeCloseTo(75 / 7 - 2.5, 5);
    expect(r.presentKelvinPerWatt).toBeCloseTo(4, 9);
  });

  it("says so when no resistance is small enough, or any is fine", () => {
    const hot = maxLinkResistance(net({ ...series, sources: [{ node: "junction", watts: 100 }] }), { node: "junction", limitC: 100, link: 1 });
    expect(hot.feasible).toBe(false);
    const twoPaths = net({ ...series, links: [...series.links, { from: "junction", to: "ambient", type: "resistance", kelvinPerWatt: 1 }] });
    const easy = maxLinkResistance(twoPaths, { node: "junction", limitC: 100, link: 1 });
    expect(easy.kelvinPerWatt).toBeNull();
  });
});

describe("breakdown of a rise and link traces", () => {
  it("the ladder walks the main heat path and its drops add up to the rise", () => {
    const n = lamp();
    const s = solveSteady(n);
    const b = breakdownRise(n, s, "junction");
    expect(b.steps.map((x) => x.to)).toEqual(["sink", "case", "ambient"]);
    expect(b.steps[0]!.deltaK).toBeCloseTo(12.5, 6);
    expect(b.steps.reduce((t, x) => t + x.deltaK, 0)).toBeCloseTo(b.riseK, 9);
    expect(b.remainderK).toBeCloseTo(0, 9);
    // the last step is whichever of convection and radiation carries more; its share is below 1
    expect(b.steps[2]!.shareOfOutflow).toBeLessThan(1);
  });

  it("every link has a trace with its formula, inputs with units, result and source", () => {
    const n = lamp();
    const traces = explainLinks(n, solveSteady(n));
    expect(traces).toHaveLength(4);
    for (const t of traces) {
      expect(t.formula.length).toBeGreaterThan(5);
      expect(t.source.length).toBeGreaterThan(5);
      expect(t.inputs.every((q) => q.unit.length > 0 && Number.isFinite(q.value))).toBe(true);
    }
    expect(traces[2]!.formula).toContain("Churchill–Chu");
  });
});
