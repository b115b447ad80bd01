import { airPropertiesAt, type AirProperties } from "../air-properties";
import { STANDARD_GRAVITY, toKelvin } from "../constants";
import type { Surface } from "../schema";
import { coefficientAt, filmAir, FILM_SLOTS, SURFACE_CODE } from "../solver/convection-kernel";
import { elementResult, makeTrace, quantity, type ElementResult } from "../trace";

const INCROPERA_CH9 = 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", ch. 9';

/** Below this temperature difference the coefficient is evaluated at the floor, so a link at ΔT = 0 keeps a small, finite conductance. */
const MIN_DELTA_K = 1e-9;

export interface NaturalConvectionCoefficient {
  coefficientWPerM2K: number;
  rayleigh: number;
  nusselt: number;
  /** The surface the correlation was applied to: a horizontal plate colder than the air behaves like the opposite face. */
  effectiveSurface: Surface;
  correlation: string;
  equation: string;
  source: string;
  range: string;
  inRange: boolean;
  filmK: number;
  air: AirProperties;
}

/** Rayleigh number gβΔT L³/(να), with ideal-gas β = 1/T_film. */
export function rayleighNumber(air: AirProperties, deltaK: number, lengthM: number): number {
  return (STANDARD_GRAVITY * air.expansionPerK * deltaK * lengthM ** 3) / (air.kinematicViscosityM2PerS * air.diffusivityM2PerS);
}

/** Churchill–Chu Prandtl-number function [1 + (c/Pr)^(9/16)]. */
const prFactor = (c: number, pr: number) => 1 + (c / pr) ** (9 / 16);

function nusseltFor(surface: Surface, ra: number, pr: number): Omit<NaturalConvectionCoefficient, "coefficientWPerM2K" | "rayleigh" | "effectiveSurface" | "filmK" | "air"> {
  switch (surface) {
    case "vertical-plate":
      if (ra <= 1e9) {
        return {
          nusselt: 0.68 + (0.67 * ra ** 0.25) / prFactor(0.492, pr) ** (4 / 9),
          correlation: "Churchill–Chu, vertical plate, laminar form",
          equation: "Nu_L = 0.68 + 0.670·Ra_L^(1/4) / [1 + (0.492/Pr)^(9/16)]^(4/9)",
          source: `Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1323; as ${INCROPERA_CH9}, eq. 9.27`,
          range: "Ra_L ≤ 10⁹ (laminar)",
          inRange: true,
        };
      }
      return {
        nusselt: (0.825 + (0.387 * ra ** (1 / 6)) / prFactor(0.492, pr) ** (8 / 27)) ** 2,
        correlation: "Churchill–Chu, vertical plate, all Rayleigh numbers",
        equation: "Nu_L = {0.825 + 0.387·Ra_L^(1/6) / [1 + (0.492/Pr)^(9/16)]^(8/27)}²",
        source: `Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1323; as ${INCROPERA_CH9}, eq. 9.26`,
        range: "10⁻¹ ≤ Ra_L ≤ 10¹²",
        inRange: ra <= 1e12,
      };
    case "horizontal-cylinder":
      return {
        nusselt: (0.6 + (0.387 * ra ** (1 / 6)) / prFactor(0.559, pr) ** (8 / 27)) ** 2,
        correlation: "Churchill–Chu, long horizontal cylinder",
        equation: "Nu_D = {0.60 + 0.387·Ra_D^(1/6) / [1 + (0.559/Pr)^(9/16)]^(8/27)}²",
        source: `Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1049; as ${INCROPERA_CH9}, eq. 9.34`,
        range: "Ra_D ≤ 10¹² (characteristic length = diameter)",
        inRange: ra <= 1e12,
      };
    case "horizontal-plate-up":
      if (ra <= 1e7) {
        return {
          nusselt: 0.54 * ra ** 0.25,
          correlation: "Upper surface of a hot plate (or lower surface of a cold plate), laminar",
          equation: "Nu_L = 0.54·Ra_L^(1/4), L = A/P",
          source: `Goldstein, Sparrow & Jones (1973), Lloyd & Moran (1974); as ${INCROPERA_CH9}, eq. 9.30`,
          range: "10⁴ ≤ Ra_L ≤ 10⁷, Pr ≥ 0.7",
          inRange: ra >= 1e4 && pr >= 0.7,
        };
      }
      return {
        nusselt: 0.15 * ra ** (1 / 3),
        correlation: "Upper surface of a hot plate (or lower surface of a cold plate), turbulent",
        equation: "Nu_L = 0.15·Ra_L^(1/3), L = A/P",
        source: `Lloyd & Moran (1974); as ${INCROPERA_CH9}, eq. 9.31`,
        range: "10⁷ ≤ Ra_L ≤ 10¹¹, all Pr",
        inRange: ra <= 1e11,
      };
    case "horizontal-plate-down":
      return {
        nusselt: 0.52 * ra ** 0.2,
        correlation: "Lower surface of a hot plate (or upper surface of a cold plate)",
        equation: "Nu_L = 0.52·Ra_L^(1/5), L = A/P",
        source: `Radziemska & Lewandowski (2001); as ${INCROPERA_CH9} (7th ed.), eq. 9.32`,
        range: "10⁴ ≤ Ra_L ≤ 10⁹, Pr ≥ 0.7",
        inRange: ra >= 1e4 && ra <= 1e9 && pr >= 0.7,
      };
  }
}

