import { declaredResistance, extend, makeTrace, type Network, quantity, emissivityFor, finnedEnvelopeAreaM2, finnedHeatsinkConductance, getMaterial, toKelvin, heatCapacity, naturalConvection, radiationExchange, type Finish, type FinnedHeatsinkGeometry, type Trace } from "@/lib/thermal";
import type { SpecsOfKind } from "@/lib/parts";
import type { ProblemList } from "../problems";
import { PLACES, type NetworkBuilder } from "./builder";
import { LAMINAR_EXPONENT, type FinDirection, type Surface } from "@/lib/thermal/correlations";

const FIN_WORDS: Readonly<Record<FinDirection, string>> = { vertical: "fins vertical", horizontal: "fins level", up: "fins pointing up", down: "fins hanging down" };

type HeatsinkSpecs = SpecsOfKind<"heatsink">;
type GeometrySpecs = Extract<HeatsinkSpecs, { rating: "geometry" }>;

/** Emissivity of a sink: the part's figure, else its material in its finish (Incropera Table A.11), else as supplied. */
export function sinkEmissivity(s: GeometrySpecs | HeatsinkSpecs): { e: number; note: string } {
  if (s.emissivity !== undefined && s.emissivity > 0) return { e: s.emissivity, note: "emissivity from the part" };
  const material = s.material ?? "aluminium-6063-t5";
  const finish: Finish = s.finish ?? "as-supplied";
  const t = emissivityFor(material, finish) ?? emissivityFor(material, "as-supplied");
  return t ? { e: t.emissivity, note: `emissivity of ${material}, ${finish} (${t.source})` } : { e: 0.5, note: "emissivity unknown: 0.5 assumed" };
}

/** Rated rise used when the part gives neither its rated rise nor its rated power: 75 K (from memory of heatsink catalogues' usual basis — check against a copy). */
export const DEFAULT_RATED_RISE_K = 75;
/** Share of a rated sink's heat that leaves by convection in still air (the rest by radiation): 0.7 (common practice for bare or anodised sinks). */
export const CONVECTIVE_SHARE = 0.7;

/**
 * A declared rating holds at its rated rise. Natural convection strengthens with the rise
 * (laminar: h ∝ ΔT^¼), so the convective share of the conductance is scaled by
 * (ΔT/ΔT_rated)^¼; the radiative share is taken as unchanged.
 */
type DeclaredSpecs = Extract<HeatsinkSpecs, { rating: "declared" }>;

const ratedRise = (s: DeclaredSpecs): number => s.ratedDeltaK ?? (s.ratedPowerW !== undefined ? s.ratedPowerW * s.sinkToAirKPerW : DEFAULT_RATED_RISE_K);

/** Conductance relative to the rating at a rise: s_c·(ΔT/ΔT_rated)^n + (1 − s_c). */
const riseFactor = (riseK: number, rated: number): number => CONVECTIVE_SHARE * (riseK / rated) ** LAMINAR_EXPONENT + (1 - CONVECTIVE_SHARE);

