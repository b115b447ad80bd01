import Link from "next/link";
import { notFound } from "next/navigation";
import { ExampleEditForm } from "@/components/classes/example-edit-form";
import { partChangesSince } from "@/server/builds/part-changes";
import { requirePageUser } from "@/server/auth/session";
import { solveExample } from "@/server/classes/examples";
import { loadExample, orNotFound } from "@/server/classes/load";

export const metadata = { title: "Edit worked example" };

/** Instructors edit a published example's title and narrative; its revision, and so every number, stays as published. */
export default async function EditExamplePage({ params }: { params: Promise<{ id: string; exampleId: string }> }) {
  const user = await requirePageUser();
  const { id, exampleId } = await params;
  const { example, cls } = await orNotFound(loadExample({ id: exampleId, viewer: user }));
  // Students get the same "not found" as for anything they may not open.
  if (cls.id !== id || !cls.access.canTeach) notFound();
  const { build, revision } = await solveExample(example);
  const changed = await partChangesSince({ build: { ...build, access: { canView: true, canEdit: false, isOwner: false } }, revision });
  const back = `/classes/${cls.id}/examples/${example.id}`;
  return (
    <article className="max-w-3xl space-y-4">
      <div>
        <Link href={back} className="text-sm text-ink-soft hover:text-ember">← {example.title}</Link>
        <h1 className="text-2xl font-semibold">Edit the worked example</h1>
        <p className="text-sm text-ink-soft">
          It works through revision {example.revisionNumber} of “{example.buildTitle}”, with that revision&apos;s parts as they were when it was saved: editing a part in the Parts bin never moves its numbers. To work through a newer revision, publish a new example.
        </p>
        {changed.length > 0 && (
          <p className="mt-2 rounded border border-line bg-paper-deep/60 p-2 text-xs" data-testid="parts-changed">
            {changed.length === 1 ? "One part" : `${changed.length} parts`} behind this revision changed in the bin since ({changed.map((c) => c.name).join(", ")}); the example keeps the figures of the saved parts.
          </p>
        )}
      </div>
      <ExampleEditForm exampleId={example.id} backHref={back} title={example.title} narrative={example.narrative} archived={!cls.access.canWrite} />
      <p className="text-xs text-ink-soft">Which values are questions, the tolerance, the reveal date and who may open the example are set on the example&apos;s page.</p>
    </article>
  );
}
