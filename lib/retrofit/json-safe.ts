import type { ProblemList } from "./problems";

/**
 * Last line of defence for "never NaN on screen or in JSON": walks a result and replaces
 * every non-finite number by null, naming where it was. The evaluation is written so that
 * this finds nothing; if it does, the problem list says so instead of a chart breaking.
 */
export function jsonSafe<T>(value: T, problems: ProblemList, path = "result"): T {
  return walk(value, problems, path) as T;
}

function walk(v: unknown, problems: ProblemList, path: string): unknown {
  if (typeof v === "number") {
    if (Number.isFinite(v)) return v;
    problems.add(path, "a figure could not be worked out (not a finite number) and was left out", "warning");
    return null;
  }
  if (Array.isArray(v)) return v.map((x, i) => walk(x, problems, `${path}[${i}]`));
  if (v !== null && typeof v === "object") {
    const out: Record<string, unknown> = {};
    for (const [k, x] of Object.entries(v)) if (x !== undefined) out[k] = walk(x, problems, `${path}.${k}`);
    return out;
  }
  return v;
}
