import { describe, expect, it } from "vitest";
import { airPropertiesAt, maxCommonScale, naturalConvection, requiredLinkResistance, solveSteady, spreadingResistance, toKelvin } from "@/lib/thermal";
import { channelNusselt, OPTIMUM_SPACING_COEFFICIENT } from "@/lib/thermal/correlations";
import { net } from "./helpers";

describe("natural convection against published worked examples", () => {
  it("horizontal plate, hot side up: Çengel & Ghajar, 'Heat and Mass Transfer', worked example 'Cooling of a plate in different orientations' (ch. 9, example number from memory — check against a copy; 0.6 m square plate at 90 °C in air at 30 °C, one face insulated) — book answer from memory: 139 W", () => {
    // (The same example's vertical case uses Churchill–Chu's all-Ra form; the engine uses the
    // laminar form below Ra = 10⁹ as Incropera recommends, so that case is not comparable.
    // The vertical plate is checked against Incropera Example 9.2 in elements.test.ts.)
    const up = naturalConvection({ areaM2: 0.36, surfaceC: 90, fluidC: 30, surface: "horizontal-plate-up", characteristicLengthM: 0.36 / 2.4 });
    expect(up.conductanceWPerK * 60).toBeGreaterThan(139 * 0.97);
    expect(up.conductanceWPerK * 60).toBeLessThan(139 * 1.03);
    // The hot-side-up plate at Ra ≈ 1.2·10⁷ is on the turbulent branch, Nu = 0.15·Ra^(1/3).
    expect(up.trace.equation).toContain("0.15");
  });

  it("horizontal cylinder: Incropera, DeWitt, Bergman & Lavine, 6th ed., Example 9.3 (steam pipe 0.1 m across at 165 °C, still air at 23 °C) — book figures from memory, check against a copy: Ra_D ≈ 5.07·10⁶, Nu_D ≈ 23.3, h ≈ 7.29 W/(m²·K), q′ ≈ 325 W/m by convection", () => {
    const d = 0.1;
    const r = naturalConvection({ surface: "horizontal-cylinder", areaM2: Math.PI * d, characteristicLengthM: d, surfaceC: 165, fluidC: 23 });
    const ra = r.trace.intermediates.find((x) => x.symbol === "Ra")!.value;
    const nu = r.trace.intermediates.find((x) => x.symbol === "Nu")!.value;
    // Our air table is Çengel & Ghajar's, the book's is its own Table A.4: α differs by ≈ 4 % at 367 K, so Ra by ≈ 6 %.
    expect(Math.abs(ra / 5.07e6 - 1)).toBeLessThan(0.07);
    expect(Math.abs(nu / 23.3 - 1)).toBeLessThan(0.04);
    expect(Math.abs(r.coefficientWPerM2K / 7.29 - 1)).toBeLessThan(0.05);
    expect(Math.abs((r.conductanceWPerK * 142) / 325 - 1)).toBeLessThan(0.05);
  });
});

describe("air properties against a second handbook", () => {
  // Incropera, DeWitt, Bergman & Lavine, 6th ed., Table A.4 (air at 1 atm), from memory — check against a copy:
  // T K, ν m²/s, k W/(m·K), α m²/s, Pr.
  const incroperaA4: [number, number, number, number, number][] = [
    [300, 15.89e-6, 26.3e-3, 22.5e-6, 0.707],
    [350, 20.92e-6, 30.0e-3, 29.9e-6, 0.7],
    [400, 26.41e-6, 33.8e-3, 38.3e-6, 0.69],
  ];
  it.each(incroperaA4)("at %d K the table (Çengel & Ghajar A-15) agrees with Incropera Table A.4 within the handbooks' own spread", (tK, nu, k, alpha, pr) => {
    const a = airPropertiesAt(tK);
    // The two compilations agree on ν to 1 %, and differ by up to ≈ 4 % on k, α and Pr.
    expect(Math.abs(a.kinematicViscosityM2PerS / nu - 1)).toBeLessThan(0.02);
    expect(Math.abs(a.diffusivityM2PerS / alpha - 1)).toBeLessThan(0.045);
    expect(Math.abs(a.conductivityWPerMK / k - 1)).toBeLessThan(0.03);
    expect(Math.abs(a.prandtl / pr - 1)).toBeLessThan(0.04);
  });
});

