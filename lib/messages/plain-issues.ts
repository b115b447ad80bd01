import type { z } from "zod";

/**
 * The one place that turns validation issues into what a person reads: the field named by
 * its label on screen, then the problem in plain words ("Chargers in parallel: must be a
 * whole number"). The machine path stays beside it for the API's `path` and for forms
 * that put the message next to the field.
 */

export type PathKey = string | number;
/** The label a screen shows for a path (e.g. ["design", "pack", "chargerCount"]), or null when it has none. */
export type LabelResolver = (path: readonly PathKey[]) => string | null;

export interface PlainIssue {
  /** Machine path as the API reports it: "design.pack.chargerCount", "points[3].x". */
  readonly path: string;
  /** The field's label on screen: "Chargers in parallel". */
  readonly label: string;
  /** The problem alone: "must be a whole number". */
  readonly problem: string;
  /** Label and problem: "Chargers in parallel: must be a whole number". */
  readonly message: string;
}

type Issue = z.core.$ZodIssue;

/** Prints a path the way our error bodies name fields: points[3].x rather than points.3.x. */
export function machinePath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((text, key) => {
    if (typeof key === "number") return `${text}[${key}]`;
    const name = String(key);
    return text === "" ? name : `${text}.${name}`;
  }, "");
}

// Wording the validation library writes by itself; our own messages are lower-case phrases.
const LIBRARY_WORDING = /^(Invalid|Too (big|small)|Unrecognized|Expected|Required\b)/;
export const isLibraryWording = (message: string): boolean => LIBRARY_WORDING.test(message);

const UNIT_SUFFIX = /(M2|M3|M|KPerW|WPerMK|WPerM2K|JPerK|KM2PerW|C|K|W|V|A|Ah|Kg|Ohm|S|Eur|MPerS|LmPerW|Coulomb)$/;

/** "chargerBoardAreaM2" → "charger board area": the fallback when a screen has no label. */
export function humanize(key: string): string {
  const bare = key.length > 3 ? key.replace(UNIT_SUFFIX, "") : key;
  const words = bare.replace(/([a-z0-9])([A-Z])/g, "$1 $2").replace(/[_-]+/g, " ").toLowerCase().trim();
  return words === "" ? key : words;
}

const capitalise = (s: string) => (s === "" ? s : s[0]!.toUpperCase() + s.slice(1));

