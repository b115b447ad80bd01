import { extend } from "../record";
import { AIR, airPropertiesAt, type AirProperties } from "../air-properties";
import { STANDARD_GRAVITY, STEFAN_BOLTZMANN, toKelvin } from "../constants";
import { elementResult, makeTrace, quantity, type ElementResult } from "../trace";
import { channelNusselt, CHANNEL_SOURCE, FIN_DIRECTION_SOURCE, FIN_DIRECTIONS, type FinDirection } from "../correlations";
import { coefficientAt, filmAir, FILM_SLOTS, naturalConvectionH, SURFACE_CODE } from "../solver/convection-kernel";

/** Straight-fin heatsink, all lengths in metres; the fins stand as `finDirection` says (default: vertical channels). */
export interface FinnedHeatsinkGeometry {
  /** Across the fins. */
  baseWidthM: number;
  /** Along the fins: the height of the channels when they are vertical. */
  baseLengthM: number;
  baseThicknessM: number;
  finCount: number;
  finHeightM: number;
  finThicknessM: number;
  conductivityWPerMK: number;
  emissivity: number;
  /** Mean air speed in the channels from a fan; 0 or absent: still air. */
  airSpeedMPerS?: number;
  /** The back of the base faces the air too (default: mounted, so not). */
  backExposed?: boolean;
  /**
   * How the fins stand in use: "vertical" (base upright, channels run up and down: the
   * default), "horizontal" (base upright, fins level), "up" (base level, fins point up),
   * "down" (base level, fins hang down).
   */
  finDirection?: FinDirection;
}
export { FIN_DIRECTIONS, type FinDirection };

export interface FinnedHeatsinkEvaluation {
  conductanceWPerK: number;
  spacingM: number;
  filmK: number;
  air: AirProperties;
  elenbaas: number;
  channelNusselt: number;
  channelNaturalWPerM2K: number;
  channelForcedWPerM2K: number;
  channelWPerM2K: number;
  outerWPerM2K: number;
  finEfficiencyChannel: number;
  finEfficiencyOuter: number;
  correctedFinLengthM: number;
  gFinsChannel: number;
  gFinsOuter: number;
  gBaseChannel: number;
  gBack: number;
  gRadiation: number;
  envelopeAreaM2: number;
  reynolds: number;
  direction: FinDirection;
  /** Height the air rises along the fins in the channel correlation (base length for vertical fins, fin height for fins pointing up); 0 when no channel flow is used. */
  channelRiseM: number;
  /** Fins level: coefficient of the block's front and gap ends (vertical faces as tall as the base is wide). */
  levelFinWPerM2K: number;
  /** Fins hanging down: coefficient of the array's underside (a hot surface facing down). */
  undersideWPerM2K: number;
}

const MIN_DELTA_K = 1e-9;

const finEta = (h: number, k: number, t: number, lc: number) => {
  const x = Math.sqrt((2 * h) / (k * t)) * lc;
  return x < 1e-4 ? 1 - (x * x) / 3 : Math.tanh(x) / x;
};

/** Area of the box enclosing the fins (front, two sides, two channel openings, and the back when exposed): what radiation leaves through, since the fins mostly see each other. */
export function finnedEnvelopeAreaM2(g: FinnedHeatsinkGeometry): number {
  const depth = g.finHeightM + g.baseThicknessM;
  const lv = g.baseLengthM;
  return g.baseWidthM * lv + 2 * depth * lv + 2 * g.baseWidthM * depth + (g.backExposed ? g.baseWidthM * lv : 0);
}

// Slots of the scratch `finnedCore` writes its intermediates into (the trace reads them; the
// solver's loop, which calls it several times per link and iteration, reads only the result).
const S_SPACING = 0;
const S_FILM = 1;
const S_EL = 2;
const S_NU_CH = 3;
const S_H_NAT_CH = 4;
const S_H_FORCED_CH = 5;
const S_H_CH = 6;
const S_H_OUTER = 7;
const S_ETA_CH = 8;
const S_ETA_OUT = 9;
const S_LC = 10;
const S_G_FINS_CH = 11;
const S_G_FINS_OUT = 12;
const S_G_BASE = 13;
const S_G_BACK = 14;
const S_G_RAD = 15;
const S_ENVELOPE = 16;
const S_RE = 17;
const S_RISE = 18;
const S_LEVEL_FIN = 19;
const S_UNDERSIDE = 20;
const SLOTS = 21;

