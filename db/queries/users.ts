import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { and, asc, eq, isNull, sql } from "drizzle-orm";
import { db, mysqlErrorCode, preparedOnce } from "../client";
import { buildInvitations, buildMembers, passwordResetTokens, type Role, signupRequests, userSessions, users } from "../schema";

export type UserRow = typeof users.$inferSelect;
export type PublicUser = Omit<UserRow, "passwordHash">;

const publicColumns = {
  id: users.id,
  email: users.email,
  displayName: users.displayName,
  role: users.role,
  lengthUnits: users.lengthUnits,
  temperatureUnit: users.temperatureUnit,
  createdAt: users.createdAt,
};

export function newId(): string {
  return randomBytes(15).toString("base64url");
}

const sessionStatements = preparedOnce(() => ({
  withUser: db()
    .select({ session: { id: userSessions.id, userId: userSessions.userId, expiresAt: userSessions.expiresAt }, user: publicColumns })
    .from(userSessions)
    .innerJoin(users, eq(users.id, userSessions.userId))
    .where(eq(userSessions.id, sql.placeholder("id")))
    .limit(1)
    .prepare(),
}));

/** A session (by its stored id) and its user, in one round trip; undefined when there is no such session. */
export async function getSessionWithUser({ id }: { id: string }): Promise<{ session: { id: string; userId: string; expiresAt: Date }; user: PublicUser } | undefined> {
  return (await sessionStatements().withUser.execute({ id }))[0];
}

export async function getUserByEmail({ email }: { email: string }): Promise<UserRow | undefined> {
  const rows = await db().select().from(users).where(eq(users.email, email)).limit(1);
  return rows[0];
}

export async function getUserById({ id }: { id: string }): Promise<PublicUser | undefined> {
  const rows = await db().select(publicColumns).from(users).where(eq(users.id, id)).limit(1);
  return rows[0];
}

/** Inserts a user; returns null when the e-mail is taken (the unique index decides). */
export async function createUser(input: {
  email: string;
  displayName: string;
  passwordHash: string;
  role?: Role;
}): Promise<{ id: string } | null> {
  const id = newId();
  try {
    await db()
      .insert(users)
      .values({ id, role: input.role ?? "maker", createdAt: new Date(), ...input });
    return { id };
  } catch (error) {
    if (mysqlErrorCode(error) === "ER_DUP_ENTRY") return null;
    throw error;
  }
}

export async function listUsers(): Promise<PublicUser[]> {
  return db().select(publicColumns).from(users).orderBy(asc(users.email));
}

export async function countAdmins(): Promise<number> {
  const rows = await db()
    .select({ n: sql<number>`count(*)` })
    .from(users)
    .where(eq(users.role, "admin"));
  return Number(rows[0]?.n ?? 0);
}

export async function setUserRole({ id, role }: { id: string; role: Role }): Promise<void> {
  await db().update(users).set({ role }).where(eq(users.id, id));
}

function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/** Creates a single-use reset token valid for one hour; only its hash is stored. */
export async function createPasswordResetToken({ userId }: { userId: string }): Promise<string> {
  const token = randomBytes(32).toString("base64url");
  await db()
    .insert(passwordResetTokens)
    .values({ tokenHash: hashToken(token), userId, expiresAt: new Date(Date.now() + 3600_000) });
  return token;
}

export type ResetOutcome = "ok" | "unknown" | "used" | "expired";

/** Checks the token and, when it is good, sets the password and signs out every session. */
export async function consumePasswordResetToken({
  token,
  passwordHash,
}: {
  token: string;
  passwordHash: string;
}): Promise<ResetOutcome> {
  return db().transaction(async (tx) => {
    const rows = await tx
      .select()
      .from(passwordResetTokens)
      .where(eq(passwordResetTokens.tokenHash, hashToken(token)))
      .for("update");
    const row = rows[0];
    if (!row) return "unknown";
    if (row.usedAt) return "used";
    if (row.expiresAt.getTime() <= Date.now()) return "expired";
    await tx
      .update(passwordResetTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResetTokens.tokenHash, row.tokenHash), isNull(passwordResetTokens.usedAt)));
    await tx.update(users).set({ passwordHash }).where(eq(users.id, row.userId));
    await tx.delete(userSessions).where(eq(userSessions.userId, row.userId));
    // Every other link still out for this account stops working: one reset closes them all.
    await tx.delete(passwordResetTokens).where(and(eq(passwordResetTokens.userId, row.userId), isNull(passwordResetTokens.usedAt)));
    return "ok";
  });
}

/** Keeps a sign-up until its link is opened (one day); only the token's hash is stored. */
export async function createSignupRequest(input: { email: string; displayName: string; passwordHash: string }): Promise<string> {
  const token = randomBytes(32).toString("base64url");
  await db()
    .insert(signupRequests)
    .values({ tokenHash: hashToken(token), ...input, expiresAt: new Date(Date.now() + 24 * 3600_000) });
  return token;
}

export type SignupOutcome = { status: "ok"; userId: string } | { status: "unknown" | "expired" | "taken" };

/**
 * Makes the account of a sign-up link, once: the request is removed with every other one for
 * the same address. "taken" when the address got an account meanwhile.
 */
export async function completeSignupRequest({ token }: { token: string }): Promise<SignupOutcome> {
  return db().transaction(async (tx) => {
    const rows = await tx.select().from(signupRequests).where(eq(signupRequests.tokenHash, hashToken(token))).for("update");
    const row = rows[0];
    if (!row) return { status: "unknown" };
    await tx.delete(signupRequests).where(eq(signupRequests.email, row.email));
    if (row.expiresAt.getTime() <= Date.now()) return { status: "expired" };
    const id = newId();
    try {
      await tx.insert(users).values({ id, email: row.email, displayName: row.displayName, passwordHash: row.passwordHash, role: "maker", createdAt: new Date() });
    } catch (error) {
      if (mysqlErrorCode(error) === "ER_DUP_ENTRY") return { status: "taken" };
      throw error;
    }
    // Builds shared with this address before it had an account open for it now.
    const invitations = await tx.select().from(buildInvitations).where(eq(buildInvitations.email, row.email));
    if (invitations.length) {
      await tx.insert(buildMembers).values(invitations.map((i) => ({ buildId: i.buildId, userId: id, canEdit: i.canEdit })));
      await tx.delete(buildInvitations).where(eq(buildInvitations.email, row.email));
    }
    return { status: "ok", userId: id };
  });
}
