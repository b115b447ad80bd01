import type { ProblemList } from "./problems";

/**
 * Last line of defence for "never NaN on screen or in JSON": walks a result and replaces
 * every non-finite number by null, naming where it was. The evaluation is written so that
 * this finds nothing; if it does, the problem list says so instead of a chart breaking.
 */
export function jsonSafe<T>(value: T, problems: ProblemList, path = "result"): T {
  // The usual case finds nothing: a look without copying, and the value goes out as it is.
  if (allFinite(value)) return value;
  return walk(value, problems, [path]) as T;
}

/** Whether every number inside is finite (reads only; `walk` copies). */
function allFinite(v: unknown): boolean {
  if (typeof v === "number") return Number.isFinite(v);
  if (v === null || typeof v !== "object") return true;
  if (Array.isArray(v)) {
    for (let i = 0; i < v.length; i++) {
      const x: unknown = v[i];
      if (typeof x === "number" ? !Number.isFinite(x) : typeof x === "object" && x !== null && !allFinite(x)) return false;
    }
    return true;
  }
  const src = v as Record<string, unknown>;
  for (const k in src) {
    const x = src[k];
    if (typeof x === "number" ? !Number.isFinite(x) : typeof x === "object" && x !== null && !allFinite(x)) return false;
  }
  return true;
}

/**
 * The result is mostly warm-up samples, so the walk keeps the path as a stack of segments
 * and joins it only when a problem is reported: building a path string for every number
 * cost more than the rest of the walk.
 */
function walk(v: unknown, problems: ProblemList, path: (string | number)[]): unknown {
  if (typeof v === "number") {
    if (Number.isFinite(v)) return v;
    problems.add(formatPath(path), "a figure could not be worked out (not a finite number) and was left out", "warning");
    return null;
  }
  if (Array.isArray(v)) {
    const out: unknown[] = new Array<unknown>(v.length);
    for (let i = 0; i < v.length; i++) {
      const x: unknown = v[i];
      if (typeof x === "number" && Number.isFinite(x)) {
        out[i] = x;
        continue;
      }
      path.push(i);
      out[i] = walk(x, problems, path);
      path.pop();
    }
    return out;
  }
  if (v !== null && typeof v === "object") {
    const out: Record<string, unknown> = {};
    const src = v as Record<string, unknown>;
    for (const k of Object.keys(src)) {
      const x = src[k];
      if (x === undefined) continue;
      if (typeof x === "number" && Number.isFinite(x)) {
        out[k] = x;
        continue;
      }
      path.push(k);
      out[k] = walk(x, problems, path);
      path.pop();
    }
    return out;
  }
  return v;
}

function formatPath(path: readonly (string | number)[]): string {
  let s = String(path[0] ?? "");
  for (let i = 1; i < path.length; i++) {
    const p = path[i]!;
    s += typeof p === "number" ? `[${p}]` : `.${p}`;
  }
  return s;
}
