import {
  bigint,
  boolean,
  datetime,
  double,
  index,
  int,
  json,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";

import { ROLE_NAMES } from "../lib/auth/roles";
import { PART_KINDS, PROVENANCES, VISIBILITIES } from "../lib/parts/common";

export const ROLES = ROLE_NAMES;
export type Role = (typeof ROLES)[number];

export const users = mysqlTable(
  "user",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    email: varchar("email", { length: 254 }).notNull(),
    displayName: varchar("display_name", { length: 120 }).notNull(),
    passwordHash: varchar("password_hash", { length: 255 }).notNull(),
    role: mysqlEnum("role", ROLES).notNull().default("maker"),
    lengthUnits: mysqlEnum("length_units", ["metric", "imperial"]).notNull().default("metric"),
    temperatureUnit: mysqlEnum("temperature_unit", ["C", "F"]).notNull().default("C"),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("user_email_unique").on(t.email)],
);

/** Lucia's session table: the adapter expects exactly these columns. */
export const userSessions = mysqlTable(
  "user_session",
  {
    id: varchar("id", { length: 255 }).primaryKey(),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: datetime("expires_at").notNull(),
  },
  (t) => [index("user_session_user_idx").on(t.userId)],
);

/** Password reset tokens, stored as a SHA-256 hash; single use, one hour. */
export const passwordResetTokens = mysqlTable(
  "password_reset_token",
  {
    tokenHash: varchar("token_hash", { length: 64 }).primaryKey(),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: datetime("expires_at", { fsp: 3 }).notNull(),
    usedAt: datetime("used_at", { fsp: 3 }),
  },
  (t) => [index("password_reset_user_idx").on(t.userId)],
);

/** Store of rate-limiter-flexible's MySQL limiter, shared by every app process. */
export const rateLimits = mysqlTable("rate_limit", {
  key: varchar("key", { length: 255 }).primaryKey(),
  points: int("points").notNull().default(0),
  expire: bigint("expire", { mode: "number", unsigned: true }),
});

/**
 * A part record. The common fields are real columns (filtered, sorted and searched in SQL);
 * the kind-specific `specs` and `curves` are JSON validated by lib/parts before every write,
 * in storage units (lib/units/quantities.ts).
 */
export const parts = mysqlTable(
  "part",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    ownerId: varchar("owner_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    kind: mysqlEnum("kind", PART_KINDS).notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    provenance: mysqlEnum("provenance", PROVENANCES).notNull(),
    provenanceNote: varchar("provenance_note", { length: 1000 }),
    visibility: mysqlEnum("visibility", VISIBILITIES).notNull().default("private"),
    costEur: double("cost_eur"),
    verified: boolean("verified").notNull().default(false),
    specs: json("specs").notNull(),
    curves: json("curves").notNull(),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
    updatedAt: datetime("updated_at", { fsp: 3 }).notNull(),
  },
  (t) => [
    // Each index leads with the column a Parts bin filter pins and ends with a sort column,
    // so a filtered, sorted page is read in index order.
    index("part_kind_name_idx").on(t.kind, t.name),
    index("part_owner_kind_name_idx").on(t.ownerId, t.kind, t.name),
    index("part_visibility_kind_name_idx").on(t.visibility, t.kind, t.name),
    index("part_provenance_name_idx").on(t.provenance, t.name),
    index("part_name_idx").on(t.name),
    index("part_updated_idx").on(t.updatedAt),
  ],
);

/** A file attached to a part (datasheet PDF, photo); the bytes live in object storage. */
export const partAttachments = mysqlTable(
  "part_attachment",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    partId: varchar("part_id", { length: 40 })
      .notNull()
      .references(() => parts.id, { onDelete: "cascade" }),
    uploadedBy: varchar("uploaded_by", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    objectKey: varchar("object_key", { length: 200 }).notNull(),
    filename: varchar("filename", { length: 200 }).notNull(),
    contentType: varchar("content_type", { length: 100 }).notNull(),
    sizeBytes: int("size_bytes").notNull(),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("part_attachment_part_idx").on(t.partId, t.createdAt), uniqueIndex("part_attachment_key_unique").on(t.objectKey)],
);

