/**
 * Calibrating a build to a bench run of the finished lamp: the one least certain figure of
 * its model (a declared sink rating, the inside air's coefficient, or the housing's outside
 * convection) is multiplied by the factor that brings the predicted warm-up closest to the
 * readings, by least squares over every reading at a place the model has. Pure: the caller
 * hands in the resolved build.
 */
import { evaluateBuild, type ResolvedBuild } from "@/lib/retrofit";
import { CALIBRATION_LABELS } from "@/lib/retrofit/compile/calibration";
import type { Calibration, CalibrationParameter } from "@/lib/retrofit/design-schema";
import { holdAgainst, type HoldResult } from "./hold";
import { studentT975 } from "./least-squares";

export interface ParameterChoice {
  parameter: CalibrationParameter;
  /** "the inside air's coefficient" */
  name: string;
  /** Why this one, in a sentence. */
  why: string;
}

/**
 * The figure of a build its model is least sure of, in order: a declared sink rating that
 * was not measured (sellers rate with a fan or at a large rise), then the convection of the
 * air shut inside a sealed housing (open-plate correlations stand in for a closed cavity),
 * then the housing's convection to the air outside. Null without a housing.
 */
export function leastCertainParameter(build: ResolvedBuild, o: { sinkMeasured: boolean }): ParameterChoice | null {
  const sink = build.lightEngine.heatsink;
  const choice = (parameter: CalibrationParameter, why: string): ParameterChoice => ({ parameter, name: CALIBRATION_LABELS[parameter].name, why });
  if (!build.housing) return null;
  if (sink && sink.specs.rating === "declared" && !o.sinkMeasured) {
    return choice("sink-rating", "A heatsink's stated rating is the least certain figure of this build: sellers often rate with a fan or at a larger rise than a lamp sees (common practice).");
  }
  if (build.housing.specs.enclosure === "sealed") {
    return choice("inside-air", `The heatsink is ${o.sinkMeasured ? "measured" : "worked out from its geometry"}; the least certain figure left is the convection of the air shut inside the housing, which the model takes from correlations for open plates (common practice).`);
  }
  return choice("outside-air", `The heatsink is ${o.sinkMeasured ? "measured" : "worked out from its geometry"} and the housing is vented; the least certain figure left is the housing's convection to the air outside (common practice).`);
}

export interface CalibrationRun {
  id: string;
  title: string;
  ambientC: number;
  /** The driver mode the run was made in; the highest mode when not given. */
  mode?: string;
  readings: readonly { tS: number; tempC: number; place: string }[];
}

export interface CalibrationResult {
  choice: ParameterChoice;
  mode: string;
  /** The factor on the conductance of the parameter's links, with its 95 % interval (null ends: not bounded by the run). */
  factor: number;
  low: number | null;
  high: number | null;
  readingCount: number;
  places: string[];
  rmsBeforeK: number;
  rmsAfterK: number;
  /** The factor sits at an end of the searched range: the figure cannot explain the gap. */
  atEdge: boolean;
  /** The hold at the fitted factor (measured against the calibrated prediction). */
  after: HoldResult;
  evaluations: number;
  warnings: string[];
  /** What goes into the revision's design when it is saved. */
  calibration: Calibration;
}

/** Searched range of the factor: a figure off by more than five times is not a calibration but a wrong model. */
export const FACTOR_RANGE = [0.2, 5] as const;
const TOL = 0.005;
const CURVATURE_STEP = 0.05;
const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Sum of squares over the readings at places the model has, at one factor; null when the build cannot be worked out. */
function misfitAt(build: ResolvedBuild, run: CalibrationRun, mode: string, calibration: Calibration | undefined): { hold: HoldResult; sumSq: number; count: number } | null {
  const b: ResolvedBuild = { ...build, ...(calibration ? { calibration } : {}) };
  const evaluation = evaluateBuild(b, { skipWhatItTakes: true });
  const scenario = evaluation.scenarios.find((s) => s.kind === "mode" && s.name === mode);
  if (!scenario?.warmup || !scenario.thermal) return null;
  const hold = holdAgainst({ readings: run.readings, runAmbientC: run.ambientC, modelAmbientC: run.ambientC, nodes: scenario.thermal.nodes, warmup: scenario.warmup });
  let sumSq = 0;
  let count = 0;
  for (const p of hold.places) {
    sumSq += p.rmsK * p.rmsK * p.readingCount;
    count += p.readingCount;
  }
  return { hold, sumSq, count };
}

/**
 * Fits the factor of the build's least certain figure to the run. The build is worked out at
 * the run's ambient, in the run's mode only. Throws a plain Error (for the caller to word)
 * when there is nothing to fit.
 */
