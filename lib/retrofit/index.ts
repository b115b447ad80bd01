/**
 * Sinkwise build compiler: a retrofit design → its parts → a thermal network per scenario
 * → results mapped back to named places. Pure (no I/O). This file is the only public entry.
 */
export {
  buildDesignSchema,
  lightEngineSchema,
  driverSlotSchema,
  packSchema,
  environmentSchema,
  mountSchema,
  driverCoolingSchema,
  boardSchema,
  reflectorSchema,
  housingShapeSchema,
  costsSchema,
  CONTACT_CLASSES,
  SLOT_KINDS,
  type BuildDesign,
  type BuildDesignInput,
  type Slot,
  type Mount,
  type DriverCooling,
  type ContactClass,
  type Environment,
} from "./design-schema";
export type { ResolvedBuild, ResolvedPart, ResolvedCurves, ResolvedMount, ResolvedCooling } from "./resolved";
export { resolveBuild, type PartLookup, type ResolveOutcome } from "./resolve";
export { compileBuild, type CompiledBuild, type ScenarioHeat, type CompileState } from "./compile";
export { PLACES, type NodePlace, type LinkPlace } from "./compile/builder";
export { evaluateBuild, EVALUATION_VERSION, type BuildEvaluation, type ModeSummary } from "./evaluate";
export type { EvaluateOptions } from "./options";
export type { ScenarioResult, ModeFigures, ChargingFigures, Derating } from "./scenario-mode";
export type { ThermalResult, LinkResult, LadderStep, Warmup, WhatItTakes } from "./scenario";
export { VERDICTS, verdictFor, type Verdict, type LimitResult } from "./limits";
export { TOUCH_THRESHOLDS_C, touchLimit } from "./touch";
export type { Caution } from "./cautions";
export type { CostSummary, CostLine } from "./costs";
export type { PackSummary } from "./electrical/pack";
export type { ChargePlan } from "./electrical/charger";
export { chargePlan, taperHours, CV_TIME_CONSTANT_H, TERMINATION_C_RATE, DEFAULT_REGULATION_C } from "./electrical/charger";
export { emitterAt, vfAt } from "./electrical/emitter";
export type { Problem, Severity } from "./problems";
export type { Traced } from "./trace";
export { quickCheck, quickCheckInputSchema, QUICK_CHECK_DEFAULT_MAX_TJ_C, type QuickCheckInput, type QuickCheckResult } from "./quick-check";
