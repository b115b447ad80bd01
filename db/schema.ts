import {
  bigint,
  datetime,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";

import { ROLE_NAMES } from "../lib/auth/roles";

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
