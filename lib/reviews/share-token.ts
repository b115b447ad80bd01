/** Share-link rules, pure so the route, the page and the tests share them. */

export type ShareState = "active" | "revoked" | "expired";

export function shareState(link: { revokedAt: Date | null; expiresAt: Date | null }, now: Date = new Date()): ShareState {
  if (link.revokedAt) return "revoked";
  if (link.expiresAt && link.expiresAt.getTime() <= now.getTime()) return "expired";
  return "active";
}

export function expiryFrom(days: number | undefined, now: Date = new Date()): Date | null {
  return days === undefined ? null : new Date(now.getTime() + days * 86_400_000);
}

/** A share token is 32 random bytes in base64url: 43 characters. */
export const SHARE_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;
