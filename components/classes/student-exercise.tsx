"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { errorMessage, useClassAction } from "./use-class-action";

/** A student's side of an exercise: start (own copy), open it, hand in its current revision. */
export function StudentExercise({ exerciseId, myCopy, currentRevision, countingRevision, dueAt, archived, startBlocked }: { exerciseId: string; myCopy: string | null; currentRevision: number | null; countingRevision: number | null; dueAt: string; archived: boolean; startBlocked: string | null }) {
  const router = useRouter();
  const start = useClassAction<{ build: { id: string } }>(`/api/v1/exercises/${exerciseId}/start`, "POST", { refresh: false });
  const handin = useClassAction(`/api/v1/exercises/${exerciseId}/handins`);
  const overdue = new Date(dueAt).getTime() < Date.now();
  // The revision that counts is the copy as it stands: handing it in again would change nothing but the time.
  const handedIn = currentRevision !== null && countingRevision === currentRevision;
  if (!myCopy && startBlocked) return <p role="note" data-testid="start-blocked" className="no-print rounded border border-ember/30 bg-ember-soft/40 p-2 text-sm">{startBlocked}</p>;
  if (!myCopy) {
    return (
      <div className="no-print space-y-1 text-sm">
        <button type="button" disabled={archived || start.isPending} onClick={() => start.mutate(undefined, { onSuccess: (r) => router.push(`/builds/${r.build.id}`) })} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">
          Start (make my own copy)
        </button>
        {start.isError && <p role="alert" className="text-over">{errorMessage(start.error)}</p>}
      </div>
    );
  }
  return (
    <div className="no-print space-y-1 text-sm">
      <div className="flex flex-wrap items-center gap-2">
        <Link href={`/builds/${myCopy}`} className="rounded border border-line px-3 py-1 hover:border-ember">Open my copy</Link>
        <Link href={`/builds/${myCopy}/budget`} className="rounded border border-line px-3 py-1 hover:border-ember">Budget of my copy</Link>
        <button type="button" disabled={archived || handin.isPending || handedIn} onClick={() => handin.mutate({ buildId: myCopy })} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">
          {handedIn ? `Revision ${currentRevision} is handed in` : `Hand in revision ${currentRevision ?? ""}`}
        </button>
      </div>
      <p className="text-xs text-ink-soft">
        {handedIn ? "To hand in again, change your copy and save it as a new revision. " : ""}
        {overdue ? "The due date has passed: a hand-in now is marked late." : "You may hand in again before the due date; the last one counts."}
      </p>
      {handin.isSuccess && <p role="status" className="text-ok">Handed in.</p>}
      {handin.isError && <p role="alert" className="text-over">{errorMessage(handin.error)}</p>}
    </div>
  );
}
