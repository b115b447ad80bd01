import { ApiError } from "@/lib/http/api-error";
import { heatCapacity, naturalConvection, radiationExchange, type Surface, type Trace, type TraceQuantity } from "@/lib/thermal";
import { leastSquares, studentT975, type LeastSquaresProblem } from "./least-squares";
import type { FitInput } from "./schema";
import { BENCH_CHARACTERISTIC_LENGTH_M, benchEmissivity, linearPath, naturalPath, riseAt, type PathKind, type SinkPath } from "./sink-model";

export interface FitRange {
  value: number;
  low: number;
  high: number;
}

export interface FitResult {
  sinkToAirKPerW: FitRange;
  heatCapacityJPerK: FitRange & { from: "fit" | "mass" };
  timeConstantS: number;
  rmsK: number;
  warnings: string[];
  trace: Trace;
  heatW: number;
  ambientC: number;
  /** Rise the sink would settle at with this heat: P·R. */
  steadyRiseK: number;
  model: PathKind;
  readingCount: number;
  /** The fitted warm-up, for charts: from the start to the last reading. */
  curve: { tS: number; tempC: number }[];
}

/** Below ambient by more than this with the heat on is a mistake, not noise (common practice: ±1 K is a hand thermometer's accuracy). */
const BELOW_AMBIENT_TOLERANCE_K = 1;
/** The least scatter any reading has: half a 0.1 K display step (common practice). */
const READING_FLOOR_K = 0.05;
/** Scatter assumed when the readings leave none to measure (as many readings as unknowns): a hand thermometer (common practice). */
const ASSUMED_SCATTER_K = 0.5;
const NOISY_RMS_K = 1;
const MAX_FITTED_KPERW = 1000;
const CURVE_POINTS = 120;
const DEFAULT_MATERIAL = "aluminium-6063-t5";

const q = (symbol: string, name: string, value: number, unit: string): TraceQuantity => ({ symbol, name, value, unit });
const fail = (message: string, path: string): never => {
  throw new ApiError("unprocessable:bench", message, path);
};
const fmtT = (s: number) => (s >= 120 ? `${+(s / 60).toFixed(2)} min` : `${+s.toFixed(2)} s`);

/** Heat into the sink: the watts given, or volts × amps × the emitter's heat fraction. */
export function benchHeatW(input: Pick<FitInput, "heatW" | "volts" | "amps" | "heatFraction">): number {
  return input.heatW ?? (input.volts ?? 0) * (input.amps ?? 0) * (input.heatFraction ?? 0);
}

function checkReadings(input: FitInput): void {
  const { readings, ambientC } = input;
  readings.forEach((r, i) => {
    const prev = readings[i - 1];
    if (prev && !(r.tS > prev.tS)) {
      fail(`Reading ${i + 1}: its time (${fmtT(r.tS)}) is not later than reading ${i}'s (${fmtT(prev.tS)}); times must increase.`, `readings[${i}].tS`);
    }
    if (r.tempC < ambientC - BELOW_AMBIENT_TOLERANCE_K) {
      fail(`Reading ${i + 1}: ${+r.tempC.toFixed(2)} °C is below the ambient ${+ambientC.toFixed(2)} °C, which cannot happen with the heat on; check the ambient and the thermometer.`, `readings[${i}].tempC`);
    }
  });
  if (readings.length < 2 && input.massKg === undefined) {
    fail("One reading is enough only with the sink's mass (the capacity then comes from the mass); give the mass or at least two readings.", "readings");
  }
  if (readings.every((r) => r.tS === 0)) fail("Reading 1: take the reading after the heat went on (a time above 0).", "readings[0].tS");
  const maxRise = Math.max(...readings.map((r) => r.tempC - ambientC));
  if (maxRise < 0.5) fail("The readings never rise above the ambient, so there is nothing to fit; check that the heat was on and the ambient is right.", "readings");
}

function surfaceOf(orientation: FitInput["orientation"]): Surface {
  return orientation === "lying" ? "horizontal-plate-up" : "vertical-plate";
}

