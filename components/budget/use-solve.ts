"use client";

import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import { isTraceRef, type Trace } from "@/lib/thermal/trace";
import type { RevisionSolve, RevisionTraces } from "@/server/builds/solve";

/** The solve route's answer, typed from the function that builds it. */
export type SolveAnswer = RevisionSolve;

/** Where a trace that has not been read yet is found: the index in its revision's list of traces. */
export type TraceAt = { buildId: string; revision: number; index: number };

/** Stand-ins for the traces an answer sent apart, and where each one's working is read from. */
const standIns = new WeakMap<Trace, TraceAt>();

/** Where to read a trace's working from, when it is a stand-in (its working not read yet). */
export function traceAt(trace: Trace): TraceAt | undefined {
  return standIns.get(trace);
}

/**
 * Puts a stand-in trace wherever the answer holds a reference to one (in place: the answer is
 * fresh from JSON.parse). A stand-in is an empty trace; TraceView reads its working when opened.
 */
function withStandIns(value: unknown, at: Omit<TraceAt, "index">): unknown {
  if (value === null || typeof value !== "object") return value;
  if (isTraceRef(value)) {
    const standIn: Trace = { element: "", formula: "", equation: "", inputs: [], intermediates: [], result: { symbol: "", name: "", value: 0, unit: "" }, source: "", notes: [], parts: [] };
    standIns.set(standIn, { ...at, index: value.traceRef });
    return standIn;
  }
  const entries = value as Record<string, unknown>;
  for (const k of Object.keys(entries)) entries[k] = withStandIns(entries[k], at);
  return value;
}

/**
 * The Budget's data: POST /api/v1/builds/[id]/solve for one revision (current by default). The
 * figures come first; the working behind each number is read when a reader opens it (`useTraces`).
 */
export function useSolve(buildId: string, revision?: number) {
  return useQuery({
    queryKey: ["build", buildId, "solve", revision ?? "current"],
    queryFn: async () => {
      const answer = await fetchJson<SolveAnswer>(`/api/v1/builds/${buildId}/solve`, { method: "POST", body: revision ? { revision } : {} });
      withStandIns(answer.evaluation, { buildId: answer.buildId, revision: answer.revision });
      return answer;
    },
    staleTime: 5 * 60_000,
    // Stand-ins all look alike: sharing unchanged parts with an older answer could hand a
    // number the stand-in of another revision's trace.
    structuralSharing: false,
  });
}

/** Every trace of a revision's result, in the order the answer's references number them; read once for the page. */
export function useTraces({ buildId, revision }: Omit<TraceAt, "index">) {
  return useQuery({
    queryKey: ["build", buildId, "traces", revision],
    queryFn: async () => (await fetchJson<RevisionTraces>(`/api/v1/builds/${buildId}/solve`, { method: "POST", body: { revision, traces: "only" } })).traces,
    staleTime: Infinity,
  });
}
