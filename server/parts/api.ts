import "server-only";
import type { User } from "lucia";
import { getPart, type PartRecord, type PartSummary } from "@/db/queries/parts";
import { ApiError } from "@/lib/http/api-error";
import { canEditPart, partNotes, PART_SCHEMAS, type PartInput, type PartViewer } from "@/lib/parts";
import { notFound } from "next/navigation";
import { currentUser, requirePageUser } from "@/server/auth/session";

/** The caller as the visibility rule sees them: signed in (id, role) or anonymous. */
export async function currentViewer(): Promise<PartViewer> {
  const user = await currentUser();
  return user ? { id: user.id, role: user.role } : null;
}

export function viewerOf(user: User): PartViewer {
  return { id: user.id, role: user.role };
}

/**
 * A stored part in the shape the schemas read. The JSON was validated by the same schema
 * before it was written, and numbers in storage units parse back to themselves.
 */
export function toPartInput(record: PartSummary | PartRecord): PartInput {
  const input: Record<string, unknown> = {
    kind: record.kind,
    name: record.name,
    provenance: record.provenance,
    visibility: record.visibility,
    specs: record.specs,
    curves: "curves" in record ? record.curves : {},
  };
  if (record.provenanceNote !== null) input.provenanceNote = record.provenanceNote;
  if (record.costEur !== null) input.costEur = record.costEur;
  return input as PartInput;
}

function common(record: PartSummary, viewer: PartViewer) {
  return {
    id: record.id,
    kind: record.kind,
    name: record.name,
    provenance: record.provenance,
    provenanceNote: record.provenanceNote,
    visibility: record.visibility,
    costEur: record.costEur,
    verified: record.verified,
    specs: record.specs,
    owner: { id: record.ownerId, displayName: record.ownerName },
    canEdit: canEditPart(viewer, record.ownerId),
    createdAt: record.createdAt.toISOString(),
    updatedAt: record.updatedAt.toISOString(),
  };
}

export type PartSummaryJson = ReturnType<typeof summaryJson>;
export type PartJson = ReturnType<typeof partJson>;

export function summaryJson(record: PartSummary, viewer: PartViewer) {
  return common(record, viewer);
}

/** The full part: curves and the advisory notes (never errors) beside the fields. */
export function partJson(record: PartRecord, viewer: PartViewer) {
  const parsed = PART_SCHEMAS[record.kind].safeParse(toPartInput(record));
  return { ...common(record, viewer), curves: record.curves, notes: parsed.success ? partNotes(parsed.data) : [] };
}

/** Loads a part the viewer may see, or 404 (the same answer whether it is missing or hidden). */
export async function visiblePart(id: string, viewer: PartViewer): Promise<PartRecord> {
  const record = await getPart({ id, viewer });
  if (!record) throw new ApiError("not_found:part", "No such part, or it is not shared with you.", "id");
  return record;
}

/** Loads a part the viewer may change: 404 when hidden, 403 when visible but someone else's. */
export async function editablePart(id: string, viewer: PartViewer): Promise<PartRecord> {
  const record = await visiblePart(id, viewer);
  if (!canEditPart(viewer, record.ownerId)) {
    throw new ApiError("forbidden:part", `Only the owner (${record.ownerName}) or an admin can change this part.`, "id");
  }
  return record;
}

/** Reads the URL's query string with a schema; errors name the parameter. */
export function queryOf(request: Request): URLSearchParams {
  return new URL(request.url).searchParams;
}

/** For a part's pages: the signed-in user and the part, or the not-found page (missing or hidden alike). */
export async function loadPartPage(params: Promise<{ id: string }>) {
  const user = await requirePageUser();
  const { id } = await params;
  const viewer = viewerOf(user);
  const record = await getPart({ id, viewer });
  if (!record) notFound();
  return { user, id, part: partJson(record, viewer) };
}
