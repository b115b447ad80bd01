import "server-only";
import { getBuild, getRevision } from "@/db/queries/builds";
import { buildOwner, type ExerciseRow, type HandinRow, listHandins, listStudents } from "@/db/queries/classwork";
import { type KeyFigures, keyFigures } from "@/lib/classroom/key-figures";
import { solveRevision } from "@/server/builds/solve";
import { compareHref } from "./copy";

/** A revision's key figures, read as its owner sees it (the Budget's own cached answer). */
export async function figuresOf(buildId: string, number: number): Promise<KeyFigures | null> {
  const ownerId = await buildOwner({ buildId });
  const build = ownerId ? await getBuild({ id: buildId, viewer: { id: ownerId, role: "maker" } }) : undefined;
  const revision = build ? await getRevision({ buildId, number }) : undefined;
  if (!build || !revision) return null;
  return keyFigures((await solveRevision({ build, revision })).evaluation);
}

export function handinJson(h: HandinRow, exercise: ExerciseRow) {
  return {
    id: h.id,
    studentId: h.studentId,
    studentName: h.studentName,
    buildId: h.buildId,
    buildTitle: h.buildTitle,
    revision: h.revisionNumber,
    submittedAt: h.submittedAt,
    late: h.late,
    feedback: h.feedback,
    mark: h.mark,
    feedbackAt: h.feedbackAt,
    compareHref: compareHref({ buildId: exercise.starterBuildId, revision: exercise.starterRevision }, { buildId: h.buildId, revision: h.revisionNumber }),
  };
}

/** Each student of the class with their counting (latest) hand-in and its figures beside the starter's. */
export async function roster(exercise: ExerciseRow) {
  const [students, all] = await Promise.all([listStudents({ classId: exercise.classId }), listHandins({ exerciseId: exercise.id })]);
  const starter = await figuresOf(exercise.starterBuildId, exercise.starterRevision);
  const rows = await Promise.all(
    students.map(async (s) => {
      const mine = all.filter((h) => h.studentId === s.userId);
      const latest = mine[0];
      return {
        studentId: s.userId,
        studentName: s.displayName,
        handins: mine.length,
        latest: latest ? handinJson(latest, exercise) : null,
        figures: latest ? await figuresOf(latest.buildId, latest.revisionNumber) : null,
      };
    }),
  );
  return { starter, rows };
}
