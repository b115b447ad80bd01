import type { z } from "zod";
import { plainIssues } from "@/lib/messages/plain-issues";

export interface FieldError {
  /** "specs.massKg", "points[3].x"; "" for the whole value. */
  readonly path: string;
  readonly message: string;
}

/** Prints a zod path the way a person reads it: points[3].x rather than points.3.x. */
export function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((text, key) => {
    if (typeof key === "number") return `${text}[${key}]`;
    const name = String(key);
    return text === "" ? name : `${text}.${name}`;
  }, "");
}

/** Flattens a zod error into path + problem pairs in plain words (lib/messages), in the order zod found them. */
export function fieldErrors(error: z.ZodError): FieldError[] {
  return plainIssues(error).map((issue) => ({ path: issue.path, message: issue.problem }));
}

/** "points[3].x: must be greater than the previous x (25)". */
export function describeFieldError(error: FieldError): string {
  return error.path === "" ? error.message : `${error.path}: ${error.message}`;
}
