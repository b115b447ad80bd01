import "server-only";
import { countStarterCopies, type ExerciseRow, withholdingExamples } from "@/db/queries/classwork";
import { valuesWithheld } from "@/lib/classroom/access";
import { ApiError } from "@/lib/http/api-error";
import type { LoadedClass } from "./load";

// A worked example whose values are still questions must not be given away by any other path
// to the same build: a student's own copy of it through an exercise (its Budget would show the
// answers) or a share link of the build (anyone with it, students too, would see them). The
// rule is by build, as the build's own access rule is (withheldExampleSql).

const quoted = (examples: readonly { title: string }[]) => examples.map((e) => `“${e.title}”`).join(", ");

/** Why a student may not start this exercise yet, or null when they may. */
export async function starterWithheldFor({ exercise, cls, viewer }: { exercise: Pick<ExerciseRow, "starterBuildId">; cls: LoadedClass; viewer: { id: string } }): Promise<string | null> {
  if (cls.access.canTeach) return null;
  const examples = await withholdingExamples({ buildId: exercise.starterBuildId, studentId: viewer.id });
  if (!examples.length) return null;
  return `This exercise starts from the build of the worked example ${quoted(examples)}, whose values are still questions. You can start it once your instructor reveals them.`;
}

/** "Start" refused while the starter would hand the student the answers to an example's questions. */
export async function assertStarterOpen(input: Parameters<typeof starterWithheldFor>[0]): Promise<void> {
  const why = await starterWithheldFor(input);
  if (why) throw new ApiError("conflict:exercise", why, "id");
}

/** For the instructor: why students cannot start this exercise yet, or null. */
export async function starterWarning({ exercise }: { exercise: Pick<ExerciseRow, "starterBuildId" | "classId"> }): Promise<string | null> {
  const examples = (await withholdingExamples({ buildId: exercise.starterBuildId })).filter((e) => e.classId === exercise.classId);
  if (!examples.length) return null;
  return `Students can start this exercise once you reveal the values of the worked example ${quoted(examples)}: the starter is that example's build, so a copy of it would show the answers.`;
}

/** A share link (of the build, or of a review of it) stays closed while the build is behind an example's questions. */
export async function assertLinkOpen({ buildId }: { buildId: string }): Promise<void> {
  if ((await withholdingExamples({ buildId })).length) {
    throw new ApiError("conflict:share", "This build is a worked example whose values are still questions for a class, so its links stay closed until the instructor reveals them.", "token");
  }
}

/** For the build's owner: why its links do not open now, or null. */
export async function linkWarning({ buildId }: { buildId: string }): Promise<string | null> {
  const examples = await withholdingExamples({ buildId });
  if (!examples.length) return null;
  return `While the worked example ${quoted(examples)} keeps values hidden from its class, links to this build do not open: they would show the answers. They open again once you reveal the values.`;
}

/** For the instructor of an example with questions: students who already hold a copy of its build (started before the values were hidden) can read the answers there. */
export async function copiesWarning({ example }: { example: { buildId: string; hidden: readonly string[]; revealedAt: Date | null; revealAt: Date | null } }): Promise<string | null> {
  if (!valuesWithheld(example, false)) return null;
  const copies = await countStarterCopies({ buildId: example.buildId });
  if (!copies) return null;
  return `${copies} student${copies === 1 ? " already has" : "s already have"} their own copy of this example's build through an exercise started before its values were hidden: those copies show the answers.`;
}
