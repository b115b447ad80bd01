import Link from "next/link";
import { notFound } from "next/navigation";
import { DerivationView } from "@/components/classes/derivation-view";
import { ExampleActions, ExampleTeacherPanel } from "@/components/classes/example-actions";
import { fmtDate } from "@/components/classes/format";
import { Markdown } from "@/components/classes/markdown";
import { valuesWithheld } from "@/lib/classroom/access";
import { requirePageUser } from "@/server/auth/session";
import { exampleView } from "@/server/classes/examples";
import { loadExample, orNotFound } from "@/server/classes/load";
import { copiesWarning } from "@/server/classes/withheld";

export const metadata = { title: "Worked example" };

export default async function ExamplePage({ params }: { params: Promise<{ id: string; exampleId: string }> }) {
  const user = await requirePageUser();
  const { id, exampleId } = await params;
  const { example, cls } = await orNotFound(loadExample({ id: exampleId, viewer: user }));
  if (cls.id !== id) notFound();
  const view = await exampleView({ example, canTeach: cls.access.canTeach });
  const withheld = valuesWithheld(example, cls.access.canTeach);
  const copies = cls.access.canTeach ? await copiesWarning({ example }) : null;
  const e = view.example;
  return (
    <article className="space-y-5">
      <div>
        <Link href={`/classes/${cls.id}`} className="text-sm text-ink-soft hover:text-ember">← {cls.name}</Link>
        <h1 className="text-2xl font-semibold">
          {e.title}
          {view.canTeach && cls.access.canWrite && <Link href={`/classes/${cls.id}/examples/${e.id}/edit`} className="no-print ml-3 align-middle text-sm font-normal text-ink-soft hover:text-ember">Edit</Link>}
        </h1>
        <p className="text-sm text-ink-soft">
          Worked through revision {e.revision} of “{e.buildTitle}” by {e.authorName}. A saved revision never changes, so these numbers stay as published.
        </p>
      </div>
      <ExampleActions exampleId={e.id} handoutHref={`/classes/${cls.id}/examples/${e.id}/handout`} canFork={cls.access.canWrite && !withheld} />
      {view.canTeach && view.derivation && (
        <ExampleTeacherPanel
          exampleId={e.id}
          hideable={view.derivation.hideable}
          hidden={e.hidden ?? []}
          tolerancePercent={e.tolerancePercent}
          revealAt={e.revealAt ? e.revealAt.toISOString() : null}
          revealed={e.revealed}
          visibility={e.visibility}
          archived={!cls.access.canWrite}
        />
      )}
      {copies && <p role="note" data-testid="copies-warning" className="no-print rounded border border-tight/40 bg-tight/10 p-2 text-sm">{copies}</p>}
      {!view.canTeach && e.hiddenCount > 0 && !e.revealed && (
        <p className="rounded border border-ember/30 bg-ember-soft/40 p-2 text-sm">
          {e.hiddenCount} value{e.hiddenCount === 1 ? " is" : "s are"} hidden: work {e.hiddenCount === 1 ? "it" : "them"} out and check your answer (within {e.tolerancePercent} %).
          {e.revealAt && <> The values are revealed on {fmtDate(e.revealAt)}.</>} You can fork the example into your builds once they are.
        </p>
      )}
      {e.narrative.trim() && (
        <section aria-label="Narrative" className="rounded-lg border border-line bg-white/60 p-3">
          <Markdown text={e.narrative} />
        </section>
      )}
      <section aria-label="Derivation" className="space-y-2">
        <h2 className="text-lg font-medium">Derivation</h2>
        {view.derivation ? <DerivationView derivation={view.derivation} exampleId={e.id} hiddenKeys={view.canTeach ? e.hidden : undefined} /> : <p className="text-sm text-over">This revision could not be worked out, so there is no derivation. Open its Budget for the problems.</p>}
      </section>
      <p className="text-xs text-ink-soft">The numbers are estimates from the build&apos;s parts; a thermocouple test of the real build is the final word. Hot surfaces burn: see the Budget&apos;s cautions.</p>
    </article>
  );
}