// Module-local copies: a transpiled import is a property getter per read, and this runs in the solver's loop.
const G = STANDARD_GRAVITY;
const SIGMA = STEFAN_BOLTZMANN;
const AIR_K = AIR.k;
const AIR_NU = AIR.nu;
const AIR_ALPHA = AIR.alpha;
const AIR_PR = AIR.pr;
const AIR_BETA = AIR.beta;
const film = filmAir;
const VERTICAL = SURFACE_CODE["vertical-plate"];
const hNatural = naturalConvectionH;
const channelNu = channelNusselt;
const FILM_SCRATCH = new Float64Array(FILM_SLOTS);
const LOOP_SCRATCH = new Float64Array(SLOTS);

/** Cube rule for assisting flows (Churchill): natural and forced coefficients combined. */
const combine = (a: number, b: number) => (b > 0 ? Math.cbrt(a ** 3 + b ** 3) : a);

/**
 * The model at one pair of temperatures: returns the conductance and writes every
 * intermediate into `out` (slots S_*). Written without closures, objects or strings: the
 * solver evaluates it three times per link and Newton iteration (value and two slopes).
 */
function finnedCore(g: FinnedHeatsinkGeometry, surfaceK: number, ambientK: number, out: Float64Array): number {
  const n = g.finCount;
  const lv = g.baseLengthM;
  const direction = g.finDirection ?? "vertical";
  const s = (g.baseWidthM - n * g.finThicknessM) / (n - 1);
  const filmK = 0.5 * (surfaceK + ambientK);
  const air = FILM_SCRATCH;
  film(filmK, air, false);
  const k = air[AIR_K]!;
  const nuAir = air[AIR_NU]!;
  const dT = Math.max(Math.abs(surfaceK - ambientK), MIN_DELTA_K);

  // Bar-Cohen & Rohsenow composite for isothermal symmetric vertical channels: spans the
  // fully developed (choked) limit Nu = El/24 and the isolated-plate limit Nu ∝ El^(1/4).
  // The channel's rise is the base length for vertical fins and the fin height for fins
  // pointing up from a level base.
  const h = g.finHeightM;
  const rise = direction === "up" ? h : lv;
  const el = (G * air[AIR_BETA]! * dT * s ** 4) / (nuAir * air[AIR_ALPHA]! * rise);
  const nuCh = channelNu(el);
  let hNatCh = (nuCh * k) / s;
  // The outer faces stand vertical, at the same film temperature: the air looked up above serves.
  let hNatOuter = coefficientAt(VERTICAL, rise, G * rise ** 3, air, surfaceK, ambientK);
  let levelFin = 0;
  let underside = 0;
  if (direction === "horizontal") {
    // Level fins on an upright base: warm air in the gaps cannot rise through them; it leaves
    // at the fin tips and the ends. The fins between the end fins are taken as a block whose
    // front (the tips' plane) and gap ends are vertical faces as tall as the base is wide.
    // The two end fins' free faces are horizontal plates (upper and lower face of a hot
    // plate, L = A/P), no better than the same faces stood vertical.
    const lFace = (h * lv) / (2 * (h + lv));
    const hUp = hNatural("horizontal-plate-up", lFace, surfaceK, ambientK);
    const hDown = hNatural("horizontal-plate-down", lFace, surfaceK, ambientK);
    levelFin = hNatural("vertical-plate", g.baseWidthM, surfaceK, ambientK);
    hNatCh = 0;
    hNatOuter = Math.min(0.5 * (hUp + hDown), hNatOuter);
  } else if (direction === "down") {
    // Fins hanging down trap warm air against the base: no channel flow. The array is taken
    // as a block at the base temperature shedding heat from its underside (a hot surface
    // facing down) and from its two open ends (vertical faces of the fin height).
    const lUnder = (g.baseWidthM * lv) / (2 * (g.baseWidthM + lv));
    underside = hNatural("horizontal-plate-down", lUnder, surfaceK, ambientK);
    hNatOuter = hNatural("vertical-plate", h, surfaceK, ambientK);
    hNatCh = 0;
  }

  // Forced flow: developing laminar boundary layer on each face, floored by fully developed
  // flow between parallel plates (Nu_Dh = 7.54, Dh = 2s); combined with natural convection
  // by Churchill's cube rule for assisting flow.
  const v = g.airSpeedMPerS ?? 0;
  const re = (v * lv) / nuAir;
  const hDev = v > 0 ? (0.664 * Math.sqrt(re) * air[AIR_PR]! ** (1 / 3) * k) / lv : 0;
  const hForcedCh = v > 0 ? Math.max(hDev, (7.54 * k) / (2 * s)) : 0;
  const hCh = combine(hNatCh, hForcedCh);
  const hOuter = combine(hNatOuter, hDev);

  const lc = g.finHeightM + g.finThicknessM / 2;
  const etaCh = finEta(hCh, g.conductivityWPerMK, g.finThicknessM, lc);
  const etaOut = finEta(hOuter, g.conductivityWPerMK, g.finThicknessM, lc);
  const block = v === 0 && (direction === "down" || direction === "horizontal");
  const gFinsChannel = !block
    ? etaCh * hCh * 2 * (n - 1) * lc * lv
    : direction === "down"
      ? underside * g.baseWidthM * lv + hOuter * 2 * (n - 1) * s * h
      : levelFin * (g.baseWidthM * lv + 2 * (n - 1) * s * h);
  const gFinsOuter = etaOut * hOuter * 2 * lc * lv;
  const gBaseChannel = (block ? 0 : hCh) * (n - 1) * s * lv;
  // The back of the base: upright (its height is the base length, or the width for level fins), or level (facing down under fins pointing up, up over fins hanging down).
  const backH = !g.backExposed
    ? 0
    : direction === "vertical"
      ? hOuter
      : direction === "horizontal"
        ? hNatural("vertical-plate", g.baseWidthM, surfaceK, ambientK)
        : hNatural(direction === "up" ? "horizontal-plate-down" : "horizontal-plate-up", (g.baseWidthM * lv) / (2 * (g.baseWidthM + lv)), surfaceK, ambientK);
  const gBack = g.backExposed ? backH * g.baseWidthM * lv : 0;

  // Fins mostly see each other; what leaves by radiation is what the enclosing box sees.
  const envelope = finnedEnvelopeAreaM2(g);
  const gRad = g.emissivity * SIGMA * envelope * (surfaceK * surfaceK + ambientK * ambientK) * (surfaceK + ambientK);

  out[S_SPACING] = s;
  out[S_FILM] = filmK;
  out[S_EL] = el;
  out[S_NU_CH] = nuCh;
  out[S_H_NAT_CH] = hNatCh;
  out[S_H_FORCED_CH] = hForcedCh;
  out[S_H_CH] = hCh;
  out[S_H_OUTER] = hOuter;
  out[S_ETA_CH] = etaCh;
  out[S_ETA_OUT] = etaOut;
  out[S_LC] = lc;
  out[S_G_FINS_CH] = gFinsChannel;
  out[S_G_FINS_OUT] = gFinsOuter;
  out[S_G_BASE] = gBaseChannel;
  out[S_G_BACK] = gBack;
  out[S_G_RAD] = gRad;
  out[S_ENVELOPE] = envelope;
  out[S_RE] = re;
  out[S_RISE] = direction === "down" ? 0 : rise;
  out[S_LEVEL_FIN] = levelFin;
  out[S_UNDERSIDE] = underside;
  return gFinsChannel + gFinsOuter + gBaseChannel + gBack + gRad;
}

