/** Who is asking: a signed-in user, or nobody. */
export type BenchViewer = { readonly id: string; readonly role: string } | null;

/**
 * A private run is its owner's alone; a shared run may be read by any signed-in user.
 * Only the owner changes a run or keeps a part from it. db/queries/bench.ts lists with the
 * same rule in SQL.
 */
export function canSeeRun(viewer: BenchViewer, run: { readonly ownerId: string; readonly visibility: "private" | "shared" }): boolean {
  if (viewer === null) return false;
  return run.ownerId === viewer.id || run.visibility === "shared";
}

export function canEditRun(viewer: BenchViewer, run: { readonly ownerId: string }): boolean {
  return viewer !== null && run.ownerId === viewer.id;
}