/** A label for any path: the resolver's, else the keys in words ("Link 6 › to"). */
export function labelFor(path: readonly PathKey[], resolve?: LabelResolver): string {
  const known = resolve?.(path);
  if (known) return known;
  if (path.length === 0) return "This form";
  const parts: string[] = [];
  for (const key of path) {
    if (typeof key === "number") {
      // "links", 2 → "link 3": the list's name in the singular and the item's place, counted from 1.
      const last = parts.pop();
      parts.push(`${last ? last.replace(/s$/, "") : "item"} ${key + 1}`);
    } else parts.push(humanize(key));
  }
  return capitalise(parts.join(" › "));
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function expectedWords(expected: string): string {
  switch (expected) {
    case "int":
      return "must be a whole number";
    case "number":
    case "bigint":
      return "must be a number";
    case "string":
      return "must be text";
    case "boolean":
      return "must be yes or no";
    case "array":
      return "must be a list";
    case "object":
      return "must be filled in";
    default:
      return "is not in a form we can read";
  }
}

function boundWords(issue: Extract<Issue, { code: "too_big" | "too_small" }>): string {
  const big = issue.code === "too_big";
  const limit = Number(big ? (issue as { maximum: number | bigint }).maximum : (issue as { minimum: number | bigint }).minimum);
  const inclusive = issue.inclusive !== false;
  switch (issue.origin) {
    case "string":
      if (!big && limit <= 1) return "required";
      return big ? `must be at most ${plural(limit, "character", "characters")}` : `must be at least ${plural(limit, "character", "characters")}`;
    case "array":
    case "set":
      if (!big && limit <= 1) return "needs at least one entry";
      return big ? `may have at most ${limit} entries` : `needs at least ${limit} entries`;
    default:
      if (big) return inclusive ? `must be at most ${limit}` : `must be less than ${limit}`;
      return inclusive ? `must be at least ${limit}` : `must be greater than ${limit}`;
  }
}

const rootLevel = (issue: Issue) => issue.path.length === 0 && (issue.code === "unrecognized_keys" || issue.code === "invalid_type");
const missing = (issue: Issue) => issue.code === "invalid_type" && /received undefined/.test(issue.message);

/**
 * Of the options a union tried, the one the person meant: the first whose shape matches
 * (no unknown key or wrong type at its top), else the one with the fewest complaints.
 */
function meantBranch(branches: readonly (readonly Issue[])[]): readonly Issue[] | null {
  const fitting = branches.find((b) => b.length > 0 && !b.some(rootLevel));
  if (fitting) return fitting;
  if (branches.length > 0 && branches.every((b) => b.length > 0 && b.every((i) => rootLevel(i) && missing(i)))) return null;
  const sorted = [...branches].filter((b) => b.length > 0).sort((a, b) => a.length - b.length);
  return sorted[0] ?? null;
}

/**
 * Flattens unions into the issues of the option meant, with full paths. An unknown key is
 * named by its own label, while the machine path stays at the object that refused it.
 */
function flatten(issue: Issue, prefix: readonly PathKey[] = []): { path: PathKey[]; labelPath: PathKey[]; issue: Issue }[] {
  const path = [...prefix, ...(issue.path as PathKey[])];
  if (issue.code === "invalid_union" && isLibraryWording(issue.message) && "errors" in issue && Array.isArray(issue.errors)) {
    const branch = meantBranch(issue.errors as Issue[][]);
    if (branch) return branch.flatMap((inner) => flatten(inner, path));
  }
  if (issue.code === "unrecognized_keys") {
    return issue.keys.map((key) => ({ path, labelPath: [...path, key], issue }));
  }
  return [{ path, labelPath: path, issue }];
}

/** The problem alone, in plain words, for one issue. */
export function problemWords(issue: Issue): string {
  if (!isLibraryWording(issue.message)) return issue.message;
  switch (issue.code) {
    case "invalid_type":
      return missing(issue) ? "required" : expectedWords(issue.expected);
    case "too_big":
    case "too_small":
      return boundWords(issue);
    case "invalid_value":
      return issue.values.length === 1 ? `must be ${String(issue.values[0])}` : `must be one of: ${issue.values.map(String).join(", ")}`;
    case "unrecognized_keys":
      return "does not belong here";
    case "invalid_format":
      return issue.format === "email" ? "must be an e-mail address" : "is not in the expected form";
    case "not_multiple_of":
      return `must be a multiple of ${String(issue.divisor)}`;
    case "invalid_union": {
      const branches = "errors" in issue && Array.isArray(issue.errors) ? (issue.errors as Issue[][]) : [];
      const allMissing = branches.length > 0 && branches.every((b) => b.length > 0 && b.every((i) => rootLevel(i) && missing(i)));
      return allMissing || missing(issue) ? "required" : "is not filled in correctly";
    }
    default:
      return "is not filled in correctly";
  }
}

/** Every issue of a validation error, in plain words, each naming its field by label. */
export function plainIssues(error: z.ZodError, resolve?: LabelResolver): PlainIssue[] {
  const out: PlainIssue[] = [];
  const seen = new Set<string>();
  for (const top of error.issues) {
    for (const { path, labelPath, issue } of flatten(top)) {
      const label = labelFor(labelPath, resolve);
      const problem = problemWords(issue);
      // Our own full sentences ("Give the build a title.") already say which field they mean.
      const message = /^[A-Z]/.test(problem) && /[.?!]$/.test(problem) ? problem : `${label}: ${problem}`;
      const key = `${machinePath(path)}|${message}`;
      if (seen.has(key)) continue;
      seen.add(key);
      out.push({ path: machinePath(path), label, problem, message });
    }
  }
  return out;
}
