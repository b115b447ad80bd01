/** Who may do what with a build. Pure, so pages, routes and tests share one rule. */
export type BuildViewer = { readonly id: string; readonly role: string } | null;

export type BuildFacts = {
  readonly ownerId: string;
  readonly visibility: "private" | "shared";
  /** The viewer's membership, when they have one. */
  readonly member?: { readonly canEdit: boolean } | null;
  /** The viewer is the reviewer of one of the build's reviews: they may read it, never edit it. */
  readonly assignedReviewer?: boolean;
  /** The build is a worked example or exercise starter of the viewer's class, or a hand-in in a class they teach: read-only. */
  readonly classReader?: boolean;
  /** The build is behind a worked example whose values are still questions for the viewer (a student of its class): they may not open it, however it is shared. */
  readonly withheld?: boolean;
};

export type BuildAccess = { canView: boolean; canEdit: boolean; isOwner: boolean };

/**
 * The owner edits; members edit when shared for editing; shared builds are visible to any
 * signed-in user; admins see everything but edit only their own (they curate, not build).
 * Reviewers never edit someone else's build; an assigned reviewer sees the build under review.
 */
export function buildAccess(viewer: BuildViewer, build: BuildFacts): BuildAccess {
  if (viewer === null) return { canView: false, canEdit: false, isOwner: false };
  const isOwner = viewer.id === build.ownerId;
  const memberEdit = Boolean(build.member?.canEdit) && viewer.role !== "reviewer";
  const canEdit = isOwner || memberEdit;
  const canView = canEdit || viewer.role === "admin" || (!build.withheld && (Boolean(build.member) || Boolean(build.assignedReviewer) || Boolean(build.classReader) || build.visibility === "shared"));
  return { canView, canEdit, isOwner };
}
