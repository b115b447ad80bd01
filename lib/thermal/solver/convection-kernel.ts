import { AIR, airInto } from "../air-properties";
import { STANDARD_GRAVITY, ZERO_CELSIUS_K } from "../constants";
import { flippedCode, nusseltOf, SURFACE_CODE, type Surface } from "../correlations";
import { AIR_TABLE } from "../data/air-table";
import type { LinkModel } from "./link-model";

/**
 * The natural-convection coefficient as the solver loops evaluate it, many thousand times
 * per warm-up: the correlations of correlations.ts (the one place they are written, which
 * also names the sources) with the air table's row found by a bucket lookup instead of a
 * search, no strings, no objects, and derivatives worked out analytically.
 */

const flipped = flippedCode;
export { SURFACE_CODE };

/** Same floor as the element model: a link at ΔT = 0 keeps a small, finite conductance. */
const MIN_DELTA_K = 1e-9;

// Module-local copies: the loops then read no imported bindings (a transpiled import is a
// property getter per read, which showed up at several per cent of a warm-up's profile).
const K = AIR.k;
const NU = AIR.nu;
const ALPHA = AIR.alpha;
const PR = AIR.pr;
const BETA = AIR.beta;
const ZERO_C = ZERO_CELSIUS_K;
const G = STANDARD_GRAVITY;
const CODE = SURFACE_CODE;
const airOutside = airInto;

/**
 * Film scratch: the five properties of `airInto`, then, when asked for, their slopes with
 * film temperature (per K) — the table interval's own slopes inside the table, those of the
 * power laws `airInto` extrapolates with outside it — for the analytic derivatives.
 */
const DK = 5;
const DNU = 6;
const DALPHA = 7;
const DPR = 8;
export const FILM_SLOTS = 9;

// Table columns the correlations use (T °C, k, α, ν, Pr), flattened; every row boundary is a
// multiple of 5 °C, so a 5 °C bucket always falls inside one interval.
const ROWS = AIR_TABLE.length;
const T_C = Float64Array.from(AIR_TABLE, (r) => r[0]);
const COL_K = Float64Array.from(AIR_TABLE, (r) => r[3]);
const COL_ALPHA = Float64Array.from(AIR_TABLE, (r) => r[4]);
const COL_NU = Float64Array.from(AIR_TABLE, (r) => r[6]);
const COL_PR = Float64Array.from(AIR_TABLE, (r) => r[7]);
const FIRST_C = T_C[0]!;
const LAST_C = T_C[ROWS - 1]!;
const BUCKET_C = 5;
const BUCKET_ROW = (() => {
  const buckets = Math.ceil((LAST_C - FIRST_C) / BUCKET_C);
  const rows = new Int32Array(buckets + 1);
  for (let b = 0, r = 0; b <= buckets; b++) {
    const tC = FIRST_C + b * BUCKET_C;
    while (r < ROWS - 2 && T_C[r + 1]! <= tC) r++;
    rows[b] = r;
  }
  return rows;
})();

const slopes = (col: Float64Array) => Float64Array.from(col.subarray(1), (v, r) => (v - col[r]!) / (T_C[r + 1]! - T_C[r]!));
const SLOPE_K = slopes(COL_K);
const SLOPE_ALPHA = slopes(COL_ALPHA);
const SLOPE_NU = slopes(COL_NU);
const SLOPE_PR = slopes(COL_PR);

/**
 * Air at a film temperature into `out` (slots of `AIR`), linearly interpolated between the
 * table rows exactly as `airInto` does (which handles the rare extrapolation beyond the
 * table); with `withSlopes`, also d/dT of each property.
 */
export function filmAir(filmK: number, out: Float64Array, withSlopes: boolean): void {
  const tC = filmK - ZERO_C;
  if (!(tC >= FIRST_C && tC <= LAST_C)) {
    airOutside(filmK, out);
    if (withSlopes) {
      // k ∝ T^0.8, ν ∝ T^1.7, α ∝ T^1.8, so Pr = ν/α ∝ T^−0.1.
      out[DK] = (0.8 * out[K]!) / filmK;
      out[DNU] = (1.7 * out[NU]!) / filmK;
      out[DALPHA] = (1.8 * out[ALPHA]!) / filmK;
      out[DPR] = (-0.1 * out[PR]!) / filmK;
    }
    return;
  }
  const lo = BUCKET_ROW[Math.floor((tC - FIRST_C) / BUCKET_C)]!;
  const hi = lo + 1;
  const f = (tC - T_C[lo]!) / (T_C[hi]! - T_C[lo]!);
  out[BETA] = 1 / filmK;
  out[K] = COL_K[lo]! + f * (COL_K[hi]! - COL_K[lo]!);
  out[ALPHA] = COL_ALPHA[lo]! + f * (COL_ALPHA[hi]! - COL_ALPHA[lo]!);
  out[NU] = COL_NU[lo]! + f * (COL_NU[hi]! - COL_NU[lo]!);
  out[PR] = COL_PR[lo]! + f * (COL_PR[hi]! - COL_PR[lo]!);
  if (withSlopes) {
    out[DK] = SLOPE_K[lo]!;
    out[DNU] = SLOPE_NU[lo]!;
    out[DALPHA] = SLOPE_ALPHA[lo]!;
    out[DPR] = SLOPE_PR[lo]!;
  }
}