export function declaredAtRise(s: DeclaredSpecs, riseK: number | null): { kelvinPerWatt: number; ratedRiseK: number; trace: Trace } {
  const base = declaredResistance({ kelvinPerWatt: s.sinkToAirKPerW, source: "the heatsink's declared sink-to-air resistance, as entered by the part's author" });
  const rated = ratedRise(s);
  const ratedFrom = s.ratedDeltaK !== undefined ? "rated rise from the part" : s.ratedPowerW !== undefined ? "rated rise = rated power × rated resistance" : `no rated rise or power on the part: ${DEFAULT_RATED_RISE_K} K assumed (from memory of heatsink catalogues' usual basis — check against a copy)`;
  // Forced-air ratings are not natural convection: no correction.
  if (s.ratedAirflow === "forced" || riseK === null || !(riseK > 0)) {
    base.trace.notes.push(riseK === null ? "Rating used as declared until the sink's rise is known." : "Rated in forced air: no natural-convection correction.");
    return { kelvinPerWatt: s.sinkToAirKPerW, ratedRiseK: rated, trace: base.trace };
  }
  const factor = riseFactor(riseK, rated);
  const r = s.sinkToAirKPerW / factor;
  const trace = makeTrace({
    element: "declared-sink",
    formula: "Declared sink rating corrected to the actual temperature rise (convective share, laminar exponent)",
    equation: "R = R_rated / [s_c·(ΔT/ΔT_rated)^n + (1 − s_c)]",
    inputs: [
      quantity("R_rated", "declared sink-to-air resistance", s.sinkToAirKPerW, "K/W"),
      quantity("ΔT_rated", ratedFrom, rated, "K"),
      quantity("ΔT", "sink's rise above the air around it, at this operating point", riseK, "K"),
      quantity("s_c", "convective share of the rated conductance (common practice for still air)", CONVECTIVE_SHARE, "1"),
      quantity("n", "exponent of h on ΔT in laminar natural convection (Nu ∝ Ra^¼)", LAMINAR_EXPONENT, "1"),
    ],
    intermediates: [quantity("G/G_rated", "conductance relative to the rating", factor, "1")],
    result: quantity("R", "sink-to-air resistance at this rise", r, "K/W"),
    source: "rating as entered by the part's author; correction: laminar natural convection h ∝ ΔT^¼ (Incropera, DeWitt, Bergman & Lavine, 6th ed., eq. 9.27 at large Ra); convective share 0.7 (common practice)",
    notes: [riseK < rated ? "A smaller rise than rated: the sink does worse than its rating." : "A larger rise than rated: the sink does a little better than its rating."],
    parts: [base.trace],
  });
  return { kelvinPerWatt: r, ratedRiseK: rated, trace };
}

/**
 * The declared rating's correction is a fixed point on the sink's rise: start from the heat
 * through the rating, solve, read the rise at the solution, recompile, until the rise settles.
 * These three pieces are the one implementation the Budget's operating point and the quick
 * check both step through.
 */
export const declaredRise = {
  /**
   * First guess: the rise at which the given heat through the rating, corrected to that
   * rise, gives that rise (a few passes of ΔT = P·R(ΔT), which shrink the gap about fourfold
   * each, R falling with ΔT^¼); null for a sink that is not declared.
   */
  start(s: HeatsinkSpecs | undefined, heatW: number): number | null {
    if (s?.rating !== "declared") return null;
    let rise = Math.max(heatW * s.sinkToAirKPerW, 1e-3);
    if (s.ratedAirflow === "forced") return rise;
    const rated = ratedRise(s);
    for (let i = 0; i < 4; i++) rise = Math.max((heatW * s.sinkToAirKPerW) / riseFactor(rise, rated), 1e-3);
    return rise;
  },
  /** The rise of the sink link's `from` node above its `to` node in a solution. */
  at(network: Network, temperaturesC: Readonly<Record<string, number>>, link: number): number {
    const l = network.links[link]!;
    const t = (id: string) => (id === "ambient" ? network.ambientC : (temperaturesC[id] ?? network.ambientC));
    return Math.max(t(l.from) - t(l.to), 1e-3);
  },
  /** Relative change between two rises (1 when there was none before). */
  moved(before: number | null, after: number): number {
    return before === null ? 1 : Math.abs(after - before) / Math.max(before, 1e-3);
  },
  /**
   * The rise to compile with next, from this pass (rise compiled with → rise the solve gave)
   * and the one before: a Newton step on "gave minus used", which lands on the rise that
   * reproduces itself in a pass or two where plain repetition (the rise the solve gave)
   * shrinks the gap only about sevenfold each pass. The slope of "gave" is the secant of
   * the two passes, or in the first pass that of P·R(ΔT) at a fixed heat through the sink
   * (R ∝ 1/factor). Plain repetition for a sink that is not declared, or when the step
   * would leave [½, 2] × the rise just given.
   */
  next(s: HeatsinkSpecs | undefined, earlier: { used: number; gave: number } | null, used: number, gave: number): number {
    if (s?.rating !== "declared") return gave;
    const h = gave - used;
    let slope: number;
    if (earlier) slope = used !== earlier.used ? (gave - earlier.gave) / (used - earlier.used) : 0;
    else if (s.ratedAirflow === "forced") return gave;
    else {
      const rated = ratedRise(s);
      const dFactor = (CONVECTIVE_SHARE * LAMINAR_EXPONENT * (used / rated) ** LAMINAR_EXPONENT) / used;
      slope = (-gave * dFactor) / riseFactor(used, rated);
    }
    const x = slope !== 1 ? used + h / (1 - slope) : gave;
    return Number.isFinite(x) && x >= 0.5 * gave && x <= 2 * gave ? Math.max(x, 1e-3) : gave;
  },
  /** A relative change below this ends the fixed point. */
  tolerance: 1e-3,
} as const;

