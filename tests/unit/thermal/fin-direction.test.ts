import { describe, expect, it } from "vitest";
import { airPropertiesAt, finnedHeatsink, networkSchema, type FinnedHeatsinkGeometry } from "@/lib/thermal";
import { FIN_DIRECTIONS } from "@/lib/thermal/correlations";

/** 60 × 60 mm base, 5 mm thick, eight 30 mm fins 1.375 mm thick (7 mm gaps), black anodised aluminium. */
const sink: FinnedHeatsinkGeometry = { baseWidthM: 0.06, baseLengthM: 0.06, baseThicknessM: 0.005, finCount: 8, finHeightM: 0.03, finThicknessM: 0.001375, conductivityWPerMK: 200, emissivity: 0.85 };
const SURFACE_C = 60;
const AMBIENT_C = 25;
const at = (finDirection?: (typeof FIN_DIRECTIONS)[number]) => finnedHeatsink({ ...sink, ...(finDirection ? { finDirection } : {}), surfaceC: SURFACE_C, ambientC: AMBIENT_C });

/** Air at the film temperature, and Ra = gβΔT·L³/(να) for a length, worked out here by hand. */
function film() {
  const air = airPropertiesAt((SURFACE_C + AMBIENT_C) / 2 + 273.15);
  const dT = SURFACE_C - AMBIENT_C;
  const ra = (l: number) => (9.80665 * air.expansionPerK * dT * l ** 3) / (air.kinematicViscosityM2PerS * air.diffusivityM2PerS);
  return { air, dT, ra };
}
const s = (sink.baseWidthM - sink.finCount * sink.finThicknessM) / (sink.finCount - 1);

/** Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., eq. 9.45 with Table 9.3 (symmetric isothermal plates: C1 = 576, C2 = 2.87); table number from memory — check against a copy. */
function channelByHand(riseM: number): number {
  const { air, dT } = film();
  const el = (9.80665 * air.expansionPerK * dT * s ** 4) / (air.kinematicViscosityM2PerS * air.diffusivityM2PerS * riseM);
  const nu = (576 / el ** 2 + 2.87 / Math.sqrt(el)) ** -0.5;
  return (nu * air.conductivityWPerMK) / s;
}

