import { BuildNav } from "@/components/builds/build-nav";
import { listRevisions } from "@/db/queries/builds";
import { BuildActions } from "@/components/builds/build-actions";
import { BuildReviews } from "@/components/reviews/build-reviews";
import type { JsonObject } from "@/components/builds/design-state";
import { HeatPathEditor } from "@/components/builds/heat-path-editor";
import { MembersPanel } from "@/components/builds/members-panel-lazy";
import { PartsChangedNotice } from "@/components/builds/parts-changed-notice";
import { loadBuildPage } from "@/server/builds/load";
import { partChangesSince } from "@/server/builds/part-changes";
import { calibrationSchema } from "@/lib/retrofit/design-schema";

export const metadata = { title: "Heat path" };

export default async function HeatPathPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, build, revision } = await loadBuildPage(params);
  const [history, partChanges] = await Promise.all([listRevisions({ buildId: build.id }), partChangesSince({ build, revision })]);
  const calibration = calibrationSchema.safeParse((revision.design as { calibration?: unknown }).calibration);
  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_16rem]">
      <div className="space-y-4">
        <div className="flex flex-wrap items-baseline gap-3">
          <h1 className="text-2xl font-semibold">{build.title}</h1>
          <span className="text-sm text-ink-soft">Heat path · revision {revision.number} · {build.ownerName}</span>
        </div>
        {build.variantNote && <p className="text-sm">Variant: <span className="rounded bg-ember-soft px-1.5 text-ember">{build.variantNote}</span></p>}
        <BuildNav buildId={build.id} current="heat-path" />
        <PartsChangedNotice buildId={build.id} revision={revision.number} design={revision.design} changes={partChanges} canEdit={build.access.canEdit} />
        <HeatPathEditor key={build.id} buildId={build.id} title={build.title} revision={revision.number} design={revision.design as JsonObject} canEdit={build.access.canEdit} calibration={calibration.success ? calibration.data : null} />
      </div>
      <aside className="space-y-4">
        <BuildActions buildId={build.id} isOwner={build.access.isOwner} />
        {build.access.isOwner && <MembersPanel buildId={build.id} />}
        <BuildReviews build={build} viewer={user} />
        <section className="rounded-lg border border-line bg-white/60 p-3 text-sm">
          <h2 className="mb-2 font-medium">History</h2>
          <ol className="space-y-1.5">
            {history.map((r) => (
              <li key={r.id}>
                <span className={r.number === build.currentRevision ? "font-medium" : ""}>r{r.number}</span>{" "}
                <span className="text-xs text-ink-soft">{r.createdAt.toISOString().slice(0, 16).replace("T", " ")}</span>
                {r.note && <div className="text-xs text-ink-soft">{r.note}</div>}
              </li>
            ))}
          </ol>
        </section>
      </aside>
    </div>
  );
}
