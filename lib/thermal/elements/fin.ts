import { makeTrace, quantity, type Trace } from "../trace";

export interface FinEfficiencyInput {
  heightM: number;
  thicknessM: number;
  conductivityWPerMK: number;
  coefficientWPerM2K: number;
}

export interface FinEfficiency {
  efficiency: number;
  /** m = √(2h/(k·t)), 1/m. */
  mPerM: number;
  correctedLengthM: number;
  trace: Trace;
}

/**
 * Efficiency of a straight rectangular fin with the tip folded in by the corrected length
 * L_c = L + t/2: η = tanh(m·L_c)/(m·L_c), m = √(2h/(k·t)) for a fin much wider than thick.
 */
export function finEfficiency(input: FinEfficiencyInput): FinEfficiency {
  const m = Math.sqrt((2 * input.coefficientWPerM2K) / (input.conductivityWPerMK * input.thicknessM));
  const lc = input.heightM + input.thicknessM / 2;
  const x = m * lc;
  // tanh(x)/x → 1 as x → 0; the series keeps it exact where x underflows.
  const eta = x < 1e-4 ? 1 - (x * x) / 3 : Math.tanh(x) / x;
  return {
    efficiency: eta,
    mPerM: m,
    correctedLengthM: lc,
    trace: makeTrace({
      element: "fin-efficiency",
      formula: "Straight rectangular fin, convective tip via corrected length",
      equation: "m = √(2h/(k·t)); L_c = L + t/2; η_f = tanh(m·L_c)/(m·L_c)",
      inputs: [
        quantity("L", "fin height", input.heightM, "m"),
        quantity("t", "fin thickness", input.thicknessM, "m"),
        quantity("k", "fin conductivity", input.conductivityWPerMK, "W/(m·K)"),
        quantity("h", "heat transfer coefficient on the fin", input.coefficientWPerM2K, "W/(m²·K)"),
      ],
      intermediates: [quantity("m", "fin parameter", m, "1/m"), quantity("L_c", "corrected length", lc, "m"), quantity("m·L_c", "", x, "1")],
      result: quantity("η_f", "fin efficiency", eta, "1"),
      source: 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., §3.6.4 (fin efficiency with the corrected length L_c = L + t/2; equation numbers from memory — check against a copy)',
    }),
  };
}
