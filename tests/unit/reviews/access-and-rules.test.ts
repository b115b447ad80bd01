import { describe, expect, it } from "vitest";
import { buildAccess } from "@/lib/builds/access";
import { compareQuerySchema, requestReviewSchema } from "@/lib/reviews/api-schemas";
import { expiryFrom, shareState } from "@/lib/reviews/share-token";

const reviewer = { id: "r1", role: "reviewer" };

describe("buildAccess with an assigned reviewer", () => {
  it("lets the assigned reviewer view a private build, never edit it", () => {
    expect(buildAccess(reviewer, { ownerId: "m1", visibility: "private", assignedReviewer: true })).toEqual({ canView: true, canEdit: false, isOwner: false });
    expect(buildAccess(reviewer, { ownerId: "m1", visibility: "private" })).toEqual({ canView: false, canEdit: false, isOwner: false });
    // Even a membership for editing does not let a reviewer edit.
    expect(buildAccess(reviewer, { ownerId: "m1", visibility: "private", member: { canEdit: true }, assignedReviewer: true }).canEdit).toBe(false);
    expect(buildAccess(null, { ownerId: "m1", visibility: "shared", assignedReviewer: true }).canView).toBe(false);
  });
});

describe("share link state", () => {
  const now = new Date("2026-03-01T12:00:00Z");
  it("is revoked before expired, expired at the instant, else active", () => {
    expect(shareState({ revokedAt: now, expiresAt: new Date(0) }, now)).toBe("revoked");
    expect(shareState({ revokedAt: null, expiresAt: now }, now)).toBe("expired");
    expect(shareState({ revokedAt: null, expiresAt: new Date(now.getTime() + 1) }, now)).toBe("active");
    expect(shareState({ revokedAt: null, expiresAt: null }, now)).toBe("active");
    expect(expiryFrom(7, now)?.toISOString()).toBe("2026-03-08T12:00:00.000Z");
    expect(expiryFrom(undefined, now)).toBeNull();
  });
});

describe("input schemas", () => {
  it("parses compare items with revisions and refuses the whole list on any bad entry", () => {
    expect(compareQuerySchema.parse({ items: "a1,b2@3" }).items).toEqual([{ buildId: "a1" }, { buildId: "b2", revision: 3 }]);
    const five = compareQuerySchema.safeParse({ items: "a,b,c,d,e" });
    expect(five.success).toBe(false);
    expect(five.error?.issues[0]?.message).toBe("Builds to compare: pick at most 4.");
    expect(compareQuerySchema.safeParse({ items: "a" }).error?.issues[0]?.message).toBe("Builds to compare: pick at least 2.");
    const bad = compareQuerySchema.safeParse({ items: "a,b@x" });
    expect(bad.error?.issues[0]?.path).toEqual(["items", 1]);
    expect(compareQuerySchema.safeParse({ items: "a,b@0" }).success).toBe(false);
  });

  it("normalises the reviewer address and names it when it is not one", () => {
    expect(requestReviewSchema.parse({ reviewerEmail: " Reviewer@Sinkwise.TEST " }).reviewerEmail).toBe("reviewer@sinkwise.test");
    expect(requestReviewSchema.safeParse({ reviewerEmail: "nope" }).error?.issues[0]?.path).toEqual(["reviewerEmail"]);
  });
});
