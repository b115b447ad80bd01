import { valuesWithheld, WITHHELD_MESSAGE } from "@/lib/classroom/access";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { compareHref, copyRevision } from "@/server/classes/copy";
import { solveExample } from "@/server/classes/examples";
import { loadExample } from "@/server/classes/load";
import { json, route } from "@/server/route";

/** One click: the example's revision becomes a build of the caller's, and Side by side lines them up. */
export const POST = route<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { example, cls } = await loadExample({ id: (await params).id, viewer: user });
  // A fork would carry the answers to the example's questions: not before they are revealed.
  if (valuesWithheld(example, cls.access.canTeach)) throw new ApiError("conflict:example", WITHHELD_MESSAGE, "id");
  const { build, revision } = await solveExample(example);
  const created = await copyRevision({
    revision,
    user,
    title: `${example.title} (my fork)`,
    summary: build.summary,
    note: `Forked from the worked example "${example.title}" (revision ${revision.number} of "${build.title}")`,
  });
  return json({ build: created, compareHref: compareHref({ buildId: build.id, revision: revision.number }, { buildId: created.id, revision: created.revision }) }, 201);
});
