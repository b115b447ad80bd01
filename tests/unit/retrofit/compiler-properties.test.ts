import { describe, expect, it } from "vitest";
import { partSchema } from "@/lib/parts";
import { evaluateBuild, type BuildDesignInput } from "@/lib/retrofit";
import { headlamp, inspection, lantern, lanternDesign, resolved } from "./fixtures/builds";
import { COPPER_TAPE, DECLARED_SINK, FINNED_SINK, STEEL_LANTERN } from "./fixtures/parts";

const FAST = { skipWhatItTakes: true, skipWarmup: true } as const;
type Inline = { name: string; inline: Record<string, unknown> };
const withSpecs = (part: unknown, specs: Record<string, unknown>) => ({ ...(part as Inline), inline: { ...(part as Inline).inline, ...specs } }) as never;

describe("properties any correct build compiler meets", () => {
  it("N identical emitters, each with its own share of the sink, have the same junction rise as one (series circuit: N parallel paths of N× the heat — Incropera et al., 6th ed., §3.1.3)", () => {
    const rise = (n: number) => {
      const design: BuildDesignInput = {
        ...lanternDesign,
        // Vented, so the sink's path to the air is all the junction sees.
        housing: withSpecs(STEEL_LANTERN, { enclosure: "vented" }),
        lightEngine: { ...lanternDesign.lightEngine, count: n, wiring: "series", heatsink: withSpecs(DECLARED_SINK, { sinkToAirKPerW: 8 / n }) },
      };
      const r = evaluateBuild(resolved(design), FAST);
      return r.scenarios.filter((s) => s.kind === "mode").map((s) => s.thermal!.temperaturesC.junction! - 25);
    };
    const one = rise(1);
    for (const n of [2, 4]) {
      rise(n).forEach((x, i) => expect(Math.abs(x - one[i]!)).toBeLessThan(0.05));
    }
  });

  it("in a closed housing a high-emissivity sink leaves the inside air cooler than a bare one: its radiation goes to the wall, past the air (Incropera et al., 6th ed., §13.1: air is transparent to thermal radiation)", () => {
    const air = (emissivity: number) => {
      const design: BuildDesignInput = { ...lanternDesign, lightEngine: { ...lanternDesign.lightEngine, heatsink: withSpecs(FINNED_SINK, { emissivity }) } };
      const r = evaluateBuild(resolved(design), FAST);
      return r.scenarios.find((s) => s.name === "high")!.thermal!.temperaturesC.air!;
    };
    expect(air(0.9)).toBeLessThan(air(0.05) - 0.5);
  });

  it("heat leaving to ambient equals the heat of the sources in every scenario of every fixture build (conservation of energy)", () => {
    for (const build of [lantern(), headlamp(), inspection()]) {
      const r = evaluateBuild(build, FAST);
      for (const s of r.scenarios) {
        if (!s.thermal || !s.network) continue;
        const total = s.network.sources.reduce((sum, x) => sum + Math.abs(x.watts), 0);
        expect(Math.abs(s.thermal.energyBalanceW), `${s.name}`).toBeLessThanOrEqual(1e-6 * total + 1e-9);
        expect(s.thermal.solver.converged).toBe(true);
      }
    }
  });
});

