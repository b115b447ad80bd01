import { modeDrive, type DriverMode, type ModeDrive } from "@/lib/parts";
import type { Network, NetworkCheck } from "@/lib/thermal";
import { checkModeCurrents, deratingPoint } from "./checks";
import { runtime, type PackSummary } from "./electrical/pack";
import { limitsFor } from "./limits";
import { solveModePoint } from "./operating-point";
import type { ResolvedOptions } from "./options";
import type { ProblemList } from "./problems";
import type { ResolvedBuild } from "./resolved";
import { MAX_RUN_S, thermalResult, warmup, whatItTakes, type ThermalResult, type Warmup, type WhatItTakes } from "./scenario";
import type { Traced } from "./trace";

export interface ModeFigures {
  /** The mode's figure as the maker entered it (delivered to the emitters, or drawn from the battery). */
  entered: ModeDrive;
  currentPerEmitterA: number;
  ledCurrentA: number;
  vf: Traced;
  emitterPower: Traced;
  emitterHeat: Traced;
  /** Flux per emitter at the operating Tj; null when the emitter has no efficacy. */
  fluxPerEmitter: Traced | null;
  totalFluxLm: number | null;
  relativeFluxAtTj: number;
  driveW: number;
  driverLoss: Traced;
  driverEfficiency: number;
  driverInputW: number;
  packCurrentA: number | null;
  cellCurrentA: number | null;
  cellHeat: Traced | null;
  runtime: Traced | null;
  protectionTripA: number | null;
}

export interface Derating {
  fluxVsTj: { points: readonly { x: number; y: number }[]; operating: { tjC: number; relativeFlux: number } } | null;
  emitterCurrentVsTemperature: (ReturnType<typeof deratingPoint> & { points: readonly { x: number; y: number }[]; temperatureNode: string }) | null;
  driverCurrentVsTemperature: (ReturnType<typeof deratingPoint> & { points: readonly { x: number; y: number }[]; temperatureNode: string }) | null;
}

export interface ScenarioResult {
  id: string;
  kind: "mode" | "charging";
  name: string;
  /** Index of the mode in the driver part; null for charging. */
  modeIndex: number | null;
  converged: boolean;
  iterations: number;
  network: Network | null;
  thermal: ThermalResult | null;
  warmup: Warmup | null;
  whatItTakes: WhatItTakes | null;
  derating: Derating | null;
  mode: ModeFigures | null;
  charging: ChargingFigures | null;
}

export interface ChargingFigures {
  chargerLoss: Traced;
  cellHeat: Traced;
  chargeCurrentA: number;
}

/** A mode given on the battery side needs a pack (for a current) within the driver's input range; says why not. */
function batterySideReady(build: ResolvedBuild, mode: DriverMode, field: string, pack: PackSummary | null, problems: ProblemList): boolean {
  const drive = modeDrive(mode);
  if (drive.side !== "battery") return true;
  if (!pack) {
    if (drive.quantity === "current") {
      problems.add(field, `mode "${mode.name}" is given as current drawn from the battery: add the cells to the build so its power can be worked out`);
      return false;
    }
    return true;
  }
  const d = build.driver.part;
  const v = pack.nominalVoltage.value ?? 0;
  if (d && (v < d.specs.inputVoltageMinV || v > d.specs.inputVoltageMaxV)) {
    problems.add(field, `mode "${mode.name}" is given as drawn from the battery, but the pack's ${v.toFixed(2)} V is outside the driver's input range ${d.specs.inputVoltageMinV.toFixed(2)}–${d.specs.inputVoltageMaxV.toFixed(2)} V`);
    return false;
  }
  return true;
}

