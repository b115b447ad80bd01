import "server-only";
import { notFound } from "next/navigation";
import { getBuild, getBuildAndRevision, getBuildToSolve, getRevision, type BuildSummary, type RevisionRow } from "@/db/queries/builds";
import type { SolveReads } from "@/db/queries/solve-cache";
import { getParts, partUsage, type PartRecord } from "@/db/queries/parts";
import type { BuildAccess, BuildViewer } from "@/lib/builds/access";
import { collectPartIds } from "@/lib/builds/part-ids";
import { ApiError } from "@/lib/http/api-error";
import { claimedSessionId, requirePageUser, type SessionUser } from "@/server/auth/session";

export type LoadedBuild = BuildSummary & { access: BuildAccess };

const buildNotFound = () => new ApiError("not_found:build", "No such build, or it is not shared with you.", "id");
const revisionNotFound = (n: number) => new ApiError("not_found:revision", `This build has no revision ${n}.`, "revision");

/** The build when the viewer may see it, else 404 (a private build's existence is not told). */
export async function loadBuild({ id, viewer }: { id: string; viewer: BuildViewer }): Promise<LoadedBuild> {
  const build = await getBuild({ id, viewer });
  if (!build) throw buildNotFound();
  return build;
}

export async function loadEditableBuild({ id, viewer }: { id: string; viewer: BuildViewer }): Promise<LoadedBuild> {
  const build = await loadBuild({ id, viewer });
  if (!build.access.canEdit) throw new ApiError("forbidden:build", "This build is read-only for you: only its owner (or someone it is shared with for editing) changes it.");
  return build;
}

export async function loadRevision({ build, number }: { build: LoadedBuild; number?: number }): Promise<RevisionRow> {
  const n = number ?? build.currentRevision;
  const revision = await getRevision({ buildId: build.id, number: n });
  if (!revision) throw revisionNotFound(n);
  return revision;
}

/**
 * A build the viewer may see and one of its revisions (`number`, or the current one), read
 * together: 404 for a build they may not see (as loadBuild), then for a missing revision.
 */
export async function loadBuildRevision({ id, viewer, number }: { id: string; viewer: BuildViewer; number?: number }): Promise<{ build: LoadedBuild; revision: RevisionRow }> {
  const found = await getBuildAndRevision({ id, viewer, number });
  if (!found) throw buildNotFound();
  if (!found.revision) throw revisionNotFound(number ?? found.build.currentRevision);
  return { build: found.build, revision: found.revision };
}

/**
 * loadBuildRevision for the solve route, with the revision's solve reads (SolveReads), in one
 * round trip that runs while the session is checked (`viewer`, which settles first: without a
 * session the answer is 401 whatever the build). The read takes its access facts for the user
 * of the session the cookie names; when that is not the checked viewer (an expired session), the
 * build is read again for the viewer and the solve makes its own reads.
 */
export async function loadBuildToSolve({ id, viewer, number, cacheKey, solverVersion }: { id: string; viewer: Promise<SessionUser>; number?: number; cacheKey: string; solverVersion: string }): Promise<{ build: LoadedBuild; revision: RevisionRow; reads?: SolveReads }> {
  const sessionId = await claimedSessionId();
  const read = sessionId ? getBuildToSolve({ id, sessionId, number, cacheKey, solverVersion }) : Promise.resolve(undefined);
  read.catch(() => undefined);
  const user = await viewer;
  const found = await read;
  if (found && found.viewerId === user.id) {
    const build = found.build(user);
    if (!build) throw buildNotFound();
    if (!found.revision) throw revisionNotFound(number ?? build.currentRevision);
    return { build, revision: found.revision, reads: found.reads };
  }
  return loadBuildRevision({ id, viewer: user, number });
}

/**
 * How many builds use a part, and the titles of those among them the viewer may see (a
 * private build of someone else is counted, never named).
 */
export async function partUsageFor({ partId, viewer }: { partId: string; viewer: BuildViewer }): Promise<{ count: number; visibleTitles: string[] }> {
  const usage = await partUsage({ partId });
  const seen = await Promise.all(usage.slice(0, 20).map((u) => getBuild({ id: u.buildId, viewer })));
  return { count: usage.length, visibleTitles: seen.flatMap((b) => (b?.access.canView ? [b.title] : [])) };
}

/** The parts a design refers to that the viewer may see, by id. */
export async function loadDesignParts({ design, viewer }: { design: unknown; viewer: BuildViewer }): Promise<Map<string, PartRecord>> {
  const found = await getParts({ ids: collectPartIds(design), viewer });
  return new Map(found.map((p) => [p.id, p]));
}

/** Refuses a design naming parts the author cannot see (or that do not exist), naming them. */
export async function assertDesignParts({ design, viewer }: { design: unknown; viewer: BuildViewer }): Promise<string[]> {
  const ids = collectPartIds(design);
  const parts = await loadDesignParts({ design, viewer });
  const missing = ids.filter((id) => !parts.has(id));
  if (missing.length) {
    throw new ApiError("bad_request:design", `These parts do not exist or are not visible to you: ${missing.join(", ")}.`, "design");
  }
  return ids;
}

/**
 * For the build's pages: the signed-in viewer's build and its current revision, or the
 * not-found page (the same for a missing build and one that is not shared with them).
 */
export async function loadBuildPage(params: Promise<{ id: string }>): Promise<{ user: Awaited<ReturnType<typeof requirePageUser>>; build: LoadedBuild; revision: RevisionRow }> {
  const user = await requirePageUser();
  const { id } = await params;
  try {
    return { user, ...(await loadBuildRevision({ id, viewer: user })) };
  } catch (e) {
    if (e instanceof ApiError) notFound();
    throw e;
  }
}
