"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import type { NotificationItem, ShareItem } from "./types";

export function useNotifications() {
  return useQuery({
    queryKey: ["notifications"],
    queryFn: () => fetchJson<{ items: NotificationItem[]; unread: number }>("/api/v1/notifications"),
    refetchInterval: 30_000,
    staleTime: 10_000,
  });
}

export function useMarkRead() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (ids?: string[]) => fetchJson<{ marked: number }>("/api/v1/notifications/read", { method: "POST", body: ids ? { ids } : {} }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["notifications"] }),
  });
}

export function useRequestReview(buildId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { reviewerEmail: string; revision?: number; message?: string }) =>
      fetchJson<{ review: { id: string; reviewerName: string; revisionNumber: number }; mailed: boolean }>(`/api/v1/builds/${buildId}/reviews`, { method: "POST", body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["build", buildId, "reviews"] }),
  });
}

export function useComment(reviewId: string) {
  return useMutation({
    mutationFn: (body: { anchor: { kind: "node" | "link" | "figure"; key: string }; body: string }) => fetchJson<{ comment: { id: string } }>(`/api/v1/reviews/${reviewId}/comments`, { method: "POST", body }),
  });
}

export function useVerdict(reviewId: string) {
  return useMutation({
    mutationFn: (body: { status: "approved" | "changes_requested" | "rejected"; summary: string }) => fetchJson<{ review: { id: string; status: string } }>(`/api/v1/reviews/${reviewId}/verdict`, { method: "POST", body }),
  });
}

export function useShares(buildId: string) {
  return useQuery({
    queryKey: ["build", buildId, "shares"],
    queryFn: () => fetchJson<{ shares: ShareItem[] }>(`/api/v1/builds/${buildId}/shares`),
  });
}

export function useCreateShare(buildId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { revision?: number; expiresInDays?: number }) => fetchJson<{ share: ShareItem & { url: string } }>(`/api/v1/builds/${buildId}/shares`, { method: "POST", body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["build", buildId, "shares"] }),
  });
}

export function useRevokeShare(buildId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (shareId: string) => fetchJson<{ ok: boolean }>(`/api/v1/builds/${buildId}/shares/${shareId}`, { method: "DELETE" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["build", buildId, "shares"] }),
  });
}
