import { modeDrive, type DriverMode } from "@/lib/parts";
import { isThermalInputError, solveSteady, type NetworkCheck, type SteadyResult } from "@/lib/thermal";
import { compileBuild, sinkLinks, type CompiledBuild, type ScenarioHeat } from "./compile";
import { declaredRise } from "./compile/heatsink";
import { pathResistance } from "./inverse";
import { driverAt, type DriverPoint } from "./electrical/driver";
import { currentForPower, emitterAt, type EmitterPoint } from "./electrical/emitter";
import { cellHeat, type PackSummary } from "./electrical/pack";
import type { ResolvedOptions } from "./options";
import type { ProblemList } from "./problems";
import type { ResolvedBuild, ResolvedPart } from "./resolved";
import type { Traced } from "./trace";

export interface ModeElectrical {
  emitter: EmitterPoint;
  /** Current the driver delivers (per emitter × N in parallel wiring). */
  ledCurrentA: number;
  outputW: number;
  driver: DriverPoint;
  packCurrentA: number | null;
  cellHeat: Traced | null;
}

export interface OperatingPoint {
  converged: boolean;
  iterations: number;
  electrical: ModeElectrical;
  compiled: CompiledBuild;
  steady: SteadyResult;
  heat: ScenarioHeat;
}

/**
 * Power the driver delivers to the emitters for a mode given on the battery side: η·P_battery,
 * with P_battery = I·V at the pack's nominal voltage for a current; null without a pack to
 * give that voltage. For a mode given on the output side: null.
 */
export function batterySideOutputW(mode: DriverMode, pack: PackSummary | null): number | null {
  const drive = modeDrive(mode);
  if (drive.side !== "battery") return null;
  const v = pack?.nominalVoltage.value ?? null;
  const inputW = drive.quantity === "power" ? drive.value : v !== null ? drive.value * v : null;
  return inputW === null ? null : inputW * mode.efficiency;
}

/** Electrical state of a mode at a junction temperature. */
export function modeElectrical(build: ResolvedBuild, e: ResolvedPart<"emitter">, d: ResolvedPart<"driver">, mode: DriverMode, pack: PackSummary | null, tjC: number): ModeElectrical {
  const n = build.lightEngine.count;
  const parallel = build.lightEngine.wiring === "parallel";
  // A mode drawn from the battery holds a power into the emitters (η·P_battery), like a regulated output power.
  const outW = mode.outputPowerW ?? batterySideOutputW(mode, pack) ?? 0;
  const perEmitter = mode.outputCurrentA !== undefined ? (parallel ? mode.outputCurrentA / n : mode.outputCurrentA) : currentForPower(e, n, outW, tjC);
  const ep = emitterAt(e, perEmitter, tjC);
  // A regulated power holds the heat steady as Vf moves; a regulated current lets it fall.
  if (mode.outputCurrentA === undefined) ep.heatPerKelvin = 0;
  const ledCurrent = parallel ? perEmitter * n : perEmitter;
  const outputW = n * ep.powerW;
  const dp = driverAt(d, mode, outputW, ledCurrent);
  const v = pack?.nominalVoltage.value ?? null;
  const packCurrent = pack && v ? dp.inputW / v : null;
  return { emitter: ep, ledCurrentA: ledCurrent, outputW, driver: dp, packCurrentA: packCurrent, cellHeat: pack && packCurrent !== null ? cellHeat(pack, packCurrent) : null };
}

/** Steady solve that turns engine errors into a problem; with `check`, the network is first checked against its schema. */
export function trySteady(compiled: CompiledBuild, field: string, problems: ProblemList, check: NetworkCheck | null, startC?: Readonly<Record<string, number>>): SteadyResult | null {
  if (check) {
    const i = check.firstIssue(compiled.network);
    if (i) {
      problems.add(field, `the heat path could not be built: ${i.path.join(".")}: ${i.message}`);
      return null;
    }
  }
  try {
    return solveSteady(compiled.network, undefined, startC);
  } catch (err) {
    if (isThermalInputError(err)) {
      problems.add(field, `no steady state: ${err.message}`);
      return null;
    }
    throw err;
  }
}

