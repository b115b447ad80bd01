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