/** The numbers of the model at one pair of temperatures, for the trace. */
export function evaluateFinnedHeatsink(g: FinnedHeatsinkGeometry, surfaceK: number, ambientK: number): FinnedHeatsinkEvaluation {
  const o = new Float64Array(SLOTS);
  const conductanceWPerK = finnedCore(g, surfaceK, ambientK, o);
  return {
    conductanceWPerK,
    spacingM: o[S_SPACING]!,
    filmK: o[S_FILM]!,
    air: airPropertiesAt(o[S_FILM]!),
    elenbaas: o[S_EL]!,
    channelNusselt: o[S_NU_CH]!,
    channelNaturalWPerM2K: o[S_H_NAT_CH]!,
    channelForcedWPerM2K: o[S_H_FORCED_CH]!,
    channelWPerM2K: o[S_H_CH]!,
    outerWPerM2K: o[S_H_OUTER]!,
    finEfficiencyChannel: o[S_ETA_CH]!,
    finEfficiencyOuter: o[S_ETA_OUT]!,
    correctedFinLengthM: o[S_LC]!,
    gFinsChannel: o[S_G_FINS_CH]!,
    gFinsOuter: o[S_G_FINS_OUT]!,
    gBaseChannel: o[S_G_BASE]!,
    gBack: o[S_G_BACK]!,
    gRadiation: o[S_G_RAD]!,
    envelopeAreaM2: o[S_ENVELOPE]!,
    reynolds: o[S_RE]!,
    direction: g.finDirection ?? "vertical",
    channelRiseM: o[S_RISE]!,
    levelFinWPerM2K: o[S_LEVEL_FIN]!,
    undersideWPerM2K: o[S_UNDERSIDE]!,
  };
}

