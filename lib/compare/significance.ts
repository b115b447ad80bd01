/**
 * What Side by side counts as a difference worth a colour or a sentence: temperatures and
 * headroom by 1 K or more, everything else by 2 % or more of the first column (with a small
 * floor per unit so that a change from zero is not "infinitely" significant).
 */
export const SIGNIFICANCE = { kelvin: 1, relative: 0.02 } as const;

const FLOOR: Record<string, number> = { kg: 0.001, "€": 0.05, lm: 1, h: 1 / 60, min: 0.5, W: 0.01, mAh: 1, Wh: 0.01 };

/** True when `delta` (in `unit`) matters against `reference` (the first column's value). */
export function significantlyDifferent(delta: number, unit: string, reference?: number | null): boolean {
  if (!Number.isFinite(delta)) return false;
  const d = Math.abs(delta);
  if (unit === "K" || unit === "°C") return d >= SIGNIFICANCE.kelvin;
  const relative = reference !== undefined && reference !== null && Number.isFinite(reference) ? Math.abs(reference) * SIGNIFICANCE.relative : 0;
  return d >= Math.max(relative, FLOOR[unit] ?? 0) && d > 0;
}

/** The significance of a row's unit in words, for the table's legend. */
export function significanceWords(unit: string): string {
  return unit === "K" || unit === "°C" ? `under ${SIGNIFICANCE.kelvin} K` : `under ${SIGNIFICANCE.relative * 100} %`;
}