export function calibrateBuild(input: { build: ResolvedBuild; run: CalibrationRun; sinkMeasured: boolean }): CalibrationResult {
  const { run } = input;
  const choice = leastCertainParameter(input.build, { sinkMeasured: input.sinkMeasured });
  if (!choice) throw new CalibrationError("The build has no housing, so there is no heat path to calibrate.");
  // Any earlier calibration is replaced: the fit starts from the model as it stands without it.
  const { calibration: previous, ...uncalibrated } = input.build;
  const base: ResolvedBuild = { ...uncalibrated, environment: { ...input.build.environment, ambientC: run.ambientC } };
  const modes = input.build.driver.part?.specs.modes.map((m) => m.name) ?? [];
  const mode = modes.find((m) => run.mode !== undefined && m.toLowerCase() === run.mode.toLowerCase()) ?? modes[modes.length - 1];
  if (!mode) throw new CalibrationError("The build has no driver mode to compare the run with.");
  const build: ResolvedBuild = { ...base, driver: { ...base.driver, selectedModes: [mode] } };
  let evaluations = 0;
  const template = (factor: number, extra?: Partial<Calibration>): Calibration => ({ parameter: choice.parameter, factor, low: null, high: null, run: { id: run.id, title: run.title }, readingCount: 0, rmsBeforeK: 0, rmsAfterK: 0, ...extra });
  const at = (factor: number) => {
    evaluations++;
    return misfitAt(build, run, mode, template(factor));
  };
  const before = (() => {
    evaluations++;
    return misfitAt(build, run, mode, previous);
  })();
  if (!before) throw new CalibrationError("The build's warm-up cannot be worked out in this mode, so there is nothing to hold the run against.");
  if (before.count === 0) throw new CalibrationError(`None of the run's readings is at a place the model has (${before.hold.unmatched.join(", ")}); name the places as the Budget does, e.g. "heatsink", "housing wall", "driver board".`);
  if (before.count < 2) throw new CalibrationError("Only one reading is at a place the model has: a calibration needs at least two.");

  // Golden-section search on ln(factor): the misfit is smooth and has one minimum in the range.
  const s = (x: number) => at(Math.exp(x))?.sumSq ?? Number.POSITIVE_INFINITY;
  let a = Math.log(FACTOR_RANGE[0]);
  let b = Math.log(FACTOR_RANGE[1]);
  let c = b - GOLDEN * (b - a);
  let d = a + GOLDEN * (b - a);
  let sc = s(c);
  let sd = s(d);
  while (b - a > TOL) {
    if (sc <= sd) {
      b = d;
      d = c;
      sd = sc;
      c = b - GOLDEN * (b - a);
      sc = s(c);
    } else {
      a = c;
      c = d;
      sc = sd;
      d = a + GOLDEN * (b - a);
      sd = s(d);
    }
  }
  const x0 = (a + b) / 2;
  const best = at(Math.exp(x0));
  if (!best) throw new CalibrationError("The build's warm-up cannot be worked out at the fitted factor.");
  const atEdge = x0 - Math.log(FACTOR_RANGE[0]) < 2 * TOL || Math.log(FACTOR_RANGE[1]) - x0 < 2 * TOL;

  // The interval from the misfit's curvature in ln(factor): var ≈ 2·s² / S'' with s² = S/(n − 1).
  const warnings: string[] = [];
  const n = best.count;
  const sPlus = s(x0 + CURVATURE_STEP);
  const sMinus = s(x0 - CURVATURE_STEP);
  const curvature = (sPlus + sMinus - 2 * best.sumSq) / (CURVATURE_STEP * CURVATURE_STEP);
  let low: number | null = null;
  let high: number | null = null;
  if (Number.isFinite(curvature) && curvature > 1e-9 && n > 1) {
    const sd = Math.sqrt((2 * (best.sumSq / (n - 1))) / curvature);
    const half = studentT975(n - 1) * sd;
    if (half < 5) {
      low = Math.exp(x0 - half);
      high = Math.exp(x0 + half);
    }
  }
  if (low === null) warnings.push(`The run does not pin ${choice.name} down: the readings fit about as well over a wide range of it. A longer run, or readings at more places, would.`);
  if (atEdge) warnings.push(`The best factor is at the end of the range tried (×${FACTOR_RANGE[0]} to ×${FACTOR_RANGE[1]}): the model misses the lamp by more than ${choice.name} can explain. Check the places the readings were taken and the build's parts before calibrating.`);
  const rmsBeforeK = Math.sqrt(before.sumSq / before.count);
  const rmsAfterK = Math.sqrt(best.sumSq / n);
  const factor = Math.exp(x0);
  return {
    choice,
    mode,
    factor,
    low,
    high,
    readingCount: n,
    places: best.hold.places.map((p) => p.place),
    rmsBeforeK,
    rmsAfterK,
    atEdge,
    after: best.hold,
    evaluations,
    warnings,
    calibration: template(factor, { low, high, readingCount: n, rmsBeforeK, rmsAfterK }),
  };
}

const f2 = (x: number) => x.toFixed(2);

/** The note of a calibrated revision: the run, the figure, the factor with its interval and the misfit before and after. */
export function calibrationRevisionNote(runTitle: string, result: CalibrationResult): string {
  const low = result.low ?? result.factor;
  const note = `Calibrated to the bench run “${runTitle}”: ${result.choice.name} × ${f2(result.factor)} (95 % ${f2(low)}–${f2(result.high ?? result.factor)}), misfit ${result.rmsBeforeK.toFixed(1)} K → ${result.rmsAfterK.toFixed(1)} K over ${result.readingCount} readings.`;
  return note.slice(0, 500);
}

/** Nothing to calibrate: the message says why, in words for the person who asked. */
export class CalibrationError extends Error {}