describe("housings of plastic and of two materials", () => {
  it("copper tape glued to a plastic wall is heat spreading into a poor conductor: the spot resistance is tens of times an aluminium wall's (ABS k ≈ 0.17 W/(m·K), Mark, 'Physical Properties of Polymers Handbook', 2nd ed., from memory)", () => {
    const spot = (material: string) => {
      const design: BuildDesignInput = { ...lanternDesign, housing: withSpecs(STEEL_LANTERN, { material, wallThicknessM: 0.002 }), driver: { ...lanternDesign.driver, cooling: { kind: "strapped", spreader: COPPER_TAPE } } };
      const r = evaluateBuild(resolved(design), FAST);
      const link = r.scenarios[0]!.thermal!.links.find((l) => l.from === "wall-driver" && l.to === "wall")!;
      return link;
    };
    const abs = spot("abs");
    const al = spot("aluminium-6061-t6");
    expect(abs.kelvinPerWatt / al.kelvinPerWatt).toBeGreaterThan(30);
    expect(abs.trace.inputs.find((x) => x.symbol === "k")!.value).toBeCloseTo(0.17, 6);
  });

  it("a metal tube with a plastic head: two wall nodes sharing the outside by area, joined along the wall; the plastic part runs cooler where no part presses on it", () => {
    const design: BuildDesignInput = { ...lanternDesign, housing: withSpecs(STEEL_LANTERN, { secondMaterial: "polycarbonate", secondAreaM2: 0.02, secondWallThicknessM: 0.002 }) };
    const r = evaluateBuild(resolved(design), FAST);
    const high = r.scenarios.find((s) => s.name === "high")!;
    const t = high.thermal!.temperaturesC;
    expect(t["wall-second"]).toBeDefined();
    expect(Number.isFinite(t["wall-second"]!)).toBe(true);
    const total = high.network!.sources.reduce((s, x) => s + x.watts, 0);
    expect(Math.abs(high.thermal!.energyBalanceW)).toBeLessThanOrEqual(1e-6 * total + 1e-9);
  });

  it("bad input is refused naming the field, never NaN: areas that do not add up, a second area without its material, a rated rise of zero", () => {
    const housing = (specs: Record<string, unknown>) => partSchema.safeParse({ kind: "housing", name: "h", provenance: "estimate", visibility: "private", specs: { material: "aluminium-6061-t6", wallThicknessM: 0.001, outerAreaM2: 0.05, enclosure: "sealed", ...specs } });
    const tooBig = housing({ secondMaterial: "abs", secondAreaM2: 0.06 });
    expect(tooBig.success).toBe(false);
    expect(tooBig.error!.issues.some((i) => i.path.join(".").endsWith("secondAreaM2"))).toBe(true);
    const noMaterial = housing({ secondAreaM2: 0.01 });
    expect(noMaterial.success).toBe(false);
    expect(noMaterial.error!.issues.some((i) => i.path.join(".").endsWith("secondMaterial"))).toBe(true);
    const sink = (ratedDeltaK: number) => partSchema.safeParse({ kind: "heatsink", name: "s", provenance: "estimate", visibility: "private", specs: { rating: "declared", sinkToAirKPerW: 5, ratedAirflow: "natural", ratedDeltaK } });
    for (const bad of [0, -10]) {
      const r = sink(bad);
      expect(r.success).toBe(false);
      expect(r.error!.issues.some((i) => i.path.join(".").endsWith("ratedDeltaK"))).toBe(true);
    }
    expect(sink(50).success).toBe(true);
  });
});

describe("a declared sink rating holds at its rated rise", () => {
  it("at a smaller rise than rated the sink does worse than its rating, and the trace shows the correction (laminar natural convection h ∝ ΔT^¼, Incropera et al., 6th ed., ch. 9)", () => {
    const at = (ratedDeltaK: number) => {
      const design: BuildDesignInput = { ...lanternDesign, lightEngine: { ...lanternDesign.lightEngine, heatsink: withSpecs(DECLARED_SINK, { ratedDeltaK }) } };
      const r = evaluateBuild(resolved(design), FAST);
      const low = r.scenarios.find((s) => s.name === "low")!.thermal!;
      return low.links.find((l) => l.from === "sink")!;
    };
    const link = at(75);
    expect(link.kelvinPerWatt).toBeGreaterThan(8);
    expect(link.trace.inputs.some((x) => x.symbol === "ΔT_rated" && x.value === 75)).toBe(true);
    // Rated at a rise below the actual one: better than its rating.
    expect(at(1).kelvinPerWatt).toBeLessThan(8);
  });
});

describe("warm-up to the end of the run", () => {
  it("every mode warms up until it settles or the pack is empty, so every limit the steady state exceeds gets its time", () => {
    const r = evaluateBuild(inspection(), { skipWhatItTakes: true });
    for (const s of r.scenarios) {
      const w = s.warmup!;
      expect(["settled", "pack-empty", "charge-done", "time-cap"]).toContain(w.ends);
      expect(w.converged).toBe(true);
      if (w.ends !== "settled") expect(Math.abs(w.durationS - Math.min(w.runS, 12 * 3600))).toBeLessThan(1);
      for (const l of s.thermal!.limits.filter((x) => x.kind === "max" && x.temperatureC > x.limitC + 1)) {
        const c = w.crossings.find((x) => x.limitId === l.id)!;
        if (w.ends === "settled") expect(c.timeS).not.toBeNull();
      }
    }
  });
});
