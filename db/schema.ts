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
  text,
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
    /** Set when the owner archives the build: out of the lists, kept for what points at it. */
    archivedAt: datetime("archived_at", { fsp: 3 }),
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
export const NOTIFICATION_KINDS = ["review_requested", "verdict", "comment", "feedback"] as const;

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
    /** Where the notification leads when it is neither a review nor a build (a class hand-in). */
    href: varchar("href", { length: 300 }),
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

/**
 * The specs of every part a revision used, as they were when it was saved (or, for a
 * revision saved before snapshots existed, when it was first solved). The revision's Budget,
 * reviews and worked examples read these, so editing a part in the bin never moves them.
 */
export const revisionPartSnapshots = mysqlTable(
  "revision_part_snapshot",
  {
    revisionId: varchar("revision_id", { length: 40 })
      .notNull()
      .references(() => buildRevisions.id, { onDelete: "cascade" }),
    partId: varchar("part_id", { length: 40 }).notNull(),
    /** The part record (kind, name, provenance, specs, curves, cost, last change) at snapshot time. */
    record: json("record").notNull(),
    takenAt: datetime("taken_at", { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.revisionId, t.partId] })],
);

/** When a newer solver gave a revision other figures than the last one did: what moved. */
export const revisionSolverChanges = mysqlTable(
  "revision_solver_change",
  {
    revisionId: varchar("revision_id", { length: 40 })
      .notNull()
      .references(() => buildRevisions.id, { onDelete: "cascade" }),
    solverVersion: varchar("solver_version", { length: 40 }).notNull(),
    previousVersion: varchar("previous_version", { length: 40 }).notNull(),
    /** The figures that moved, in words ("Mode high, LED junction: 92 °C → 105 °C"); empty when none did. */
    changes: json("changes").notNull(),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.revisionId, t.solverVersion] })],
);

/**
 * Who checked a part's values, when, and against what (a cited datasheet or measurement,
 * optionally one of the part's attachments). A part is "verified" only with one of these;
 * editing the part's values removes it (they are no longer what was checked).
 */
export const partVerifications = mysqlTable("part_verification", {
  partId: varchar("part_id", { length: 40 })
    .primaryKey()
    .references(() => parts.id, { onDelete: "cascade" }),
  verifiedBy: varchar("verified_by", { length: 40 })
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  verifiedAt: datetime("verified_at", { fsp: 3 }).notNull(),
  /** What the values were checked against, as the checker cited it (title, revision, page; or the measurement). */
  against: varchar("against", { length: 500 }).notNull(),
  attachmentId: varchar("attachment_id", { length: 40 }).references(() => partAttachments.id, { onDelete: "set null" }),
});

export const CLASS_ROLES = ["instructor", "student"] as const;
export const EXAMPLE_VISIBILITIES = ["class", "link"] as const;

/** A class of the Classroom: its join code is shown to its instructors and may be rotated. */
export const classes = mysqlTable(
  "class",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    name: varchar("name", { length: 120 }).notNull(),
    term: varchar("term", { length: 80 }).notNull().default(""),
    joinCode: varchar("join_code", { length: 16 }).notNull(),
    createdBy: varchar("created_by", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    archivedAt: datetime("archived_at", { fsp: 3 }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("class_join_code_unique").on(t.joinCode)],
);

/** Who belongs to a class and as what; an account's global role is not changed by it. */
export const classMembers = mysqlTable(
  "class_member",
  {
    classId: varchar("class_id", { length: 40 })
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: mysqlEnum("role", CLASS_ROLES).notNull(),
    joinedAt: datetime("joined_at", { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.classId, t.userId] }), index("class_member_user_idx").on(t.userId)],
);

