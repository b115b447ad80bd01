"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";

/**
 * Whom a build is shared with: the owner gets every address (`email`), whether or not an
 * account uses it yet; anyone else gets the members' names.
 */
export type BuildMember = { email?: string; displayName?: string; role?: string; canEdit: boolean };

const key = (buildId: string) => ["build", buildId, "members"] as const;

export function useMembers(buildId: string) {
  return useQuery({ queryKey: key(buildId), queryFn: () => fetchJson<{ members: BuildMember[] }>(`/api/v1/builds/${buildId}/members`) });
}

export function useAddMember(buildId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { email: string; canEdit: boolean }) => fetchJson<{ member: BuildMember; message: string }>(`/api/v1/builds/${buildId}/members`, { method: "POST", body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: key(buildId) }),
  });
}

export function useRemoveMember(buildId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (email: string) => fetchJson<{ ok: true }>(`/api/v1/builds/${buildId}/members/${encodeURIComponent(email)}`, { method: "DELETE" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: key(buildId) }),
  });
}
