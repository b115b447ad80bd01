"use client";

import { useState } from "react";
import type { Trace } from "@/lib/thermal/trace";
import { formatTraceValue } from "@/lib/units/figures";
import { traceAt, useTraces, type TraceAt } from "./use-solve";

/** Expands a number into its trace: formula, inputs with units, result, source. */
export function TraceView({ trace, depth = 0 }: { trace: Trace; depth?: number }) {
  const at = traceAt(trace);
  if (at) return <TraceReadLater at={at} depth={depth} />;
  return (
    <div className={`space-y-1 text-xs ${depth > 0 ? "border-l border-line pl-3" : ""}`}>
      <div className="font-medium text-ink">{trace.formula}</div>
      <div className="font-mono text-ink-soft">{trace.equation}</div>
      {trace.inputs.length > 0 && (
        <ul className="grid grid-cols-[auto_1fr] gap-x-3 font-mono">
          {trace.inputs.concat(trace.intermediates).map((q, i) => (
            <li key={`${q.symbol}-${i}`} className="contents">
              <span>{q.symbol} = {formatTraceValue(q.value, q.unit)}</span>
              <span className="font-sans text-ink-soft">{q.name}</span>
            </li>
          ))}
        </ul>
      )}
      <div className="font-mono">→ {trace.result.symbol} = {formatTraceValue(trace.result.value, trace.result.unit)}</div>
      <div className="text-ink-soft">Source: {trace.source}</div>
      {trace.validity && (
        <div className={trace.validity.inRange ? "text-ink-soft" : "text-tight"}>
          Valid for {trace.validity.range}{trace.validity.inRange ? "" : " — used outside this range here"}
        </div>
      )}
      {trace.notes.map((n) => (
        <div key={n} className="text-ink-soft">Note: {n}</div>
      ))}
      {trace.parts.map((p, i) => (
        <TraceView key={i} trace={p} depth={depth + 1} />
      ))}
    </div>
  );
}

/** A trace the answer sent apart: its revision's traces are read (once for every number) when it is shown. */
function TraceReadLater({ at, depth }: { at: TraceAt; depth: number }) {
  const traces = useTraces(at);
  if (traces.isPending) return <div className="text-xs text-ink-soft">Reading the working…</div>;
  const trace = traces.data?.[at.index];
  if (!trace) return <div className="text-xs text-over">The working behind this number could not be read{traces.error ? `: ${traces.error.message}` : ""}. Reload the page to try again.</div>;
  return <TraceView trace={trace} depth={depth} />;
}

/** A figure with a "how" toggle that opens its trace (the trace is laid out once opened). */
export function Traceable({ label, trace }: { label: string; trace: Trace | null | undefined }) {
  const [open, setOpen] = useState(false);
  if (!trace) return <span>{label}</span>;
  return (
    <details className="group inline-block align-top" onToggle={(e) => setOpen(e.currentTarget.open)}>
      <summary className="cursor-pointer list-none underline decoration-dotted underline-offset-2 hover:text-ember">{label}</summary>
      {/* The derivation reads in plain ink even where the figure is coloured (over budget, tight). */}
      {open && (
        <div className="mt-2 max-w-xl rounded border border-line bg-white p-3 font-normal text-ink shadow-sm">
          <TraceView trace={trace} />
        </div>
      )}
    </details>
  );
}
