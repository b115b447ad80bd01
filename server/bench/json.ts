import "server-only";
import type { BenchRunRow } from "@/db/queries/bench";
import { canEditRun, type BenchViewer } from "@/lib/bench/access";
import type { FitResult } from "@/lib/bench/fit";
import type { SaveRunInput } from "@/lib/bench/run-schema";

/** A run in lists: who, when, what was fitted (no readings). */
export function runSummaryJson(row: BenchRunRow, viewer: BenchViewer) {
  const fit = row.fit as FitResult | null;
  const run = row.run as SaveRunInput;
  return {
    id: row.id,
    title: row.title,
    ownerName: row.ownerName,
    visibility: row.visibility,
    mine: canEditRun(viewer, row),
    createdAt: row.createdAt.toISOString(),
    readingCount: run.readings.length,
    powered: run.powered,
    fittedPartId: row.fittedPartId,
    sinkToAirKPerW: fit?.sinkToAirKPerW ?? null,
  };
}

export type RunSummaryJson = ReturnType<typeof runSummaryJson>;

/** A run in full: the recorded input and the fit. */
export function runJson(row: BenchRunRow, viewer: BenchViewer) {
  return { ...runSummaryJson(row, viewer), run: row.run as SaveRunInput, fit: row.fit as FitResult | null };
}

export type RunJson = ReturnType<typeof runJson>;
