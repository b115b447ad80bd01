import { describe, expect, it } from "vitest";
import {
  airPropertiesAt,
  conductionResistance,
  finEfficiency,
  getMaterial,
  interfaceLayer,
  MATERIALS,
  naturalConvection,
  naturalConvectionCoefficient,
  radiationExchange,
  solveSteady,
  STEFAN_BOLTZMANN,
  strapResistance,
  heatCapacity,
} from "@/lib/thermal";
import { naturalConvectionH } from "@/lib/thermal/elements/natural-convection";
import { net } from "./helpers";

describe("Stefan–Boltzmann constant and radiation", () => {
  it("σ is the CODATA 2018 value and equals 2π⁵k⁴/(15h³c²) from the exact SI constants", () => {
    expect(STEFAN_BOLTZMANN).toBe(5.670374419e-8);
    // SI 2019: k = 1.380649e-23 J/K, h = 6.62607015e-34 J·s, c = 299 792 458 m/s, all exact
    const k = 1.380649e-23;
    const h = 6.62607015e-34;
    const c = 299792458;
    const sigma = (2 * Math.PI ** 5 * k ** 4) / (15 * h ** 3 * c ** 2);
    expect(Math.abs(sigma / STEFAN_BOLTZMANN - 1)).toBeLessThan(1e-9);
  });

  it("a black surface at 300 K to surroundings at 0 K radiates σT⁴ ≈ 459 W/m² (common practice figure)", () => {
    // 5.670374419e-8 × 300⁴ = 5.670374419e-8 × 8.1e9 = 459.3 W/m²
    const r = radiationExchange({ areaM2: 1, emissivity: 1, surfaceC: 26.85, surroundingsC: -273.15 + 1e-9 });
    expect(r.watts).toBeCloseTo(459.3, 1);
  });

  it("secant conductance reproduces q = εσA(T⁴ − T∞⁴) and the trace names σ and the `to` temperature", () => {
    const r = radiationExchange({ areaM2: 0.01, emissivity: 0.85, surfaceC: 60, surroundingsC: 25 });
    // 0.85 × 5.670374419e-8 × 0.01 × (333.15⁴ − 298.15⁴) = 4.8198e-10 × 4.4161e9 ≈ 2.1285 W
    expect(r.watts).toBeCloseTo(2.1285, 3);
    expect(r.conductanceWPerK * 35).toBeCloseTo(r.watts, 10);
    expect(r.trace.intermediates.find((q) => q.symbol === "σ")?.value).toBe(5.670374419e-8);
  });
});

