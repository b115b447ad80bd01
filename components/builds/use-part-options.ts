"use client";

import { useQuery } from "@tanstack/react-query";
import type { PartKind } from "@/lib/parts";
import { fetchJson } from "@/components/ui/fetch-json";

export type PartOption = { id: string; name: string; provenance: string; verified: boolean; owner: { displayName: string }; specs: Record<string, unknown> };

/** Parts of one kind the viewer may use (theirs, shared and public), for a slot's select. */
export function usePartOptions(kind: PartKind) {
  return useQuery({
    queryKey: ["part-options", kind],
    queryFn: async () => (await fetchJson<{ items: PartOption[] }>(`/api/v1/parts?kind=${kind}&pageSize=100&sort=name`)).items,
    staleTime: 60_000,
  });
}
