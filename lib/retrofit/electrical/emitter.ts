import { interpolate } from "@/lib/curves";
import type { ResolvedPart } from "../resolved";
import { q, SOURCES, trace, type Traced } from "../trace";

/**
 * One emitter at one current and junction temperature: forward voltage, electrical power,
 * heat and flux. Defaults where the part is silent are trade figures, stated in the traces.
 */

/** About −2 mV/K for white LEDs (PRODUCT.md, common practice). */
export const DEFAULT_VF_TEMPCO_V_PER_K = -0.002;
/** Share of electrical power that becomes heat when the part gives neither heat fraction nor efficacy: 60–80 % is typical of white phosphor LEDs. */
export const DEFAULT_HEAT_FRACTION = 0.7;
/** Luminous efficacy of radiation of a white phosphor LED spectrum, ≈ 300 lm per optical watt (from memory; 280–330 for 3000–6500 K). */
export const WHITE_LER_LM_PER_W = 300;
/** Relative flux loss per kelvin above 25 °C without a curve, ≈ 0.25 %/K (from memory, typical of white phosphor LEDs). */
export const DEFAULT_FLUX_TEMPCO_PER_K = -0.0025;
/** Temperature the forward voltage and efficacy are stated at unless the part says otherwise. */
export const REFERENCE_TJ_C = 25;

export interface EmitterPoint {
  currentA: number;
  vfV: number;
  powerW: number;
  heatW: number;
  /** ∂(heat)/∂Tj at this point, W/K (negative: Vf falls as the junction warms). */
  heatPerKelvin: number;
  fluxLm: number | null;
  relativeFluxTj: number;
  heatFraction: number;
  traces: { vf: Traced; power: Traced; heat: Traced; flux: Traced | null };
}

export function vfAt(e: ResolvedPart<"emitter">, currentA: number, tjC: number): { vf: number; base: number; tempco: number; fromCurve: boolean } {
  const curve = e.curves.vfVsCurrent;
  const base = curve ? interpolate(curve.points, currentA).y : e.specs.vfV;
  const tempco = e.specs.vfTempCoeffVPerK ?? DEFAULT_VF_TEMPCO_V_PER_K;
  // A Vf below a tenth of the cold value is outside any physical junction; hold it there.
  const vf = Math.max(base + tempco * (tjC - REFERENCE_TJ_C), 0.1 * base);
  return { vf, base, tempco, fromCurve: curve !== undefined };
}

function relativeFluxAtTj(e: ResolvedPart<"emitter">, tjC: number): { rel: number; fromCurve: boolean } {
  const curve = e.curves.fluxVsTj;
  if (curve) return { rel: interpolate(curve.points, tjC).y, fromCurve: true };
  return { rel: Math.max(0, 1 + DEFAULT_FLUX_TEMPCO_PER_K * (tjC - REFERENCE_TJ_C)), fromCurve: false };
}

function relativeFluxAtCurrent(e: ResolvedPart<"emitter">, currentA: number): { rel: number; fromCurve: boolean } {
  const curve = e.curves.fluxVsCurrent;
  if (curve) return { rel: interpolate(curve.points, currentA).y, fromCurve: true };
  return { rel: currentA / e.specs.vfRefCurrentA, fromCurve: false };
}

