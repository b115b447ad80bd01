import type { ReactNode } from "react";

/** Placeholder for a screen whose capability lands in a later piece of work. */
export function ComingNext({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="space-y-3">
      <h1 className="text-2xl font-semibold">{title}</h1>
      <div className="rounded-lg border border-dashed border-line bg-white/50 p-6 text-sm text-ink-soft">
        <p className="mb-2 font-medium text-ink">Coming next</p>
        {children}
      </div>
    </section>
  );
}
