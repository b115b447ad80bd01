"use client";

import { useMutation, useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import type { CompareItem } from "@/lib/reviews/api-schemas";
import type { Trace } from "@/lib/thermal";
import { itemsParam } from "@/lib/reviews/words";
import type { Comparison } from "@/server/compare/load";

/** The compare route's answer, typed by the function that builds it (it carries no dates). */
export type CompareAnswer = Comparison;

export function useCompare(items: readonly CompareItem[]) {
  const param = itemsParam(items);
  return useQuery({
    queryKey: ["compare", param],
    queryFn: () => fetchJson<CompareAnswer>(`/api/v1/compare?items=${encodeURIComponent(param)}`),
    enabled: items.length >= 2,
    staleTime: 5 * 60_000,
  });
}

export function useSaveComparison() {
  return useMutation({
    mutationFn: (body: { title: string; items: CompareItem[] }) => fetchJson<{ comparison: { id: string; url: string } }>("/api/v1/comparisons", { method: "POST", body }),
  });
}
