import type { Visibility } from "./common";

/** Who is asking: a signed-in user (id and role) or nobody. */
export type PartViewer = { readonly id: string; readonly role: string } | null;

/** Only the owner or an admin changes a part, its attachments or deletes it. */
export function canEditPart(viewer: PartViewer, ownerId: string): boolean {
  return viewer !== null && (viewer.role === "admin" || viewer.id === ownerId);
}

/**
 * private: owner and admins; shared: any signed-in user; public: anyone, also anonymous
 * (share links). The SQL in db/queries/parts.ts applies the same rule to lists.
 */
export function canSeePart(viewer: PartViewer, part: { readonly ownerId: string; readonly visibility: Visibility }): boolean {
  if (part.visibility === "public") return true;
  if (viewer === null) return false;
  return part.visibility === "shared" || canEditPart(viewer, part.ownerId);
}
