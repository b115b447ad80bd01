/**
 * An explanation trace: what a person reading a worked example or a review needs to
 * check one number by hand — the formula by name, every input with its unit, the result
 * and the published source the formula follows.
 */
export interface TraceQuantity {
  symbol: string;
  name: string;
  value: number;
  unit: string;
}

export interface TraceValidity {
  /** The range the source states, in words (e.g. "10⁴ ≤ Ra ≤ 10⁷, Pr ≥ 0.7"). */
  range: string;
  inRange: boolean;
}

export interface Trace {
  element: string;
  formula: string;
  /** The equation as a reader would write it, with the symbols used in `inputs`. */
  equation: string;
  inputs: TraceQuantity[];
  intermediates: TraceQuantity[];
  result: TraceQuantity;
  source: string;
  validity?: TraceValidity;
  notes: string[];
  /** Sub-models combined into this one (e.g. the parts of a finned heatsink). */
  parts: Trace[];
}

/** What every element helper returns: the value in both forms and its trace. */
export interface ElementResult {
  kelvinPerWatt: number;
  conductanceWPerK: number;
  trace: Trace;
}

export const quantity = (symbol: string, name: string, value: number, unit: string): TraceQuantity => ({
  symbol,
  name,
  value,
  unit,
});

export function makeTrace(t: Omit<Trace, "intermediates" | "notes" | "parts"> & Partial<Pick<Trace, "intermediates" | "notes" | "parts">>): Trace {
  return { intermediates: [], notes: [], parts: [], ...t };
}

/** Resistance and conductance of one element, never Infinity: a zero conductance is reported as a huge resistance. */
export function elementResult(conductanceWPerK: number, trace: Trace): ElementResult {
  const g = Math.max(conductanceWPerK, 1e-300);
  return { conductanceWPerK: conductanceWPerK, kelvinPerWatt: Math.min(1 / g, Number.MAX_VALUE), trace };
}

/**
 * Where a trace stands in a result sent without its traces: the index of the trace in the list
 * sent apart (the working behind a number is read when a reader opens it).
 */
export interface TraceRef {
  traceRef: number;
}

/** A trace, told by its shape (what every trace carries): an element, a formula, inputs, a result and a source. */
export function isTrace(value: unknown): value is Trace {
  if (value === null || typeof value !== "object" || Array.isArray(value)) return false;
  const t = value as Partial<Record<keyof Trace, unknown>>;
  return typeof t.element === "string" && typeof t.formula === "string" && typeof t.source === "string" && Array.isArray(t.inputs) && t.result !== null && typeof t.result === "object";
}

export function isTraceRef(value: unknown): value is TraceRef {
  return value !== null && typeof value === "object" && typeof (value as Partial<TraceRef>).traceRef === "number" && Object.keys(value).length === 1;
}
