"use client";

import { type FormEvent, useState } from "react";
import { errorMessage, useClassAction } from "./use-class-action";

/** A hidden value as a question: the student types an answer and is told whether it is within the tolerance. */
export function AnswerBox({ exampleId, refKey, unit, label }: { exampleId: string; refKey: string; unit: string; label: string }) {
  const check = useClassAction<{ correct: boolean; tolerancePercent: number }>(`/api/v1/examples/${exampleId}/answers`, "POST", { refresh: false });
  const [text, setText] = useState("");
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const value = Number(text.replace(",", ".").replace("−", "-"));
    check.mutate({ key: refKey, value: Number.isFinite(value) && text.trim() !== "" ? value : "not a number" });
  }
  return (
    <form onSubmit={onSubmit} noValidate className="no-print inline-flex flex-wrap items-center gap-1" aria-label={`Your answer: ${label}`}>
      <span className="rounded bg-ember-soft px-1.5 font-mono text-ember" title="hidden by your instructor">?</span>
      <input value={text} onChange={(e) => setText(e.target.value)} inputMode="decimal" aria-label={`Your answer for ${label}, in ${unit}`} className="w-20 rounded border border-line bg-white px-1 py-0 font-mono text-xs" />
      <span className="text-xs text-ink-soft">{unit}</span>
      <button type="submit" disabled={check.isPending || text.trim() === ""} className="rounded border border-line px-1.5 text-xs hover:border-ember disabled:opacity-40">Check</button>
      {check.isSuccess && (
        <span role="status" className={`text-xs ${check.data.correct ? "text-ok" : "text-over"}`}>
          {check.data.correct ? `Right (within ${check.data.tolerancePercent} %)` : `Not within ${check.data.tolerancePercent} % — try again`}
        </span>
      )}
      {check.isError && <span role="alert" className="text-xs text-over">{errorMessage(check.error)}</span>}
    </form>
  );
}
