import "server-only";
import { getBenchRun, listBenchRuns, runsForFittedPart, type BenchRunRow } from "@/db/queries/bench";
import { canEditRun, canSeeRun, type BenchViewer } from "@/lib/bench/access";
import { ApiError } from "@/lib/http/api-error";

/** A run the viewer may see, else 404 (a private run of someone else does not exist for them). */
export async function loadBenchRun({ id, viewer }: { id: string; viewer: BenchViewer }): Promise<BenchRunRow> {
  const run = await getBenchRun({ id });
  if (!run || !canSeeRun(viewer, run)) throw new ApiError("not_found:bench_run", "No such bench run, or it is not shared with you.", "id");
  return run;
}

/** A run the viewer owns: 404 when they may not see it, 403 when they may only read it. */
export async function loadOwnBenchRun({ id, viewer }: { id: string; viewer: BenchViewer }): Promise<BenchRunRow> {
  const run = await loadBenchRun({ id, viewer });
  if (!canEditRun(viewer, run)) throw new ApiError("forbidden:bench_run", "Only the person who recorded this run can change it or keep a part from it.", "id");
  return run;
}

/** The runs a viewer may see: their own and the shared ones. */
export async function listVisibleRuns({ viewer }: { viewer: NonNullable<BenchViewer> }): Promise<BenchRunRow[]> {
  const rows = await listBenchRuns({ viewerId: viewer.id });
  return rows.filter((r) => canSeeRun(viewer, r));
}

/** The runs a part was fitted from, that the viewer may see (the part's evidence). */
export async function evidenceForPart({ partId, viewer }: { partId: string; viewer: BenchViewer }): Promise<BenchRunRow[]> {
  const rows = await runsForFittedPart({ partId });
  return rows.filter((r) => canSeeRun(viewer, r));
}