export const BUILD_VISIBILITIES = ["private", "shared"] as const;

/**
 * A retrofit. Its content lives in immutable revisions; the build row holds what may change
 * without a new revision (title, visibility) and which revision is current.
 */
export const builds = mysqlTable(
  "build",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    ownerId: varchar("owner_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    title: varchar("title", { length: 160 }).notNull(),
    summary: varchar("summary", { length: 2000 }).notNull().default(""),
    visibility: mysqlEnum("visibility", BUILD_VISIBILITIES).notNull().default("private"),
    /** The build this one was forked from as a variant, and what the variant changed. */
    variantOf: varchar("variant_of", { length: 40 }),
    variantNote: varchar("variant_note", { length: 500 }),
    currentRevision: int("current_revision").notNull().default(1),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
    updatedAt: datetime("updated_at", { fsp: 3 }).notNull(),
  },
  (t) => [
    index("build_owner_updated_idx").on(t.ownerId, t.updatedAt),
    index("build_visibility_updated_idx").on(t.visibility, t.updatedAt),
    index("build_variant_of_idx").on(t.variantOf),
  ],
);

/** Users (other than the owner) a build is shared with, for viewing or editing. */
export const buildMembers = mysqlTable(
  "build_member",
  {
    buildId: varchar("build_id", { length: 40 })
      .notNull()
      .references(() => builds.id, { onDelete: "cascade" }),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    canEdit: boolean("can_edit").notNull().default(false),
  },
  (t) => [primaryKey({ columns: [t.buildId, t.userId] }), index("build_member_user_idx").on(t.userId)],
);

/** One saved, immutable state of a build: the design JSON validated by lib/retrofit. */
export const buildRevisions = mysqlTable(
  "build_revision",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    buildId: varchar("build_id", { length: 40 })
      .notNull()
      .references(() => builds.id, { onDelete: "cascade" }),
    number: int("number").notNull(),
    design: json("design").notNull(),
    note: varchar("note", { length: 500 }).notNull().default(""),
    createdBy: varchar("created_by", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("build_revision_number_unique").on(t.buildId, t.number)],
);

/** Which parts a revision uses: a used part cannot be deleted. */
export const revisionParts = mysqlTable(
  "revision_part",
  {
    revisionId: varchar("revision_id", { length: 40 })
      .notNull()
      .references(() => buildRevisions.id, { onDelete: "cascade" }),
    partId: varchar("part_id", { length: 40 })
      .notNull()
      .references(() => parts.id),
  },
  (t) => [primaryKey({ columns: [t.revisionId, t.partId] }), index("revision_part_part_idx").on(t.partId)],
);

/**
 * Cached evaluation of a revision, keyed by what the result depends on besides the revision
 * (the solver version and a fingerprint of the parts as read): another key is a miss.
 */
export const solveCache = mysqlTable(
  "solve_cache",
  {
    revisionId: varchar("revision_id", { length: 40 })
      .notNull()
      .references(() => buildRevisions.id, { onDelete: "cascade" }),
    cacheKey: varchar("cache_key", { length: 40 }).notNull(),
    result: json("result").notNull(),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.revisionId, t.cacheKey] })],
);

export const REVIEW_STATUSES = ["requested", "approved", "changes_requested", "rejected"] as const;
export const ANCHOR_KINDS = ["node", "link", "figure"] as const;
export const NOTIFICATION_KINDS = ["review_requested", "verdict", "comment"] as const;