export function emitterAt(e: ResolvedPart<"emitter">, currentA: number, tjC: number): EmitterPoint {
  const v = vfAt(e, currentA, tjC);
  const power = v.vf * currentA;
  const s = e.specs;
  const relT = relativeFluxAtTj(e, tjC);
  const relI = relativeFluxAtCurrent(e, currentA);
  const refFlux = s.efficacyLmPerW !== undefined ? s.efficacyLmPerW * s.vfV * s.vfRefCurrentA : null;
  const flux = refFlux !== null ? refFlux * relI.rel * relT.rel : null;

  let heatFraction: number;
  let heatNote: string;
  if (s.heatFraction !== undefined) {
    heatFraction = s.heatFraction;
    heatNote = "heat fraction from the part";
  } else if (flux !== null && power > 0) {
    // Light that leaves is not heat: optical watts = lumens ÷ luminous efficacy of radiation.
    heatFraction = Math.min(1, Math.max(0.3, 1 - flux / WHITE_LER_LM_PER_W / power));
    heatNote = `heat fraction 1 − Φ/(LER·P) with LER = ${WHITE_LER_LM_PER_W} lm/W (white phosphor spectrum, from memory)`;
  } else {
    heatFraction = DEFAULT_HEAT_FRACTION;
    heatNote = `no heat fraction or efficacy on the part: ${DEFAULT_HEAT_FRACTION * 100} % assumed (${SOURCES.trade}: 60–80 %)`;
  }
  const heat = power * heatFraction;
  // With a declared heat fraction, heat is exactly linear in Tj through Vf; the slope lets the solver carry the coupling.
  const heatPerKelvin = v.vf > 0.1 * v.base ? v.tempco * currentA * heatFraction : 0;

  const vfTrace = trace({
    element: "emitter-vf",
    formula: "Forward voltage at current and junction temperature",
    equation: "Vf = Vf₂₅(I) + (dVf/dT)·(Tj − 25 °C)",
    inputs: [q("Vf₂₅", v.fromCurve ? "Vf at I from the Vf-vs-current curve" : "Vf at the reference current", v.base, "V"), q("dVf/dT", "temperature coefficient", v.tempco, "V/K"), q("Tj", "junction temperature", tjC, "°C"), q("I", "current per emitter", currentA, "A")],
    result: q("Vf", "forward voltage", v.vf, "V"),
    source: s.vfTempCoeffVPerK !== undefined ? SOURCES.datasheet : `${SOURCES.datasheet}; coefficient −2 mV/K assumed (${SOURCES.trade})`,
    notes: v.fromCurve ? [] : ["No Vf-vs-current curve: Vf taken as at the reference current for every current (real Vf rises with current)."],
  });
  const powerTrace = trace({ element: "emitter-power", formula: "Electrical power of one emitter", equation: "P = Vf·I", inputs: [q("Vf", "forward voltage", v.vf, "V"), q("I", "current", currentA, "A")], result: q("P", "electrical power", power, "W"), source: "definition of electrical power, P = V·I (any physics textbook)" });
  const heatTrace = trace({ element: "emitter-heat", formula: "Heat at the junction", equation: "P_heat = P·f_heat", inputs: [q("P", "electrical power", power, "W"), q("f_heat", "heat fraction", heatFraction, "1")], result: q("P_heat", "heat", heat, "W"), source: s.heatFraction !== undefined ? SOURCES.datasheet : SOURCES.trade, notes: [heatNote] });
  const fluxTrace =
    flux === null || refFlux === null
      ? null
      : trace({
          element: "emitter-flux",
          formula: "Flux at current and junction temperature",
          equation: "Φ = η_ref·Vf_ref·I_ref · Φ_rel(I) · Φ_rel(Tj)",
          inputs: [q("η_ref", "reference efficacy", s.efficacyLmPerW ?? 0, "lm/W"), q("Vf_ref", "reference Vf", s.vfV, "V"), q("I_ref", "reference current", s.vfRefCurrentA, "A"), q("Φ_rel(I)", relI.fromCurve ? "relative flux at I (curve)" : "relative flux at I, taken ∝ I", relI.rel, "1"), q("Φ_rel(Tj)", relT.fromCurve ? "relative flux at Tj (curve)" : "relative flux at Tj, −0.25 %/K from 25 °C", relT.rel, "1")],
          result: q("Φ", "luminous flux per emitter", flux, "lm"),
          source: relT.fromCurve ? SOURCES.datasheet : `${SOURCES.datasheet}; flux-vs-Tj slope from memory (typical white LED)`,
          notes: relI.fromCurve ? [] : ["No flux-vs-current curve: flux taken proportional to current (no droop), optimistic above the reference current."],
        });
  return {
    currentA,
    vfV: v.vf,
    powerW: power,
    heatW: heat,
    heatPerKelvin,
    fluxLm: flux,
    relativeFluxTj: relT.rel,
    heatFraction,
    traces: { vf: { value: v.vf, unit: "V", trace: vfTrace }, power: { value: power, unit: "W", trace: powerTrace }, heat: { value: heat, unit: "W", trace: heatTrace }, flux: fluxTrace ? { value: flux, unit: "lm", trace: fluxTrace } : null },
  };
}

/** Current per emitter that makes N emitters draw a regulated output power at Tj (bisection; P rises with I). */
export function currentForPower(e: ResolvedPart<"emitter">, count: number, powerW: number, tjC: number): number {
  let lo = 0;
  let hi = 50;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (count * vfAt(e, mid, tjC).vf * mid < powerW) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
