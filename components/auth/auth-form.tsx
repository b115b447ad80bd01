"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";

export type AuthField = { name: string; label: string; type: "email" | "password" | "text"; autoComplete: string };

type Props = {
  action: string;
  fields: readonly AuthField[];
  submitLabel: string;
  /** Where to go after success; without it the server's message is shown instead. */
  redirectTo?: string;
  extra?: Record<string, string>;
};

/** A small form posting JSON to one of the auth routes and showing its errors by field. */
export function AuthForm({ action, fields, submitLabel, redirectTo, extra }: Props) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [error, setError] = useState<{ message: string; path: string } | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBusy(true);
    setError(null);
    const body: Record<string, string> = { ...extra };
    const data = new FormData(event.currentTarget);
    for (const f of fields) body[f.name] = String(data.get(f.name) ?? "");
    try {
      const result = await fetchJson<{ message?: string; joinedClasses?: { id: string }[] }>(action, { method: "POST", body });
      if (redirectTo) {
        await queryClient.invalidateQueries();
        // Signing in joined a class the address was invited to: open it.
        const joined = result.joinedClasses ?? [];
        router.push(joined.length === 1 ? `/classes/${joined[0]!.id}` : joined.length > 1 ? "/classes" : redirectTo);
        router.refresh();
      } else {
        setNotice(result.message ?? "Done.");
      }
    } catch (e) {
      setError(e instanceof ApiClientError ? { message: e.message, path: e.path } : { message: "Network error; try again.", path: "" });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {fields.map((f) => {
        // The API names the field in its message ("password: …"); beside the field that is redundant.
        const fieldError = error && error.path === f.name ? error.message.replace(`${f.name}: `, "") : null;
        return (
          <label key={f.name} className="block text-sm">
            <span className="mb-1 block font-medium">{f.label}</span>
            <input
              name={f.name}
              type={f.type}
              autoComplete={f.autoComplete}
              aria-invalid={fieldError ? true : undefined}
              className="w-full rounded border border-line bg-white px-3 py-2 focus:border-ember focus:outline-none"
            />
            {fieldError && <span role="alert" className="mt-1 block text-over">{fieldError}</span>}
          </label>
        );
      })}
      {error && !fields.some((f) => f.name === error.path) && (
        <p role="alert" className="rounded border border-over/30 bg-over/5 px-3 py-2 text-sm text-over">
          {error.message}
        </p>
      )}
      {notice && <p role="status" className="rounded border border-ok/30 bg-ok/5 px-3 py-2 text-sm text-ok">{notice}</p>}
      <button
        type="submit"
        disabled={busy}
        className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90 disabled:opacity-50"
      >
        {busy ? "Working…" : submitLabel}
      </button>
    </form>
  );
}
