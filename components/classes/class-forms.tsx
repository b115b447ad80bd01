"use client";

import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { errorMessage, fieldError, useClassAction } from "./use-class-action";

const input = "w-full rounded border border-line bg-white px-2 py-1";

/** Opens a class (instructors and admins). */
export function CreateClassForm() {
  const router = useRouter();
  const create = useClassAction<{ class: { id: string } }>("/api/v1/classes", "POST", { refresh: false });
  const [name, setName] = useState("");
  const [term, setTerm] = useState("");
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    create.mutate({ name, term }, { onSuccess: (r) => router.push(`/classes/${r.class.id}`) });
  }
  return (
    <form onSubmit={onSubmit} noValidate aria-label="New class" className="space-y-2 rounded-lg border border-line bg-white/60 p-3 text-sm">
      <h2 className="font-medium">New class</h2>
      <label className="block">
        Class name
        <input value={name} onChange={(e) => setName(e.target.value)} className={input} aria-invalid={fieldError(create.error, "name") ? true : undefined} placeholder="Evening course: heat in LED retrofits" />
      </label>
      {fieldError(create.error, "name") && <p className="text-over">{fieldError(create.error, "name")}</p>}
      <label className="block">
        Term
        <input value={term} onChange={(e) => setTerm(e.target.value)} className={input} placeholder="Autumn 2026" />
      </label>
      <button type="submit" disabled={create.isPending} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">Open the class</button>
      {create.isError && !fieldError(create.error, "name") && <p role="alert" className="text-over">{errorMessage(create.error)}</p>}
    </form>
  );
}

/** Joins a class with the 8-character code the instructor gives out. */
export function JoinByCodeForm() {
  const router = useRouter();
  const join = useClassAction<{ class: { id: string } }>("/api/v1/classes/join", "POST", { refresh: false });
  const [code, setCode] = useState("");
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    join.mutate({ code }, { onSuccess: (r) => router.push(`/classes/${r.class.id}`) });
  }
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Join a class" className="space-y-2 rounded-lg border border-line bg-white/60 p-3 text-sm">
      <h2 className="font-medium">Join a class</h2>
      <label className="block">
        Join code
        <input value={code} onChange={(e) => setCode(e.target.value)} className={`${input} font-mono uppercase`} placeholder="8 letters and digits" maxLength={40} />
      </label>
      <button type="submit" disabled={join.isPending || code.trim() === ""} className="rounded border border-ember px-3 py-1 text-ember disabled:opacity-40">Join</button>
      {join.isError && <p role="alert" className="text-over">{errorMessage(join.error)}</p>}
    </form>
  );
}
