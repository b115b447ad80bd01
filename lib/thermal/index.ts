/**
 * Sinkwise thermal engine: network JSON v1 in, temperatures out, every element traced.
 * Pure TypeScript, no I/O. This file is the only public entry.
 */
export {
  networkSchema,
  transientRequestSchema,
  nodeSchema,
  linkSchema,
  sourceSchema,
  surfaceSchema,
  thresholdSchema,
  type Network,
  type NetworkInput,
  type NetworkNode,
  type NetworkLink,
  type LinkType,
  type HeatSource,
  type Surface,
  type FinnedHeatsinkLink,
  type Threshold,
  type TransientRequest,
  type TransientOptions,
} from "./schema";
export { NetworkCheck, type NetworkIssue } from "./network-check";
export { ThermalInputError, isThermalInputError, type ThermalErrorCode } from "./errors";
export { AMBIENT_ID } from "./ids";
export { STEFAN_BOLTZMANN, STANDARD_GRAVITY, ZERO_CELSIUS_K, NETWORK_LIMITS, toKelvin, toCelsius } from "./constants";
export { solveSteady, steadyTemperatures, sourceSweep, type SteadyResult, type SteadyLinkResult } from "./solve-steady";
export type { SteadyOptions } from "./solver/steady";
export { solveTransient, prepareTransient, type PreparedTransient, type TransientResult, type Crossing, type TransientSolverSettings } from "./solve-transient";
export { makeTrace, quantity, elementResult, isTrace, isTraceRef, type Trace, type TraceRef, type TraceQuantity, type TraceValidity, type ElementResult } from "./trace";
export { airPropertiesAt, type AirProperties } from "./air-properties";
export { MATERIALS, getMaterial, emissivityFor, type Material, type Finish } from "./materials";
export {
  declaredResistance,
  conductionResistance,
  convectionResistance,
  interfaceLayer,
  strapResistance,
  heatCapacity,
  type InterfaceInput,
  type HeatCapacityInput,
} from "./elements/basic";
export { naturalConvection, naturalConvectionCoefficient, rayleighNumber, type NaturalConvectionInput, type NaturalConvectionCoefficient } from "./elements/natural-convection";
export { radiationExchange, type RadiationInput } from "./elements/radiation";
export { finEfficiency, type FinEfficiency, type FinEfficiencyInput } from "./elements/fin";
export { finnedHeatsink, evaluateFinnedHeatsink, finnedHeatsinkConductance, finnedEnvelopeAreaM2, type FinnedHeatsinkGeometry, type FinnedHeatsinkEvaluation } from "./elements/heatsink";
export { spreadingResistance, type SpreadingInput, type SpreadingResult } from "./elements/spreading";
export {
  maxSourcePower,
  maxLinkResistance,
  monotoneRoot,
  requiredLinkResistance,
  pathResistance,
  maxCommonScale,
  SINK_RANGE_KPERW,
  type ResistanceAnswer,
  type ScaleAnswer,
  type Root,
  type LimitTarget, type MaxPowerOptions, type MaxPowerResult, type MaxResistanceOptions, type MaxResistanceResult } from "./inverse";
export { extend, setEntry } from "./record";
export { breakdownRise, type RiseBreakdown, type RiseStep } from "./breakdown";
export { explainLinks, traceLink } from "./explain";
