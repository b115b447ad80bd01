import "server-only";
import type { Session, User } from "lucia";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import type { Role } from "@/db/schema";
import { ApiError } from "@/lib/http/api-error";
import { lucia } from "./lucia";

export type SessionUser = User;

/** Reads and validates the session cookie; refreshes it when Lucia extended the session. */
export const getSession = cache(async (): Promise<{ user: User; session: Session } | null> => {
  const jar = await cookies();
  const id = jar.get(lucia().sessionCookieName)?.value;
  if (!id) return null;
  const result = await lucia().validateSession(id);
  try {
    if (result.session?.fresh) {
      const c = lucia().createSessionCookie(result.session.id);
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
  const session = await lucia().createSession(userId, {});
  const c = lucia().createSessionCookie(session.id);
  (await cookies()).set(c.name, c.value, c.attributes);
}

export async function endSession(): Promise<void> {
  const s = await getSession();
  if (s) await lucia().invalidateSession(s.session.id);
  const c = lucia().createBlankSessionCookie();
  (await cookies()).set(c.name, c.value, c.attributes);
}
