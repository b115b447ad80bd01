import { airPropertiesAt, type AirProperties } from "../air-properties";
import { STANDARD_GRAVITY, toKelvin } from "../constants";
import { describeCorrelation, effectiveSurface as turned, nusseltNumber, type CorrelationDescription, type Surface } from "../correlations";
import { extend } from "../record";
import { elementResult, makeTrace, quantity, type ElementResult } from "../trace";

export { naturalConvectionH } from "../solver/convection-kernel";
export { nusseltNumber } from "../correlations";

/** Below this temperature difference the coefficient is evaluated at the floor, so a link at ΔT = 0 keeps a small, finite conductance. */
const MIN_DELTA_K = 1e-9;

export interface NaturalConvectionCoefficient extends CorrelationDescription {
  coefficientWPerM2K: number;
  rayleigh: number;
  nusselt: number;
  /** The surface the correlation was applied to: a horizontal plate colder than the air behaves like the opposite face. */
  effectiveSurface: Surface;
  filmK: number;
  air: AirProperties;
}

/** Rayleigh number gβΔT L³/(να), with ideal-gas β = 1/T_film. */
export function rayleighNumber(air: AirProperties, deltaK: number, lengthM: number): number {
  return (STANDARD_GRAVITY * air.expansionPerK * deltaK * lengthM ** 3) / (air.kinematicViscosityM2PerS * air.diffusivityM2PerS);
}

/** The average natural-convection coefficient of a surface at surfaceK in still air at fluidK. */
export function naturalConvectionCoefficient(surface: Surface, lengthM: number, surfaceK: number, fluidK: number): NaturalConvectionCoefficient {
  const filmK = 0.5 * (surfaceK + fluidK);
  const air = airPropertiesAt(filmK);
  const delta = Math.max(Math.abs(surfaceK - fluidK), MIN_DELTA_K);
  // A horizontal plate colder than the air sheds its boundary layer like a hot plate turned over.
  const effectiveSurface = turned(surface, surfaceK >= fluidK);
  const ra = rayleighNumber(air, delta, lengthM);
  const nusselt = nusseltNumber(effectiveSurface, ra, air.prandtl);
  const h = (nusselt * air.conductivityWPerMK) / lengthM;
  return extend(describeCorrelation(effectiveSurface, ra, air.prandtl), { nusselt, coefficientWPerM2K: h, rayleigh: ra, effectiveSurface, filmK, air });
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
  return extend(elementResult(g, trace), { coefficientWPerM2K: c.coefficientWPerM2K });
}
