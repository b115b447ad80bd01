import { makeBuildFile } from "@/lib/builds/export-format";
import { requireUser } from "@/server/auth/session";
import { loadBuild, loadDesignParts, loadRevision } from "@/server/builds/load";
import { route } from "@/server/route";

/** Downloads the Sinkwise build file (docs/build-file-v1.md) of a revision with its parts. */
export const GET = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const build = await loadBuild({ id: (await params).id, viewer: user });
  const n = Number(new URL(request.url).searchParams.get("revision") ?? build.currentRevision);
  const revision = await loadRevision({ build, number: Number.isInteger(n) && n > 0 ? n : build.currentRevision });
  const parts = await loadDesignParts({ design: revision.design, viewer: user });
  const file = makeBuildFile({
    title: build.title,
    summary: build.summary,
    revision: revision.number,
    design: revision.design,
    parts: [...parts.values()].map((p) => ({ id: p.id, kind: p.kind, name: p.name, provenance: p.provenance, specs: p.specs, curves: p.curves, costEur: p.costEur })),
  });
  const filename = `${build.title.replace(/[^A-Za-z0-9-]+/g, "-").slice(0, 60) || "build"}-r${revision.number}.sinkwise.json`;
  return new Response(JSON.stringify(file, null, 2), {
    headers: { "content-type": "application/json", "content-disposition": `attachment; filename="${filename}"` },
  });
});
