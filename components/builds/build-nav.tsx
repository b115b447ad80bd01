import Link from "next/link";

const TABS = [
  ["heat-path", "Heat path", ""],
  ["budget", "Budget", "/budget"],
  ["report", "Report", "/report"],
  ["reviews", "Reviews", "/reviews"],
] as const;

export type BuildTab = (typeof TABS)[number][0];

/** The tabs of one build's pages. */
export function BuildNav({ buildId, current }: { buildId: string; current: BuildTab }) {
  return (
    <nav className="no-print flex gap-4 text-sm" aria-label="Build">
      {TABS.map(([key, label, suffix]) =>
        key === current ? (
          <span key={key} className="font-medium text-ember">{label}</span>
        ) : (
          <Link key={key} href={`/builds/${buildId}${suffix}`} className="hover:text-ember">{label}</Link>
        ),
      )}
    </nav>
  );
}
