/**
 * What the evaluation says instead of crashing: a named field (slot path such as
 * "driver.modes[2]" or "lightEngine.heatsink"), a message a modder can act on, and how bad
 * it is. `error`: the build cannot work as designed (a limit of a part is broken by the
 * design itself) or a result that depends on it is missing (null); `warning`: a result
 * exists but rests on a doubtful input or assumption; `info`: a default the engine filled in.
 */
export type Severity = "error" | "warning" | "info";

export interface Problem {
  field: string;
  message: string;
  severity: Severity;
}

export const problem = (field: string, message: string, severity: Severity = "error"): Problem => ({ field, message, severity });

/** Collects problems once each (the same default may be noticed by several scenarios). */
export class ProblemList {
  private readonly items: Problem[] = [];
  private readonly seen = new Set<string>();

  add(field: string, message: string, severity: Severity = "error"): void {
    const key = `${severity}|${field}|${message}`;
    if (this.seen.has(key)) return;
    this.seen.add(key);
    this.items.push({ field, message, severity });
  }

  push(p: Problem): void {
    this.add(p.field, p.message, p.severity);
  }

  get list(): Problem[] {
    return [...this.items];
  }
}