/** Bessel J0 and J1 by the polynomial approximations of Abramowitz & Stegun, 9.4.1–9.4.6 (|error| < 1e-7). */
function besselJ0(x: number): number {
  const ax = Math.abs(x);
  if (ax <= 3) {
    const y = (x / 3) ** 2;
    return 1 - 2.2499997 * y + 1.2656208 * y ** 2 - 0.3163866 * y ** 3 + 0.0444479 * y ** 4 - 0.0039444 * y ** 5 + 0.00021 * y ** 6;
  }
  const y = 3 / ax;
  const f0 = 0.79788456 - 0.00000077 * y - 0.0055274 * y ** 2 - 0.00009512 * y ** 3 + 0.00137237 * y ** 4 - 0.00072805 * y ** 5 + 0.00014476 * y ** 6;
  const t0 = ax - 0.78539816 - 0.04166397 * y - 0.00003954 * y ** 2 + 0.00262573 * y ** 3 - 0.00054125 * y ** 4 - 0.00029333 * y ** 5 + 0.00013558 * y ** 6;
  return (f0 * Math.cos(t0)) / Math.sqrt(ax);
}
function besselJ1(x: number): number {
  const ax = Math.abs(x);
  if (ax <= 3) {
    const y = (x / 3) ** 2;
    return x * (0.5 - 0.56249985 * y + 0.21093573 * y ** 2 - 0.03954289 * y ** 3 + 0.00443319 * y ** 4 - 0.00031761 * y ** 5 + 0.00001109 * y ** 6);
  }
  const y = 3 / ax;
  const f1 = 0.79788456 + 0.00000156 * y + 0.01659667 * y ** 2 + 0.00017105 * y ** 3 - 0.00249511 * y ** 4 + 0.00113653 * y ** 5 - 0.00020033 * y ** 6;
  const t1 = ax - 2.35619449 + 0.12499612 * y + 0.0000565 * y ** 2 - 0.00637879 * y ** 3 + 0.00074348 * y ** 4 + 0.00079824 * y ** 5 - 0.00029166 * y ** 6;
  return (Math.sign(x) * f1 * Math.cos(t1)) / Math.sqrt(ax);
}
/** n-th positive zero of J1 (McMahon's asymptotic start, Newton with J1′ = J0 − J1/x). */
function zeroJ1(n: number): number {
  const beta = (n + 0.25) * Math.PI;
  let x = beta - 3 / (8 * beta);
  for (let i = 0; i < 8; i++) x -= besselJ1(x) / (besselJ0(x) - besselJ1(x) / x);
  return x;
}

/**
 * Exact series solution for a uniform-flux disc source (radius a) on a coaxial disc plate
 * (radius b, thickness t, conductivity k, adiabatic rim) cooled on its far face by h, by
 * separation of variables (Kennedy 1960; Yovanovich, Muzychka & Culham 1999): resistance
 * from the source's peak (centre) and mean temperature to the cooled face's film, minus the
 * film 1/(h·πb²) so it compares with a plate resistance that stops at the cooled face.
 */
function exactPlateResistance(a: number, b: number, t: number, k: number, h: number, terms: number): { peak: number; mean: number } {
  const oneD = t / (k * Math.PI * b * b);
  let peak = oneD;
  let mean = oneD;
  for (let n = 1; n <= terms; n++) {
    const delta = zeroJ1(n);
    const lam = delta / b;
    const th = Math.tanh(lam * t);
    const phi = (lam * th + h / k) / (lam + (h / k) * th);
    const j0 = besselJ0(delta);
    const j1a = besselJ1(lam * a);
    peak += (2 * j1a) / (Math.PI * a * b * b * k * lam * lam * phi * j0 * j0);
    mean += (4 * j1a * j1a) / (Math.PI * a * a * b * b * k * lam ** 3 * phi * j0 * j0);
  }
  return { peak, mean };
}

