import { describe, expect, it } from "vitest";
import { evaluateBuild, type BuildDesignInput } from "@/lib/retrofit";
import { resolved, lanternDesign } from "./fixtures/builds";
import { DECLARED_SINK, EMITTER, PASTE, STEEL_LANTERN } from "./fixtures/parts";

// A vented lantern: the declared sink hands its heat straight to ambient air, so the
// junction's path is three resistances in series and Tj has a closed form.
const vented: BuildDesignInput = {
  ...lanternDesign,
  housing: { ...STEEL_LANTERN, inline: { ...STEEL_LANTERN.inline, enclosure: "vented" } },
  lightEngine: { emitter: EMITTER, count: 1, interface: PASTE, heatsink: DECLARED_SINK, footprintM2: 3.5e-3 * 3.5e-3 },
};

describe("declared-sink build, worked by hand", () => {
  const r = evaluateBuild(resolved(vented), { skipWarmup: true });
  const low = r.scenarios.find((s) => s.id === "mode:low")!;

  it("Tj = Ta + P_heat·ΣR with P_heat = hf·I·(Vf₂₅ + k·(Tj − 25)) solved for Tj", () => {
    // Part figures (fixtures/parts.ts): Rth(j-sp) 2.5 K/W, Vf 2.9 V at 25 °C, k = −2 mV/K
    // (PRODUCT.md: about −2 mV/K), heat fraction 0.7, mode "low" 0.35 A.
    // Interface: paste 50 µm at 3 W/(m·K) over the 3.5 × 3.5 mm footprint (Incropera eq. 3.6):
    //   R_if = 50e-6 / (3 · 12.25e-6) = 1.36054 K/W. Declared sink 8 K/W to ambient (vented).
    const rIf = 50e-6 / (3 * 12.25e-6);
    expect(rIf).toBeCloseTo(1.36054, 4);
    const sumR = 2.5 + rIf + 8; // 11.86054 K/W
    const [ta, i, hf, vf25, k] = [25, 0.35, 0.7, 2.9, -0.002];
    // Tj = Ta + ΣR·hf·I·(vf25 + k(Tj − 25))  ⇒  Tj·(1 − ΣR·hf·I·k) = Ta + ΣR·hf·I·(vf25 − 25k)
    // With the sink exactly at its rating this is the closed form:
    const tjRated = (ta + sumR * hf * i * (vf25 - 25 * k)) / (1 - sumR * hf * i * k);
    // = (25 + 11.86054·0.245·2.95) / (1 + 0.0058117) ≈ 33.38 °C
    expect(tjRated).toBeCloseTo(33.38, 1);
    // The rating holds at its rated rise (75 K when the part gives none); at this sink's ≈ 9 K
    // rise the convective 70 % of its conductance scales by (ΔT/75)^¼ (laminar natural
    // convection), so R_sink = 8/[0.7·(ΔT/75)^¼ + 0.3]. Fixed point by hand on Tj and ΔT:
    const rSink = (dT: number) => 8 / (0.7 * (dT / 75) ** 0.25 + 0.3);
    let tj = tjRated;
    let dT = 8;
    for (let it = 0; it < 200; it++) {
      const p = hf * i * (vf25 + k * (tj - 25));
      dT = p * rSink(dT);
      tj = ta + p * (2.5 + rIf) + dT;
    }
    expect(tj).toBeGreaterThan(tjRated);
    expect(low.thermal!.temperaturesC.junction!).toBeCloseTo(tj, 2);
    const pHeat = hf * i * (vf25 + k * (tj - 25));
    expect(low.mode!.emitterHeat.value!).toBeCloseTo(pHeat, 4);
    expect(low.thermal!.temperaturesC.sink!).toBeCloseTo(ta + pHeat * rSink(dT), 2);
    expect(low.converged).toBe(true);
  });

  it("the network is JSON v1 with the named places and a trace on every link", () => {
    const net = low.network!;
    expect(net.ambientC).toBe(25);
    expect(net.links.find((l) => l.from === "junction")).toMatchObject({ to: "solder", type: "resistance", kelvinPerWatt: 2.5 });
    const sinkLink = net.links.find((l) => l.from === "sink")!;
    expect(sinkLink).toMatchObject({ to: "ambient", type: "resistance" });
    // Worse than the 8 K/W rating at this small rise (the rating holds at 75 K).
    expect(sinkLink.type === "resistance" && sinkLink.kelvinPerWatt).toBeGreaterThan(8);
    const places = Object.keys(low.thermal!.byPlace);
    for (const p of ["LED junction", "emitter solder point", "heatsink", "housing wall", "driver board", "cells"]) expect(places).toContain(p);
    expect(places).not.toContain("housing air"); // vented: no enclosed air node
    for (const l of low.thermal!.links) expect(l.trace.result.unit).toMatch(/K\/W|W\/K/);
  });

  it("a sealed housing adds the enclosed air and the wall to the path, so the junction runs hotter", () => {
    const sealed = evaluateBuild(resolved(lanternDesign), { skipWarmup: true }).scenarios.find((s) => s.id === "mode:low")!;
    expect(sealed.thermal!.byPlace["housing air"]).toBeGreaterThan(25);
    expect(sealed.thermal!.temperaturesC.junction!).toBeGreaterThan(low.thermal!.temperaturesC.junction! + 1);
  });

  it("the ladder adds up to the junction's rise", () => {
    const ladder = low.thermal!.ladder!;
    const sum = ladder.steps.reduce((s, x) => s + x.deltaK, 0);
    expect(sum + ladder.remainderK).toBeCloseTo(ladder.riseK, 9);
    expect(ladder.steps[0]).toMatchObject({ from: "junction", to: "solder" });
  });
});

describe("a heatsink's own heat capacity", () => {
  it("a capacity given on the part (as a bench fit keeps it) is the sink node's capacity, in place of mass × specific heat", () => {
    const withCapacity: BuildDesignInput = { ...vented, lightEngine: { ...vented.lightEngine, heatsink: { ...DECLARED_SINK, inline: { ...DECLARED_SINK.inline, heatCapacityJPerK: 61 } } } };
    const given = evaluateBuild(resolved(withCapacity), { skipWarmup: true }).scenarios.find((s) => s.id === "mode:low")!;
    const sinkNode = (r: typeof given) => r.network!.nodes.find((n) => n.id === "sink")!;
    expect(sinkNode(given).heatCapacityJPerK).toBe(61);
    // Without it: 30 g of aluminium at about 900 J/(kg·K) (Incropera, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1: pure aluminium 903): about 27 J/K.
    const plain = evaluateBuild(resolved(vented), { skipWarmup: true }).scenarios.find((s) => s.id === "mode:low")!;
    const fromMass = sinkNode(plain).heatCapacityJPerK!;
    expect(fromMass).toBeGreaterThan(0.03 * 850);
    expect(fromMass).toBeLessThan(0.03 * 1000);
  });
});
