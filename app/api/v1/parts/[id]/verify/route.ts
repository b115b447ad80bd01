import { getPart } from "@/db/queries/parts";
import { getPartVerification, isPartAttachment, unverifyPart, verifyPart } from "@/db/queries/part-verifications";
import { ApiError } from "@/lib/http/api-error";
import { verifySchema } from "@/lib/parts";
import { requireUser } from "@/server/auth/session";
import { partJson, viewerOf, visiblePart } from "@/server/parts/api";
import { json, readJson, route } from "@/server/route";

/**
 * Admins curate the catalogue. "Verified" means someone checked the part's values against a
 * datasheet or a measurement that is attached or cited: the check records who, when and
 * against what. An invented estimate cannot be verified.
 */
export const PATCH = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const { id } = await params;
  const user = await requireUser("admin");
  const viewer = viewerOf(user);
  const part = await visiblePart(id, viewer);
  const input = await readJson(request, verifySchema, "verify");
  if (input.verified) {
    if (part.provenance === "estimate") {
      throw new ApiError("bad_request:verify", "An estimate cannot be verified: set the part's provenance to datasheet or measured, attach or cite that source, then check the values against it.", "verified");
    }
    if (input.attachmentId !== undefined && !(await isPartAttachment({ partId: id, attachmentId: input.attachmentId }))) {
      throw new ApiError("bad_request:verify", "Attachment: choose one of this part's own attachments.", "attachmentId");
    }
    await verifyPart({ partId: id, userId: user.id, against: input.against, attachmentId: input.attachmentId ?? null });
  } else {
    await unverifyPart({ partId: id });
  }
  const record = await getPart({ id, viewer });
  if (!record) throw new ApiError("not_found:part", "No such part.", "id");
  const verification = await getPartVerification({ partId: id });
  return json({ part: partJson(record, viewer), verification: verification && { ...verification, at: verification.at.toISOString() } });
});
