import Link from "next/link";
import { CreateClassForm, JoinByCodeForm } from "@/components/classes/class-forms";
import { listClassesFor } from "@/db/queries/classes";
import { CLASS_CREATOR_ROLES } from "@/lib/classroom/access";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Classroom" };

export default async function ClassroomPage() {
  const user = await requirePageUser();
  const classes = await listClassesFor({ viewer: user });
  const canCreate = (CLASS_CREATOR_ROLES as readonly string[]).includes(user.role);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Classroom</h1>
        <p className="text-sm text-ink-soft">Worked examples where every number comes with its formula, inputs and source; exercises you start from a copy and hand in.</p>
      </div>
      <section className="space-y-2">
        <h2 className="text-lg font-medium">My classes</h2>
        {classes.length === 0 ? (
          <p className="text-sm text-ink-soft">You are in no class yet. Join one with the code your instructor gives out{canCreate ? ", or open one" : ""}.</p>
        ) : (
          <ul className="divide-y divide-line rounded-lg border border-line bg-white/60" data-testid="class-list">
            {classes.map((c) => (
              <li key={c.id} className="flex flex-wrap items-center gap-3 px-3 py-2">
                <Link href={`/classes/${c.id}`} className="font-medium hover:text-ember">{c.name}</Link>
                {c.term && <span className="text-xs text-ink-soft">{c.term}</span>}
                {c.archivedAt && <span className="rounded bg-line px-1.5 text-xs">archived</span>}
                <span className="ml-auto text-xs text-ink-soft">{c.myRole ?? "admin"} · {c.memberCount} member{c.memberCount === 1 ? "" : "s"}</span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <div className="grid gap-4 sm:grid-cols-2">
        <JoinByCodeForm />
        {canCreate && <CreateClassForm />}
      </div>
    </div>
  );
}