/** Conductance alone, for the solver's loop: no allocation. */
export const finnedHeatsinkConductance = (g: FinnedHeatsinkGeometry, surfaceK: number, ambientK: number): number => finnedCore(g, surfaceK, ambientK, LOOP_SCRATCH);

const BCR = CHANNEL_SOURCE;

/** How each fin direction reads in a trace. */
export const FIN_STANDING: Readonly<Record<FinDirection, string>> = {
  vertical: "Fins vertical: the channels run up and down",
  horizontal: "Fins level on an upright base: the channels run sideways",
  up: "Fins pointing up from a level base",
  down: "Fins hanging down from a level base",
};

/** Sink-to-air resistance of a straight-fin heatsink at a base temperature and an air temperature. */
export function finnedHeatsink(input: FinnedHeatsinkGeometry & { surfaceC: number; ambientC: number }): ElementResult & { evaluation: FinnedHeatsinkEvaluation } {
  const e = evaluateFinnedHeatsink(input, toKelvin(input.surfaceC), toKelvin(input.ambientC));
  const notes = [
    "Base taken isothermal: spreading from a small source into the base is a separate element.",
    `${FIN_STANDING[e.direction]}; radiation leaves through the enclosing box (front, sides and the two channel openings).`,
  ];
  if (e.direction === "horizontal") notes.push("Level fins: warm air cannot rise through the gaps, so the fins between the end fins are taken as a block shedding heat from its front and gap ends (conservative: real arrays do somewhat better, but no better than with vertical fins).");
  if (e.direction === "down") notes.push("Fins hanging down: warm air is trapped between them, so the channels carry no flow of their own (conservative).");
  if (e.direction === "horizontal" || e.direction === "down") {
    const upright = evaluateFinnedHeatsink(extend(input, { finDirection: "vertical" as const }), toKelvin(input.surfaceC), toKelvin(input.ambientC));
    notes.push(`A lower bound: the same sink with vertical fins would give ${(1 / upright.conductanceWPerK).toPrecision(3)} K/W at these temperatures; the truth lies between the two.`);
  }
  if (e.direction !== "down" && e.elenbaas < 10) notes.push(`Elenbaas number ${e.elenbaas.toPrecision(3)} < 10: the channels are choked in still air (fins too close for natural convection).`);
  if ((input.airSpeedMPerS ?? 0) > 0) notes.push("Fan air: flat-plate laminar h floored by fully developed parallel-plate flow, combined with natural convection by the cube rule.");
  const trace = makeTrace({
    element: "finned-heatsink",
    formula: "Straight-fin heatsink: channel convection, outer faces, base and envelope radiation in parallel",
    equation: "G = η_ch·h_ch·A_fins,ch + η_o·h_o·A_fins,o + h_ch·A_base,ch + h_o·A_back + ε·σ·A_env·(T²+T∞²)(T+T∞)",
    inputs: [
      quantity("W", "base width (across fins)", input.baseWidthM, "m"),
      quantity("L", "base length (along fins)", input.baseLengthM, "m"),
      quantity("t_b", "base thickness", input.baseThicknessM, "m"),
      quantity("N", "fin count", input.finCount, "1"),
      quantity("H", "fin height", input.finHeightM, "m"),
      quantity("t", "fin thickness", input.finThicknessM, "m"),
      quantity("k", "fin conductivity", input.conductivityWPerMK, "W/(m·K)"),
      quantity("ε", "emissivity", input.emissivity, "1"),
      quantity("V", "air speed in channels", input.airSpeedMPerS ?? 0, "m/s"),
      quantity("T", "base temperature", input.surfaceC, "°C"),
      quantity("T∞", "air temperature", input.ambientC, "°C"),
    ],
    intermediates: [
      quantity("s", "fin spacing", e.spacingM, "m"),
      ...(e.channelRiseM > 0 ? [quantity("L_rise", "height the air rises along the fins (channel correlation)", e.channelRiseM, "m")] : []),
      ...(e.direction === "horizontal" ? [quantity("h_front", "front and gap ends of the level-fin block, vertical faces as tall as the base is wide", e.levelFinWPerM2K, "W/(m²·K)")] : []),
      ...(e.direction === "down" ? [quantity("h_under", "underside of the array, a hot surface facing down", e.undersideWPerM2K, "W/(m²·K)")] : []),
      quantity("El", "Elenbaas number gβΔT·s⁴/(να·L_rise)", e.elenbaas, "1"),
      quantity("Nu_s", "channel Nusselt number [576/El² + 2.87/√El]^(-1/2)", e.channelNusselt, "1"),
      quantity("h_ch", "channel coefficient", e.channelWPerM2K, "W/(m²·K)"),
      quantity("h_o", "outer-face coefficient", e.outerWPerM2K, "W/(m²·K)"),
      quantity("η_ch", "fin efficiency in the channels", e.finEfficiencyChannel, "1"),
      quantity("η_o", "fin efficiency of the outer faces", e.finEfficiencyOuter, "1"),
      quantity("G_fins,ch", "fins in the channels", e.gFinsChannel, "W/K"),
      quantity("G_fins,o", "outer faces of the end fins", e.gFinsOuter, "W/K"),
      quantity("G_base", "base between the fins", e.gBaseChannel, "W/K"),
      quantity("G_back", "back of the base", e.gBack, "W/K"),
      quantity("A_env", "envelope area", e.envelopeAreaM2, "m²"),
      quantity("G_rad", "radiation from the envelope", e.gRadiation, "W/K"),
    ],
    result: quantity("R", "sink-to-air resistance", 1 / e.conductanceWPerK, "K/W"),
    source: `${e.direction === "vertical" ? `${BCR}; outer faces: Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1323` : FIN_DIRECTION_SOURCE[e.direction]}; fin efficiency: Incropera et al., 6th ed., §3.6.4; forced flow: Incropera et al., 6th ed., eq. 7.30 and the fully developed parallel-plate value Nu = 7.54 (table number from memory — check against a copy); air: ${e.air.source}`,
    validity: { range: `${FIN_STANDING[e.direction].toLowerCase()}, isothermal base, laminar flow (Re_L < 5·10⁵)`, inRange: e.reynolds < 5e5 },
    notes,
  });
  return extend(elementResult(e.conductanceWPerK, trace), { evaluation: e });
}
