"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import type { CommentItem, NotificationItem, ShareItem } from "./types";

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
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { anchor: { kind: "node" | "link" | "figure"; key: string }; body: string }) => fetchJson<{ comment: { id: string } }>(`/api/v1/reviews/${reviewId}/comments`, { method: "POST", body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["review", reviewId, "comments"] }),
  });
}

/** A review's comments with their targets in words (for pins drawn outside the review page). */
export function useReviewComments(reviewId: string | null) {
  return useQuery({
    queryKey: ["review", reviewId, "comments"],
    queryFn: () => fetchJson<{ comments: Omit<CommentItem, "createdAt">[] }>(`/api/v1/reviews/${reviewId}/comments`),
    enabled: reviewId !== null,
  });
}

export function useVerdict(reviewId: string) {
  return useMutation({
    mutationFn: (body: { status: "approved" | "changes_requested" | "rejected"; summary: string }) => fetchJson<{ review: { id: string; status: string } }>(`/api/v1/reviews/${reviewId}/verdict`, { method: "POST", body }),
  });
}

/** Where a set of share links lives: a build's Budget links, or a review's links. */
export type ShareScope = { kind: "build"; buildId: string } | { kind: "review"; reviewId: string };
const sharesPath = (s: ShareScope) => (s.kind === "build" ? `/api/v1/builds/${s.buildId}/shares` : `/api/v1/reviews/${s.reviewId}/shares`);
const sharesKey = (s: ShareScope) => (s.kind === "build" ? ["build", s.buildId, "shares"] : ["review", s.reviewId, "shares"]);

export function useShares(scope: ShareScope) {
  return useQuery({
    queryKey: sharesKey(scope),
    queryFn: () => fetchJson<{ shares: ShareItem[] }>(sharesPath(scope)),
  });
}

export function useCreateShare(scope: ShareScope) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { revision?: number; expiresInDays?: number }) => fetchJson<{ share: ShareItem & { url: string } }>(sharesPath(scope), { method: "POST", body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: sharesKey(scope) }),
  });
}

export function useRevokeShare(scope: ShareScope) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (shareId: string) => fetchJson<{ ok: boolean }>(`${sharesPath(scope)}/${shareId}`, { method: "DELETE" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: sharesKey(scope) }),
  });
}
