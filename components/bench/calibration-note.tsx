import Link from "next/link";
import type { Calibration } from "@/lib/retrofit/design-schema";
import { CALIBRATION_LABELS } from "@/lib/retrofit/design-labels";

const f2 = (x: number) => x.toFixed(2);

/** On the Budget of a calibrated revision: which figure a bench run corrected, by how much, and how well. */
export function CalibrationNote({ calibration: c }: { calibration: Calibration }) {
  const label = CALIBRATION_LABELS[c.parameter];
  return (
    <section className="rounded-lg border border-line bg-white/60 p-3 text-sm" data-testid="calibration-note">
      <h2 className="font-medium">Calibrated to a bench run</h2>
      <p className="text-ink-soft">
        In this revision {label.name} ({label.links}) is the model's × {f2(c.factor)}
        {c.low !== null && c.high !== null ? ` (95 % interval ${f2(c.low)}–${f2(c.high)})` : ""}, fitted to the warm-up{" "}
        <Link href={`/bench/${c.run.id}`} className="text-ember">{c.run.title}</Link>: the misfit fell from {c.rmsBeforeK.toFixed(1)} K to {c.rmsAfterK.toFixed(1)} K over {c.readingCount} readings. Each corrected link's derivation shows the model's own figure and the factor.
      </p>
    </section>
  );
}
