import type { Evaluation } from "./types";

/** The cautions that apply to this build, always shown with the numbers. */
export function CautionsPanel({ cautions }: { cautions: Evaluation["cautions"] }) {
  if (cautions.length === 0) return null;
  return (
    <section aria-label="Cautions" className="space-y-2 rounded-lg border border-tight/40 bg-tight/5 p-4" data-testid="cautions">
      <h2 className="font-semibold">Cautions</h2>
      <ul className="space-y-2 text-sm">
        {cautions.map((c) => (
          <li key={c.id}>
            <span className="font-medium">{c.title}.</span> <span className="text-ink-soft">{c.text}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
