import Link from "next/link";
import { buttonClass, quietButtonClass } from "@/components/parts/labels";
import { PartsBin } from "@/components/parts/parts-bin";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Parts bin" };

export default async function Page() {
  const user = await requirePageUser();
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end gap-3">
        <div className="mr-auto">
          <h1 className="text-2xl font-semibold">Parts bin</h1>
          <p className="text-sm text-ink-soft">Emitters, drivers, heatsinks, cells and the rest — every figure with its unit and where it came from.</p>
        </div>
        <Link href="/parts/import" className={quietButtonClass}>Import CSV</Link>
        <Link href="/parts/new" className={buttonClass}>New part</Link>
      </div>
      <PartsBin prefs={{ length: user.lengthUnits, temperature: user.temperatureUnit }} />
    </div>
  );
}