/** A maker's request that a reviewer check one revision of a build, and the verdict. */
export const reviews = mysqlTable(
  "review",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    buildId: varchar("build_id", { length: 40 })
      .notNull()
      .references(() => builds.id, { onDelete: "cascade" }),
    revisionNumber: int("revision_number").notNull(),
    requestedBy: varchar("requested_by", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    reviewerId: varchar("reviewer_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    status: mysqlEnum("status", REVIEW_STATUSES).notNull().default("requested"),
    /** What the maker asks the reviewer to look at. */
    message: varchar("message", { length: 2000 }).notNull().default(""),
    summary: varchar("summary", { length: 4000 }).notNull().default(""),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
    decidedAt: datetime("decided_at", { fsp: 3 }),
  },
  (t) => [
    index("review_reviewer_status_idx").on(t.reviewerId, t.status, t.createdAt),
    index("review_requested_by_idx").on(t.requestedBy, t.createdAt),
    index("review_build_idx").on(t.buildId, t.createdAt),
  ],
);

/** A comment in a review, pinned to a node or link of the heat path or to a figure. */
export const reviewComments = mysqlTable(
  "review_comment",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    reviewId: varchar("review_id", { length: 40 })
      .notNull()
      .references(() => reviews.id, { onDelete: "cascade" }),
    authorId: varchar("author_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    anchorKind: mysqlEnum("anchor_kind", ANCHOR_KINDS).notNull(),
    anchorKey: varchar("anchor_key", { length: 120 }).notNull(),
    body: varchar("body", { length: 4000 }).notNull(),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("review_comment_review_idx").on(t.reviewId, t.createdAt)],
);

/** A read-only link to one revision's Budget; only the SHA-256 of the token is kept. */
export const shareLinks = mysqlTable(
  "share_link",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    buildId: varchar("build_id", { length: 40 })
      .notNull()
      .references(() => builds.id, { onDelete: "cascade" }),
    revisionNumber: int("revision_number").notNull(),
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    createdBy: varchar("created_by", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: datetime("expires_at", { fsp: 3 }),
    revokedAt: datetime("revoked_at", { fsp: 3 }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("share_link_token_unique").on(t.tokenHash), index("share_link_build_idx").on(t.buildId, t.createdAt)],
);

/** What the header bell lists: review requests, verdicts and comments for one user. */
export const notifications = mysqlTable(
  "notification",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    kind: mysqlEnum("kind", NOTIFICATION_KINDS).notNull(),
    reviewId: varchar("review_id", { length: 40 }).references(() => reviews.id, { onDelete: "cascade" }),
    buildId: varchar("build_id", { length: 40 }).references(() => builds.id, { onDelete: "cascade" }),
    text: varchar("text", { length: 500 }).notNull(),
    readAt: datetime("read_at", { fsp: 3 }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("notification_user_idx").on(t.userId, t.readAt, t.createdAt)],
);

/** A saved Side by side: two to four builds (optionally pinned revisions), in column order. */
export const comparisons = mysqlTable(
  "comparison",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    ownerId: varchar("owner_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    title: varchar("title", { length: 160 }).notNull(),
    items: json("items").notNull(),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("comparison_owner_idx").on(t.ownerId, t.createdAt)],
);

export const BENCH_RUN_VISIBILITIES = ["private", "shared"] as const;

/**
 * A bench run: a measured warm-up with its electrical input and conditions (validated by
 * lib/bench before every write, in storage units), the fit worked out when it was saved,
 * and the heatsink part kept from that fit, if any.
 */
export const benchRuns = mysqlTable(
  "bench_run",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    ownerId: varchar("owner_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    title: varchar("title", { length: 160 }).notNull(),
    visibility: mysqlEnum("visibility", BENCH_RUN_VISIBILITIES).notNull().default("private"),
    poweredPartId: varchar("powered_part_id", { length: 40 }).references(() => parts.id, { onDelete: "set null" }),
    poweredBuildId: varchar("powered_build_id", { length: 40 }).references(() => builds.id, { onDelete: "set null" }),
    poweredRevision: int("powered_revision"),
    run: json("run").notNull(),
    fit: json("fit"),
    fittedPartId: varchar("fitted_part_id", { length: 40 }).references(() => parts.id, { onDelete: "set null" }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("bench_run_owner_idx").on(t.ownerId, t.createdAt), index("bench_run_visibility_idx").on(t.visibility, t.createdAt), index("bench_run_fitted_part_idx").on(t.fittedPartId)],
);