/** An e-mail invitation to a class: only the SHA-256 of the token is kept; single use, 7 days. */
export const classInvitations = mysqlTable(
  "class_invitation",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    classId: varchar("class_id", { length: 40 })
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    email: varchar("email", { length: 254 }).notNull(),
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    invitedBy: varchar("invited_by", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: datetime("expires_at", { fsp: 3 }).notNull(),
    usedAt: datetime("used_at", { fsp: 3 }),
    usedBy: varchar("used_by", { length: 40 }).references(() => users.id, { onDelete: "set null" }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("class_invitation_token_unique").on(t.tokenHash), index("class_invitation_class_idx").on(t.classId, t.createdAt)],
);

/**
 * A worked example: one immutable revision of a build, a Markdown narrative, the scenario the
 * derivation follows, the values hidden from students (keys of derivation steps) and when
 * they are revealed. `link` visibility opens it read-only to anyone holding the link.
 */
export const workedExamples = mysqlTable(
  "worked_example",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    classId: varchar("class_id", { length: 40 })
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    title: varchar("title", { length: 160 }).notNull(),
    narrative: text("narrative").notNull(),
    buildId: varchar("build_id", { length: 40 })
      .notNull()
      .references(() => builds.id, { onDelete: "cascade" }),
    revisionId: varchar("revision_id", { length: 40 })
      .notNull()
      .references(() => buildRevisions.id, { onDelete: "cascade" }),
    revisionNumber: int("revision_number").notNull(),
    scenarioId: varchar("scenario_id", { length: 80 }),
    hidden: json("hidden").notNull(),
    tolerancePercent: double("tolerance_percent").notNull().default(2),
    revealAt: datetime("reveal_at", { fsp: 3 }),
    revealedAt: datetime("revealed_at", { fsp: 3 }),
    visibility: mysqlEnum("visibility", EXAMPLE_VISIBILITIES).notNull().default("class"),
    linkTokenHash: varchar("link_token_hash", { length: 64 }),
    createdBy: varchar("created_by", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("worked_example_class_idx").on(t.classId, t.createdAt), uniqueIndex("worked_example_link_unique").on(t.linkTokenHash), index("worked_example_build_idx").on(t.buildId)],
);

/** An exercise: instructions, a starter revision every student copies, and a due date. */
export const exercises = mysqlTable(
  "exercise",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    classId: varchar("class_id", { length: 40 })
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    title: varchar("title", { length: 160 }).notNull(),
    instructions: text("instructions").notNull(),
    starterBuildId: varchar("starter_build_id", { length: 40 })
      .notNull()
      .references(() => builds.id, { onDelete: "cascade" }),
    starterRevision: int("starter_revision").notNull(),
    dueAt: datetime("due_at", { fsp: 3 }).notNull(),
    createdBy: varchar("created_by", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("exercise_class_idx").on(t.classId, t.dueAt), index("exercise_starter_idx").on(t.starterBuildId)],
);

/** A student's own copy of an exercise's starter ("Start"): one per student and exercise. */
export const exerciseCopies = mysqlTable(
  "exercise_copy",
  {
    exerciseId: varchar("exercise_id", { length: 40 })
      .notNull()
      .references(() => exercises.id, { onDelete: "cascade" }),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    buildId: varchar("build_id", { length: 40 })
      .notNull()
      .references(() => builds.id, { onDelete: "cascade" }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.exerciseId, t.userId] })],
);

/** One hand-in of a saved revision; the student's latest counts. Feedback and mark per hand-in. */
export const handins = mysqlTable(
  "handin",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    exerciseId: varchar("exercise_id", { length: 40 })
      .notNull()
      .references(() => exercises.id, { onDelete: "cascade" }),
    studentId: varchar("student_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    buildId: varchar("build_id", { length: 40 })
      .notNull()
      .references(() => builds.id, { onDelete: "cascade" }),
    revisionNumber: int("revision_number").notNull(),
    late: boolean("late").notNull(),
    submittedAt: datetime("submitted_at", { fsp: 3 }).notNull(),
    feedback: text("feedback"),
    mark: varchar("mark", { length: 40 }),
    feedbackBy: varchar("feedback_by", { length: 40 }).references(() => users.id, { onDelete: "set null" }),
    feedbackAt: datetime("feedback_at", { fsp: 3 }),
  },
  (t) => [index("handin_exercise_student_idx").on(t.exerciseId, t.studentId, t.submittedAt), index("handin_build_idx").on(t.buildId)],
);

/**
 * A sign-up waiting for its owner to open the link mailed to the address: the account is made
 * only then, so the sign-up answer is the same whether or not the address already has one.
 * Only the token's hash and the password's hash are stored.
 */
export const signupRequests = mysqlTable(
  "signup_request",
  {
    tokenHash: varchar("token_hash", { length: 64 }).primaryKey(),
    email: varchar("email", { length: 254 }).notNull(),
    displayName: varchar("display_name", { length: 120 }).notNull(),
    passwordHash: varchar("password_hash", { length: 255 }).notNull(),
    expiresAt: datetime("expires_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("signup_request_email_idx").on(t.email)],
);

/**
 * A build shared with an address no account uses yet: it becomes a membership when an account
 * is made with that address. Sharing answers the same either way.
 */
export const buildInvitations = mysqlTable(
  "build_invitation",
  {
    buildId: varchar("build_id", { length: 40 })
      .notNull()
      .references(() => builds.id, { onDelete: "cascade" }),
    email: varchar("email", { length: 254 }).notNull(),
    canEdit: boolean("can_edit").notNull().default(false),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.buildId, t.email] }), index("build_invitation_email_idx").on(t.email)],
);

/**
 * A read-only link to a review: the reviewed revision with its verdict and comments. Made by
 * the review's reviewer or the build's owner; only the SHA-256 of the token is kept.
 */
export const reviewShareLinks = mysqlTable(
  "review_share_link",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    reviewId: varchar("review_id", { length: 40 })
      .notNull()
      .references(() => reviews.id, { onDelete: "cascade" }),
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    createdBy: varchar("created_by", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: datetime("expires_at", { fsp: 3 }),
    revokedAt: datetime("revoked_at", { fsp: 3 }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("review_share_link_token_unique").on(t.tokenHash), index("review_share_link_review_idx").on(t.reviewId, t.createdAt)],
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
