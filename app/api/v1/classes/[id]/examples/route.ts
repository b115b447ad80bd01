import { createExample, listExamples } from "@/db/queries/classwork";
import { isRevealed } from "@/lib/classroom/access";
import { createExampleSchema } from "@/lib/classroom/api-schemas";
import { requireUser } from "@/server/auth/session";
import { loadBuild, loadRevision } from "@/server/builds/load";
import { assertHideable, newExampleLink } from "@/server/classes/example-write";
import { solveExample } from "@/server/classes/examples";
import { assertTeaching, loadClass } from "@/server/classes/load";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const cls = await loadClass({ id: (await params).id, viewer: user });
  const rows = await listExamples({ classId: cls.id });
  return json({
    examples: rows.map((e) => ({
      id: e.id,
      title: e.title,
      buildTitle: e.buildTitle,
      revision: e.revisionNumber,
      hiddenCount: e.hidden.length,
      revealed: isRevealed(e),
      revealAt: e.revealAt,
      visibility: e.visibility,
      createdAt: e.createdAt,
    })),
  });
});

/** Publishes one saved revision of a build the instructor may see as a worked example. */
export const POST = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const cls = await loadClass({ id: (await params).id, viewer: user });
  const input = await readJson(request, createExampleSchema, "example");
  assertTeaching(cls);
  const build = await loadBuild({ id: input.buildId, viewer: user });
  const revision = await loadRevision({ build, number: input.revision });
  const { derivation } = await solveExample({ buildId: build.id, revisionNumber: revision.number, scenarioId: input.scenarioId ?? null });
  assertHideable(derivation, input.hidden);
  const link = input.visibility === "link" ? newExampleLink() : null;
  const id = await createExample({
    classId: cls.id,
    title: input.title,
    narrative: input.narrative,
    buildId: build.id,
    revisionId: revision.id,
    revisionNumber: revision.number,
    scenarioId: derivation?.scenarioId ?? null,
    hidden: [...new Set(input.hidden)],
    tolerancePercent: input.tolerancePercent,
    revealAt: input.revealAt ? new Date(input.revealAt) : null,
    visibility: input.visibility,
    linkTokenHash: link?.tokenHash ?? null,
    createdBy: user.id,
  });
  return json({ example: { id, classId: cls.id, revision: revision.number }, linkUrl: link?.url }, 201);
});
