import { EXAMPLE_FORMAT, EXAMPLE_FORMAT_VERSION, type ExampleFile, exampleFileName } from "@/lib/classroom/export-format";
import { valuesWithheld } from "@/lib/classroom/access";
import { requireUser } from "@/server/auth/session";
import { exampleView, solveExample } from "@/server/classes/examples";
import { loadExample } from "@/server/classes/load";
import { route } from "@/server/route";

/** The example as our own JSON file, as the caller sees it (a student's copy keeps the questions blank). */
export const GET = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { example, cls } = await loadExample({ id: (await params).id, viewer: user });
  const view = await exampleView({ example, canTeach: cls.access.canTeach });
  const { revision } = await solveExample(example);
  const file: ExampleFile = {
    format: EXAMPLE_FORMAT,
    version: EXAMPLE_FORMAT_VERSION,
    exportedAt: new Date().toISOString(),
    title: example.title,
    narrative: example.narrative,
    // The design would give the questions' answers away to a student until they are revealed.
    build: { title: example.buildTitle, revision: revision.number, design: valuesWithheld(example, cls.access.canTeach) ? null : revision.design },
    scenario: view.derivation ? { id: view.derivation.scenarioId, name: view.derivation.scenarioName } : null,
    tolerancePercent: example.tolerancePercent,
    hidden: example.hidden,
    derivation: view.derivation,
  };
  return new Response(JSON.stringify(file, null, 2), {
    headers: { "content-type": "application/json; charset=utf-8", "content-disposition": `attachment; filename="${exampleFileName(example.title)}"` },
  });
});