/** Fits the sink-to-air resistance (and the heat capacity, unless it comes from the mass) to a warm-up. */
export function fitWarmUp(input: FitInput, options: { path?: PathKind } = {}): FitResult {
  checkReadings(input);
  const heatW = benchHeatW(input);
  const { ambientC, readings } = input;
  const n = readings.length;
  const times = Float64Array.from(readings, (r) => r.tS);
  const rises = Float64Array.from(readings, (r) => r.tempC - ambientC);
  const tLast = times[n - 1]!;
  const surface = surfaceOf(input.orientation);
  const em = benchEmissivity(input.material, input.finish);
  const path: SinkPath =
    options.path === "linear"
      ? linearPath()
      : naturalPath({ ambientC, surface, characteristicLengthM: BENCH_CHARACTERISTIC_LENGTH_M, emissivity: em.e, emissivityNote: em.note });

  const material = input.material ?? DEFAULT_MATERIAL;
  const massCapacity = input.massKg !== undefined ? heatCapacity({ massKg: input.massKg, materialId: material }) : undefined;
  // With the mass known and too few readings to separate R from C, C comes from the mass.
  const capacityFromMass = massCapacity !== undefined && n < 3;

  const maxRise = Math.max(...rises);
  const r0 = (Math.max(maxRise, 0.5) / heatW) * 1.1;
  let c0: number;
  if (massCapacity) c0 = massCapacity.heatCapacityJPerK;
  else {
    const i63 = rises.findIndex((th) => th >= 0.632 * maxRise);
    const tau0 = i63 > 0 && i63 < n - 1 ? Math.max(times[i63]!, 1) : Math.max(tLast, 1);
    c0 = tau0 / r0;
  }

  const rc = (x: Float64Array): [number, number] => [Math.exp(x[0]!), capacityFromMass ? c0 : Math.exp(x[1]!)];
  const problem: LeastSquaresProblem = {
    p: capacityFromMass ? 1 : 2,
    observed: rises,
    stepFor: (x) => {
      const [r, c] = rc(x);
      return (r * c) / 40;
    },
    model: (x, step, out) => {
      const [r, c] = rc(x);
      riseAt(path, heatW, r, c, times, out, step);
    },
  };
  const x0 = capacityFromMass ? Float64Array.of(Math.log(r0)) : Float64Array.of(Math.log(r0), Math.log(c0));
  const ls = leastSquares(problem, x0);
  const [r, c] = rc(ls.x);
  if (!ls.converged || !(r < MAX_FITTED_KPERW) || !Number.isFinite(c)) {
    fail("The warm-up does not pin the sink down: the readings still climb in a straight line. Run until the rise clearly slows (at least one time constant, often 15–30 minutes).", "readings");
  }

  const dof = n - problem.p;
  const rmsK = Math.sqrt(ls.ssr / n);
  const scatter = dof > 0 ? Math.max(Math.sqrt(ls.ssr / dof), READING_FLOOR_K) : ASSUMED_SCATTER_K;
  const tq = dof > 0 ? studentT975(dof) : 1.959964;
  const half = (j: number) => tq * scatter * Math.sqrt(ls.inverseNormal[j * problem.p + j]!);
  const range = (value: number, h: number): FitRange => {
    if (!Number.isFinite(h) || h > 50) fail("The readings cannot tell the sink's resistance and capacity apart; take readings over a longer part of the warm-up.", "readings");
    return { value, low: value * Math.exp(-h), high: value * Math.exp(h) };
  };
  const sinkToAirKPerW = range(r, half(0));
  const heatCapacityJPerK = capacityFromMass ? { value: c, low: c, high: c, from: "mass" as const } : { ...range(c, half(1)), from: "fit" as const };
  const timeConstantS = r * c;
  const steadyRiseK = heatW * r;

  const warnings: string[] = [];
  if (tLast < timeConstantS) {
    warnings.push(
      capacityFromMass
        ? `The reading was taken at ${fmtT(tLast)}, before one time constant (${fmtT(timeConstantS)}): the resistance leans on the capacity worked out from the mass. A reading after ${fmtT(2 * timeConstantS)} would settle it.`
        : `The run lasted ${fmtT(tLast)}, shorter than the sink's time constant (${fmtT(timeConstantS)}): the heat capacity is poorly pinned down and the resistance is an extrapolation. Run for about ${fmtT(2 * timeConstantS)}.`,
    );
  }
  if (rmsK > NOISY_RMS_K) warnings.push(`The readings scatter by ${rmsK.toFixed(1)} K (RMS) around the fitted warm-up: check the thermometer's contact with the sink and keep draughts off it.`);
  if (sinkToAirKPerW.high / sinkToAirKPerW.value > 1.25) warnings.push("The resistance is uncertain by more than 25 %: more readings, or a longer run, narrow it.");
  if (dof === 0) warnings.push(`As many readings as unknowns: the interval assumes each reading is good to ±${ASSUMED_SCATTER_K} K.`);
  if (massCapacity && !capacityFromMass) {
    const ratio = c / massCapacity.heatCapacityJPerK;
    if (ratio < 0.5 || ratio > 2) warnings.push(`The fitted heat capacity (${c.toFixed(0)} J/K) is far from what the mass gives (${massCapacity.heatCapacityJPerK.toFixed(0)} J/K): check the mass, the material, and whether the emitter's board and the clamp warm up with the sink.`);
  }

  const curveTimes = Float64Array.from({ length: CURVE_POINTS + 1 }, (_, i) => (tLast * i) / CURVE_POINTS);
  const curveRise = riseAt(path, heatW, r, c, curveTimes, new Float64Array(curveTimes.length));
  const curve = Array.from(curveTimes, (t, i) => ({ tS: t, tempC: ambientC + curveRise[i]! }));

  const trace = fitTrace({ input, heatW, path, r, c, timeConstantS, rmsK, scatter, tq, dof, sinkToAirKPerW, capacityFromMass, massCapacity, material, tLast, n });
  return { sinkToAirKPerW, heatCapacityJPerK, timeConstantS, rmsK, warnings, trace, heatW, ambientC, steadyRiseK, model: path.kind, readingCount: n, curve };
}

