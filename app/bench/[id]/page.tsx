import Link from "next/link";
import { notFound } from "next/navigation";
import { RunView } from "@/components/bench/run-view";
import { requirePageUser } from "@/server/auth/session";
import { runJson } from "@/server/bench/json";
import { loadBenchRun } from "@/server/bench/load";

export const metadata = { title: "Bench run" };

export default async function BenchRunPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser();
  const row = await loadBenchRun({ id: (await params).id, viewer: user }).catch(() => null);
  if (!row) notFound();
  const run = runJson(row, user);
  return (
    <div className="space-y-4">
      <p className="text-sm"><Link href="/bench" className="text-ink-soft hover:text-ember">← Bench runs</Link></p>
      <div>
        <h1 className="text-2xl font-semibold">{run.title}</h1>
        <p className="text-sm text-ink-soft">Recorded by {run.mine ? "you" : run.ownerName} on {run.createdAt.slice(0, 10)} · {run.readingCount} readings · {run.visibility}</p>
      </div>
      <RunView run={run} />
    </div>
  );
}
