import { describe, expect, it } from "vitest";
import { finnedHeatsink, getMaterial, heatCapacity, solveSteady, solveTransient, spreadingResistance, emissivityFor, type NetworkInput } from "@/lib/thermal";
import { net } from "./helpers";

/**
 * Independent check of the spreading closed form: the same disc solved as an axisymmetric
 * finite-volume grid (rings × layers) with the engine's linear solver, itself checked
 * against ml-matrix elsewhere.
 */
function discByFiniteVolumes(p: { a: number; b: number; t: number; k: number; h: number; nr: number; nz: number }) {
  const dr = p.b / p.nr;
  const dz = p.t / p.nz;
  const id = (i: number, j: number) => `r${i}z${j}`;
  const nodes: { id: string }[] = [];
  const links: NetworkInput["links"] = [];
  const sources: { node: string; watts: number }[] = [];
  const Q = 1;
  for (let j = 0; j < p.nz; j++) {
    for (let i = 0; i < p.nr; i++) {
      nodes.push({ id: id(i, j) });
      const rIn = i * dr;
      const rOut = (i + 1) * dr;
      const ring = Math.PI * (rOut * rOut - rIn * rIn);
      if (i + 1 < p.nr) links.push({ from: id(i, j), to: id(i + 1, j), type: "resistance", kelvinPerWatt: dr / (p.k * 2 * Math.PI * rOut * dz) });
      if (j + 1 < p.nz) links.push({ from: id(i, j), to: id(i, j + 1), type: "conduction", lengthM: dz, areaM2: ring, conductivityWPerMK: p.k });
      // layer 0 is the cooled face: half a cell of conduction then h
      if (j === 0) links.push({ from: id(i, 0), to: "ambient", type: "resistance", kelvinPerWatt: dz / 2 / (p.k * ring) + 1 / (p.h * ring) });
      if (j === p.nz - 1 && rOut <= p.a + 1e-12) sources.push({ node: id(i, j), watts: (Q * ring) / (Math.PI * p.a * p.a) });
    }
  }
  const r = solveSteady(net({ ambientC: 0, nodes, links, sources }));
  const top = p.nz - 1;
  const qFlux = Q / (Math.PI * p.a * p.a);
  // surface = top cell centre + half a cell of conduction under the source's flux
  const surface = (i: number) => r.temperaturesC[id(i, top)]! + (qFlux * dz) / 2 / p.k;
  let avg = 0;
  let area = 0;
  for (let i = 0; i * dr < p.a - 1e-12; i++) {
    const ring = Math.PI * (((i + 1) * dr) ** 2 - (i * dr) ** 2);
    avg += surface(i) * ring;
    area += ring;
  }
  return { maxRise: surface(0) / Q, avgRise: avg / area / Q };
}

describe("spreading resistance, Lee–Song–Au–Moran (1995) closed form", () => {
  it("reduces to one-dimensional conduction t/(k·A) when the source covers the plate", () => {
    const r = spreadingResistance({ sourceAreaM2: 1e-3, plateAreaM2: 1e-3, plateThicknessM: 0.002, conductivityWPerMK: 200, sinkCoefficientWPerM2K: 1000 });
    expect(r.kelvinPerWatt).toBeCloseTo(0.002 / (200 * 1e-3), 9);
  });

  for (const c of [
    { name: "10 mm source on a 40 mm aluminium disc, 3 mm thick, strong sink", a: 0.005, b: 0.02, t: 0.003, k: 200, h: 2000 },
    { name: "6 mm source on a 30 mm copper disc, 1.5 mm thick, weak sink", a: 0.003, b: 0.015, t: 0.0015, k: 400, h: 200 },
  ]) {
    it(`${c.name}: peak and mean rise agree with a 40 × 12 finite-volume solution within 10 %`, () => {
      const fd = discByFiniteVolumes({ ...c, nr: 40, nz: 12 });
      const s = spreadingResistance({ sourceAreaM2: Math.PI * c.a * c.a, plateAreaM2: Math.PI * c.b * c.b, plateThicknessM: c.t, conductivityWPerMK: c.k, sinkCoefficientWPerM2K: c.h });
      const r0 = s.sinkKelvinPerWatt;
      expect(Math.abs((s.kelvinPerWatt + r0) / fd.maxRise - 1)).toBeLessThan(0.1);
      expect(Math.abs((s.averageKelvinPerWatt + r0) / fd.avgRise - 1)).toBeLessThan(0.1);
    });
  }
});

