import "server-only";
import { createHash, randomBytes } from "node:crypto";
import type { Session, User } from "lucia";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import type { Role } from "@/db/schema";
import { ApiError } from "@/lib/http/api-error";
import { lucia } from "./lucia";

export type SessionUser = User;

/**
 * However active, a session ends this long after its sign-in (on top of Lucia's sliding
 * 30 days), so a stolen cookie cannot be kept alive for ever.
 */
export const ABSOLUTE_SESSION_MS = 60 * 24 * 60 * 60 * 1000;

const TOKEN = /^([0-9a-z]{1,12})\.([A-Za-z0-9_-]{43})$/;

/**
 * The cookie carries "<issued>.<secret>"; the database keeps "<issued>.<SHA-256 of secret>"
 * as the session id, so a copy of the table opens no session. The issue time is part of
 * the stored id, so a client who edits it in the cookie only names a session that does not
 * exist.
 */
export function sessionIdOf(token: string): { id: string; issuedAt: number } | null {
  const m = TOKEN.exec(token);
  if (!m?.[1] || !m[2]) return null;
  return { id: `${m[1]}.${createHash("sha256").update(m[2]).digest("hex")}`, issuedAt: parseInt(m[1], 36) };
}

function newSessionToken(now = Date.now()): { token: string; id: string } {
  const token = `${now.toString(36)}.${randomBytes(32).toString("base64url")}`;
  const parsed = sessionIdOf(token);
  if (!parsed) throw new Error("session token shape");
  return { token, id: parsed.id };
}

/** Reads and validates the session cookie; refreshes it when Lucia extended the session. */
export const getSession = cache(async (): Promise<{ user: User; session: Session } | null> => {
  const jar = await cookies();
  const token = jar.get(lucia().sessionCookieName)?.value;
  if (!token) return null;
  const parsed = sessionIdOf(token);
  const expired = parsed !== null && Date.now() - parsed.issuedAt > ABSOLUTE_SESSION_MS;
  if (parsed && expired) await lucia().invalidateSession(parsed.id);
  const result = parsed && !expired ? await lucia().validateSession(parsed.id) : { session: null, user: null };
  try {
    if (result.session?.fresh) {
      const c = lucia().createSessionCookie(token);
      jar.set(c.name, c.value, c.attributes);
    }
    if (!result.session) {
      const c = lucia().createBlankSessionCookie();
      jar.set(c.name, c.value, c.attributes);
    }
  } catch {
    // Server components may not set cookies; the next route handler call will.
  }
  return result.session && result.user ? { user: result.user, session: result.session } : null;
});

/**
 * The stored id of the session the request's cookie names, without asking the database whether
 * it is live: for a read that runs beside the session check (getSession) and is trusted only
 * when that check names the same user.
 */
export async function claimedSessionId(): Promise<string | null> {
  const token = (await cookies()).get(lucia().sessionCookieName)?.value;
  return token ? (sessionIdOf(token)?.id ?? null) : null;
}

export async function currentUser(): Promise<User | null> {
  return (await getSession())?.user ?? null;
}

/** For route handlers: 401 without a session, 403 when the role is not one of `roles`. */
export async function requireUser(...roles: Role[]): Promise<User> {
  const user = await currentUser();
  if (!user) throw new ApiError("unauthorized:session", "Sign in to do this.");
  if (roles.length > 0 && !roles.includes(user.role)) {
    throw new ApiError("forbidden:role", `This needs the ${roles.join(" or ")} role.`);
  }
  return user;
}

/** For pages: redirect to sign-in (or to the home page when the role does not fit). */
export async function requirePageUser(...roles: Role[]): Promise<User> {
  const user = await currentUser();
  if (!user) redirect("/signin");
  if (roles.length > 0 && !roles.includes(user.role)) redirect("/?denied=1");
  return user;
}

export async function startSession(userId: string): Promise<void> {
  const { token, id } = newSessionToken();
  await lucia().createSession(userId, {}, { sessionId: id });
  const c = lucia().createSessionCookie(token);
  (await cookies()).set(c.name, c.value, c.attributes);
}

export async function endSession(): Promise<void> {
  const s = await getSession();
  if (s) await lucia().invalidateSession(s.session.id);
  const c = lucia().createBlankSessionCookie();
  (await cookies()).set(c.name, c.value, c.attributes);
}
