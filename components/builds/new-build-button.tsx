"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";
import type { StartingPoint } from "@/lib/starter";

/** A starting point as the page hands it over: its words and its design, made on the server
 *  (the starter bin and its schemas stay out of the browser). */
export type StartingChoice = { key: StartingPoint; label: string; title: string; description: string; design: Record<string, unknown> };

/**
 * Starts a build from a starting point (a kind of light with every slot filled from the
 * starter bin, values marked as estimates) or empty, and opens its Heat path editor.
 */
export function NewBuildButton({ points }: { points: readonly StartingChoice[] }) {
  const router = useRouter();
  const [title, setTitle] = useState("");
  const [point, setPoint] = useState<StartingPoint | "empty">(points[0]?.key ?? "empty");
  const chosen = points.find((p) => p.key === point);
  const [error, setError] = useState<string | null>(null);
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);

  async function create() {
    setError(null);
    setBusy(true);
    try {
      const design = chosen ? chosen.design : { lightEngine: {} };
      const name = title.trim() || (chosen ? chosen.title : "");
      const note = chosen ? `Started as a ${chosen.label.toLowerCase()} from the starter bin` : "First revision";
      const r = await fetchJson<{ build: { id: string } }>("/api/v1/builds", { method: "POST", body: { title: name, design, note } });
      router.push(`/builds/${r.build.id}`);
    } catch (e) {
      setError(e instanceof ApiClientError ? e.message : "Could not create the build.");
      setBusy(false);
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
    <div className="w-full max-w-xl space-y-3 rounded-lg border border-line bg-white p-4" data-testid="new-build">
      <fieldset>
        <legend className="mb-2 text-sm font-medium">Start from</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          {points.map((p) => (
            <label key={p.key} className={`block cursor-pointer rounded border p-2 text-sm ${point === p.key ? "border-ember bg-ember-soft/40" : "border-line"}`}>
              <input type="radio" name="starting-point" value={p.key} checked={point === p.key} onChange={() => setPoint(p.key)} className="mr-1.5" />
              <span className="font-medium">{p.label}</span>
              <span className="mt-0.5 block text-xs text-ink-soft">{p.description}</span>
            </label>
          ))}
          <label className={`block cursor-pointer rounded border p-2 text-sm ${point === "empty" ? "border-ember bg-ember-soft/40" : "border-line"}`}>
            <input type="radio" name="starting-point" value="empty" checked={point === "empty"} onChange={() => setPoint("empty")} className="mr-1.5" />
            <span className="font-medium">Empty build</span>
            <span className="mt-0.5 block text-xs text-ink-soft">Every slot empty; pick parts from your Parts bin.</span>
          </label>
        </div>
        <p className="mt-2 text-xs text-ink-soft">Starting points use generic parts from the starter bin: typical values, estimates only. Change what differs in your build.</p>
      </fieldset>
      <label className="block text-sm">
        <span className="mb-1 block font-medium">Title of the new build</span>
        <input
          value={title}
          onChange={(e) => setTitle(e.target.value)}
          placeholder={chosen ? chosen.title : "e.g. Square lantern, 2 cells"}
          aria-label="Title of the new build"
          className="w-full rounded border border-line bg-white px-3 py-2"
        />
        {error && <span role="alert" className="mt-1 block text-over">{error}</span>}
      </label>
      <div className="flex gap-2">
        <button type="button" onClick={create} disabled={busy} className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90 disabled:opacity-50">
          {busy ? "Creating…" : "Create"}
        </button>
        <button type="button" onClick={() => setOpen(false)} className="px-2 text-sm text-ink-soft hover:text-ember">Cancel</button>
      </div>
    </div>
  );
}