/** Vertical-fin sink of 6063 aluminium, anodised, base mounted (back not exposed). */
function sink(finCount: number, spacingM: number, baseM: number, finHeightM: number) {
  const al = getMaterial("aluminium-6063-t5")!;
  const finThicknessM = (baseM - (finCount - 1) * spacingM) / finCount;
  const baseThicknessM = 0.005;
  const volume = baseM * baseM * baseThicknessM + finCount * finThicknessM * finHeightM * baseM;
  return {
    geometry: {
      baseWidthM: baseM,
      baseLengthM: baseM,
      baseThicknessM,
      finCount,
      finHeightM,
      finThicknessM,
      conductivityWPerMK: al.conductivityWPerMK,
      emissivity: emissivityFor(al.id, "anodised")!.emissivity,
    },
    heatCapacityJPerK: heatCapacity({ volumeM3: volume, materialId: al.id }).heatCapacityJPerK,
  };
}

function withSource(g: ReturnType<typeof sink>, watts: number) {
  return net({
    ambientC: 25,
    nodes: [{ id: "junction", heatCapacityJPerK: 0.05 }, { id: "sink", heatCapacityJPerK: g.heatCapacityJPerK }],
    links: [
      { from: "junction", to: "sink", type: "resistance", kelvinPerWatt: 2.5 },
      { from: "sink", to: "ambient", type: "finned-heatsink", ...g.geometry },
    ],
    sources: [{ node: "junction", watts }],
  });
}

describe("finned heatsinks: facts of the trade (common practice)", () => {
  const eight = sink(8, 0.007, 0.06, 0.03);
  const sixteen = sink(16, 0.003, 0.06, 0.03);
  const small = sink(12, 0.0025, 0.04, 0.02);

  it("60 × 60 mm base, 8 fins 30 mm tall ~7 mm apart: roughly 3–5 K/W sink-to-air in still air at 7 W", () => {
    const r = solveSteady(withSource(eight, 7));
    const rSink = r.links[1]!.kelvinPerWatt;
    expect(rSink).toBeGreaterThan(3);
    expect(rSink).toBeLessThan(5);
    // 8 fins: t = (60 − 7 × 7)/8 = 1.375 mm — a plausible extrusion
    expect(eight.geometry.finThicknessM).toBeCloseTo(0.001375, 9);
  });

  it("…so 7 W of heat keeps that sink below 60 °C at 25 °C after 20 minutes of warm-up", () => {
    const tr = solveTransient(withSource(eight, 7), { durationS: 1200, stepS: 1, thresholds: [{ node: "sink", limitC: 60 }] });
    const last = tr.temperaturesC.sink!.at(-1)!;
    expect(last).toBeLessThan(60);
    // it really warmed: 7 W × ≥ 3 K/W ≈ 21 K rise at steady state, and the ~100 g sink gets most of the way in 20 min
    expect(last).toBeGreaterThan(40);
    expect(tr.crossings![0]!.timeS).toBeNull();
  });

  it("the same base with 16 fins 3 mm apart (a sink made for a fan) does worse in still air, and the trace says the channels choke", () => {
    const r8 = solveSteady(withSource(eight, 7)).links[1]!.kelvinPerWatt;
    const r16 = solveSteady(withSource(sixteen, 7)).links[1]!.kelvinPerWatt;
    expect(r16).toBeGreaterThan(r8 * 1.1);
    const t = finnedHeatsink({ ...sixteen.geometry, surfaceC: 60, ambientC: 25 }).trace;
    expect(t.notes.join(" ")).toMatch(/choked/);
  });

  it("…while with a fan (2 m/s through the channels) the dense sink beats the sparse one", () => {
    const fan = (g: ReturnType<typeof sink>) => finnedHeatsink({ ...g.geometry, airSpeedMPerS: 2, surfaceC: 60, ambientC: 25 }).kelvinPerWatt;
    expect(fan(sixteen)).toBeLessThan(fan(eight));
    expect(fan(eight)).toBeLessThan(finnedHeatsink({ ...eight.geometry, surfaceC: 60, ambientC: 25 }).kelvinPerWatt);
  });

  it("a 40 × 40 mm sink with a dozen 20 mm fins is nowhere near enough for 7 W without a fan", () => {
    const r = solveSteady(withSource(small, 7));
    // "nowhere near": over 8 K/W, so 7 W pushes the sink past 80 °C (25 + 7 × 8 = 81), 20 K beyond a 60 °C sink budget
    expect(r.links[1]!.kelvinPerWatt).toBeGreaterThan(8);
    expect(r.temperaturesC.sink!).toBeGreaterThan(80);
  });

  it("the heatsink trace lists its parts and they add up to the total", () => {
    const e = finnedHeatsink({ ...eight.geometry, surfaceC: 55, ambientC: 25 });
    const part = (s: string) => e.trace.intermediates.find((q) => q.symbol === s)!.value;
    const sum = part("G_fins,ch") + part("G_fins,o") + part("G_base") + part("G_back") + part("G_rad");
    expect(sum).toBeCloseTo(e.conductanceWPerK, 12);
    expect(e.trace.source).toContain("Bar-Cohen & Rohsenow");
  });
});
