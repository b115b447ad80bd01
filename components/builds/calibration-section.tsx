"use client";

import Link from "next/link";
import { CALIBRATION_LABELS } from "@/lib/retrofit/design-labels";
import type { Calibration } from "@/lib/retrofit/design-schema";
import type { Json } from "./design-state";

const f2 = (x: number) => x.toFixed(2);

/**
 * The bench-run calibration a revision carries (it is worked out on the bench screen, never
 * typed): what it corrects, by how much, from which run; the maker may take it out of the
 * draft (the model's own figures come back once saved) or put it back before saving.
 * `saved` is the revision's calibration as the server read it; `current` the draft's.
 */
export function CalibrationSection({ saved: c, current, canEdit, onChange }: { saved: Calibration | null; current: Json | undefined; canEdit: boolean; onChange: (value: Json | undefined) => void }) {
  if (!c) return null;
  const label = CALIBRATION_LABELS[c.parameter];
  const removed = current === undefined;
  return (
    <fieldset className="rounded-lg border border-line bg-white/60 p-4 text-sm" data-testid="calibration-section">
      <legend className="px-1 text-sm font-semibold">Calibration from a bench run</legend>
      {removed ? (
        <p data-testid="calibration-removed">
          Removed in this draft: once saved, the new revision uses the model&apos;s own {label.name} again (revision history keeps the calibrated one).
        </p>
      ) : (
        <p>
          {label.name[0]?.toUpperCase()}{label.name.slice(1)} ({label.links}) is the model&apos;s × {f2(c.factor)}
          {c.low !== null && c.high !== null ? ` (95 % interval ${f2(c.low)}–${f2(c.high)})` : ""}, fitted to the warm-up{" "}
          <Link href={`/bench/${c.run.id}`} className="text-ember">{c.run.title}</Link>: misfit {c.rmsBeforeK.toFixed(1)} K → {c.rmsAfterK.toFixed(1)} K over {c.readingCount} readings.
          <span className="block text-xs text-ink-soft">It is worked out on the bench run&apos;s page, not typed. If you change the heat path, the fit no longer describes it: calibrate again against a new run, or remove it.</span>
        </p>
      )}
      {canEdit && (
        <button type="button" onClick={() => onChange(removed ? c : undefined)} className="mt-2 rounded border border-line px-3 py-1 hover:border-ember" data-testid="calibration-toggle">
          {removed ? "Keep the calibration" : "Remove the calibration"}
        </button>
      )}
    </fieldset>
  );
}
