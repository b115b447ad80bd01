import Link from "next/link";
import { notFound } from "next/navigation";
import { fmtDate } from "@/components/classes/format";
import { Markdown } from "@/components/classes/markdown";
import { RosterTable } from "@/components/classes/roster-table";
import { StudentExercise } from "@/components/classes/student-exercise";
import { getBuild } from "@/db/queries/builds";
import { getCopy, listHandins } from "@/db/queries/classwork";
import { requirePageUser } from "@/server/auth/session";
import { loadExercise, orNotFound } from "@/server/classes/load";
import { handinJson, roster } from "@/server/classes/roster";
import { starterWarning, starterWithheldFor } from "@/server/classes/withheld";

export const metadata = { title: "Exercise" };

export default async function ExercisePage({ params }: { params: Promise<{ id: string; exerciseId: string }> }) {
  const user = await requirePageUser();
  const { id, exerciseId } = await params;
  const { exercise, cls } = await orNotFound(loadExercise({ id: exerciseId, viewer: user }));
  if (cls.id !== id) notFound();
  const archived = cls.archivedAt !== null;
  const head = (
    <div className="space-y-1">
      <Link href={`/classes/${cls.id}`} className="text-sm text-ink-soft hover:text-ember">← {cls.name}</Link>
      <h1 className="text-2xl font-semibold">{exercise.title}</h1>
      <p className="text-sm text-ink-soft">Due {fmtDate(exercise.dueAt)} · starts from revision {exercise.starterRevision} of “{exercise.starterTitle}”</p>
      {exercise.instructions.trim() && <div className="rounded-lg border border-line bg-white/60 p-3"><Markdown text={exercise.instructions} /></div>}
    </div>
  );
  if (cls.access.canTeach) {
    const [r, warning] = await Promise.all([roster(exercise), starterWarning({ exercise })]);
    const rows = JSON.parse(JSON.stringify(r.rows));
    return (
      <div className="space-y-5">
        {head}
        {warning && <p role="note" data-testid="starter-warning" className="rounded border border-tight/40 bg-tight/10 p-2 text-sm">{warning}</p>}
        <section className="space-y-2">
          <h2 className="text-lg font-medium">Roster</h2>
          <p className="text-xs text-ink-soft">Each student&apos;s counting (latest) hand-in; figures are the hottest over the driver modes, with the change against the starter (green cooler, red hotter). Click a heading to sort.</p>
          <RosterTable rows={rows} starter={r.starter} />
        </section>
      </div>
    );
  }
  const [copy, mine, startBlocked] = await Promise.all([getCopy({ exerciseId: exercise.id, userId: user.id }), listHandins({ exerciseId: exercise.id, studentId: user.id }), starterWithheldFor({ exercise, cls, viewer: user })]);
  const copyBuild = copy ? await getBuild({ id: copy.buildId, viewer: user }) : undefined;
  const handins = mine.map((h) => handinJson(h, exercise));
  return (
    <div className="space-y-5">
      {head}
      <StudentExercise exerciseId={exercise.id} myCopy={copyBuild?.id ?? null} currentRevision={copyBuild?.currentRevision ?? null} countingRevision={mine.find((h) => h.buildId === copyBuild?.id)?.revisionNumber ?? null} dueAt={exercise.dueAt.toISOString()} archived={archived} startBlocked={startBlocked} />
      <section className="space-y-2">
        <h2 className="text-lg font-medium">My hand-ins</h2>
        {handins.length === 0 ? <p className="text-sm text-ink-soft">Nothing handed in yet.</p> : (
          <ul className="space-y-2" data-testid="my-handins">
            {handins.map((h, i) => (
              <li key={h.id} className="rounded-lg border border-line bg-white/60 p-3 text-sm">
                <div className="flex flex-wrap items-center gap-2">
                  <strong>Revision {h.revision}</strong>
                  <span className="text-ink-soft">handed in {fmtDate(h.submittedAt)}</span>
                  {h.late && <span className="rounded bg-over/10 px-1.5 text-xs text-over">late</span>}
                  {i === 0 && <span className="rounded bg-ok/10 px-1.5 text-xs text-ok">counts</span>}
                  <Link href={h.compareHref} className="ml-auto text-xs hover:text-ember">Side by side with the starter</Link>
                </div>
                {h.feedback && (
                  <div className="mt-2 rounded border border-line bg-paper p-2" data-testid="feedback">
                    <div className="text-xs text-ink-soft">Feedback{h.mark ? <> · mark <strong className="text-ink">{h.mark}</strong></> : null}{h.feedbackAt ? ` · ${fmtDate(h.feedbackAt)}` : ""}</div>
                    <p className="whitespace-pre-wrap">{h.feedback}</p>
                  </div>
                )}
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
