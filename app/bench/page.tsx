import Link from "next/link";
import { RecordRun, type PoweredOption } from "@/components/bench/record-run";
import { listBuilds } from "@/db/queries/builds";
import { listParts } from "@/db/queries/parts";
import { partListQuerySchema } from "@/lib/parts";
import { requirePageUser } from "@/server/auth/session";
import { runSummaryJson } from "@/server/bench/json";
import { listVisibleRuns } from "@/server/bench/load";

export const metadata = { title: "Bench runs" };

const p3 = (x: number) => x.toPrecision(3);

export default async function BenchPage() {
  const user = await requirePageUser();
  const [rows, emitters, builds] = await Promise.all([
    listVisibleRuns({ viewer: user }),
    listParts({ viewer: user, query: partListQuerySchema.parse({ kind: "emitter", pageSize: "100" }) }),
    listBuilds({ viewer: user }),
  ]);
  const runs = rows.map((r) => runSummaryJson(r, user));
  const powered: PoweredOption[] = [
    ...emitters.items.map((p) => ({ value: `part:${p.id}`, label: p.name, group: "Parts" as const })),
    ...builds.mine.map((b) => ({ value: `build:${b.id}`, label: b.title, group: "Builds" as const })),
  ];
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Bench runs</h1>
        <p className="text-sm text-ink-soft">A warm-up measured on the bench, turned into numbers the model can use: a salvaged sink's resistance to the air and its heat capacity, with how sure they are.</p>
      </div>
      <RecordRun powered={powered} />
      <section>
        <h2 className="mb-2 text-lg font-medium">Recorded runs</h2>
        {runs.length === 0 ? (
          <p className="text-sm text-ink-soft">No runs yet.</p>
        ) : (
          <table className="w-full text-sm" data-testid="bench-runs">
            <thead className="text-left text-ink-soft"><tr><th className="py-1 font-medium">Run</th><th className="font-medium">By</th><th className="font-medium">Readings</th><th className="font-medium">Sink-to-air (95 %)</th><th className="font-medium">Part kept</th></tr></thead>
            <tbody>
              {runs.map((r) => (
                <tr key={r.id} className="border-t border-line">
                  <td className="py-1"><Link href={`/bench/${r.id}`} className="hover:text-ember">{r.title}</Link> <span className="text-xs text-ink-soft">{r.createdAt.slice(0, 10)}{r.visibility === "shared" ? " · shared" : ""}</span></td>
                  <td>{r.mine ? "you" : r.ownerName}</td>
                  <td>{r.readingCount}</td>
                  <td>{r.sinkToAirKPerW ? `${p3(r.sinkToAirKPerW.value)} K/W (${p3(r.sinkToAirKPerW.low)}–${p3(r.sinkToAirKPerW.high)})` : "a build's warm-up"}</td>
                  <td>{r.fittedPartId ? <Link href={`/parts/${r.fittedPartId}`} className="hover:text-ember">open</Link> : "–"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
    </div>
  );
}
