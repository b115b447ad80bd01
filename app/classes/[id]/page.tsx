import Link from "next/link";
import { ClassAdmin } from "@/components/classes/class-admin";
import { fmtDate } from "@/components/classes/format";
import { NewExampleForm, NewExerciseForm } from "@/components/classes/new-work-forms";
import { listBuilds } from "@/db/queries/builds";
import { listMembers, listPendingInvitations } from "@/db/queries/classes";
import { getCopy, listExamples, listExercises, listHandins } from "@/db/queries/classwork";
import { isRevealed } from "@/lib/classroom/access";
import { requirePageUser } from "@/server/auth/session";
import { loadClass, orNotFound } from "@/server/classes/load";

export const metadata = { title: "Classroom" };

export default async function ClassPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser();
  const cls = await orNotFound(loadClass({ id: (await params).id, viewer: user }));
  const teach = cls.access.canTeach;
  const archived = cls.archivedAt !== null;
  const [members, examples, exercises] = await Promise.all([listMembers({ classId: cls.id }), listExamples({ classId: cls.id }), listExercises({ classId: cls.id })]);
  const invitations = teach ? await listPendingInvitations({ classId: cls.id }) : [];
  const myBuilds = teach ? (await listBuilds({ viewer: user })).mine.map((b) => ({ id: b.id, title: b.title, currentRevision: b.currentRevision })) : [];
  const status = await Promise.all(
    exercises.map(async (x) => {
      if (teach) return { id: x.id, text: `${new Set((await listHandins({ exerciseId: x.id })).map((h) => h.studentId)).size} handed in` };
      const [copy, mine] = await Promise.all([getCopy({ exerciseId: x.id, userId: user.id }), listHandins({ exerciseId: x.id, studentId: user.id })]);
      const latest = mine[0];
      return { id: x.id, text: latest ? `handed in ${fmtDate(latest.submittedAt)}${latest.late ? " (late)" : ""}${latest.feedback ? " · feedback" : ""}` : copy ? "started" : "not started" };
    }),
  );
  return (
    <div className="space-y-6">
      <div>
        <Link href="/classes" className="text-sm text-ink-soft hover:text-ember">← Classroom</Link>
        <h1 className="text-2xl font-semibold">{cls.name}</h1>
        <p className="text-sm text-ink-soft">
          {cls.term && <>{cls.term} · </>}you are {cls.access.role === "admin" ? "an admin here" : cls.access.role === "instructor" ? "an instructor" : "a student"}
          {archived && <span className="ml-2 rounded bg-line px-1.5 text-xs text-ink">archived: read-only</span>}
        </p>
      </div>

      {teach && (
        <ClassAdmin
          classId={cls.id}
          joinCode={cls.joinCode}
          archived={archived}
          meId={user.id}
          members={members.map((m) => ({ userId: m.userId, displayName: m.displayName, email: m.email, role: m.role }))}
          invitations={invitations.map((i) => ({ id: i.id, email: i.email, expiresAt: i.expiresAt.toISOString() }))}
        />
      )}

      <section className="space-y-2">
        <h2 className="text-lg font-medium">Worked examples</h2>
        {examples.length === 0 ? <p className="text-sm text-ink-soft">None yet.</p> : (
          <ul className="divide-y divide-line rounded-lg border border-line bg-white/60" data-testid="example-list">
            {examples.map((e) => (
              <li key={e.id} className="flex flex-wrap items-center gap-3 px-3 py-2 text-sm">
                <Link href={`/classes/${cls.id}/examples/${e.id}`} className="font-medium hover:text-ember">{e.title}</Link>
                <span className="text-xs text-ink-soft">{e.buildTitle}, revision {e.revisionNumber}</span>
                {e.hidden.length > 0 && <span className="rounded bg-ember-soft px-1.5 text-xs text-ember">{isRevealed(e) ? "answers revealed" : `${e.hidden.length} question${e.hidden.length === 1 ? "" : "s"}`}</span>}
                {teach && e.visibility === "link" && <span className="text-xs text-ink-soft">link on</span>}
              </li>
            ))}
          </ul>
        )}
        {teach && !archived && <NewExampleForm classId={cls.id} builds={myBuilds} />}
      </section>

      <section className="space-y-2">
        <h2 className="text-lg font-medium">Exercises</h2>
        {exercises.length === 0 ? <p className="text-sm text-ink-soft">None yet.</p> : (
          <ul className="divide-y divide-line rounded-lg border border-line bg-white/60" data-testid="exercise-list">
            {exercises.map((x) => (
              <li key={x.id} className="flex flex-wrap items-center gap-3 px-3 py-2 text-sm">
                <Link href={`/classes/${cls.id}/exercises/${x.id}`} className="font-medium hover:text-ember">{x.title}</Link>
                <span className="text-xs text-ink-soft">due {fmtDate(x.dueAt)}</span>
                <span className="ml-auto text-xs">{status.find((s) => s.id === x.id)?.text}</span>
              </li>
            ))}
          </ul>
        )}
        {teach && !archived && <NewExerciseForm classId={cls.id} builds={myBuilds} />}
      </section>

      {!teach && (
        <section className="space-y-1 text-sm">
          <h2 className="text-lg font-medium">Members</h2>
          <p className="text-ink-soft">{members.map((m) => `${m.displayName}${m.role === "instructor" ? " (instructor)" : ""}`).join(" · ")}</p>
        </section>
      )}
    </div>
  );
}