describe("natural convection", () => {
  it("vertical plate: Incropera Example 9.2 (glass fire screen 0.71 m high × 1.02 m wide at 232 °C, room 23 °C) — book answer from memory: Ra ≈ 1.813e9, Nu ≈ 147, q ≈ 1060 W", () => {
    const r = naturalConvection({ surface: "vertical-plate", areaM2: 0.71 * 1.02, characteristicLengthM: 0.71, surfaceC: 232, fluidC: 23 });
    const ra = r.trace.intermediates.find((q) => q.symbol === "Ra")!.value;
    // Our air table (Çengel A-15) differs from the book's (Incropera A.4) by a few per cent at 400 K.
    expect(ra / 1.813e9).toBeGreaterThan(0.95);
    expect(ra / 1.813e9).toBeLessThan(1.1);
    expect(r.trace.formula).toContain("all Rayleigh numbers");
    const q = r.conductanceWPerK * (232 - 23);
    expect(Math.abs(q / 1060 - 1)).toBeLessThan(0.03);
  });

  it("small surfaces in still air come out at 3–10 W/(m²·K) (common practice, PRODUCT.md)", () => {
    for (const surface of ["vertical-plate", "horizontal-plate-up", "horizontal-cylinder"] as const) {
      const r = naturalConvection({ surface, areaM2: 0.005, characteristicLengthM: 0.05, surfaceC: 55, fluidC: 25 });
      expect(r.coefficientWPerM2K).toBeGreaterThan(3);
      expect(r.coefficientWPerM2K).toBeLessThan(10);
    }
    const down = naturalConvection({ surface: "horizontal-plate-down", areaM2: 0.005, characteristicLengthM: 0.05, surfaceC: 55, fluidC: 25 });
    const up = naturalConvection({ surface: "horizontal-plate-up", areaM2: 0.005, characteristicLengthM: 0.05, surfaceC: 55, fluidC: 25 });
    expect(down.coefficientWPerM2K).toBeLessThan(up.coefficientWPerM2K);
  });

  it("outside a correlation's range it still answers, finite, and says so in the trace", () => {
    const r = naturalConvection({ surface: "horizontal-plate-up", areaM2: 1e-6, characteristicLengthM: 0.001, surfaceC: 26, fluidC: 25 });
    expect(Number.isFinite(r.coefficientWPerM2K)).toBe(true);
    expect(r.trace.validity?.inRange).toBe(false);
    expect(r.trace.notes.join(" ")).toMatch(/outside the correlation's range/);
  });

  it("the solver's allocation-free coefficient equals the traced one on every surface, inside and outside the air table", () => {
    for (const surface of ["vertical-plate", "horizontal-plate-up", "horizontal-plate-down", "horizontal-cylinder"] as const) {
      for (const [ts, tf, L] of [[330, 298, 0.05], [290, 300, 0.2], [600, 300, 1.5], [240, 200, 0.01]] as const) {
        expect(naturalConvectionH(surface, L, ts, tf)).toBeCloseTo(naturalConvectionCoefficient(surface, L, ts, tf).coefficientWPerM2K, 10);
      }
    }
  });

  it("a horizontal plate colder than the air uses the opposite face's correlation", () => {
    const r = naturalConvection({ surface: "horizontal-plate-up", areaM2: 0.01, characteristicLengthM: 0.05, surfaceC: 5, fluidC: 25 });
    expect(r.trace.formula).toContain("Lower surface of a hot plate");
  });
});

describe("air properties (Çengel & Ghajar Table A-15)", () => {
  it("each interpolated state is self-consistent: ν = μ/ρ, α = k/(ρ·c_p), Pr = ν/α within 1 %", () => {
    for (let c = -50; c <= 160; c += 7) {
      const a = airPropertiesAt(c + 273.15);
      expect(a.inTable).toBe(true);
      expect(a.diffusivityM2PerS / (a.conductivityWPerMK / (a.densityKgPerM3 * a.specificHeatJPerKgK))).toBeCloseTo(1, 1.7);
      expect(a.prandtl / (a.kinematicViscosityM2PerS / a.diffusivityM2PerS)).toBeCloseTo(1, 1.7);
    }
  });

  it("viscosity agrees with Sutherland's law μ = 1.458e-6·T^1.5/(T + 110.4) (U.S. Standard Atmosphere 1976) within 1.5 %", () => {
    for (let c = -50; c <= 160; c += 10) {
      const a = airPropertiesAt(c + 273.15);
      const t = c + 273.15;
      const mu = (1.458e-6 * t ** 1.5) / (t + 110.4);
      expect(Math.abs((a.kinematicViscosityM2PerS * a.densityKgPerM3) / mu - 1)).toBeLessThan(0.015);
    }
  });

  it("extrapolation beyond the table is continuous and flagged", () => {
    const edge = airPropertiesAt(160 + 273.15);
    const past = airPropertiesAt(160.001 + 273.15);
    expect(past.inTable).toBe(false);
    expect(past.conductivityWPerMK / edge.conductivityWPerMK).toBeCloseTo(1, 4);
    expect(past.kinematicViscosityM2PerS / edge.kinematicViscosityM2PerS).toBeCloseTo(1, 3);
    expect(airPropertiesAt(2000).kinematicViscosityM2PerS).toBeGreaterThan(0);
  });
});

describe("materials", () => {
  it("every row names its handbook and has physical values", () => {
    for (const m of MATERIALS) {
      expect(m.source.length).toBeGreaterThan(10);
      expect(m.conductivityWPerMK).toBeGreaterThan(0);
      for (const e of Object.values(m.emissivity)) expect(e).toBeGreaterThan(0), expect(e).toBeLessThanOrEqual(1);
    }
  });

  it("thermal diffusivity k/(ρ·c_p) matches Incropera Table A.1's α column (from memory: Cu 117e-6, Al 97.1e-6 m²/s)", () => {
    const cu = getMaterial("copper-pure")!;
    const al = getMaterial("aluminium-pure")!;
    expect(cu.conductivityWPerMK / (cu.densityKgPerM3 * cu.specificHeatJPerKgK) / 117e-6).toBeCloseTo(1, 1.5);
    expect(al.conductivityWPerMK / (al.densityKgPerM3 * al.specificHeatJPerKgK) / 97.1e-6).toBeCloseTo(1, 1.5);
  });

  it("pure metals obey Wiedemann–Franz k ≈ L₀·σ_el·T within 15 % (L₀ = 2.44e-8 W·Ω/K²; σ_el from memory: Cu 5.96e7, Al 3.77e7 S/m at 20 °C)", () => {
    // Cu: 2.44e-8 × 5.96e7 × 293 = 426 W/(m·K); Al: 2.44e-8 × 3.77e7 × 293 = 270 W/(m·K)
    expect(Math.abs(getMaterial("copper-pure")!.conductivityWPerMK / (2.44e-8 * 5.96e7 * 293) - 1)).toBeLessThan(0.15);
    expect(Math.abs(getMaterial("aluminium-pure")!.conductivityWPerMK / (2.44e-8 * 3.77e7 * 293) - 1)).toBeLessThan(0.15);
  });
});

describe("simple elements", () => {
  it("conduction, interface, strap and heat capacity by hand", () => {
    // 1 mm of aluminium, 20 × 20 mm: 0.001 / (205 × 4e-4) = 0.012195 K/W
    expect(conductionResistance({ lengthM: 0.001, areaM2: 4e-4, conductivityWPerMK: 205 }).kelvinPerWatt).toBeCloseTo(0.0121951, 6);
    // grease 50 µm, k = 3 W/(m·K), 1 cm²: 5e-5 / (3 × 1e-4) = 0.1667 K/W
    expect(interfaceLayer({ bondLineM: 5e-5, conductivityWPerMK: 3, areaM2: 1e-4 }).kelvinPerWatt).toBeCloseTo(0.16667, 4);
    expect(interfaceLayer({ resistancePerAreaM2KPerW: 2e-5, areaM2: 1e-4 }).kelvinPerWatt).toBeCloseTo(0.2, 9);
    // copper tape 60 mm × 35 µm × 10 mm: 0.06 / (401 × 3.5e-5 × 0.01) = 427.5 K/W — tape alone carries little
    expect(strapResistance({ lengthM: 0.06, thicknessM: 3.5e-5, widthM: 0.01, conductivityWPerMK: 401 }).kelvinPerWatt).toBeCloseTo(427.5, 0);
    // 100 g of 6063 aluminium: 0.1 × 900 = 90 J/K
    expect(heatCapacity({ massKg: 0.1, materialId: "aluminium-6063-t5" }).heatCapacityJPerK).toBeCloseTo(90, 9);
    expect(heatCapacity({ volumeM3: 1e-5, materialId: "copper-pure" }).heatCapacityJPerK).toBeCloseTo(1e-5 * 8933 * 385, 9);
  });

  it("fin efficiency with corrected length matches a fin cut into 100 nodes with a convecting tip within 1 %", () => {
    const k = 200;
    const t = 0.0015;
    const H = 0.03;
    const h = 25;
    const depth = 0.05;
    const eta = finEfficiency({ heightM: H, thicknessM: t, conductivityWPerMK: k, coefficientWPerM2K: h }).efficiency;
    const N = 100;
    const dx = H / N;
    const nodes = Array.from({ length: N + 1 }, (_, i) => ({ id: `x${i}` }));
    const links = [];
    for (let i = 0; i < N; i++) links.push({ from: `x${i}`, to: `x${i + 1}`, type: "conduction" as const, lengthM: dx, areaM2: t * depth, conductivityWPerMK: k });
    for (let i = 0; i <= N; i++) links.push({ from: `x${i}`, to: "ambient", type: "convection" as const, areaM2: 2 * depth * dx * (i === 0 || i === N ? 0.5 : 1), coefficientWPerM2K: h });
    links.push({ from: `x${N}`, to: "ambient", type: "convection" as const, areaM2: t * depth, coefficientWPerM2K: h });
    const r = solveSteady(net({ ambientC: 0, nodes, links, sources: [{ node: "x0", watts: 1 }] }));
    // η = q_f / (h·A_f·θ_b) with A_f = 2·depth·H + t·depth (faces and tip)
    const etaFd = 1 / (h * (2 * depth * H + t * depth) * r.temperaturesC.x0!);
    expect(Math.abs(eta / etaFd - 1)).toBeLessThan(0.01);
  });
});
