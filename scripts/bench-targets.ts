/**
 * The speed targets `npm run bench` checks, collected as the sections run and listed again
 * at the end: each with its figure, its limit and a plain "ok" or "over".
 */
export interface TargetResult {
  what: string;
  figure: string;
  limit: string;
  ok: boolean;
}

const results: TargetResult[] = [];

/** Records a target and returns its line: "<what>: <figure> (target <limit>): ok|over". */
export function target(what: string, value: number, limit: number, unit: string, digits = 1, compare: "<" | "≤" = "≤"): string {
  const ok = compare === "<" ? value < limit : value <= limit;
  // A figure is never shown equal to a limit it fails (or to one it meets by a hair): more
  // digits until the two differ.
  // (toFixed takes at most 100 digits; two different doubles differ well before that.)
  let shown = digits;
  while (shown < 100 && value !== limit && value.toFixed(shown) === limit.toFixed(shown)) shown++;
  const r = { what, figure: `${value.toFixed(shown)} ${unit}`, limit: `${compare} ${limit.toFixed(shown)} ${unit}`, ok };
  results.push(r);
  return `${r.what}: ${r.figure} (target ${r.limit}): ${ok ? "ok" : "over"}`;
}

/** Every target recorded so far, one line each, and how many hold. */
export function targetSummary(): string[] {
  const held = results.filter((r) => r.ok).length;
  return ["", `[bench] targets: ${held} of ${results.length} ok`, ...results.map((r) => `[bench]   ${r.ok ? "ok  " : "over"}  ${r.what}: ${r.figure} (target ${r.limit})`)];
}
