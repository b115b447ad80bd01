import type { Metadata } from "next";
import { BudgetReport } from "@/components/budget/budget-report";
import { designDiff } from "@/lib/compare";
import { ApiError } from "@/lib/http/api-error";
import { buildDesignSchema } from "@/lib/retrofit";
import { openShare } from "@/server/reviews/share";
import { formatMoney } from "@/lib/units/figures";

export const metadata: Metadata = { title: "Shared budget", robots: { index: false, follow: false } };

/** Read-only view of one revision's Budget from a share link: no sign-in, nothing else of the app. */
export default async function SharedPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const shared = await openShare({ token }).catch((e: unknown) => {
    if (e instanceof ApiError) return e;
    throw e;
  });
  if (shared instanceof ApiError) {
    return (
      <section className="mx-auto max-w-lg space-y-2 rounded-lg border border-line bg-white/60 p-6">
        <h1 className="text-xl font-semibold">This link does not open anything</h1>
        <p role="alert" className="text-sm text-over">{shared.message}</p>
        <p className="text-sm text-ink-soft">{shared.code === "conflict:share" ? "Try the link again after the values are revealed." : "Ask the build\u2019s owner for a new link."}</p>
      </section>
    );
  }
  const parsed = buildDesignSchema.safeParse(shared.revision.design);
  const publicNames = new Map(shared.parts.map((p) => [p.id, p.name]));
  const design = parsed.success ? designDiff([parsed.data], (id) => publicNames.get(id) ?? "a part of the owner's") : [];
  const ambientC = parsed.success ? parsed.data.environment.ambientC : 25;
  return (
    <div className="space-y-6" data-testid="shared-budget">
      <header className="space-y-1">
        <p className="text-xs uppercase tracking-wide text-ink-soft">Shared read-only{shared.expiresAt ? ` · until ${new Date(shared.expiresAt).toLocaleDateString()}` : ""}</p>
        <h1 className="text-2xl font-semibold">{shared.build.title}</h1>
        <p className="text-sm text-ink-soft">
          Revision {shared.revision.number} · by {shared.build.ownerName}
          {shared.build.variantNote ? ` · variant: ${shared.build.variantNote}` : ""}
        </p>
        {shared.build.summary && <p className="text-sm">{shared.build.summary}</p>}
      </header>
      <section className="rounded-lg border border-line bg-white/60 p-4" aria-label="Design">
        <h2 className="mb-2 font-semibold">The build</h2>
        <dl className="grid gap-x-4 gap-y-1 text-sm sm:grid-cols-[14rem_1fr]">
          {design.map((row) => (
            <div key={row.slot} className="contents">
              <dt className="text-ink-soft">{row.label}</dt>
              <dd>{row.values[0]}</dd>
            </div>
          ))}
        </dl>
      </section>
      <section className="rounded-lg border border-line bg-white/60 p-4" aria-label="Public parts">
        <h2 className="mb-2 font-semibold">Public parts it uses</h2>
        {shared.parts.length === 0 ? (
          <p className="text-sm text-ink-soft">None: the parts of this build are the owner&apos;s own.</p>
        ) : (
          <table className="w-full text-left text-sm">
            <thead className="text-xs uppercase tracking-wide text-ink-soft">
              <tr><th className="py-1 pr-3 font-medium">Kind</th><th className="py-1 pr-3 font-medium">Name</th><th className="py-1 pr-3 font-medium">Provenance</th><th className="py-1 font-medium">Cost</th></tr>
            </thead>
            <tbody>
              {shared.parts.map((p) => (
                <tr key={p.id} className="border-t border-line">
                  <td className="py-1 pr-3">{p.kind}</td>
                  <td className="py-1 pr-3">{p.name}</td>
                  <td className="py-1 pr-3">{p.provenance}</td>
                  <td className="py-1">{formatMoney(p.costEur)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
      <section className="space-y-2" aria-label="Budget">
        <h2 className="font-semibold">Budget</h2>
        <BudgetReport evaluation={shared.result} ambientC={ambientC} />
      </section>
    </div>
  );
}
