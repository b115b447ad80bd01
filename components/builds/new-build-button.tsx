"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";

/** Starts an empty build (defaults: 25 °C, still air, held for a minute) and opens its editor. */
export function NewBuildButton() {
  const router = useRouter();
  const [title, setTitle] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [open, setOpen] = useState(false);

  async function create() {
    setError(null);
    try {
      const r = await fetchJson<{ build: { id: string } }>("/api/v1/builds", { method: "POST", body: { title, design: { lightEngine: {} } } });
      router.push(`/builds/${r.build.id}`);
    } catch (e) {
      setError(e instanceof ApiClientError ? e.message : "Could not create the build.");
    }
  }

  if (!open) {
    return (
      <button type="button" onClick={() => setOpen(true)} className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90">
        New build
      </button>
    );
  }
  return (
    <div className="flex items-start gap-2">
      <label className="text-sm">
        <span className="sr-only">Title of the new build</span>
        <input
          autoFocus
          value={title}
          onChange={(e) => setTitle(e.target.value)}
          placeholder="e.g. Square lantern, 2 cells"
          aria-label="Title of the new build"
          className="w-64 rounded border border-line bg-white px-3 py-2"
        />
        {error && <span role="alert" className="mt-1 block text-over">{error}</span>}
      </label>
      <button type="button" onClick={create} className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90">
        Create
      </button>
    </div>
  );
}
