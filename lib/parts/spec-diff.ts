import { METRIC_PREFERENCES, type UnitPreferences } from "@/lib/units";
import type { PartKind } from "./common";
import { formatFieldValue } from "./display";
import { KIND_DEFINITIONS } from "./registry";

/** The parts of a record a revision's figures depend on. */
export interface PartSpecsView {
  kind: PartKind;
  name: string;
  provenance: string;
  costEur: number | null;
  specs: Record<string, unknown>;
  curves: Record<string, unknown>;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/**
 * What changed in a part since a revision took its snapshot, in words a maker reads
 * ("Maximum junction temperature: 150 °C → 135 °C"). Empty when nothing that matters did.
 */
export function describePartChanges(before: PartSpecsView, after: PartSpecsView, prefs: UnitPreferences = METRIC_PREFERENCES): string[] {
  const out: string[] = [];
  if (before.name !== after.name) out.push(`Name: ${before.name} → ${after.name}`);
  if (before.kind !== after.kind) return [...out, "Kind of part changed"];
  if (before.provenance !== after.provenance) out.push(`Provenance: ${before.provenance} → ${after.provenance}`);
  if (before.costEur !== after.costEur) out.push(`Cost: ${before.costEur ?? "none"} → ${after.costEur ?? "none"} EUR`);
  const def = KIND_DEFINITIONS[after.kind];
  const seen = new Set<string>();
  for (const field of def.fields) {
    seen.add(field.key);
    const a = before.specs[field.key];
    const b = after.specs[field.key];
    if (same(a, b)) continue;
    out.push(`${field.label}: ${formatFieldValue(field, a, prefs)} → ${formatFieldValue(field, b, prefs)}`);
  }
  for (const key of new Set([...Object.keys(before.specs), ...Object.keys(after.specs)])) {
    if (!seen.has(key) && !same(before.specs[key], after.specs[key])) out.push(`${key}: changed`);
  }
  for (const key of new Set([...Object.keys(before.curves), ...Object.keys(after.curves)])) {
    if (same(before.curves[key], after.curves[key])) continue;
    out.push(!before.curves[key] ? `Curve ${key}: added` : !after.curves[key] ? `Curve ${key}: removed` : `Curve ${key}: points changed`);
  }
  return out;
}
