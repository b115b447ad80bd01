import { isTraceRef, type Trace } from "@/lib/thermal";
import type { BuildEvaluation } from "@/lib/retrofit";
import type { Client } from "./http";

/** A copy of an answer's value with every TraceRef replaced by the trace it numbers; a reference past the list throws. */
export function joinTraces(value: unknown, traces: readonly unknown[]): unknown {
  if (Array.isArray(value)) return value.map((v) => joinTraces(v, traces));
  if (value === null || typeof value !== "object") return value;
  if (isTraceRef(value)) {
    if (value.traceRef < 0 || value.traceRef >= traces.length) throw new Error(`trace reference ${value.traceRef} past the ${traces.length} traces sent`);
    return traces[value.traceRef];
  }
  return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, joinTraces(v, traces)]));
}

/** A revision's evaluation as the Budget reads it: the figures, then the traces they refer to, joined. */
export async function solvedWithTraces(client: Client, buildId: string): Promise<BuildEvaluation> {
  const figures = await client.post(`/api/v1/builds/${buildId}/solve`, {});
  if (figures.status !== 200) throw new Error(`solve → ${figures.status}`);
  const { revision, evaluation } = figures.body as unknown as { revision: number; evaluation: unknown };
  const listed = await client.post(`/api/v1/builds/${buildId}/solve`, { revision, traces: "only" });
  if (listed.status !== 200) throw new Error(`traces → ${listed.status}`);
  return joinTraces(evaluation, (listed.body as unknown as { traces: Trace[] }).traces) as BuildEvaluation;
}
