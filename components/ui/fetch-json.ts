"use client";

/** Error from one of our API routes, carrying its `{ error: { code, message, path } }`. */
export class ApiClientError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly path: string,
  ) {
    super(message);
  }
}

export async function fetchJson<T>(url: string, init?: { method?: string; body?: unknown }): Promise<T> {
  const response = await fetch(url, {
    method: init?.method ?? "GET",
    headers: init?.body === undefined ? undefined : { "content-type": "application/json" },
    body: init?.body === undefined ? undefined : JSON.stringify(init.body),
  });
  const text = await response.text();
  let data: unknown = null;
  try {
    data = text ? JSON.parse(text) : null;
  } catch {
    data = null;
  }
  if (!response.ok) {
    const e = (data as { error?: { code?: string; message?: string; path?: string } } | null)?.error;
    throw new ApiClientError(response.status, e?.code ?? "unknown", e?.message ?? `Request failed (${response.status})`, e?.path ?? "");
  }
  return data as T;
}
