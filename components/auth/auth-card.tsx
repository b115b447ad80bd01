import type { ReactNode } from "react";

export function AuthCard({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="mx-auto max-w-md rounded-lg border border-line bg-white/60 p-6 shadow-sm">
      <h1 className="mb-5 text-xl font-semibold">{title}</h1>
      {children}
    </section>
  );
}
