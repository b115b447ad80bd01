import { extend } from "../record";
import { elementResult, makeTrace, quantity, type ElementResult } from "../trace";

export type SpreadingInput = {
  sourceAreaM2: number;
  plateAreaM2: number;
  plateThicknessM: number;
  conductivityWPerMK: number;
} & ({ sinkCoefficientWPerM2K: number } | { sinkResistanceKPerW: number });

export interface SpreadingResult extends ElementResult {
  /** Resistance to the source's mean temperature instead of its peak. */
  averageKelvinPerWatt: number;
  /** The sink-side resistance R₀ = 1/(h·A_p) implied by the boundary, in series after the plate. */
  sinkKelvinPerWatt: number;
}

/**
 * A small source on a larger plate cooled on its far face: the plate's resistance from the
 * source to the cooled face, spreading included, by the closed-form approximation of
 * Lee, Song, Au & Moran (1995). Source and plate are taken as coaxial discs of equal
 * area (a = √(A_s/π), b = √(A_p/π)). The result includes the one-dimensional conduction
 * through the thickness (the ε·τ/√π term), so it replaces, not adds to, a conduction link.
 */
export function spreadingResistance(input: SpreadingInput): SpreadingResult {
  const { sourceAreaM2: as, plateAreaM2: ap, plateThicknessM: t, conductivityWPerMK: k } = input;
  const a = Math.sqrt(as / Math.PI);
  const b = Math.sqrt(ap / Math.PI);
  const eps = Math.min(a / b, 1);
  const tau = t / b;
  const r0 = "sinkResistanceKPerW" in input ? input.sinkResistanceKPerW : 1 / (input.sinkCoefficientWPerM2K * ap);
  const bi = 1 / (Math.PI * k * b * r0);
  const lambda = Math.PI + 1 / (Math.sqrt(Math.PI) * eps);
  const th = Math.tanh(lambda * tau);
  const phi = (th + lambda / bi) / (1 + (lambda / bi) * th);
  const sqrtPi = Math.sqrt(Math.PI);
  const psiMax = (eps * tau) / sqrtPi + (1 / sqrtPi) * (1 - eps) * phi;
  const psiAvg = (eps * tau) / sqrtPi + 0.5 * (1 - eps) ** 1.5 * phi;
  const rMax = psiMax / (sqrtPi * k * a);
  const rAvg = psiAvg / (sqrtPi * k * a);
  const notes = [
    "Peak (centre) temperature of a uniform-flux source; `averageKelvinPerWatt` gives the mean over the source.",
    "Includes conduction through the plate thickness; the sink resistance R₀ is in series after it.",
  ];
  if (as > ap) notes.push("Source larger than the plate: taken as covering the plate (ε = 1).");
  const trace = makeTrace({
    element: "spreading",
    formula: "Spreading resistance of a small source on a plate (Lee–Song–Au–Moran closed form)",
    equation: "ε = a/b, τ = t/b, Bi = 1/(π·k·b·R₀), λ = π + 1/(√π·ε), Φ = [tanh(λτ) + λ/Bi]/[1 + (λ/Bi)·tanh(λτ)], ψ_max = ετ/√π + (1−ε)·Φ/√π, R = ψ_max/(√π·k·a)",
    inputs: [
      quantity("A_s", "source area", as, "m²"),
      quantity("A_p", "plate area", ap, "m²"),
      quantity("t", "plate thickness", t, "m"),
      quantity("k", "plate conductivity", k, "W/(m·K)"),
      quantity("R₀", "sink-side resistance", r0, "K/W"),
    ],
    intermediates: [
      quantity("a", "equivalent source radius", a, "m"),
      quantity("b", "equivalent plate radius", b, "m"),
      quantity("ε", "radius ratio", eps, "1"),
      quantity("τ", "relative thickness", tau, "1"),
      quantity("Bi", "Biot number", bi, "1"),
      quantity("λ", "eigenvalue approximation", lambda, "1"),
      quantity("Φ", "", phi, "1"),
      quantity("ψ_max", "dimensionless peak resistance", psiMax, "1"),
      quantity("ψ_avg", "dimensionless mean resistance", psiAvg, "1"),
    ],
    result: quantity("R", "plate resistance, source peak to cooled face", rMax, "K/W"),
    source: "S. Lee, S. Song, V. Au & K. P. Moran, \"Constriction/spreading resistance model for electronics packaging\", ASME/JSME Thermal Engineering Conference, 1995, vol. 4, pp. 199–206",
    notes,
  });
  return extend(elementResult(1 / rMax, trace), { averageKelvinPerWatt: rAvg, sinkKelvinPerWatt: r0 });
}
