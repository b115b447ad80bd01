import { makeTrace, quantity, type Trace } from "@/lib/thermal";

/**
 * Traces of the electrical side and of the build-level figures are made with the engine's
 * own helpers, so the Budget screen expands every number the same way.
 */
export const q = quantity;
export const trace = makeTrace;
export type TraceSpec = Parameters<typeof makeTrace>[0];

/** A figure with its unit and its trace; value null when it cannot be worked out (a problem says why). */
export interface Traced {
  value: number | null;
  unit: string;
  trace: Trace;
}

export const traced = (t: Trace): Traced => ({ value: t.result.value, unit: t.result.unit, trace: t });

/** Series combination of element traces into one link trace (e.g. interface + spreading). */
export function seriesTrace(element: string, parts: Trace[], totalKPerW: number, notes: string[] = []): Trace {
  return trace({
    element,
    formula: "Resistances in series",
    equation: parts.length > 1 ? "R = " + parts.map((_, i) => `R${i + 1}`).join(" + ") : "R = R1",
    inputs: parts.map((p, i) => q(`R${i + 1}`, `${p.element}: ${p.formula}`, p.result.value, p.result.unit)),
    result: q("R", "resistance", totalKPerW, "K/W"),
    source: 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., §3.1.3 (the thermal circuit: resistances in series add)',
    notes,
    parts,
  });
}

/** N identical paths in parallel: the trace of one path, divided by N. */
export function scaledTrace(one: Trace, n: number): Trace {
  return trace({
    element: one.element,
    formula: `${n} identical paths in parallel`,
    equation: `R = R_one / ${n}`,
    inputs: [q("R_one", `${one.element}: ${one.formula}`, one.result.value, one.result.unit), q("N", "paths", n, "1")],
    result: q("R", "resistance", one.result.value / n, one.result.unit),
    source: 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., §3.1.3 (the thermal circuit: resistances in parallel)',
    parts: [one],
  });
}

/** Sources named once so every trace cites them the same way. */
export const SOURCES = {
  trade: "common practice (LED and Li-ion trade figures)",
  incropera: 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed.',
  iso13732: "ISO 13732-1:2006, Ergonomics of the thermal environment — hot surfaces, burn thresholds (values from memory of the figures; check against a copy)",
  ohm: "Joule's first law, P = I²·R (any physics textbook)",
  datasheet: "as entered by the part's author (datasheet, measurement or estimate, as the part's provenance says)",
  entered: "as entered by the build's author",
} as const;