/** Nusselt number alone — the same branches as `nusseltFor`, without building the description (solver hot path). */
export function nusseltNumber(surface: Surface, ra: number, pr: number): number {
  switch (surface) {
    case "vertical-plate":
      return ra <= 1e9 ? 0.68 + (0.67 * Math.sqrt(Math.sqrt(ra))) / prFactor(0.492, pr) ** (4 / 9) : (0.825 + (0.387 * ra ** (1 / 6)) / prFactor(0.492, pr) ** (8 / 27)) ** 2;
    case "horizontal-cylinder":
      return (0.6 + (0.387 * ra ** (1 / 6)) / prFactor(0.559, pr) ** (8 / 27)) ** 2;
    case "horizontal-plate-up":
      return ra <= 1e7 ? 0.54 * Math.sqrt(Math.sqrt(ra)) : 0.15 * Math.cbrt(ra);
    case "horizontal-plate-down":
      return 0.52 * ra ** 0.2;
  }
}

const scratch = new Float64Array(FILM_SLOTS);

/** h of a surface in W/(m²·K), allocation-free; equals `naturalConvectionCoefficient(...).coefficientWPerM2K` (the solvers' kernel, shared so both agree). */
export function naturalConvectionH(surface: Surface, lengthM: number, surfaceK: number, fluidK: number): number {
  filmAir(0.5 * (surfaceK + fluidK), scratch, false);
  return coefficientAt(SURFACE_CODE[surface], lengthM, STANDARD_GRAVITY * lengthM ** 3, scratch, surfaceK, fluidK);
}

const flip: Record<Surface, Surface> = {
  "vertical-plate": "vertical-plate",
  "horizontal-cylinder": "horizontal-cylinder",
  "horizontal-plate-up": "horizontal-plate-down",
  "horizontal-plate-down": "horizontal-plate-up",
};

/** The average natural-convection coefficient of a surface at surfaceK in still air at fluidK. */
export function naturalConvectionCoefficient(surface: Surface, lengthM: number, surfaceK: number, fluidK: number): NaturalConvectionCoefficient {
  const filmK = 0.5 * (surfaceK + fluidK);
  const air = airPropertiesAt(filmK);
  const delta = Math.max(Math.abs(surfaceK - fluidK), MIN_DELTA_K);
  // A horizontal plate colder than the air sheds its boundary layer like a hot plate turned over.
  const effectiveSurface = surfaceK >= fluidK ? surface : flip[surface];
  const ra = rayleighNumber(air, delta, lengthM);
  const n = nusseltFor(effectiveSurface, ra, air.prandtl);
  const h = (nusseltNumber(effectiveSurface, ra, air.prandtl) * air.conductivityWPerMK) / lengthM;
  return { ...n, coefficientWPerM2K: h, rayleigh: ra, effectiveSurface, filmK, air };
}

export interface NaturalConvectionInput {
  surface: Surface;
  areaM2: number;
  characteristicLengthM: number;
  surfaceC: number;
  fluidC: number;
}

/** Natural convection from a surface: h·A with h from the named correlation at the film temperature. */
export function naturalConvection(input: NaturalConvectionInput): ElementResult & { coefficientWPerM2K: number } {
  const c = naturalConvectionCoefficient(input.surface, input.characteristicLengthM, toKelvin(input.surfaceC), toKelvin(input.fluidC));
  const g = c.coefficientWPerM2K * input.areaM2;
  const notes: string[] = [];
  if (!c.inRange) notes.push(`Ra = ${c.rayleigh.toPrecision(3)} is outside the correlation's range (${c.range}); the value is an extrapolation.`);
  if (!c.air.inTable) notes.push("Film temperature is outside the air table; properties were extrapolated.");
  if (c.effectiveSurface !== input.surface) notes.push(`Surface is colder than the air, so the ${c.effectiveSurface} correlation applies.`);
  const trace = makeTrace({
    element: "natural-convection",
    formula: c.correlation,
    equation: `${c.equation}; h = Nu·k/L; G = h·A`,
    inputs: [
      quantity("A", "area", input.areaM2, "m²"),
      quantity("L", "characteristic length", input.characteristicLengthM, "m"),
      quantity("T_s", "surface temperature", input.surfaceC, "°C"),
      quantity("T_∞", "air temperature", input.fluidC, "°C"),
    ],
    intermediates: [
      quantity("T_f", "film temperature", c.filmK, "K"),
      quantity("k", "air conductivity at T_f", c.air.conductivityWPerMK, "W/(m·K)"),
      quantity("ν", "air kinematic viscosity at T_f", c.air.kinematicViscosityM2PerS, "m²/s"),
      quantity("α", "air thermal diffusivity at T_f", c.air.diffusivityM2PerS, "m²/s"),
      quantity("Pr", "Prandtl number at T_f", c.air.prandtl, "1"),
      quantity("Ra", "Rayleigh number", c.rayleigh, "1"),
      quantity("Nu", "Nusselt number", c.nusselt, "1"),
      quantity("h", "heat transfer coefficient", c.coefficientWPerM2K, "W/(m²·K)"),
    ],
    result: quantity("G", "conductance", g, "W/K"),
    source: `${c.source}; air properties: ${c.air.source}`,
    validity: { range: c.range, inRange: c.inRange },
    notes,
  });
  return { ...elementResult(g, trace), coefficientWPerM2K: c.coefficientWPerM2K };
}
