import Link from "next/link";
import { KIND_OPTIONS } from "@/components/parts/labels";
import { PartForm } from "@/components/parts/part-form-lazy";
import { PART_KINDS, type PartKind } from "@/lib/parts";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "New part" };

function isKind(value: unknown): value is PartKind {
  return typeof value === "string" && (PART_KINDS as readonly string[]).includes(value);
}

export default async function Page({ searchParams }: { searchParams: Promise<{ kind?: string | string[] }> }) {
  const user = await requirePageUser();
  const { kind } = await searchParams;
  const chosen = isKind(kind) ? kind : undefined;
  return (
    <div className="space-y-5">
      <h1 className="text-2xl font-semibold">New part</h1>
      <nav aria-label="Kind of part" className="flex flex-wrap gap-2 text-sm">
        {KIND_OPTIONS.map((o) => (
          <Link
            key={o.value}
            href={`/parts/new?kind=${o.value}`}
            aria-current={o.value === chosen ? "page" : undefined}
            className={`rounded-full border px-3 py-1 ${o.value === chosen ? "border-ember bg-ember-soft text-ember" : "border-line bg-white hover:border-ember"}`}
          >
            {o.label}
          </Link>
        ))}
      </nav>
      {chosen ? (
        <PartForm key={chosen} kind={chosen} prefs={{ length: user.lengthUnits, temperature: user.temperatureUnit }} />
      ) : (
        <p className="text-sm text-ink-soft">Choose what kind of part to add.</p>
      )}
    </div>
  );
}
