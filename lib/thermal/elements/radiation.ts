import { STEFAN_BOLTZMANN, toKelvin } from "../constants";
import { extend } from "../record";
import { elementResult, makeTrace, quantity, type ElementResult } from "../trace";

export interface RadiationInput {
  areaM2: number;
  emissivity: number;
  surfaceC: number;
  surroundingsC: number;
}

/**
 * Net radiation from a small grey surface to large surroundings, q = εσA(T⁴ − T∞⁴).
 * The conductance reported is the secant one, εσA(T² + T∞²)(T + T∞), so q = G·(T − T∞)
 * holds exactly and stays finite when the two temperatures meet.
 */
export function radiationExchange(input: RadiationInput): ElementResult & { watts: number } {
  const t = toKelvin(input.surfaceC);
  const tInf = toKelvin(input.surroundingsC);
  const c = input.emissivity * STEFAN_BOLTZMANN * input.areaM2;
  const watts = c * (t ** 4 - tInf ** 4);
  const g = c * (t * t + tInf * tInf) * (t + tInf);
  const trace = makeTrace({
    element: "radiation",
    formula: "Radiation exchange of a small grey surface with large surroundings",
    equation: "q = ε·σ·A·(T⁴ − T∞⁴); G = ε·σ·A·(T² + T∞²)·(T + T∞)",
    inputs: [
      quantity("A", "area", input.areaM2, "m²"),
      quantity("ε", "emissivity", input.emissivity, "1"),
      quantity("T", "surface temperature", t, "K"),
      quantity("T∞", "surroundings temperature", tInf, "K"),
    ],
    intermediates: [
      quantity("σ", "Stefan–Boltzmann constant (CODATA 2018, exact)", STEFAN_BOLTZMANN, "W/(m²·K⁴)"),
      quantity("q", "net heat radiated", watts, "W"),
      quantity("h_r", "radiation coefficient", g / input.areaM2, "W/(m²·K)"),
    ],
    result: quantity("G", "conductance (secant)", g, "W/K"),
    source: 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., eq. 1.7 (small surface in a large enclosure); σ from CODATA 2018',
    notes: ["Surroundings are taken at the temperature of the link's `to` node and to be much larger than the surface."],
  });
  return extend(elementResult(g, trace), { watts });
}
