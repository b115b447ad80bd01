import { emissivityFor, naturalConvectionCoefficient, STEFAN_BOLTZMANN, toKelvin, type Finish, type Surface } from "@/lib/thermal";

/**
 * The engine's model of a heatsink on the bench: one node of heat capacity C, heated by P,
 * losing heat to the air through a path of conductance G(θ), θ the rise above ambient:
 *
 *   C·dθ/dt = P − G(θ)·θ,  θ(0) = 0 (the sink starts at ambient when the heat goes on).
 *
 * `natural`: G follows natural convection plus radiation, scaled so that the steady rise at
 * this heat input is exactly P·R — R is the sink-to-air resistance at the run's own
 * conditions. `linear`: G = 1/R (a declared resistance), whose warm-up has a closed form.
 */
export type PathKind = "natural" | "linear";

export interface SinkPath {
  kind: PathKind;
  /** Shape of the conductance per area against the rise, h_c(θ) + ε·h_r(θ), W/(m²·K); only for `natural`. */
  shape: (riseK: number) => number;
  surface: Surface;
  characteristicLengthM: number;
  emissivity: number;
  emissivityNote: string;
}

/** A lamp-sized sink: the length only sets how convection and radiation share the heat (common practice). */
export const BENCH_CHARACTERISTIC_LENGTH_M = 0.05;
/** Rises the conductance table covers; beyond it the last value holds. */
const MAX_RISE_K = 400;
const TABLE_STEPS = 64;
/** Tables already built, by conditions: a maker fits several runs at the same ambient. */
const tables = new Map<string, Float64Array>();
const MAX_TABLES = 16;

export function benchEmissivity(material: string | undefined, finish: Finish | undefined): { e: number; note: string } {
  if (finish !== undefined) {
    const t = emissivityFor(material ?? "aluminium-6063-t5", finish);
    if (t) return { e: t.emissivity, note: `emissivity of ${material ?? "aluminium"}, ${finish} (${t.source})` };
  }
  return { e: 0.5, note: "finish not given: emissivity 0.5 assumed (between bare and anodised metal)" };
}

/** Builds the natural convection + radiation path once per fit, as a table over √θ (smooth near θ = 0, cheap to look up). */
export function naturalPath(input: { ambientC: number; surface: Surface; characteristicLengthM: number; emissivity: number; emissivityNote: string }): SinkPath {
  const tInf = toKelvin(input.ambientC);
  const du = Math.sqrt(MAX_RISE_K) / TABLE_STEPS;
  const key = `${input.ambientC}|${input.surface}|${input.characteristicLengthM}|${input.emissivity}`;
  let table = tables.get(key);
  if (!table) {
    table = new Float64Array(TABLE_STEPS + 1);
    for (let i = 0; i <= TABLE_STEPS; i++) {
      const rise = Math.max((i * du) ** 2, 1e-6);
      const t = tInf + rise;
      const hc = naturalConvectionCoefficient(input.surface, input.characteristicLengthM, t, tInf).coefficientWPerM2K;
      const hr = input.emissivity * STEFAN_BOLTZMANN * (t * t + tInf * tInf) * (t + tInf);
      table[i] = hc + hr;
    }
    if (tables.size >= MAX_TABLES) tables.delete(tables.keys().next().value!);
    tables.set(key, table);
  }
  const tab = table;
  const shape = (riseK: number): number => {
    const x = Math.sqrt(Math.max(riseK, 0)) / du;
    if (x >= TABLE_STEPS) return tab[TABLE_STEPS]!;
    const i = Math.floor(x);
    const f = x - i;
    return tab[i]! * (1 - f) + tab[i + 1]! * f;
  };
  return { kind: "natural", shape, surface: input.surface, characteristicLengthM: input.characteristicLengthM, emissivity: input.emissivity, emissivityNote: input.emissivityNote };
}

export const linearPath = (): SinkPath => ({ kind: "linear", shape: () => 1, surface: "vertical-plate", characteristicLengthM: 0, emissivity: 0, emissivityNote: "" });

/**
 * First-order response of a lumped capacity behind a constant resistance, heated from
 * ambient: θ(t) = P·R·(1 − e^(−t/(R·C))).
 */
export function firstOrderRise(heatW: number, r: number, c: number, tS: number): number {
  return heatW * r * -Math.expm1(-tS / (r * c));
}

/**
 * The rise at each time for resistance r and capacity c. The `natural` path is integrated
 * with the classical fourth-order Runge–Kutta scheme in steps of at most `maxStepS` (by
 * default 1/40 of R·C); `linear` uses the closed form.
 */
export function riseAt(path: SinkPath, heatW: number, r: number, c: number, timesS: ArrayLike<number>, out: Float64Array, maxStepS = (r * c) / 40): Float64Array {
  const n = timesS.length;
  if (path.kind === "linear") {
    for (let i = 0; i < n; i++) out[i] = firstOrderRise(heatW, r, c, timesS[i]!);
    return out;
  }
  const shape = path.shape;
  const k = 1 / (r * shape(heatW * r)); // G(θ) = k·shape(θ), so G(P·R)·P·R = P
  const invC = 1 / c;
  const f = (th: number) => (heatW - k * shape(th) * th) * invC;
  const hMax = maxStepS;
  let t = 0;
  let th = 0;
  for (let i = 0; i < n; i++) {
    const target = timesS[i]!;
    const span = target - t;
    if (span > 0) {
      const steps = Math.ceil(span / hMax);
      const h = span / steps;
      for (let s = 0; s < steps; s++) {
        const k1 = f(th);
        const k2 = f(th + 0.5 * h * k1);
        const k3 = f(th + 0.5 * h * k2);
        const k4 = f(th + h * k3);
        th += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
      }
      t = target;
    }
    out[i] = th;
  }
  return out;
}