/**
 * Junction temperature, emitter power and flux solved together: the emitter's heat enters
 * the network with its slope ∂P/∂Tj (Vf falls as it warms), the network answers a Tj, the
 * electrical side is re-evaluated there (curves, driver loss, cell heat, spreading
 * boundary) until Tj moves less than the tolerance.
 */
export function solveModePoint(build: ResolvedBuild, mode: DriverMode, field: string, pack: PackSummary | null, o: ResolvedOptions, problems: ProblemList, check: NetworkCheck): OperatingPoint | null {
  const e = build.lightEngine.emitter;
  const d = build.driver.part;
  if (!e || !d) return null;
  let tj = build.environment.ambientC;
  let sinkR: number | null = null;
  let sinkRise: number | null = null;
  let risePass: { used: number; gave: number } | null = null;
  let last: { el: ModeElectrical; compiled: CompiledBuild; steady: SteadyResult; heat: ScenarioHeat } | null = null;
  for (let k = 1; k <= o.maxIterations; k++) {
    const el = modeElectrical(build, e, d, mode, pack, tj);
    const heat: ScenarioHeat = {
      junctionW: build.lightEngine.count * el.emitter.heatW,
      junctionWPerK: build.lightEngine.count * el.emitter.heatPerKelvin,
      junctionRefC: tj,
      driverW: el.driver.lossW.value ?? 0,
      cellsW: el.cellHeat?.value ?? 0,
      chargerW: 0,
    };
    // A declared rating's correction needs the sink's rise: start from the junction's heat through the rating (the driver's heat does not pass the sink).
    if (sinkRise === null) sinkRise = declaredRise.start(build.lightEngine.heatsink?.specs, heat.junctionW);
    const compiled = compileBuild(build, heat, { sinkToAirKPerW: sinkR ?? null, sinkRiseK: sinkRise }, problems);
    if (!compiled) return null;
    if (sinkR === null) sinkR = compiled.sinkEstimateKPerW;
    // Each pass changes the network a little: the last answer is a close start.
    const steady = trySteady(compiled, field, problems, k === 1 ? check : null, last?.steady.temperaturesC);
    if (!steady) return null;
    const tjNew = steady.temperaturesC.junction ?? tj;
    const newSinkR: number | null = compiled.sinkLink !== null ? pathResistance(compiled.network, steady, sinkLinks(compiled)) : sinkR;
    last = { el, compiled, steady, heat };
    const riseBefore: number | null = sinkRise;
    // Only a declared rating depends on the rise (its correction); a geometry sink's model follows it by itself.
    const declared = build.lightEngine.heatsink?.specs.rating === "declared";
    let riseMoved = 0;
    if (compiled.sinkLink !== null) {
      const gave = declaredRise.at(compiled.network, steady.temperaturesC, compiled.sinkLink);
      riseMoved = !declared ? 0 : declaredRise.moved(riseBefore, gave);
      sinkRise = riseBefore !== null ? declaredRise.next(build.lightEngine.heatsink?.specs, risePass, riseBefore, gave) : gave;
      if (riseBefore !== null) risePass = { used: riseBefore, gave };
    }
    const moved = Math.abs(tjNew - tj);
    const sinkMoved = sinkR !== null && newSinkR !== null ? Math.abs(newSinkR - sinkR) / sinkR : 0;
    tj = tjNew;
    sinkR = newSinkR;
    if (moved < o.toleranceK && sinkMoved < 1e-3 && riseMoved < declaredRise.tolerance) {
      // Re-evaluate the electrical side at the converged Tj so every figure belongs to it.
      return { converged: true, iterations: k, electrical: modeElectrical(build, e, d, mode, pack, tj), compiled, steady, heat };
    }
  }
  if (!last) return null;
  problems.add(field, `junction temperature, Vf and power did not settle in ${o.maxIterations} iterations; figures are from the last one`, "warning");
  return { converged: false, iterations: o.maxIterations, electrical: modeElectrical(build, e, d, mode, pack, tj), compiled: last.compiled, steady: last.steady, heat: last.heat };
}
