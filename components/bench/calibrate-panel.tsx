"use client";

import { useRouter } from "next/navigation";
import { ApiClientError } from "@/components/ui/fetch-json";
import { useCalibration } from "./use-bench";

const f2 = (x: number) => x.toFixed(2);

/**
 * Under the overlay on the Budget: offer to correct the build's least certain figure to the
 * measured warm-up. Working it out shows the factor, its interval and the misfit before and
 * after; saving makes a new revision.
 */
export function CalibratePanel({ runId, nextRevision }: { runId: string; nextRevision: number }) {
  const work = useCalibration(runId);
  const save = useCalibration(runId);
  const router = useRouter();
  const c = work.data?.calibration;
  const err = [work.error, save.error].find((e) => e instanceof ApiClientError) as ApiClientError | undefined;
  const saved = save.data?.revision;

  return (
    <div className="space-y-2 border-t border-line pt-2" data-testid="calibrate">
      {!c && (
        <button type="button" onClick={() => work.mutate({ save: false })} disabled={work.isPending} className="rounded border border-ember px-3 py-1.5 text-sm font-medium text-ember hover:bg-ember/5">
          {work.isPending ? "Working it out…" : "Calibrate the model to this run"}
        </button>
      )}
      {c && (
        <div className="space-y-1" data-testid="calibration-result">
          <p>
            <span className="font-medium">Least certain figure: {c.name}.</span> <span className="text-ink-soft">{c.why}</span>
          </p>
          <p data-testid="calibration-factor">
            Fitted to this run (mode “{c.mode}”, {c.readingCount} readings at {c.places.join(", ")}): × {f2(c.factor)}
            {c.low !== null && c.high !== null ? ` (95 % interval ${f2(c.low)}–${f2(c.high)})` : " (not pinned down by this run)"}; the misfit falls from {c.rmsBeforeK.toFixed(1)} K to {c.rmsAfterK.toFixed(1)} K.
          </p>
          <p className="text-ink-soft">With this factor {c.verdictAfter.charAt(0).toLowerCase()}{c.verdictAfter.slice(1)}</p>
          {c.warnings.map((w) => (
            <p key={w} role="alert" className="text-over">{w}</p>
          ))}
          {saved ? (
            <p className="text-ok" data-testid="calibration-saved">Saved as revision {saved.number}.</p>
          ) : c.canSave ? (
            <button
              type="button"
              disabled={save.isPending}
              onClick={() => save.mutate({ save: true }, { onSuccess: () => router.refresh() })}
              className="rounded bg-ember px-3 py-1.5 text-sm font-medium text-white hover:opacity-90"
            >
              {save.isPending ? "Saving…" : `Save as revision ${nextRevision}`}
            </button>
          ) : null}
          <p className="text-xs text-ink-soft">A fit to one run also absorbs whatever else the model misses, and the interval assumes the rest of the model is right: treat the factor as this lamp's, not as a rule.</p>
        </div>
      )}
      {err && <p role="alert" className="text-over">{err.message}</p>}
    </div>
  );
}