interface TraceArgs {
  input: FitInput;
  heatW: number;
  path: SinkPath;
  r: number;
  c: number;
  timeConstantS: number;
  rmsK: number;
  scatter: number;
  tq: number;
  dof: number;
  sinkToAirKPerW: FitRange;
  capacityFromMass: boolean;
  massCapacity: ReturnType<typeof heatCapacity> | undefined;
  material: string;
  tLast: number;
  n: number;
}

const LUMPED = 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., §5.3, lumped capacitance with a heat input (from memory — check against a copy for the equation number)';
const CONFIDENCE = 'Press, Teukolsky, Vetterling & Flannery, "Numerical Recipes", 3rd ed., §15.5 (nonlinear least squares) and §15.6 (confidence limits from s²·(JᵀJ)⁻¹) (from memory — check against a copy)';

function fitTrace(a: TraceArgs): Trace {
  const { path, heatW, r, input } = a;
  const ambientC = input.ambientC;
  const natural = path.kind === "natural";
  const equation = natural
    ? "C·dθ/dt = P − G(θ)·θ, θ(0) = 0; G(θ) = [h_c(θ) + ε·h_r(θ)] / (R·[h_c(P·R) + ε·h_r(P·R)]); R, C minimise Σ(θ_model(tᵢ) − θᵢ)²"
    : "θ(t) = P·R·(1 − e^(−t/(R·C))); R, C minimise Σ(θ_model(tᵢ) − θᵢ)²";
  const inputs = [
    q("P", "heat into the sink", heatW, "W"),
    q("T_a", "ambient", ambientC, "°C"),
    q("n", "readings", a.n, "1"),
    q("t_end", "last reading", a.tLast, "s"),
  ];
  if (input.volts !== undefined && input.amps !== undefined && input.heatFraction !== undefined) {
    inputs.push(q("V", "voltage", input.volts, "V"), q("I", "current", input.amps, "A"), q("f", "heat fraction of the emitter", input.heatFraction, "1"));
  }
  const notes = [
    "The sink is taken to start at ambient when the heat goes on (time 0) and to be one body at one temperature.",
    `R is the sink-to-air resistance at this run's conditions: ${heatW.toFixed(2)} W, ${ambientC.toFixed(1)} °C ambient, ${input.orientation ?? "upright"}, still air.`,
    `The 95 % intervals come from the residual scatter s = ${a.scatter.toFixed(3)} K and Student's t = ${a.tq.toFixed(3)} with ${a.dof} degrees of freedom (Abramowitz & Stegun, Handbook of Mathematical Functions, Table 26.10).`,
  ];
  if (a.capacityFromMass) notes.push("The heat capacity is not fitted: it comes from the mass and the material (C = m·c_p); only the resistance is fitted to the reading(s).");
  if (input.massKg !== undefined && input.material === undefined) notes.push(`Material not given: ${a.material} assumed for the specific heat.`);
  if (natural) notes.push(`How the conductance grows with the rise follows natural convection from a ${path.surface} of ${(path.characteristicLengthM * 1000).toFixed(0)} mm plus radiation; ${path.emissivityNote}.`);
  const parts: Trace[] = [];
  const tSteady = ambientC + heatW * r;
  if (natural) {
    parts.push(naturalConvection({ surface: path.surface, areaM2: 1, characteristicLengthM: path.characteristicLengthM, surfaceC: tSteady, fluidC: ambientC }).trace);
    parts.push(radiationExchange({ areaM2: 1, emissivity: path.emissivity, surfaceC: tSteady, surroundingsC: ambientC }).trace);
  }
  if (a.massCapacity) parts.push(a.massCapacity.trace);
  return {
    element: "bench-fit",
    formula: natural ? "Warm-up of a lumped heatsink with a natural-convection and radiation path, fitted by least squares" : "First-order warm-up of a lumped heatsink behind a constant resistance, fitted by least squares",
    equation,
    inputs,
    intermediates: [
      q("C", a.capacityFromMass ? "heat capacity (from the mass)" : "heat capacity (fitted)", a.c, "J/K"),
      q("τ", "time constant R·C", a.timeConstantS, "s"),
      q("θ_ss", "steady rise P·R", heatW * r, "K"),
      q("RMS", "misfit of the readings", a.rmsK, "K"),
      q("R_low", "resistance, 95 % low end", a.sinkToAirKPerW.low, "K/W"),
      q("R_high", "resistance, 95 % high end", a.sinkToAirKPerW.high, "K/W"),
    ],
    result: q("R", "sink-to-air resistance (fitted)", r, "K/W"),
    source: `${LUMPED}; fit and intervals: ${CONFIDENCE}`,
    notes,
    parts,
  };
}
