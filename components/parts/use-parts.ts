"use client";

import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import type { Part } from "@/lib/parts";
import { type PartDto, type PartPageDto, type PartsQuery, queryString } from "./types";

/** One page of the Parts bin; the previous page stays on screen while the next loads. */
export function useParts(query: PartsQuery) {
  return useQuery({
    queryKey: ["parts", query],
    queryFn: () => fetchJson<PartPageDto>(`/api/v1/parts?${queryString(query)}`),
    placeholderData: keepPreviousData,
  });
}

export function usePart(id: string, initial?: PartDto) {
  return useQuery({
    queryKey: ["part", id],
    queryFn: async () => (await fetchJson<{ part: PartDto }>(`/api/v1/parts/${id}`)).part,
    initialData: initial,
  });
}

/** Create (no id) or replace (id) a part; the lists and the part are refetched afterwards. */
export function useSavePart(id?: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (part: Part) =>
      (await fetchJson<{ part: PartDto }>(id ? `/api/v1/parts/${id}` : "/api/v1/parts", { method: id ? "PATCH" : "POST", body: part })).part,
    onSuccess: (part) => {
      client.setQueryData(["part", part.id], part);
      void client.invalidateQueries({ queryKey: ["parts"] });
    },
  });
}

export function usePartAction(id: string) {
  const client = useQueryClient();
  const done = () => {
    void client.invalidateQueries({ queryKey: ["parts"] });
    void client.invalidateQueries({ queryKey: ["part", id] });
  };
  return {
    duplicate: useMutation({
      mutationFn: async () => (await fetchJson<{ part: PartDto }>(`/api/v1/parts/${id}/duplicate`, { method: "POST", body: {} })).part,
      onSuccess: done,
    }),
    remove: useMutation({
      mutationFn: () => fetchJson<{ deleted: { id: string } }>(`/api/v1/parts/${id}`, { method: "DELETE" }),
      onSuccess: done,
    }),
    verify: useMutation({
      mutationFn: async (body: { verified: true; against: string; attachmentId?: string } | { verified: false }) =>
        (await fetchJson<{ part: PartDto }>(`/api/v1/parts/${id}/verify`, { method: "PATCH", body })).part,
      onSuccess: (part) => {
        client.setQueryData(["part", id], part);
        done();
      },
    }),
  };
}
