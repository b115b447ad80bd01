import { create, createUnitDependencies, unitDependencies, type FactoryFunctionMap, type Unit } from "mathjs";

/**
 * A private mathjs instance: custom units are registered here so the global mathjs (which
 * other code may use) is never mutated. Only the unit functions are built (mathjs's own
 * tree-shakable factories), about a third of the whole library in a browser bundle.
 */
// mathjs types each dependency map as possibly undefined; at runtime both are always there.
export const math = create({ unitDependencies, createUnitDependencies } as FactoryFunctionMap);

// Lumen is missing from mathjs. 1 lm = 1 cd·sr and the steradian is dimensionless, so
// defining it as 1 cd keeps lm/W comparable with itself and distinct from every other unit.
math.createUnit("lm", { definition: "1 cd", prefixes: "short", aliases: ["lumen", "lumens"] });

/**
 * Rewrites what people type into what mathjs parses: symbols (°C, Ω, µ, ², ·) and the
 * run-together conductivity spellings W/mK and W/m²K, which mathjs would otherwise read as
 * "per millikelvin".
 */
export function normaliseUnitText(text: string): string {
  return text
    .trim()
    .replace(/[µμ]/g, "u")
    .replace(/[ΩΩ]/g, "ohm")
    .replace(/℃|°\s*C\b/g, "degC")
    .replace(/℉|°\s*F\b/g, "degF")
    .replace(/°/g, "deg")
    .replace(/²/g, "^2")
    .replace(/³/g, "^3")
    .replace(/[·⋅]/g, " ")
    .replace(/\/\s*m(\^2)?\s*K\b/g, (_m, sq: string | undefined) => `/(m${sq ?? ""} K)`);
}

/** mathjs throws on text it cannot read; this returns the message instead. */
export function tryUnit(text: string): { ok: true; unit: Unit } | { ok: false; message: string } {
  try {
    const unit = math.unit(text);
    return { ok: true, unit };
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message : String(error) };
  }
}

/** The dimension vector of a mathjs unit string (valueless), e.g. "K/W". */
export function dimensionsOf(unitText: string): readonly number[] {
  return math.unit(unitText).dimensions;
}

export function sameDimensions(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((value, index) => Math.abs(value - (b[index] ?? 0)) < 1e-12);
}