describe("spreading resistance against the exact series solution", () => {
  const cases = [
    { name: "10 mm source on a 40 mm aluminium disc 3 mm thick, h = 2000", a: 0.005, b: 0.02, t: 0.003, k: 200, h: 2000 },
    { name: "6 mm source on a 30 mm copper disc 1.5 mm thick, h = 50", a: 0.003, b: 0.015, t: 0.0015, k: 400, h: 50 },
    { name: "3.5 mm emitter footprint on a 20 mm aluminium star 1.6 mm thick, h = 500", a: 0.00197, b: 0.01, t: 0.0016, k: 150, h: 500 },
  ];
  it.each(cases)("$name: the closed form (Lee, Song, Au & Moran 1995) is within 10 % of the series (Yovanovich, Muzychka & Culham, J. Thermophysics Heat Transfer 13 (1999) 495)", ({ a, b, t, k, h }) => {
    const exact = exactPlateResistance(a, b, t, k, h, 400);
    const r = spreadingResistance({ sourceAreaM2: Math.PI * a * a, plateAreaM2: Math.PI * b * b, plateThicknessM: t, conductivityWPerMK: k, sinkCoefficientWPerM2K: h });
    expect(Math.abs(r.kelvinPerWatt / exact.peak - 1)).toBeLessThan(0.1);
    expect(Math.abs(r.averageKelvinPerWatt / exact.mean - 1)).toBeLessThan(0.1);
  });

  it("half-space limits of a uniform-flux disc (Carslaw & Jaeger, 'Conduction of Heat in Solids', 2nd ed., §10.5, from memory — check against a copy): peak R = 1/(π·k·a), mean R = 8/(3π²·k·a)", () => {
    const a = 0.001;
    const k = 100;
    // A source far smaller than the plate and the plate far thicker than the source: a half-space.
    const exact = exactPlateResistance(a, 0.05, 0.05, k, 1e6, 4000);
    expect(Math.abs(exact.peak / (1 / (Math.PI * k * a)) - 1)).toBeLessThan(0.03);
    expect(Math.abs(exact.mean / (8 / (3 * Math.PI ** 2 * k * a)) - 1)).toBeLessThan(0.03);
    const r = spreadingResistance({ sourceAreaM2: Math.PI * a * a, plateAreaM2: Math.PI * 0.05 ** 2, plateThicknessM: 0.05, conductivityWPerMK: k, sinkCoefficientWPerM2K: 1e6 });
    expect(Math.abs(r.kelvinPerWatt / (1 / (Math.PI * k * a)) - 1)).toBeLessThan(0.03);
    // The closed form's mean is 1/(2√π·k·a) at this limit, 4 % above the exact 8/(3π²·k·a).
    expect(Math.abs(r.averageKelvinPerWatt / (8 / (3 * Math.PI ** 2 * k * a)) - 1)).toBeLessThan(0.06);
  });
});

describe("channel correlation", () => {
  it("its best spacing for fixed base width matches Bar-Cohen & Rohsenow's closed form s_opt = 2.714·(gβΔT/(να·L))^(−¼) (J. Heat Transfer 106 (1984) 116)", () => {
    // Heat per unit base width ∝ (channels per metre) × h × wall area ∝ Nu(El)/s², with El = p·s⁴.
    const air = airPropertiesAt(toKelvin(45));
    const L = 0.06;
    const p = (9.80665 * air.expansionPerK * 40) / (air.kinematicViscosityM2PerS * air.diffusivityM2PerS * L);
    const heat = (s: number) => channelNusselt(p * s ** 4) / (s * s);
    let best = 0;
    let bestS = 0;
    for (let s = 0.001; s < 0.03; s += 1e-6) {
      const q = heat(s);
      if (q > best) [best, bestS] = [q, s];
    }
    const closed = OPTIMUM_SPACING_COEFFICIENT * p ** -0.25;
    expect(Math.abs(bestS / closed - 1)).toBeLessThan(0.005);
    // A real sink for a 40 K rise, 60 mm tall: an optimum of a few millimetres.
    expect(closed).toBeGreaterThan(0.004);
    expect(closed).toBeLessThan(0.01);
  });
});

describe("the one inverse search, on networks with closed-form answers", () => {
  const series = net({
    ambientC: 25,
    nodes: [{ id: "junction" }, { id: "sink" }],
    links: [
      { from: "junction", to: "sink", type: "resistance", kelvinPerWatt: 2.5 },
      { from: "sink", to: "ambient", type: "resistance", kelvinPerWatt: 4 },
    ],
    sources: [{ node: "junction", watts: 5 }],
  });
  it("required sink resistance on a series path: R = (T_lim − T∞)/P − R_rest (Ohm's-law analogy, Incropera §3.1.3)", () => {
    const at = solveSteady(series);
    const r = requiredLinkResistance(series, at, 1, "junction", 100);
    // (100 − 25)/5 − 2.5 = 12.5 K/W
    expect(r.kelvinPerWatt).toBeCloseTo(12.5, 2);
    expect(r.solves).toBeLessThanOrEqual(3);
    const none = requiredLinkResistance(series, at, 1, "junction", 30);
    expect(none.kelvinPerWatt).toBe(0);
    expect(none.feasible).toBe(false);
  });
  it("largest common scale of the sources on a linear network: s = (T_lim − T∞)/rise (linearity)", () => {
    const at = solveSteady(series);
    // Junction rise 5·6.5 = 32.5 K, sink rise 20 K: the junction at 90 °C binds at s = 2, before the sink at 80 °C (s = 2.75).
    const r = maxCommonScale(series, at, [
      { node: "junction", limitC: 90 },
      { node: "sink", limitC: 80 },
    ]);
    expect(r.scale).toBeCloseTo(2, 3);
    expect(r.binding).toBe(0);
  });
});