/** Straight-fin geometry for the engine, or null (with a problem) when the fins cannot fit on the base. */
export function finGeometry(s: GeometrySpecs, field: string, problems: ProblemList): FinnedHeatsinkGeometry | null {
  const n = s.finCount;
  const t = s.finThicknessM ?? 0;
  if (s.finSpacingM !== undefined && t > s.finSpacingM) {
    problems.add(`${field}.finThicknessM`, `fins ${(t * 1000).toFixed(2)} mm thick are thicker than the ${(s.finSpacingM * 1000).toFixed(2)} mm gaps between them; check the measurements (the spacing used is worked out from the base width)`, "warning");
  }
  if (n * t >= s.baseWidthM) {
    problems.add(`${field}.finCount`, `${n} fins of ${(t * 1000).toFixed(2)} mm do not fit on a ${(s.baseWidthM * 1000).toFixed(1)} mm base`);
    return null;
  }
  const k = getMaterial(s.material ?? "")?.conductivityWPerMK ?? 200;
  return {
    baseWidthM: s.baseWidthM,
    baseLengthM: s.baseLengthM,
    baseThicknessM: s.baseThicknessM,
    finCount: n,
    finHeightM: s.finHeightM ?? 0.001,
    finThicknessM: t,
    conductivityWPerMK: k,
    emissivity: sinkEmissivity(s).e,
  };
}

export const baseAreaM2 = (s: HeatsinkSpecs): number | undefined => (s.rating === "geometry" ? s.baseLengthM * s.baseWidthM : undefined);

export function sinkCapacity(s: HeatsinkSpecs): { heatCapacityJPerK: number; trace: Trace } | undefined {
  if (s.heatCapacityJPerK !== undefined) {
    const c = s.heatCapacityJPerK;
    // A capacity on the part (fitted from a bench run, or known) is the sink's own figure: it
    // wins over mass × specific heat, which assumes the whole mass warms as one.
    return { heatCapacityJPerK: c, trace: makeTrace({ element: "heat-capacity", formula: "Heat capacity of the heatsink, as entered", equation: "C", inputs: [quantity("C", "heat capacity given on the part", c, "J/K")], result: quantity("C", "heat capacity", c, "J/K"), source: "as entered on the heatsink part (a measured part's capacity is fitted from its bench run)" }) };
  }
  const material = s.material ?? "aluminium-6063-t5";
  if (s.massKg !== undefined) return heatCapacity({ massKg: s.massKg, materialId: material });
  if (s.rating !== "geometry") return undefined;
  const fins = s.finCount * (s.finHeightM ?? 0) * (s.finThicknessM ?? 0) * s.baseLengthM;
  return heatCapacity({ volumeM3: s.baseLengthM * s.baseWidthM * s.baseThicknessM + fins, materialId: material });
}

/**
 * The sink's own path to the air it stands in (`to`): a declared rating, the finned model,
 * or a flat plate for a sink without fins. Convection goes to the air around the sink (`to`);
 * radiation goes to what the sink sees (`sees`: the housing wall inside a housing, the
 * surroundings in the open), since air is transparent. Returns the sink's links (the
 * convective one first) to ask the "required sink resistance" question of, and a first
 * estimate of their combined resistance.
 */
