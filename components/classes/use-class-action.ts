"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";

/**
 * One Classroom change (POST/PATCH/DELETE to our API). The pages are server components, so
 * after a change the page is refreshed from the server rather than patched in a client cache.
 */
export function useClassAction<T = unknown>(url: string, method: "POST" | "PATCH" | "DELETE" = "POST", { refresh = true } = {}) {
  const router = useRouter();
  return useMutation({
    mutationFn: (body?: unknown) => fetchJson<T>(url, { method, body: body ?? (method === "DELETE" ? undefined : {}) }),
    onSuccess: () => {
      if (refresh) router.refresh();
    },
  });
}

/** The message of a failed change for one field (by its API path), to show under that field. */
export function fieldError(error: unknown, path: string): string | null {
  return error instanceof ApiClientError && error.path === path ? error.message : null;
}

export function errorMessage(error: unknown): string | null {
  return error instanceof Error ? error.message : null;
}
