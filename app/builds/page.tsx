import Link from "next/link";
import { listBuilds, type BuildSummary } from "@/db/queries/builds";
import { BuildRowActions } from "@/components/builds/build-row-actions";
import { BuildsNotice } from "@/components/builds/builds-notice";
import { NewBuildButton } from "@/components/builds/new-build-button";
import { STARTING_POINT_INFO, STARTING_POINTS, startingDesign } from "@/lib/starter";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Builds" };

/** Each build followed by its variants, so heat-path alternatives are listed together. */
function grouped(builds: BuildSummary[]): (BuildSummary & { nested: boolean })[] {
  const ids = new Set(builds.map((b) => b.id));
  const children = new Map<string, BuildSummary[]>();
  for (const b of builds) {
    if (b.variantOf && ids.has(b.variantOf)) children.set(b.variantOf, [...(children.get(b.variantOf) ?? []), b]);
  }
  return builds
    .filter((b) => !(b.variantOf && ids.has(b.variantOf)))
    .flatMap((b) => [{ ...b, nested: false }, ...(children.get(b.id) ?? []).map((c) => ({ ...c, nested: true }))]);
}

function BuildList({ builds, empty, ownerActions = false }: { builds: BuildSummary[]; empty: string; ownerActions?: boolean }) {
  if (builds.length === 0) return <p className="text-sm text-ink-soft">{empty}</p>;
  return (
    <ul className="divide-y divide-line rounded-lg border border-line bg-white/60">
      {grouped(builds).map((b) => (
        <li key={b.id} className={`flex flex-wrap items-baseline gap-x-4 gap-y-1 py-3 pr-4 ${b.nested ? "pl-8" : "pl-4"}`}>
          <Link href={`/builds/${b.id}`} className="font-medium hover:text-ember">
            {b.nested && <span aria-hidden className="mr-1.5 text-ink-soft">↳</span>}
            {b.title}
          </Link>
          {b.variantNote && <span className="rounded bg-ember-soft px-1.5 text-xs text-ember">variant: {b.variantNote}</span>}
          <span className="text-xs text-ink-soft">revision {b.currentRevision} · {b.ownerName} · {b.visibility}</span>
          <span className="ml-auto flex flex-wrap gap-3 text-sm">
            <Link href={`/builds/${b.id}`} className="text-ink-soft hover:text-ember">Heat path</Link>
            <Link href={`/builds/${b.id}/budget`} className="text-ink-soft hover:text-ember">Budget</Link>
            {ownerActions && <BuildRowActions id={b.id} title={b.title} archived={b.archivedAt !== null} />}
          </span>
        </li>
      ))}
    </ul>
  );
}

export default async function BuildsPage({ searchParams }: { searchParams: Promise<{ q?: string | string[] }> }) {
  const user = await requirePageUser();
  const raw = (await searchParams).q;
  const q = (Array.isArray(raw) ? raw[0] : raw)?.trim().slice(0, 160) || undefined;
  const { mine, shared, archived } = await listBuilds({ viewer: user, q });
  return (
    <div className="space-y-8">
      <div className="flex items-start gap-4">
        <h1 className="text-2xl font-semibold">Builds</h1>
        <div className="ml-auto">
          <NewBuildButton points={STARTING_POINTS.map((key) => ({ key, ...STARTING_POINT_INFO[key], design: startingDesign(key) }))} />
        </div>
      </div>
      <form role="search" className="flex items-center gap-2" action="/builds">
        <input name="q" defaultValue={q ?? ""} placeholder="Search builds by name" aria-label="Search builds by name" className="w-72 rounded border border-line bg-white px-3 py-1.5 text-sm" />
        <button type="submit" className="rounded border border-line px-3 py-1.5 text-sm">Search</button>
        {q && <Link href="/builds" className="text-sm text-ink-soft hover:text-ember">Show all</Link>}
      </form>
      <BuildsNotice />
      <section className="space-y-3">
        <h2 className="text-lg font-medium">Mine</h2>
        <BuildList builds={mine} ownerActions empty={q ? `None of your builds is called anything like “${q}”.` : "No builds yet. Start one, or copy a shared build."} />
      </section>
      <section className="space-y-3">
        <h2 className="text-lg font-medium">Shared with me</h2>
        <BuildList builds={shared} empty={q ? `Nothing shared with you matches “${q}”.` : "Nothing is shared with you yet."} />
      </section>
      {archived.length > 0 && (
        <details className="space-y-3">
          <summary className="cursor-pointer text-lg font-medium">Archived ({archived.length})</summary>
          <BuildList builds={archived} ownerActions empty="" />
        </details>
      )}
    </div>
  );
}
