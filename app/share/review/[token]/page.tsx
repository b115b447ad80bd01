import type { Metadata } from "next";
import { VERDICT_STYLE } from "@/components/budget/format";
import { PinIcon } from "@/components/reviews/pin-icon";
import { SharedHeatPaths } from "@/components/reviews/shared-heat-paths";
import { ApiError } from "@/lib/http/api-error";
import { DASH, formatAgainstLimit, formatFigure, formatHeadroom } from "@/lib/units/figures";
import { openReviewShare } from "@/server/reviews/review-share";

export const metadata: Metadata = { title: "Shared review", robots: { index: false, follow: false } };

/** Read-only view of a review from its share link: verdict, comments and limits; no sign-in, no private values. */
export default async function SharedReviewPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const shared = await openReviewShare({ token }).catch((e: unknown) => {
    if (e instanceof ApiError) return e;
    throw e;
  });
  if (shared instanceof ApiError) {
    return (
      <section className="mx-auto max-w-lg space-y-2 rounded-lg border border-line bg-white/60 p-6">
        <h1 className="text-xl font-semibold">This link does not open anything</h1>
        <p role="alert" className="text-sm text-over">{shared.message}</p>
        <p className="text-sm text-ink-soft">{shared.code === "conflict:share" ? "Try the link again after the values are revealed." : "Ask the reviewer or the build\u2019s owner for a new link."}</p>
      </section>
    );
  }
  const r = shared.review;
  return (
    <div className="space-y-6" data-testid="shared-review">
      <header className="space-y-1">
        <p className="text-xs uppercase tracking-wide text-ink-soft">Shared review, read-only{shared.expiresAt ? ` · until ${new Date(shared.expiresAt).toLocaleDateString()}` : ""}</p>
        <h1 className="text-2xl font-semibold">{r.buildTitle}</h1>
        <p className="text-sm text-ink-soft">
          Revision {r.revisionNumber} · by {r.ownerName} · reviewed by {r.reviewerName}
          {r.variantNote ? ` · variant: ${r.variantNote}` : ""}
        </p>
      </header>
      <section aria-label="Verdict" data-testid="shared-verdict" className="rounded-lg border border-line bg-white/70 p-4 text-sm">
        <h2 className="mb-1 font-semibold">Verdict: {r.statusLabel}</h2>
        {r.summary ? <p className="whitespace-pre-wrap">{r.summary}</p> : <p className="text-ink-soft">The reviewer has not recorded a verdict yet.</p>}
      </section>
      <section aria-label="Comments" className="space-y-2 rounded-lg border border-line bg-white/60 p-4 text-sm">
        <h2 className="font-semibold">Comments</h2>
        {shared.comments.length === 0 && <p className="text-ink-soft">No comments.</p>}
        <ol className="space-y-2">
          {shared.comments.map((c, i) => (
            <li key={i} className="rounded border border-line bg-white/70 p-2" data-testid="shared-comment">
              <div className="mb-0.5 flex flex-wrap gap-2 text-xs text-ink-soft"><span className="rounded bg-paper-deep px-1.5"><PinIcon /> {c.target}</span><span className="ml-auto">{c.authorName} · {new Date(c.createdAt).toLocaleDateString()}</span></div>
              <p className="whitespace-pre-wrap">{c.body}</p>
            </li>
          ))}
        </ol>
      </section>
      <section aria-label="Heat path" className="space-y-2 rounded-lg border border-line bg-white/60 p-4 text-sm" data-testid="shared-heat-path">
        <h2 className="font-semibold">Heat path of revision {r.revisionNumber}</h2>
        <SharedHeatPaths heatPaths={shared.heatPaths} />
      </section>
      {shared.results && (
        <section aria-label="Limits" className="space-y-3 rounded-lg border border-line bg-white/60 p-4 text-sm">
          <h2 className="font-semibold">Limits in every scenario</h2>
          <p className="text-xs text-ink-soft">Temperatures are estimates; a thermocouple test of the real build is the final word. A limit from one of the owner&apos;s own parts is not shown.</p>
          {shared.results.scenarios.map((s) => (
            <div key={s.label}>
              <h3 className="mb-1 font-medium">{s.label}{s.verdict && <span className={`ml-2 rounded border px-1.5 text-xs ${VERDICT_STYLE[s.verdict] ?? ""}`}>{s.verdict}</span>}</h3>
              <table className="w-full text-left">
                <thead className="text-xs text-ink-soft"><tr><th className="py-0.5 pr-3 font-medium">Place</th><th className="py-0.5 pr-3 font-medium">Temperature</th><th className="py-0.5 pr-3 font-medium">Limit</th><th className="py-0.5 pr-3 font-medium">Headroom</th><th className="py-0.5 font-medium">Verdict</th></tr></thead>
                <tbody>
                  {s.limits.map((l) => {
                    // A failing value and its limit at one precision, so rounding never shows them equal.
                    const shown = l.limitC === null ? null : formatAgainstLimit(l.temperatureC, l.limitC, l.kind, "temperature");
                    return (
                      <tr key={l.place} className="border-t border-line">
                        <td className="py-0.5 pr-3">{l.place}</td>
                        <td className="py-0.5 pr-3">{shown ? shown.value : formatFigure(l.temperatureC, "temperature")}</td>
                        <td className="py-0.5 pr-3">{shown ? shown.limit : "the owner's part"}</td>
                        <td className="py-0.5 pr-3">{l.headroomK === null ? DASH : formatHeadroom(l.headroomK)}</td>
                        <td className="py-0.5">{l.verdict}</td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            </div>
          ))}
        </section>
      )}
    </div>
  );
}
