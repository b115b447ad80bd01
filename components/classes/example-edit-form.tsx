"use client";

import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { errorMessage, fieldError, useClassAction } from "./use-class-action";

/** The title and narrative of a published worked example; its revision (and so its numbers) stay as published. */
export function ExampleEditForm(props: { exampleId: string; backHref: string; title: string; narrative: string; archived: boolean }) {
  const router = useRouter();
  const patch = useClassAction(`/api/v1/examples/${props.exampleId}`, "PATCH", { refresh: false });
  const [title, setTitle] = useState(props.title);
  const [narrative, setNarrative] = useState(props.narrative);
  function onSave(e: FormEvent) {
    e.preventDefault();
    patch.mutate({ title, narrative }, { onSuccess: () => { router.push(props.backHref); router.refresh(); } });
  }
  // The API's message starts with the field's machine name; the field's own label is beside it on screen.
  const plain = (m: string | null) => m?.replace(/^[^:]*: /, "") ?? null;
  const titleError = plain(fieldError(patch.error, "title"));
  const narrativeError = plain(fieldError(patch.error, "narrative"));
  return (
    <form onSubmit={onSave} noValidate className="space-y-3 text-sm" data-testid="example-edit-form">
      <label className="block">
        <span className="mb-1 block font-medium">Title</span>
        <input value={title} onChange={(e) => setTitle(e.target.value)} aria-invalid={titleError ? true : undefined} disabled={props.archived} className="w-full rounded border border-line bg-white px-2 py-1.5" />
        {titleError && <span role="alert" className="mt-1 block text-xs text-over">{titleError}</span>}
      </label>
      <label className="block">
        <span className="mb-1 block font-medium">Narrative</span>
        <textarea value={narrative} onChange={(e) => setNarrative(e.target.value)} rows={14} aria-invalid={narrativeError ? true : undefined} disabled={props.archived} className="w-full rounded border border-line bg-white px-2 py-1.5 font-mono text-xs" />
        <span className="mt-1 block text-xs text-ink-soft">Markdown with maths between dollar signs ($R = L/(kA)$). Raw HTML and script are shown as text, never run.</span>
        {narrativeError && <span role="alert" className="mt-1 block text-xs text-over">{narrativeError}</span>}
      </label>
      <div className="flex gap-2">
        <button type="submit" disabled={patch.isPending || props.archived} className="rounded bg-ember px-3 py-1.5 text-white disabled:opacity-40">{patch.isPending ? "Saving…" : "Save changes"}</button>
        <a href={props.backHref} className="rounded border border-line px-3 py-1.5 hover:border-ember">Cancel</a>
      </div>
      {patch.isError && !titleError && !narrativeError && <p role="alert" className="text-over">{errorMessage(patch.error)}</p>}
    </form>
  );
}
