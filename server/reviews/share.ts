import "server-only";
import { getBuild, getRevision } from "@/db/queries/builds";
import { findShareLinkByHash } from "@/db/queries/shares";
import { getUserById } from "@/db/queries/users";
import { ApiError } from "@/lib/http/api-error";
import { withholdUnpublished } from "@/lib/reviews/publish";
import { SHARE_TOKEN_PATTERN, shareState } from "@/lib/reviews/share-token";
import type { BuildEvaluation } from "@/lib/retrofit";
import { loadDesignParts } from "@/server/builds/load";
import { solveRevision } from "@/server/builds/solve";
import { assertLinkOpen } from "@/server/classes/withheld";
import { hashShareToken } from "./tokens";

export interface SharedBudget {
  build: { id: string; title: string; summary: string; ownerName: string; variantNote: string | null };
  revision: { number: number; note: string; createdAt: Date; design: unknown };
  /** The public parts the design uses; a private or shared part is not shown through a link. */
  parts: { id: string; kind: string; name: string; provenance: string; specs: Record<string, unknown>; costEur: number | null }[];
  expiresAt: Date | null;
  /** The revision's evaluation, worked out as its owner sees the parts (the one solver path, cached). */
  result: BuildEvaluation;
}

/**
 * What a share token opens: one revision of one build, read-only, without sign-in. Unknown,
 * revoked and expired tokens are refused with a message saying which (never a 500); so is a
 * link to a build whose worked example's values are still questions.
 */
export async function openShare({ token }: { token: string }): Promise<SharedBudget> {
  const unknown = new ApiError("not_found:share", "This share link does not exist.", "token");
  if (!SHARE_TOKEN_PATTERN.test(token)) throw unknown;
  const link = await findShareLinkByHash({ tokenHash: hashShareToken(token) });
  if (!link) throw unknown;
  const state = shareState(link);
  if (state === "revoked") throw new ApiError("not_found:share", "This share link was revoked by the build's owner.", "token");
  if (state === "expired") throw new ApiError("not_found:share", `This share link expired on ${link.expiresAt?.toISOString().slice(0, 10)}.`, "token");
  // The owner's view of their own build: the link stands in for them, read-only.
  const owner = await getUserById({ id: link.ownerId });
  const build = owner ? await getBuild({ id: link.buildId, viewer: { id: owner.id, role: owner.role } }) : undefined;
  const revision = build ? await getRevision({ buildId: build.id, number: link.revisionNumber }) : undefined;
  if (!owner || !build || !revision) throw unknown;
  await assertLinkOpen({ buildId: build.id });
  // The parts as the owner sees them: the evaluation may quote any of these; only public
  // ones are published through a link, the rest are withheld from what it carries.
  const parts = await loadDesignParts({ design: revision.design, viewer: { id: owner.id, role: owner.role } });
  const unpublished = [...parts.values()].filter((p) => p.visibility !== "public").map((p) => ({ id: p.id, name: p.name }));
  const solved = await solveRevision({ build, revision });
  return {
    build: { id: build.id, title: build.title, summary: build.summary, ownerName: build.ownerName, variantNote: build.variantNote },
    revision: { number: revision.number, note: withholdUnpublished(revision.note, unpublished), createdAt: revision.createdAt, design: revision.design },
    parts: [...parts.values()]
      .filter((p) => p.visibility === "public")
      .map((p) => ({ id: p.id, kind: p.kind, name: p.name, provenance: p.provenance, specs: p.specs, costEur: p.costEur })),
    expiresAt: link.expiresAt,
    result: withholdUnpublished(solved.evaluation, unpublished),
  };
}
