"use client";

import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { errorMessage, useClassAction } from "./use-class-action";

/** Fork into my builds with one click, then Side by side with the example; export; handout. */
export function ExampleActions({ exampleId, handoutHref, canFork }: { exampleId: string; handoutHref: string; canFork: boolean }) {
  const router = useRouter();
  const fork = useClassAction<{ compareHref: string }>(`/api/v1/examples/${exampleId}/fork`, "POST", { refresh: false });
  return (
    <div className="no-print flex flex-wrap items-center gap-2 text-sm">
      {canFork && (
        <button type="button" disabled={fork.isPending} onClick={() => fork.mutate(undefined, { onSuccess: (r) => router.push(r.compareHref) })} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">
          {fork.isPending ? "Forking…" : "Fork into my builds and compare"}
        </button>
      )}
      <a href={handoutHref} className="rounded border border-line px-3 py-1 hover:border-ember">Printable handout</a>
      <a href={`/api/v1/examples/${exampleId}/export`} className="rounded border border-line px-3 py-1 hover:border-ember">Export (JSON)</a>
      {fork.isError && <p role="alert" className="w-full text-over">{errorMessage(fork.error)}</p>}
    </div>
  );
}

type Hideable = { key: string; label: string; unit: string };

/** The instructor's controls: which values are questions, the tolerance, when they are revealed, who may open the example. */
export function ExampleTeacherPanel(props: { exampleId: string; hideable: Hideable[]; hidden: string[]; tolerancePercent: number; revealAt: string | null; revealed: boolean; visibility: "class" | "link"; archived: boolean }) {
  const patch = useClassAction<{ linkUrl?: string }>(`/api/v1/examples/${props.exampleId}`, "PATCH");
  const [hidden, setHidden] = useState<string[]>(props.hidden);
  const [tolerance, setTolerance] = useState(String(props.tolerancePercent));
  const [revealAt, setRevealAt] = useState(props.revealAt ? props.revealAt.slice(0, 16) : "");
  const [linkUrl, setLinkUrl] = useState<string | null>(null);
  const toggle = (key: string) => setHidden((h) => (h.includes(key) ? h.filter((k) => k !== key) : [...h, key]));
  function onSave(e: FormEvent) {
    e.preventDefault();
    const t = Number(tolerance.replace(",", "."));
    patch.mutate({ hidden, tolerancePercent: Number.isFinite(t) ? t : "not a number", revealAt: revealAt ? new Date(revealAt).toISOString() : null });
  }
  return (
    <details className="no-print rounded-lg border border-line bg-white/60 p-3 text-sm" data-testid="teacher-panel">
      <summary className="cursor-pointer font-medium">Questions and sharing (only instructors see this)</summary>
      <form onSubmit={onSave} noValidate className="mt-2 space-y-2">
        <fieldset className="max-h-64 overflow-y-auto rounded border border-line p-2">
          <legend className="px-1 text-xs text-ink-soft">Hide these values from students (they answer them)</legend>
          {props.hideable.map((h) => (
            <label key={h.key} className="flex items-center gap-2 text-xs">
              <input type="checkbox" checked={hidden.includes(h.key)} onChange={() => toggle(h.key)} disabled={props.archived} />
              {h.label} <span className="text-ink-soft">({h.unit})</span>
            </label>
          ))}
        </fieldset>
        <div className="flex flex-wrap items-end gap-3">
          <label className="block">Tolerance of answers, %<input value={tolerance} onChange={(e) => setTolerance(e.target.value)} inputMode="decimal" className="ml-1 w-16 rounded border border-line bg-white px-1" /></label>
          <label className="block">Reveal after<input type="datetime-local" value={revealAt} onChange={(e) => setRevealAt(e.target.value)} className="ml-1 rounded border border-line bg-white px-1" /></label>
          <button type="submit" disabled={patch.isPending || props.archived} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">Save</button>
        </div>
      </form>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <span className="text-xs text-ink-soft">{props.revealed ? "Values are revealed to the class." : `${props.hidden.length} value(s) hidden from the class.`}</span>
        <button type="button" disabled={patch.isPending || props.archived} onClick={() => patch.mutate({ reveal: !props.revealed, ...(props.revealed ? { revealAt: null } : {}) })} className="rounded border border-line px-2 py-0.5 text-xs hover:border-ember">
          {props.revealed ? "Hide them again" : "Reveal now"}
        </button>
        <span className="ml-auto text-xs">Open to: <strong>{props.visibility === "link" ? "anyone with the link" : "the class"}</strong></span>
        <button
          type="button"
          disabled={patch.isPending || props.archived}
          onClick={() => patch.mutate({ visibility: props.visibility === "link" ? "class" : "link" }, { onSuccess: (r) => setLinkUrl(r.linkUrl ?? null) })}
          className="rounded border border-line px-2 py-0.5 text-xs hover:border-ember"
        >
          {props.visibility === "link" ? "Turn the link off" : "Make a read-only link"}
        </button>
      </div>
      {linkUrl && <p role="status" className="mt-1 break-all text-xs">Link (shown once — copy it now): <code>{linkUrl}</code></p>}
      {patch.isError && <p role="alert" className="text-over">{errorMessage(patch.error)}</p>}
    </details>
  );
}
