import { CalibrationNote } from "@/components/bench/calibration-note";
import { HoldPanel } from "@/components/bench/hold-panel";
import { MeasuredSinkPanel } from "@/components/bench/measured-sink-panel";
import { BuildNav } from "@/components/builds/build-nav";
import { BudgetScreen } from "@/components/budget/budget-screen";
import { holdForBuild } from "@/server/bench/hold";
import { measuredSinkEffect } from "@/server/bench/sink-effect";
import { loadBuildPage } from "@/server/builds/load";
import { calibrationSchema } from "@/lib/retrofit/design-schema";

export const metadata = { title: "Budget" };

export default async function BudgetPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, build, revision } = await loadBuildPage(params);
  const env = (revision.design as { environment?: { ambientC?: number } }).environment;
  const calibration = calibrationSchema.safeParse((revision.design as { calibration?: unknown }).calibration);
  // Only the current revision is calibrated (a new revision follows it), and only by someone who may edit the build.
  const calibrate = build.access.canEdit && revision.number === build.currentRevision ? { nextRevision: build.currentRevision + 1 } : null;
  const [measured, hold] = await Promise.all([measuredSinkEffect({ build, revision, viewer: user }), holdForBuild({ build, revision, viewer: user })]);
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-semibold">{build.title}</h1>
        <span className="text-sm text-ink-soft">Budget · revision {revision.number}</span>
      </div>
      <BuildNav buildId={build.id} current="budget" />
      {measured && <MeasuredSinkPanel effect={measured} />}
      {calibration.success && <CalibrationNote calibration={calibration.data} />}
      {hold && <HoldPanel hold={hold} calibrate={calibrate} />}
      <BudgetScreen buildId={build.id} ambientC={env?.ambientC ?? 25} />
    </div>
  );
}
