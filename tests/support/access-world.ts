// The cast and objects of the role × route × method matrix (tests/integration/access/matrix.ts):
// a maker who owns everything below ("owner"), a second maker, a reviewer assigned to the
// owner's build, an instructor, a student (a maker in the instructor's class once classes
// exist), an admin, and someone not signed in. Objects made fresh per cell are for cells that
// use them up (a delete, a verdict).
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { Client, DEMO_PASSWORD, signedIn } from "./http";
import { minimalPdf } from "./pdf";
import { createParts, newUser, type PartIds, retrofitDesign } from "./retrofit";

export const ROLES = ["anonymous", "owner", "maker", "reviewer", "instructor", "student", "admin"] as const;
export type Role = (typeof ROLES)[number];
export type Person = { id: string; email: string };

export type World = {
  clients: Record<Role, Client>;
  people: Record<Exclude<Role, "anonymous">, Person>;
  /** The owner's private parts (one per kind). */
  parts: PartIds;
  /** The owner's private build, under review by the reviewer. */
  build: string;
  /** A second build of the owner's, shared with every signed-in user. */
  sharedBuild: string;
  review: string;
  share: { id: string; token: string };
  /** A share link of the review, made by its reviewer. */
  reviewShare: { id: string; token: string };
  comparison: string;
  attachment: string;
  /** A second session of the role's account (for a cell that ends its session). */
  session(role: Role): Promise<Client>;
  fresh: {
    part(): Promise<string>;
    build(): Promise<string>;
    /** A new build of the owner's with a review assigned to the reviewer. */
    review(): Promise<{ buildId: string; reviewId: string }>;
    share(): Promise<{ buildId: string; id: string }>;
    /** A new share link of `review`, made by the owner. */
    reviewShare(): Promise<{ reviewId: string; id: string }>;
    attachment(): Promise<{ partId: string; id: string }>;
    /** A build of the owner's shared (view-only) with the second maker. */
    member(): Promise<{ buildId: string; userId: string }>;
    /** A new maker account, for role changes. */
    user(): Promise<string>;
  };
};

function check(r: { status: number; body: unknown }, want: number, what: string): void {
  if (r.status !== want) throw new Error(`${what}: ${r.status} ${JSON.stringify(r.body)}`);
}

export function pdfForm(): FormData {
  const data = new FormData();
  data.append("file", new Blob([minimalPdf() as BlobPart], { type: "application/pdf" }), "sheet.pdf");
  return data;
}

export async function makeWorld(): Promise<World> {
  const admin = await signedIn("admin@sinkwise.test");
  const owner = await newUser(admin, "maker", "matrix-owner");
  const maker = await newUser(admin, "maker", "matrix-maker");
  const reviewer = await newUser(admin, "reviewer", "matrix-reviewer");
  const instructor = await newUser(admin, "maker", "matrix-instructor");
  check(await admin.patch(`/api/v1/admin/users/${instructor.id}`, { role: "instructor" }), 200, "instructor role");
  const student = await newUser(admin, "maker", "matrix-student");
  const me = await admin.get("/api/v1/me");
  const adminUser = me.body.user!;
  const o = owner.client;

  const parts = await createParts(o, "private");
  const newBuild = async (visibility: "private" | "shared" = "private"): Promise<string> => {
    const r = await o.post("/api/v1/builds", { title: "Matrix lantern", visibility, design: retrofitDesign(parts, "strapped") });
    check(r, 201, "build");
    return (r.body.build as { id: string }).id;
  };
  const requestReview = async (buildId: string): Promise<string> => {
    const r = await o.post(`/api/v1/builds/${buildId}/reviews`, { reviewerEmail: reviewer.email, message: "Please check the driver." });
    check(r, 201, "review");
    return (r.body.review as { id: string }).id;
  };
  const newShare = async (buildId: string) => {
    const r = await o.post(`/api/v1/builds/${buildId}/shares`, {});
    check(r, 201, "share");
    const s = r.body.share as { id: string; token: string };
    return { id: s.id, token: s.token };
  };
  const newAttachment = async (partId: string): Promise<string> => {
    const r = await o.send("POST", `/api/v1/parts/${partId}/attachments`, pdfForm());
    check(r, 201, "attachment");
    return (r.body.attachment as { id: string }).id;
  };
  const newPart = async (): Promise<string> => {
    const r = await o.post("/api/v1/parts", { ...GOOD_PARTS.spreader, name: "Matrix strap", visibility: "private" });
    check(r, 201, "part");
    return (r.body.part as { id: string }).id;
  };

  const build = await newBuild();
  const sharedBuild = await newBuild("shared");
  const review = await requestReview(build);
  const share = await newShare(build);
  const newReviewShare = async (by: Client): Promise<{ id: string; token: string }> => {
    const r = await by.post(`/api/v1/reviews/${review}/shares`, {});
    check(r, 201, "review share");
    return r.body.share as { id: string; token: string };
  };
  const reviewShare = await newReviewShare(reviewer.client);
  const saved = await o.post("/api/v1/comparisons", { title: "Matrix pair", items: [{ buildId: build }, { buildId: sharedBuild }] });
  check(saved, 201, "comparison");
  const attachment = await newAttachment(parts.emitter);

  return {
    clients: { anonymous: new Client(), owner: o, maker: maker.client, reviewer: reviewer.client, instructor: instructor.client, student: student.client, admin },
    people: {
      owner: { id: owner.id, email: owner.email },
      maker: { id: maker.id, email: maker.email },
      reviewer: { id: reviewer.id, email: reviewer.email },
      instructor: { id: instructor.id, email: instructor.email },
      student: { id: student.id, email: student.email },
      admin: { id: adminUser.id, email: adminUser.email },
    },
    parts,
    build,
    sharedBuild,
    session: async (role) => {
      if (role === "anonymous") return new Client();
      if (role === "admin") return signedIn("admin@sinkwise.test", DEMO_PASSWORD);
      const who = { owner, maker, reviewer, instructor, student }[role];
      return signedIn(who.email, "long enough pw");
    },
    review,
    share,
    reviewShare,
    comparison: (saved.body.comparison as { id: string }).id,
    attachment,
    fresh: {
      part: newPart,
      build: () => newBuild(),
      review: async () => {
        const buildId = await newBuild();
        return { buildId, reviewId: await requestReview(buildId) };
      },
      share: async () => {
        const buildId = await newBuild();
        return { buildId, id: (await newShare(buildId)).id };
      },
      reviewShare: async () => ({ reviewId: review, id: (await newReviewShare(o)).id }),
      attachment: async () => {
        const partId = await newPart();
        return { partId, id: await newAttachment(partId) };
      },
      member: async () => {
        const buildId = await newBuild();
        check(await o.post(`/api/v1/builds/${buildId}/members`, { email: maker.email, canEdit: false }), 201, "member");
        return { buildId, userId: maker.id };
      },
      user: async () => (await newUser(admin, "maker", "matrix-role")).id,
    },
  };
}
