import type { z } from "zod";
import { workedOutFinGap } from "@/lib/parts/kinds/heatsink";
import { parseQuantity } from "@/lib/units";

/**
 * The gap between fins in the Quick check. The finned-sink model takes its channel width
 * from the base width, the fin count and the fin thickness, so a gap that is typed in is
 * checked against them rather than used on its own:
 * - left empty, it is worked out: (W − n·t) / (n − 1), and shown with the answer;
 * - given, the fins and gaps must fit on the base (n·t + (n − 1)·s ≤ W, 2 % tolerance for
 *   rounded measurements), and a gap far from the worked-out one is reported.
 */

export interface FinGap {
  /** The gap the model uses, m. */
  readonly usedM: number;
  /** The gap as typed in, m; null when it was left empty. */
  readonly givenM: number | null;
}

const num = (v: unknown, quantity: "length" | "count"): number | null => {
  if (typeof v !== "number" && typeof v !== "string") return null;
  const parsed = parseQuantity(v, quantity);
  return parsed.ok ? parsed.si : null;
};

const emptyValue = (v: unknown) => v === undefined || v === null || (typeof v === "string" && v.trim() === "");

/** Worked-out gap between n fins of thickness t on a base of width w, or null when they do not fit. */
export const derivedFinGap = workedOutFinGap;

/**
 * Before the heatsink's own checks: an empty gap is filled with the worked-out one, so the
 * part schema (which needs a gap when there are fins) sees a value. Fins that do not fit
 * get a placeholder gap here and are refused by `checkFinFit` with the field named.
 */
export function fillFinGap(sink: unknown): unknown {
  if (!sink || typeof sink !== "object" || Array.isArray(sink) || !("geometry" in sink)) return sink;
  const input = (sink as { geometry: unknown }).geometry;
  if (!input || typeof input !== "object" || Array.isArray(input)) return sink;
  const g = input as Record<string, unknown>;
  if (!emptyValue(g.finSpacingM)) return sink;
  const n = num(g.finCount, "count");
  const w = num(g.baseWidthM, "length");
  const t = num(g.finThicknessM, "length");
  if (n === null || w === null || t === null || n < 1) return sink;
  const gap = n === 1 ? w : (derivedFinGap(w, n, t) ?? 1e-6);
  return { ...sink, geometry: { ...g, finSpacingM: gap }, gapWorkedOut: true };
}

type Geometry = { baseWidthM: number; finCount: number; finThicknessM?: number; finSpacingM?: number };

/** Adds issues naming the field when the fins (and gaps, if given) do not fit on the base. */
export function checkFinFit(g: Geometry, gapGiven: boolean, ctx: z.RefinementCtx, at: readonly (string | number)[]): void {
  const n = g.finCount;
  const t = g.finThicknessM ?? 0;
  const mm = (m: number) => `${Number((m * 1000).toPrecision(3))} mm`;
  if (n >= 1 && n * t >= g.baseWidthM) {
    ctx.addIssue({ code: "custom", path: [...at, "finCount"], message: `${n} fins ${mm(t)} thick take ${mm(n * t)}, which does not fit on a base ${mm(g.baseWidthM)} wide` });
    return;
  }
  if (gapGiven && n >= 2 && g.finSpacingM !== undefined) {
    const need = n * t + (n - 1) * g.finSpacingM;
    if (need > g.baseWidthM * 1.02) {
      ctx.addIssue({
        code: "custom",
        path: [...at, "finSpacingM"],
        message: `${n} fins ${mm(t)} thick with gaps of ${mm(g.finSpacingM)} need ${mm(need)}, more than the ${mm(g.baseWidthM)} base width; check the width or leave the gap empty to have it worked out`,
      });
    }
  }
}
