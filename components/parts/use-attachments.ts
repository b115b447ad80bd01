"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";
import type { AttachmentDto } from "./types";

export function useAttachments(partId: string) {
  return useQuery({
    queryKey: ["attachments", partId],
    queryFn: async () => (await fetchJson<{ attachments: AttachmentDto[] }>(`/api/v1/parts/${partId}/attachments`)).attachments,
  });
}

/** multipart/form-data upload: fetchJson only sends JSON, so this one posts the form itself. */
async function upload(partId: string, file: File): Promise<AttachmentDto> {
  const form = new FormData();
  form.append("file", file, file.name);
  const response = await fetch(`/api/v1/parts/${partId}/attachments`, { method: "POST", body: form });
  const data: unknown = await response.json().catch(() => null);
  if (!response.ok) {
    const e = (data as { error?: { code?: string; message?: string; path?: string } } | null)?.error;
    throw new ApiClientError(response.status, e?.code ?? "unknown", e?.message ?? `Upload failed (${response.status})`, e?.path ?? "file");
  }
  return (data as { attachment: AttachmentDto }).attachment;
}

export function useAttachmentMutations(partId: string) {
  const client = useQueryClient();
  const refresh = () => client.invalidateQueries({ queryKey: ["attachments", partId] });
  return {
    upload: useMutation({ mutationFn: (file: File) => upload(partId, file), onSuccess: refresh }),
    remove: useMutation({
      mutationFn: (attachment: AttachmentDto) => fetchJson<{ deleted: { id: string } }>(attachment.url, { method: "DELETE" }),
      onSuccess: refresh,
    }),
  };
}