export function compileSinkToAir(
  b: NetworkBuilder,
  s: HeatsinkSpecs,
  to: string,
  field: string,
  guessC: number,
  o: { sees?: string; riseK?: number | null; finDirection?: FinDirection } = {},
): { link: number; radiationLink: number | null; estimateKPerW: number } | null {
  const sees = o.sees ?? to;
  const riseK = o.riseK ?? null;
  const direction = o.finDirection ?? "vertical";
  const where = to === "ambient" ? "ambient air" : PLACES.air;
  const seen = sees === "ambient" ? "surroundings" : sees === "wall" ? PLACES.wall : sees;
  if (s.rating === "declared") {
    const c = declaredAtRise(s, riseK);
    const r = { kelvinPerWatt: c.kelvinPerWatt, trace: c.trace };
    if (s.ratedAirflow === "forced") {
      b.problems.add(`${field}.ratedAirflow`, "the sink's resistance is rated with a fan; in still air inside a lamp it will be several times worse", "warning");
      r.trace.notes.push("Rated in forced air: optimistic for still air.");
    }
    r.trace.notes.push("A declared rating includes the sink's radiation and assumes open air at the rated conditions.");
    if (sees !== to) r.trace.notes.push("Inside a housing the rating's radiation share goes to the inside air with the rest: a declared rating does not say how it splits.");
    return { link: b.resistance("sink", to, c.kelvinPerWatt, `heatsink → ${where} (declared, corrected to the actual rise)`, field, r.trace), radiationLink: null, estimateKPerW: c.kelvinPerWatt };
  }
  if (s.finCount >= 2) {
    const g = finGeometry(s, field, b.problems);
    if (!g) return null;
    // The finned model's convection to the air; its envelope radiation as a link of its own to what the sink sees.
    // The default direction is left out of the link so networks of upright builds read as before.
    const link = b.link({ from: "sink", to, type: "finned-heatsink", ...g, emissivity: 0, ...(direction === "vertical" ? {} : { finDirection: direction }) }, `heatsink → ${where} (finned, convection, ${FIN_WORDS[direction]}, from geometry)`, field);
    const envelope = finnedEnvelopeAreaM2(g);
    const em = sinkEmissivity(s);
    const radiationLink = b.link({ from: "sink", to: sees, type: "radiation", areaM2: envelope, emissivity: em.e }, `heatsink envelope → ${seen} (radiation, ε ${em.e.toFixed(2)})`, field);
    // Only the figure is wanted here (the link's trace is worked out at the solution): no trace.
    const est = finnedHeatsinkConductance(extend(g, { finDirection: direction }), toKelvin(guessC + 30), toKelvin(guessC));
    return { link, radiationLink, estimateKPerW: Math.min(1 / Math.max(est, 1e-300), Number.MAX_VALUE) };
  }
  // A flat plate (or one fin): its open face convects and radiates. Upright (fins vertical or
  // level): a vertical plate; a level base faces up or down.
  const area = s.baseLengthM * s.baseWidthM;
  const em = sinkEmissivity(s);
  const surface: Surface = direction === "up" ? "horizontal-plate-up" : direction === "down" ? "horizontal-plate-down" : "vertical-plate";
  const plateL = surface === "vertical-plate" ? (direction === "horizontal" ? s.baseWidthM : s.baseLengthM) : area / (2 * (s.baseLengthM + s.baseWidthM));
  const link = b.link({ from: "sink", to, type: "natural-convection", areaM2: area, surface, characteristicLengthM: plateL }, `heatsink plate → ${where} (convection)`, field);
  const radiationLink = b.link({ from: "sink", to: sees, type: "radiation", areaM2: area, emissivity: em.e }, `heatsink plate → ${seen} (radiation, ε ${em.e.toFixed(2)})`, field);
  const h = naturalConvection({ surface, areaM2: area, characteristicLengthM: plateL, surfaceC: guessC + 30, fluidC: guessC });
  const rad = radiationExchange({ areaM2: area, emissivity: em.e, surfaceC: guessC + 30, surroundingsC: guessC });
  return { link, radiationLink, estimateKPerW: 1 / (h.conductanceWPerK + rad.conductanceWPerK) };
}
