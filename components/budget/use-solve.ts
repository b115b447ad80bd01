"use client";

import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import type { RevisionSolve } from "@/server/builds/solve";

/** The solve route's answer, typed from the function that builds it. */
export type SolveAnswer = RevisionSolve;

/** The Budget's data: POST /api/v1/builds/[id]/solve for one revision (current by default). */
export function useSolve(buildId: string, revision?: number) {
  return useQuery({
    queryKey: ["build", buildId, "solve", revision ?? "current"],
    queryFn: () => fetchJson<SolveAnswer>(`/api/v1/builds/${buildId}/solve`, { method: "POST", body: revision ? { revision } : {} }),
    staleTime: 5 * 60_000,
  });
}