describe("fin direction of a straight-fin heatsink", () => {
  it("vertical is the default: the same figures with and without the field", () => {
    expect(at("vertical").conductanceWPerK).toBe(at().conductanceWPerK);
    expect(at().evaluation.channelNaturalWPerM2K).toBeCloseTo(channelByHand(sink.baseLengthM), 10);
  });

  it("fins pointing up: the channel correlation (Incropera et al., 6th ed., eq. 9.45, Table 9.3) with the fin height as the rise", () => {
    const e = at("up").evaluation;
    expect(e.channelRiseM).toBe(sink.finHeightM);
    expect(e.channelNaturalWPerM2K).toBeCloseTo(channelByHand(sink.finHeightM), 10);
    expect(at("up").trace.source).toMatch(/common practice/);
  });

  it("level fins: the fins between the end fins as a block with a vertical front and gap ends as tall as the base is wide (Churchill & Chu, Incropera et al., 6th ed., eq. 9.27); the end fins' free faces as horizontal plates — upper face Nu = 0.54·Ra^¼ (6th ed., eq. 9.30), lower face Nu = 0.52·Ra^⅕ (7th ed., eq. 9.32), L = A/P — no better than stood vertical", () => {
    const { air, ra } = film();
    const cc = (l: number) => ((0.68 + (0.67 * ra(l) ** 0.25) / (1 + (0.492 / air.prandtl) ** (9 / 16)) ** (4 / 9)) * air.conductivityWPerMK) / l;
    const l = (sink.finHeightM * sink.baseLengthM) / (2 * (sink.finHeightM + sink.baseLengthM));
    const hUp = (0.54 * ra(l) ** 0.25 * air.conductivityWPerMK) / l;
    const hDown = (0.52 * ra(l) ** 0.2 * air.conductivityWPerMK) / l;
    const e = at("horizontal").evaluation;
    expect(e.levelFinWPerM2K).toBeCloseTo(cc(sink.baseWidthM), 8);
    expect(e.gFinsChannel).toBeCloseTo(cc(sink.baseWidthM) * (sink.baseWidthM * sink.baseLengthM + 2 * (sink.finCount - 1) * s * sink.finHeightM), 8);
    expect(e.outerWPerM2K).toBeCloseTo(Math.min((hUp + hDown) / 2, cc(sink.baseLengthM)), 8);
    expect(e.gBaseChannel).toBe(0);
    expect(at("horizontal").trace.notes.join(" ")).toMatch(/lower bound: the same sink with vertical fins would give 3\.\d\d K\/W/);
  });

  it("fins hanging down: a block whose underside is a hot surface facing down (Incropera et al., 7th ed., eq. 9.32, L = A/P) and whose open ends are vertical faces of the fin height (6th ed., eq. 9.27)", () => {
    const { air, ra } = film();
    const lu = (sink.baseWidthM * sink.baseLengthM) / (2 * (sink.baseWidthM + sink.baseLengthM));
    const hUnder = (0.52 * ra(lu) ** 0.2 * air.conductivityWPerMK) / lu;
    // Churchill & Chu laminar form, eq. 9.27, L = fin height
    const hEnd = ((0.68 + (0.67 * ra(sink.finHeightM) ** 0.25) / (1 + (0.492 / air.prandtl) ** (9 / 16)) ** (4 / 9)) * air.conductivityWPerMK) / sink.finHeightM;
    const e = at("down").evaluation;
    expect(e.undersideWPerM2K).toBeCloseTo(hUnder, 8);
    expect(e.gFinsChannel).toBeCloseTo(hUnder * sink.baseWidthM * sink.baseLengthM + hEnd * 2 * (sink.finCount - 1) * s * sink.finHeightM, 8);
    expect(e.gBaseChannel).toBe(0);
  });

  it("vertical channels do best and fins hanging down worst (common practice; arrays with level fins and downward arrays shed less heat than vertical ones — Starner & McManus, J. Heat Transfer 85 (1963) 273, from memory — check against a copy)", () => {
    const g = Object.fromEntries(FIN_DIRECTIONS.map((d) => [d, at(d).conductanceWPerK])) as Record<(typeof FIN_DIRECTIONS)[number], number>;
    expect(g.vertical).toBeGreaterThan(g.horizontal);
    expect(g.vertical).toBeGreaterThan(g.down);
    expect(g.up).toBeGreaterThan(g.down);
    expect(g.up).toBeGreaterThan(g.horizontal);
    // …and the radiation is the same whichever way the fins stand (the envelope does not change)
    expect(new Set(FIN_DIRECTIONS.map((d) => at(d).evaluation.gRadiation.toPrecision(12))).size).toBe(1);
  });

  it("each direction's trace names its model and its sources; the parts add up", () => {
    for (const d of FIN_DIRECTIONS) {
      const r = at(d);
      const part = (sym: string) => r.trace.intermediates.find((q) => q.symbol === sym)!.value;
      expect(part("G_fins,ch") + part("G_fins,o") + part("G_base") + part("G_back") + part("G_rad")).toBeCloseTo(r.conductanceWPerK, 12);
      expect(r.trace.source).toMatch(/Incropera|Bar-Cohen/);
      expect(r.trace.notes.join(" ")).toMatch(d === "vertical" ? /Fins vertical/ : d === "horizontal" ? /Fins level/ : d === "up" ? /pointing up/ : /hanging down/);
    }
  });

  it("the network format takes the direction and refuses an unknown one with a plain message", () => {
    const base = { ambientC: 25, nodes: [{ id: "sink" }], sources: [{ node: "sink", watts: 5 }] };
    const link = { from: "sink", to: "ambient", type: "finned-heatsink", ...sink };
    expect(networkSchema.safeParse({ ...base, links: [{ ...link, finDirection: "down" }] }).success).toBe(true);
    const bad = networkSchema.safeParse({ ...base, links: [{ ...link, finDirection: "sideways" }] });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues[0]!.message).toBe("must be one of: vertical, horizontal, up, down");
  });
});
