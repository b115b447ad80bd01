"use client";

import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import type { Evaluation } from "./types";

export type SolveAnswer = { buildId: string; revision: number; solverVersion: string; solverChange: { previousVersion: string; changes: string[] } | null; cached: boolean; evaluation: Evaluation };

/** The Budget's data: POST /api/v1/builds/[id]/solve for one revision (current by default). */
export function useSolve(buildId: string, revision?: number) {
  return useQuery({
    queryKey: ["build", buildId, "solve", revision ?? "current"],
    queryFn: () => fetchJson<SolveAnswer>(`/api/v1/builds/${buildId}/solve`, { method: "POST", body: revision ? { revision } : {} }),
    staleTime: 5 * 60_000,
  });
}
