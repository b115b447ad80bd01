import { updateExample } from "@/db/queries/classwork";
import { patchExampleSchema } from "@/lib/classroom/api-schemas";
import { requireUser } from "@/server/auth/session";
import { assertHideable, newExampleLink } from "@/server/classes/example-write";
import { exampleView, solveExample } from "@/server/classes/examples";
import { assertTeaching, loadExample } from "@/server/classes/load";
import { json, readJson, route } from "@/server/route";

type Ctx = { params: Promise<{ id: string }> };

/** The example with its derivation; a student gets hidden values blanked until they are revealed. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { example, cls } = await loadExample({ id: (await params).id, viewer: user });
  return json(await exampleView({ example, canTeach: cls.access.canTeach }));
});

/**
 * Changes the narrative, the hidden values, the tolerance, when values are revealed, or the
 * visibility. Turning the link on makes a new link (shown once); turning it off revokes it.
 */
export const PATCH = route<Ctx>(async (request, { params }) => {
  const user = await requireUser();
  const { example, cls } = await loadExample({ id: (await params).id, viewer: user });
  const input = await readJson(request, patchExampleSchema, "example");
  assertTeaching(cls);
  if (input.hidden) assertHideable((await solveExample(example)).derivation, input.hidden);
  const link = input.visibility === "link" && example.visibility !== "link" ? newExampleLink() : null;
  await updateExample({
    id: example.id,
    title: input.title,
    narrative: input.narrative,
    hidden: input.hidden ? [...new Set(input.hidden)] : undefined,
    tolerancePercent: input.tolerancePercent,
    revealAt: input.revealAt === undefined ? undefined : input.revealAt === null ? null : new Date(input.revealAt),
    revealedAt: input.reveal === undefined ? undefined : input.reveal ? new Date() : null,
    visibility: input.visibility,
    linkTokenHash: input.visibility === "class" ? null : link?.tokenHash,
  });
  const { example: fresh } = await loadExample({ id: example.id, viewer: user });
  return json({ ...(await exampleView({ example: fresh, canTeach: true })), linkUrl: link?.url });
});
