"use client";

import { pathKeys, problemLabel } from "@/lib/messages";
import type { Problem, Severity } from "@/lib/retrofit";

export { pathKeys, problemLabel };

/**
 * Where the editor shows an evaluation problem: the problem names a slot of the design
 * ("pack.cell.internalResistanceOhm", "driver.modes[2]"), the editor has one field per slot
 * it lets you change. The first rule whose prefix matches (at a segment boundary) wins, so
 * longer prefixes come first. Fields that appear only for one mounting or cooling kind are
 * not targets: their problems go to the field that picks the kind, which is always shown.
 */
const RULES: readonly (readonly [prefix: string, editorPath: string])[] = [
  ["housing", "housing"],
  ["lightEngine.emitter", "lightEngine.emitter"],
  ["lightEngine.count", "lightEngine.count"],
  ["lightEngine.interface", "lightEngine.interface"],
  ["lightEngine.heatsink", "lightEngine.heatsink"],
  ["lightEngine.wiring", "lightEngine.wiring"],
  ["lightEngine.mount", "lightEngine.mount.kind"],
  ["driver.cooling", "driver.cooling.kind"],
  // The driver's part, its modes and the modes the build selects are all picked with the Driver.
  ["driver", "driver.part"],
  ["pack.cell", "pack.cell"],
  ["pack.series", "pack.series"],
  ["pack.parallel", "pack.parallel"],
  ["pack.protection", "pack.protection"],
  ["pack.chargerCount", "pack.chargerCount"],
  ["pack.chargerBoardAreaM2", "pack.charger"],
  ["pack.charger", "pack.charger"],
  // "pack" alone is the pack as a whole (its voltage against the driver's input): the cells make it.
  ["pack", "pack.cell"],
  ["environment.ambientC", "environment.ambientC"],
  ["environment.contact", "environment.contact"],
  ["environment.orientation", "environment.orientation"],
  ["environment.air", "environment.air.kind"],
  ["housingShape.form", "housingShape.form"],
  ["costs.comparableNewLightEur", "costs.comparableNewLightEur"],
];

function matches(field: string, prefix: string): boolean {
  if (!field.startsWith(prefix)) return false;
  const next = field.charAt(prefix.length);
  return next === "" || next === "." || next === "[";
}

/** The editor field a problem belongs to, or null when the editor has no field for it. */
export function editorFieldFor(field: string): string | null {
  for (const [prefix, editorPath] of RULES) if (matches(field, prefix)) return editorPath;
  return null;
}

export type PlacedProblems = { byField: ReadonlyMap<string, readonly Problem[]>; unplaced: readonly Problem[] };

/** Sorts problems onto editor fields; `info` ones (defaults the engine filled in) are left out. */
export function placeProblems(problems: readonly Problem[]): PlacedProblems {
  const byField = new Map<string, Problem[]>();
  const unplaced: Problem[] = [];
  for (const p of problems) {
    if (p.severity === "info") continue;
    const target = editorFieldFor(p.field);
    if (target === null) unplaced.push(p);
    else byField.set(target, [...(byField.get(target) ?? []), p]);
  }
  return { byField, unplaced };
}

const SEVERITY_CLASS: Record<Severity, string> = { error: "text-over", warning: "text-tight", info: "text-ink-soft" };

/** The problems of one field, under it (spans: a field sits inside its <label>). */
export function FieldProblems({ problems }: { problems?: readonly Problem[] }) {
  if (!problems?.length) return null;
  return (
    <span className="mt-1 block space-y-0.5">
      {problems.map((p) => (
        <span key={`${p.severity}|${p.field}|${p.message}`} data-testid="field-problem" data-severity={p.severity} className={`block text-xs ${SEVERITY_CLASS[p.severity]}`}>
          {p.severity === "warning" ? "Check: " : ""}
          {p.message}
        </span>
      ))}
    </span>
  );
}

/** Above the editor: the state of the check and the problems no field stands for. */
export function ProblemsSummary({ revision, status, problems, total, errorMessage, unsaved = false }: { revision: number; status: "pending" | "error" | "success"; problems: readonly Problem[]; total: number; errorMessage?: string; unsaved?: boolean }) {
  const what = unsaved ? "The unsaved draft" : `Revision ${revision} as saved`;
  if (status === "pending") return <p className="text-xs text-ink-soft">Checking {unsaved ? "the unsaved draft" : `revision ${revision}`}…</p>;
  if (status === "error") return <p className="text-xs text-tight">{what} could not be checked: {errorMessage ?? "no answer"}.</p>;
  return (
    <section aria-label="Problems found" data-testid="editor-problems" className="text-sm">
      <p className="text-xs text-ink-soft">
        {total === 0 ? `${what}: no problems found.` : `${what}: ${total} problem${total === 1 ? "" : "s"}, shown next to the fields they concern${problems.length ? " or listed here" : ""}.`}
      </p>
      {problems.length > 0 && (
        <ul className="mt-1 space-y-0.5 rounded border border-line bg-white/60 px-3 py-2">
          {problems.map((p) => (
            <li key={`${p.severity}|${p.field}|${p.message}`} data-testid="unplaced-problem" className={`text-xs ${SEVERITY_CLASS[p.severity]}`}>
              <span className="font-medium">{problemLabel(p.field)}</span>: {p.message}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
