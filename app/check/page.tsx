import { QuickCheckForm } from "@/components/check/quick-check-form";

export const metadata = { title: "Quick check" };

export default function QuickCheckPage() {
  return (
    <div className="space-y-4">
      <div>
        <h1 className="text-2xl font-semibold">Quick check</h1>
        <p className="text-sm text-ink-soft">Is this heatsink enough for this emitter? No account needed.</p>
      </div>
      <QuickCheckForm />
    </div>
  );
}
