import type { CurvePoint } from "./schema";

export interface Interpolated {
  readonly y: number;
  /** True when x lies outside the table and y was clamped to the nearest end point. */
  readonly extrapolated: boolean;
}

/**
 * Linear interpolation in a validated table (strictly increasing x). Outside the table the
 * end value is held, not extended: datasheet curves bend near their ends and a straight-line
 * extension can run to negative flux or current. `extrapolated` tells the caller to warn.
 */
export function interpolate(points: readonly CurvePoint[], x: number): Interpolated {
  if (!Number.isFinite(x)) throw new RangeError("interpolate: x must be a finite number");
  const first = points[0];
  const last = points[points.length - 1];
  if (!first || !last) throw new RangeError("interpolate: the curve has no points");
  if (x <= first.x) return { y: first.y, extrapolated: x < first.x };
  if (x >= last.x) return { y: last.y, extrapolated: x > last.x };

  // Binary search for the segment [lo, lo + 1] holding x; tables are short but this keeps
  // transient loops that interpolate every step cheap.
  let lo = 0;
  let hi = points.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((points[mid]?.x ?? Number.POSITIVE_INFINITY) <= x) lo = mid;
    else hi = mid;
  }
  const a = points[lo];
  const b = points[hi];
  if (!a || !b) throw new RangeError("interpolate: the curve is not sorted by x");
  // An exact hit returns the tabulated value itself, bit for bit.
  if (x === a.x) return { y: a.y, extrapolated: false };
  const t = (x - a.x) / (b.x - a.x);
  // a.y + t·(b.y − a.y) can leave [a.y, b.y] by rounding when t is 1 − ε; the convex form
  // below cannot.
  const y = (1 - t) * a.y + t * b.y;
  return { y: Math.min(Math.max(y, Math.min(a.y, b.y)), Math.max(a.y, b.y)), extrapolated: false };
}

/** The x range a curve covers, for chart axes and "outside the curve" warnings. */
export function curveRange(points: readonly CurvePoint[]): { min: number; max: number } | null {
  const first = points[0];
  const last = points[points.length - 1];
  return first && last ? { min: first.x, max: last.x } : null;
}
