/** Who may do what in a class. Pure, so pages, routes and tests share one rule. */
export type ClassRole = "instructor" | "student";

export type ClassAccess = {
  /** The viewer's standing in the class; admins see every class as its instructors do. */
  role: ClassRole | "admin";
  canTeach: boolean;
  /** Changes are refused in an archived class (it is read-only), except un-archiving. */
  canWrite: boolean;
};

export function classAccess(viewer: { id: string; role: string }, membership: ClassRole | null, archived: boolean): ClassAccess | null {
  if (viewer.role === "admin" && membership !== "student") return { role: membership ?? "admin", canTeach: true, canWrite: !archived };
  if (!membership) return null;
  return { role: membership, canTeach: membership === "instructor", canWrite: !archived };
}

/** Global roles that may open a class (and so become its first instructor). */
export const CLASS_CREATOR_ROLES = ["instructor", "admin"] as const;

/** Whether a hand-in submitted at `at` is late for a due date. */
export function isLate(at: Date, dueAt: Date): boolean {
  return at.getTime() > dueAt.getTime();
}

/** Hidden values are shown to students once revealed by hand or once the reveal date has passed. */
export function isRevealed(example: { revealedAt: Date | null; revealAt: Date | null }, now: Date = new Date()): boolean {
  return example.revealedAt !== null || (example.revealAt !== null && example.revealAt.getTime() <= now.getTime());
}

/** An answer is right when it is within the tolerance (per cent of the value's size). */
export function withinTolerance(answer: number, value: number, tolerancePercent: number): boolean {
  const allowed = Math.max(Math.abs(value) * (tolerancePercent / 100), 1e-9);
  return Math.abs(answer - value) <= allowed;
}

/**
 * Whether an example's values are still questions for this viewer: it hides values, they do
 * not teach the class, and the values are not revealed yet. While they are, nothing that
 * carries the numbers is opened to them: the build behind it, a fork of it, its design.
 */
export function valuesWithheld(example: { hidden: readonly string[]; revealedAt: Date | null; revealAt: Date | null }, canTeach: boolean, now: Date = new Date()): boolean {
  return !canTeach && example.hidden.length > 0 && !isRevealed(example, now);
}

/** What a student is told when a path would show the numbers of an example whose values are still questions. */
export const WITHHELD_MESSAGE = "This worked example's values are still questions: its build opens (and can be forked) once your instructor reveals them.";
