"use client";

import { useMutation, useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import type { DiffRow, FigureRow, LadderColumn, WarmupSeries } from "@/lib/compare";
import type { CompareItem } from "@/lib/reviews/api-schemas";
import type { Trace } from "@/lib/thermal";
import { itemsParam } from "@/lib/reviews/api-schemas";

export interface CompareAnswer {
  columns: { buildId: string; revision: number; currentRevision: number; title: string; variantNote: string | null; ownerName: string; verdict: string | null; problems: { field: string; message: string; severity: string }[] }[];
  differences: DiffRow[];
  /** Each figure with its derivation per column (null where nothing derives it, e.g. a verdict). */
  figures: (FigureRow & { traces?: (Trace | null)[] })[];
  warmups: WarmupSeries[];
  ladders: { scenarioId: string; scenarioName: string; columns: (LadderColumn | null)[] }[];
}

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
