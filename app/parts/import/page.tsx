import { ImportPanel } from "@/components/parts/import-panel";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Import parts" };

export default async function Page() {
  await requirePageUser();
  return (
    <div className="space-y-5">
      <div>
        <h1 className="text-2xl font-semibold">Import parts from CSV</h1>
        <p className="text-sm text-ink-soft">One kind per file. Preview first: every row is checked, and the import creates all good rows at once or nothing.</p>
      </div>
      <ImportPanel />
    </div>
  );
}
