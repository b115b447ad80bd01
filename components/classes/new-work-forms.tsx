"use client";

import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { errorMessage, fieldError, useClassAction } from "./use-class-action";

export type BuildChoice = { id: string; title: string; currentRevision: number };

const input = "w-full rounded border border-line bg-white px-2 py-1";

function Problem({ error, path }: { error: unknown; path: string }) {
  const m = fieldError(error, path);
  return m ? <p className="text-over">{m}</p> : null;
}

function BuildPicker({ builds, value, onChange, label }: { builds: BuildChoice[]; value: string; onChange: (v: string) => void; label: string }) {
  return (
    <label className="block">
      {label}
      <select value={value} onChange={(e) => onChange(e.target.value)} className={input}>
        <option value="">— choose one of your builds —</option>
        {builds.map((b) => (
          <option key={b.id} value={b.id}>{b.title} (revision {b.currentRevision})</option>
        ))}
      </select>
    </label>
  );
}

/** Publishes the current revision of one of the instructor's builds as a worked example. */
export function NewExampleForm({ classId, builds }: { classId: string; builds: BuildChoice[] }) {
  const router = useRouter();
  const create = useClassAction<{ example: { id: string } }>(`/api/v1/classes/${classId}/examples`, "POST", { refresh: false });
  const [title, setTitle] = useState("");
  const [buildId, setBuildId] = useState("");
  const [narrative, setNarrative] = useState("");
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    create.mutate({ title, buildId, narrative }, { onSuccess: (r) => router.push(`/classes/${classId}/examples/${r.example.id}`) });
  }
  return (
    <form onSubmit={onSubmit} noValidate aria-label="New worked example" className="space-y-2 rounded-lg border border-line bg-white/60 p-3 text-sm">
      <h3 className="font-medium">New worked example</h3>
      <label className="block">Title<input value={title} onChange={(e) => setTitle(e.target.value)} className={input} /></label>
      <Problem error={create.error} path="title" />
      <BuildPicker builds={builds} value={buildId} onChange={setBuildId} label="Build (its current revision is published; later changes to the build do not reach the example)" />
      <Problem error={create.error} path="buildId" />
      <label className="block">
        Narrative (Markdown; maths between $…$ or $$…$$)
        <textarea value={narrative} onChange={(e) => setNarrative(e.target.value)} rows={5} className={`${input} font-mono text-xs`} placeholder={"The junction sits $R_{j-sp} \\cdot P$ above the solder point…"} />
      </label>
      <p className="text-xs text-ink-soft">After publishing, choose on the example's page which values to hide as questions.</p>
      <button type="submit" disabled={create.isPending} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">Publish to the class</button>
      {create.isError && !["title", "buildId"].includes((create.error as { path?: string }).path ?? "") && <p role="alert" className="text-over">{errorMessage(create.error)}</p>}
    </form>
  );
}

/** Sets an exercise: instructions, a starter build, a due date. */
export function NewExerciseForm({ classId, builds }: { classId: string; builds: BuildChoice[] }) {
  const create = useClassAction<{ warning: string | null }>(`/api/v1/classes/${classId}/exercises`);
  const [title, setTitle] = useState("");
  const [buildId, setBuildId] = useState("");
  const [instructions, setInstructions] = useState("");
  const [due, setDue] = useState("");
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const dueAt = due ? new Date(due).toISOString() : "";
    create.mutate({ title, buildId, instructions, dueAt }, { onSuccess: () => { setTitle(""); setInstructions(""); setDue(""); } });
  }
  return (
    <form onSubmit={onSubmit} noValidate aria-label="New exercise" className="space-y-2 rounded-lg border border-line bg-white/60 p-3 text-sm">
      <h3 className="font-medium">New exercise</h3>
      <label className="block">Title<input value={title} onChange={(e) => setTitle(e.target.value)} className={input} /></label>
      <Problem error={create.error} path="title" />
      <BuildPicker builds={builds} value={buildId} onChange={setBuildId} label="Starter build (each student starts from a copy of its current revision)" />
      <Problem error={create.error} path="buildId" />
      <label className="block">
        Instructions (Markdown)
        <textarea value={instructions} onChange={(e) => setInstructions(e.target.value)} rows={4} className={`${input} font-mono text-xs`} />
      </label>
      <label className="block">Due date<input type="datetime-local" value={due} onChange={(e) => setDue(e.target.value)} className={input} /></label>
      <Problem error={create.error} path="dueAt" />
      <button type="submit" disabled={create.isPending} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">Set the exercise</button>
      {create.isSuccess && <p role="status" className="text-ok">Exercise set.</p>}
      {create.data?.warning && <p role="note" className="rounded border border-tight/40 bg-tight/10 p-2 text-xs">{create.data.warning}</p>}
      {create.isError && !["title", "buildId", "dueAt"].includes((create.error as { path?: string }).path ?? "") && <p role="alert" className="text-over">{errorMessage(create.error)}</p>}
    </form>
  );
}
