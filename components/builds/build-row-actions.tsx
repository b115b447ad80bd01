"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";
import { announceBuildsNotice } from "./builds-notice";

const quiet = "text-ink-soft hover:text-ember";

/**
 * The owner's actions on a row of the Builds list: rename in place, archive (or bring
 * back), and delete after a confirmation. A build a review or a class points at is archived instead
 * of deleted; the answer says so.
 */
export function BuildRowActions({ id, title, archived }: { id: string; title: string; archived: boolean }) {
  const router = useRouter();
  const [mode, setMode] = useState<"idle" | "rename" | "confirm-delete">("idle");
  const [name, setName] = useState(title);
  const [message, setMessage] = useState<{ text: string; bad: boolean } | null>(null);

  async function call(fn: () => Promise<string | null>) {
    setMessage(null);
    try {
      const text = await fn();
      setMode("idle");
      // The row may move (an archived build leaves "Mine"): the list's notice line says what happened.
      if (text) announceBuildsNotice(text);
      router.refresh();
    } catch (e) {
      setMessage({ text: e instanceof ApiClientError ? e.message : "The server did not answer; try again.", bad: true });
    }
  }
  const rename = () => call(async () => (await fetchJson(`/api/v1/builds/${id}`, { method: "PATCH", body: { title: name } }), null));
  const archive = (value: boolean) => call(async () => (await fetchJson(`/api/v1/builds/${id}`, { method: "PATCH", body: { archived: value } }), null));
  const remove = () => call(async () => (await fetchJson<{ message?: string }>(`/api/v1/builds/${id}`, { method: "DELETE" })).message ?? `“${title}” was deleted.`);

  return (
    <span className="flex flex-wrap items-center gap-3 text-sm" data-testid="build-row-actions">
      {mode === "rename" && (
        <span className="flex items-center gap-2">
          <input value={name} onChange={(e) => setName(e.target.value)} aria-label={`New title for ${title}`} className="w-56 rounded border border-line bg-white px-2 py-1" autoFocus />
          <button type="button" onClick={rename} className="rounded bg-ember px-2 py-1 text-white">Save title</button>
          <button type="button" onClick={() => { setMode("idle"); setName(title); }} className={quiet}>Cancel</button>
        </span>
      )}
      {mode === "confirm-delete" && (
        <span role="alertdialog" aria-label={`Delete ${title}?`} className="flex items-center gap-2 rounded border border-over/40 bg-white px-2 py-1">
          <span>Delete “{title}” and all its revisions? This cannot be undone.</span>
          <button type="button" onClick={remove} className="rounded bg-over px-2 py-0.5 text-white">Delete for good</button>
          <button type="button" onClick={() => setMode("idle")} className={quiet}>Keep it</button>
        </span>
      )}
      {mode === "idle" && (
        <>
          <button type="button" onClick={() => setMode("rename")} className={quiet}>Rename</button>
          <button type="button" onClick={() => archive(!archived)} className={quiet}>{archived ? "Bring back" : "Archive"}</button>
          <button type="button" onClick={() => setMode("confirm-delete")} className="text-ink-soft hover:text-over">Delete</button>
        </>
      )}
      {message && <span role={message.bad ? "alert" : "status"} className={message.bad ? "text-over" : "text-ok"}>{message.text}</span>}
    </span>
  );
}