/** `check`: the evaluation's schema check of its networks (see NetworkCheck). */
export function runMode(build: ResolvedBuild, mode: DriverMode, index: number, pack: PackSummary | null, o: ResolvedOptions, problems: ProblemList, check: NetworkCheck): ScenarioResult {
  const field = `driver.modes[${index}]`;
  const base: ScenarioResult = { id: `mode:${mode.name}`, kind: "mode", name: mode.name, modeIndex: index, converged: false, iterations: 0, network: null, thermal: null, warmup: null, whatItTakes: null, derating: null, mode: null, charging: null };
  if (!batterySideReady(build, mode, field, pack, problems)) return base;
  const op = solveModePoint(build, mode, field, pack, o, problems, check);
  if (!op) return base;
  const el = op.electrical;
  const n = build.lightEngine.count;
  checkModeCurrents(build, index, mode.name, el.emitter.currentA, el.packCurrentA, problems);
  const defs = limitsFor(build, op.compiled, op.steady, false, problems);
  const thermal = thermalResult(op.compiled, op.steady, defs, o);
  const tjC = op.steady.temperaturesC.junction ?? build.environment.ambientC;
  const e = build.lightEngine.emitter!;
  const d = build.driver.part!;
  const tSp = op.steady.temperaturesC.solder ?? tjC;
  const tDrv = op.steady.temperaturesC.driver;
  const emitterDerate = deratingPoint(e.curves.currentVsTemperature?.points, tSp, el.emitter.currentA);
  const driverDerate = tDrv !== undefined ? deratingPoint(d.curves.currentVsTemperature?.points, tDrv, el.ledCurrentA) : null;
  if (emitterDerate && !emitterDerate.ok) problems.add(field, `mode "${mode.name}": ${el.emitter.currentA.toFixed(2)} A per emitter is above the ${emitterDerate.allowedA.toFixed(2)} A its derating curve allows at ${tSp.toFixed(0)} °C (solder point)`, "warning");
  if (driverDerate && !driverDerate.ok) problems.add(field, `mode "${mode.name}": the driver's derating curve allows ${driverDerate.allowedA.toFixed(2)} A at ${tDrv?.toFixed(0)} °C`, "warning");
  const flux = el.emitter.traces.flux;
  const cellI = el.packCurrentA !== null ? el.packCurrentA / build.pack.parallel : null;
  const figures: ModeFigures = {
    entered: modeDrive(mode),
    currentPerEmitterA: el.emitter.currentA,
    ledCurrentA: el.ledCurrentA,
    vf: el.emitter.traces.vf,
    emitterPower: el.emitter.traces.power,
    emitterHeat: el.emitter.traces.heat,
    fluxPerEmitter: flux,
    totalFluxLm: el.emitter.fluxLm !== null ? n * el.emitter.fluxLm : null,
    relativeFluxAtTj: el.emitter.relativeFluxTj,
    driveW: el.outputW,
    driverLoss: el.driver.lossW,
    driverEfficiency: el.driver.efficiency,
    driverInputW: el.driver.inputW,
    packCurrentA: el.packCurrentA,
    cellCurrentA: cellI,
    cellHeat: el.cellHeat,
    runtime: pack && el.packCurrentA !== null ? runtime(pack, el.packCurrentA) : null,
    protectionTripA: build.pack.protection?.specs.overCurrentTripA ?? null,
  };
  const wrap = (pts: readonly { x: number; y: number }[] | undefined, p: ReturnType<typeof deratingPoint>, node: string) => (pts && p ? { ...p, points: pts, temperatureNode: node } : null);
  return {
    ...base,
    converged: op.converged,
    iterations: op.iterations,
    network: op.compiled.network,
    thermal,
    // Each mode warms up until it settles or the pack is empty (12 h at most; without a pack, until it settles).
    warmup: o.skipWarmup ? null : warmup(op.compiled.network, op.steady, thermal.limits, figures.runtime?.value ? figures.runtime.value * 3600 : MAX_RUN_S, "pack-empty", o, field, problems),
    whatItTakes: o.skipWhatItTakes ? null : whatItTakes(op.compiled, op.steady, thermal.limits, el.outputW, o, field, problems),
    derating: {
      fluxVsTj: e.curves.fluxVsTj ? { points: e.curves.fluxVsTj.points, operating: { tjC, relativeFlux: el.emitter.relativeFluxTj } } : null,
      emitterCurrentVsTemperature: wrap(e.curves.currentVsTemperature?.points, emitterDerate, "solder"),
      driverCurrentVsTemperature: wrap(d.curves.currentVsTemperature?.points, driverDerate, "driver"),
    },
    mode: figures,
  };
}

