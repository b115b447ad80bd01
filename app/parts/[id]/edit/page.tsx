import Link from "next/link";
import { redirect } from "next/navigation";
import { PartForm } from "@/components/parts/part-form-lazy";
import { loadPartPage } from "@/server/parts/api";

export const metadata = { title: "Edit part" };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const { user, id, part } = await loadPartPage(params);
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
