/**
 * Every Parts bin id a design refers to, wherever the slot sits (`{ partId }` objects).
 * Walks the JSON generically so a slot added to the design schema is found without change.
 */
export function collectPartIds(design: unknown): string[] {
  const ids = new Set<string>();
  const visit = (value: unknown): void => {
    if (Array.isArray(value)) {
      value.forEach(visit);
      return;
    }
    if (value === null || typeof value !== "object") return;
    const record = value as Record<string, unknown>;
    if (typeof record.partId === "string") ids.add(record.partId);
    for (const v of Object.values(record)) visit(v);
  };
  visit(design);
  return [...ids].sort();
}

/** Replaces each `{ partId }` slot by the result of `replace` (e.g. an inline copy of the part). */
export function mapPartSlots(design: unknown, replace: (partId: string) => unknown): unknown {
  if (Array.isArray(design)) return design.map((v) => mapPartSlots(v, replace));
  if (design === null || typeof design !== "object") return design;
  const record = design as Record<string, unknown>;
  if (typeof record.partId === "string" && Object.keys(record).length === 1) return replace(record.partId);
  return Object.fromEntries(Object.entries(record).map(([k, v]) => [k, mapPartSlots(v, replace)]));
}
