import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { PartForm } from "@/components/parts/part-form";
import { getPart } from "@/db/queries/parts";
import { requirePageUser } from "@/server/auth/session";
import { partJson, viewerOf } from "@/server/parts-api";

export const metadata = { title: "Edit part" };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser();
  const { id } = await params;
  const viewer = viewerOf(user);
  const record = await getPart({ id, viewer });
  if (!record) notFound();
  const part = partJson(record, viewer);
  // Someone else's part: back to its page, where Duplicate makes an editable copy.
  if (!part.canEdit) redirect(`/parts/${id}`);
  return (
    <div className="space-y-5">
      <p className="text-sm text-ink-soft">
        <Link href={`/parts/${id}`} className="hover:text-ember">{part.name}</Link> / edit
      </p>
      <h1 className="text-2xl font-semibold">Edit {part.name}</h1>
      <PartForm kind={part.kind} part={part} prefs={{ length: user.lengthUnits, temperature: user.temperatureUnit }} />
    </div>
  );
}