const nusselt = nusseltOf;

const rayleigh = (gL3: number, air: Float64Array, delta: number) => (gL3 * air[BETA]! * delta) / (air[NU]! * air[ALPHA]!);

/**
 * h in W/(m²·K) of a surface at surfaceK in air at fluidK, with `air` filled by `filmAir`
 * for their film temperature. `gL3` is g·L³ of the characteristic length L.
 */
export function coefficientAt(code: number, lengthM: number, gL3: number, air: Float64Array, surfaceK: number, fluidK: number): number {
  const delta = Math.max(Math.abs(surfaceK - fluidK), MIN_DELTA_K);
  const effective = surfaceK >= fluidK ? code : flipped(code);
  return (nusselt(effective, rayleigh(gL3, air, delta), air[PR]!, null) * air[K]!) / lengthM;
}

const H_SCRATCH = new Float64Array(FILM_SLOTS);

/** h of a surface in W/(m²·K), allocation-free: what the element model and the heatsink model ask for. */
export function naturalConvectionH(surface: Surface, lengthM: number, surfaceK: number, fluidK: number): number {
  filmAir(0.5 * (surfaceK + fluidK), H_SCRATCH, false);
  return coefficientAt(CODE[surface], lengthM, G * lengthM ** 3, H_SCRATCH, surfaceK, fluidK);
}

// Scratch shared by every link: evaluations never overlap, and a network with hundreds of
// convection links then allocates nothing per link for it.
const FILM_AIR = new Float64Array(FILM_SLOTS);
const NU_GRAD = new Float64Array(2);

/**
 * Natural convection, q = h(T_f, |ΔT|)·A·ΔT with T_f = (ti + tj)/2 and ΔT = ti − tj, g·L³ and
 * the surface code worked out once. The derivatives are analytic (one evaluation instead
 * of the three of a finite difference):
 *   ∂q/∂ti = A·(h + ½ΔT·∂h/∂T_f + |ΔT|·∂h/∂|ΔT|),  ∂q/∂tj = A·(−h + ½ΔT·∂h/∂T_f − |ΔT|·∂h/∂|ΔT|),
 * with |ΔT|·∂h/∂|ΔT| = (k/L)·∂Nu/∂ln Ra and ∂ln Ra/∂T_f = −1/T_f − ν′/ν − α′/α (β = 1/T_f).
 */
export class NaturalConvectionLink implements LinkModel {
  readonly linear = false;
  readonly kind = "natural-convection";
  private readonly code: number;
  private readonly gL3: number;
  constructor(
    readonly areaM2: number,
    surface: Surface,
    readonly lengthM: number,
  ) {
    this.code = SURFACE_CODE[surface];
    this.gL3 = G * lengthM ** 3;
  }
  evaluate(ti: number, tj: number, out: Float64Array, derivatives: boolean): void {
    const { code, lengthM, gL3, areaM2 } = this;
    const air = FILM_AIR;
    filmAir(0.5 * (ti + tj), air, derivatives);
    const dt = ti - tj;
    const magnitude = Math.abs(dt);
    const effective = ti >= tj ? code : flipped(code);
    const grad = derivatives ? NU_GRAD : null;
    const nu = nusselt(effective, rayleigh(gL3, air, Math.max(magnitude, MIN_DELTA_K)), air[PR]!, grad);
    const h = (nu * air[K]!) / lengthM;
    out[0] = h * areaM2 * dt;
    if (!grad) return;
    const kOverL = air[K]! / lengthM;
    const dLnRaDTf = -air[BETA]! - air[DNU]! / air[NU]! - air[DALPHA]! / air[ALPHA]!;
    const dhDTf = (grad[0]! * dLnRaDTf + grad[1]! * air[DPR]!) * kOverL + (nu * air[DK]!) / lengthM;
    // Below the floor Ra is held constant, so h does not change with |ΔT| there.
    const byMagnitude = magnitude > MIN_DELTA_K ? grad[0]! * kOverL : 0;
    out[1] = areaM2 * (h + 0.5 * dt * dhDTf + byMagnitude);
    out[2] = areaM2 * (-h + 0.5 * dt * dhDTf - byMagnitude);
  }
}
