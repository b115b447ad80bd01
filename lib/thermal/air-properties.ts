import { toCelsius, ZERO_CELSIUS_K } from "./constants";
import { AIR_TABLE, AIR_TABLE_SOURCE } from "./data/air-table";

export interface AirProperties {
  temperatureK: number;
  densityKgPerM3: number;
  specificHeatJPerKgK: number;
  conductivityWPerMK: number;
  diffusivityM2PerS: number;
  kinematicViscosityM2PerS: number;
  prandtl: number;
  /** Ideal gas: β = 1/T. */
  expansionPerK: number;
  inTable: boolean;
  source: string;
}

const FIRST = AIR_TABLE[0]!;
const LAST = AIR_TABLE[AIR_TABLE.length - 1]!;

function fromRow(row: readonly number[], tK: number, inTable: boolean): AirProperties {
  return {
    temperatureK: tK,
    densityKgPerM3: row[1]!,
    specificHeatJPerKgK: row[2]!,
    conductivityWPerMK: row[3]!,
    diffusivityM2PerS: row[4]!,
    kinematicViscosityM2PerS: row[6]!,
    prandtl: row[7]!,
    expansionPerK: 1 / tK,
    inTable,
    source: AIR_TABLE_SOURCE,
  };
}

/** Index into the scratch array `airInto` fills. */
export const AIR = { k: 0, nu: 1, alpha: 2, pr: 3, beta: 4 } as const;

/** Index of the table row at or below tC (inside the table), so rows lo and lo + 1 bracket it. */
function rowBelow(tC: number): number {
  let lo = 0;
  let hi = AIR_TABLE.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (AIR_TABLE[mid]![0] <= tC) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * The properties the convection correlations need, written into `out` without allocating
 * (the solvers call this for every link in every iteration). Same interpolation and
 * extrapolation as `airPropertiesAt` (both find the rows with `rowBelow`).
 */
export function airInto(temperatureK: number, out: Float64Array): boolean {
  const tC = temperatureK - ZERO_CELSIUS_K;
  out[AIR.beta] = 1 / temperatureK;
  if (tC >= FIRST[0] && tC <= LAST[0]) {
    const lo = rowBelow(tC);
    const a = AIR_TABLE[lo]!;
    const b = AIR_TABLE[lo + 1]!;
    const f = (tC - a[0]) / (b[0] - a[0]);
    out[AIR.k] = a[3] + f * (b[3] - a[3]);
    out[AIR.alpha] = a[4] + f * (b[4] - a[4]);
    out[AIR.nu] = a[6] + f * (b[6] - a[6]);
    out[AIR.pr] = a[7] + f * (b[7] - a[7]);
    return true;
  }
  const end = tC < FIRST[0] ? FIRST : LAST;
  const r = temperatureK / (end[0] + ZERO_CELSIUS_K);
  // Scale the end row's own ν and α (μ ∝ T^0.7 with ρ ∝ 1/T gives ν ∝ T^1.7) so the values join the table without a step.
  out[AIR.k] = end[3] * r ** 0.8;
  out[AIR.nu] = end[6] * r ** 1.7;
  out[AIR.alpha] = end[4] * r ** 1.8;
  out[AIR.pr] = out[AIR.nu]! / out[AIR.alpha]!;
  return false;
}

/**
 * Air properties at a temperature, linearly interpolated between the table's rows.
 * Outside the table the end row is scaled (ρ ∝ 1/T as an ideal gas; k ∝ T^0.8, μ ∝ T^0.7,
 * the usual power-law fits for air) so properties stay positive and smooth; `inTable`
 * says when that happened.
 */
export function airPropertiesAt(temperatureK: number): AirProperties {
  const tC = toCelsius(temperatureK);
  if (tC < FIRST[0] || tC > LAST[0]) return extrapolated(tC < FIRST[0] ? FIRST : LAST, temperatureK);
  const lo = rowBelow(tC);
  const a = AIR_TABLE[lo]!;
  const b = AIR_TABLE[lo + 1]!;
  const f = (tC - a[0]) / (b[0] - a[0]);
  const row = a.map((v, i) => v + f * (b[i]! - v));
  return fromRow(row, temperatureK, true);
}

function extrapolated(end: readonly number[], tK: number): AirProperties {
  const r = tK / (end[0]! + ZERO_CELSIUS_K);
  const rho = end[1]! / r;
  const cp = end[2]!;
  const k = end[3]! * r ** 0.8;
  // Scale the end row's own ν and α (μ ∝ T^0.7 with ρ ∝ 1/T gives ν ∝ T^1.7) so the values join the table without a step.
  const nu = end[6]! * r ** 1.7;
  const alpha = end[4]! * r ** 1.8;
  return {
    temperatureK: tK,
    densityKgPerM3: rho,
    specificHeatJPerKgK: cp,
    conductivityWPerMK: k,
    diffusivityM2PerS: alpha,
    kinematicViscosityM2PerS: nu,
    prandtl: nu / alpha,
    expansionPerK: 1 / tK,
    inTable: false,
    source: `${AIR_TABLE_SOURCE}, extrapolated beyond ${FIRST[0]}…${LAST[0]} °C`,
  };
}
