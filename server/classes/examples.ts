import "server-only";
import { getBuild, getRevision } from "@/db/queries/builds";
import { buildOwner, type ExampleRow } from "@/db/queries/classwork";
import { getUserById } from "@/db/queries/users";
import { isRevealed } from "@/lib/classroom/access";
import { type Derivation, deriveExample, hideValues } from "@/lib/classroom/derivation";
import { ApiError } from "@/lib/http/api-error";
import { solveRevision } from "@/server/builds/solve";

/**
 * The example's revision worked out through the one solver path (the same cached answer the
 * Budget shows), read as the build's owner sees it: whoever may see the example sees the
 * instructor's figures, not their own view of the parts.
 */
export async function solveExample(example: Pick<ExampleRow, "buildId" | "revisionNumber" | "scenarioId">) {
  const build = await getBuild({ id: example.buildId, viewer: { id: (await buildOwner({ buildId: example.buildId })) ?? "", role: "maker" } });
  const revision = build ? await getRevision({ buildId: build.id, number: example.revisionNumber }) : undefined;
  if (!build || !revision) throw new ApiError("not_found:example", "The build this example works through is gone.", "id");
  const solved = await solveRevision({ build, revision });
  return { build, revision, evaluation: solved.evaluation, derivation: deriveExample(solved.evaluation, example.scenarioId) };
}

export type ExampleView = Awaited<ReturnType<typeof exampleView>>;

/** What a viewer sees of an example: instructors everything (and which values are hidden), students the questions until revealed. */
export async function exampleView({ example, canTeach, now = new Date() }: { example: ExampleRow; canTeach: boolean; now?: Date }) {
  const { derivation } = await solveExample(example);
  const revealed = isRevealed(example, now);
  const shown: Derivation | null = derivation && !canTeach && !revealed ? hideValues(derivation, example.hidden) : derivation;
  const author = await getUserById({ id: example.createdBy });
  return {
    example: {
      id: example.id,
      classId: example.classId,
      title: example.title,
      narrative: example.narrative,
      buildId: example.buildId,
      buildTitle: example.buildTitle,
      revision: example.revisionNumber,
      scenarioId: derivation?.scenarioId ?? example.scenarioId,
      authorName: author?.displayName ?? "",
      hiddenCount: example.hidden.length,
      hidden: canTeach ? example.hidden : undefined,
      tolerancePercent: example.tolerancePercent,
      revealAt: example.revealAt,
      revealed,
      visibility: example.visibility,
      createdAt: example.createdAt,
    },
    canTeach,
    derivation: shown,
  };
}
