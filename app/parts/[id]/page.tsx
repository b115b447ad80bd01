import Link from "next/link";
import { PartEvidence } from "@/components/bench/part-evidence";
import { AttachmentsPanel } from "@/components/parts/attachments-panel";
import { CurveChart } from "@/components/parts/curve-chart-lazy";
import { PROVENANCE_LABELS, VISIBILITY_LABELS } from "@/components/parts/labels";
import { PartActions } from "@/components/parts/part-actions";
import { PartFields } from "@/components/parts/part-fields";
import type { CurveKind } from "@/lib/curves";
import { kindDefinition } from "@/lib/parts";
import { getPartVerification } from "@/db/queries/part-verifications";
import { evidenceForPart } from "@/server/bench/load";
import { loadPartPage } from "@/server/parts/api";
import { formatMoney } from "@/lib/units/figures";

export const metadata = { title: "Part" };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const { user, id, part } = await loadPartPage(params);
  const prefs = { length: user.lengthUnits, temperature: user.temperatureUnit } as const;
  const def = kindDefinition(part.kind);
  const verification = part.verified ? await getPartVerification({ partId: part.id }) : null;
  const measured = part.kind === "heatsink" && part.provenance === "measured";
  const evidence = measured ? await evidenceForPart({ partId: part.id, viewer: user }) : [];
  const curves = (def.curveKinds as readonly CurveKind[]).flatMap((kind) => {
    const curve = part.curves[kind] as { points: { x: number; y: number }[] } | undefined;
    return curve ? [{ kind, points: curve.points }] : [];
  });
  return (
    <article className="space-y-6">
      <header className="space-y-2">
        <p className="text-sm text-ink-soft">
          <Link href="/parts" className="hover:text-ember">Parts bin</Link> / {def.label}
        </p>
        <h1 className="text-2xl font-semibold">{part.name}</h1>
        <p className="flex flex-wrap gap-2 text-xs">
          <span className="rounded bg-ember-soft px-2 py-0.5 text-ember">{PROVENANCE_LABELS[part.provenance]}</span>
          <span className="rounded bg-paper-deep px-2 py-0.5">{VISIBILITY_LABELS[part.visibility]}</span>
          <span className="text-ink-soft">by {part.owner.displayName}</span>
          {part.costEur !== null && <span className="text-ink-soft">· {formatMoney(part.costEur)}</span>}
        </p>
        {part.provenanceNote && <p className="max-w-3xl text-sm text-ink-soft">Source: {part.provenanceNote}</p>}
        {verification ? (
          <p className="max-w-3xl text-sm" data-testid="verification">
            <span className="mr-2 rounded bg-ok/10 px-2 py-0.5 text-xs text-ok">Verified</span>
            {`Verified against ${verification.against}${verification.attachment ? ` (attached: ${verification.attachment.filename})` : ""}, by ${verification.byName} on ${verification.at.toISOString().slice(0, 10)}.`}
          </p>
        ) : (
          part.provenance === "estimate" && <p className="max-w-3xl text-xs text-ink-soft">An estimate: nobody has checked these values against a datasheet or a measurement.</p>
        )}
        <PartActions id={part.id} name={part.name} canEdit={part.canEdit} isAdmin={user.role === "admin"} verified={part.verified} provenance={part.provenance} />
      </header>
      <section aria-labelledby="figures-heading" className="space-y-3">
        <h2 id="figures-heading" className="text-lg font-medium">Figures</h2>
        <PartFields part={part} prefs={prefs} />
      </section>
      {curves.length > 0 && (
        <section aria-labelledby="curves-heading" className="space-y-3">
          <h2 id="curves-heading" className="text-lg font-medium">Curves</h2>
          <div className="grid gap-4 md:grid-cols-2">
            {curves.map((c) => (
              <CurveChart key={c.kind} kind={c.kind} points={c.points} prefs={prefs} />
            ))}
          </div>
        </section>
      )}
      {measured && <PartEvidence runs={evidence} />}
      <AttachmentsPanel partId={part.id} canEdit={part.canEdit} />
    </article>
  );
}
