import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** 32 random bytes, base64url (43 characters): what the share URL carries. */
export function newShareToken(): string {
  return randomBytes(32).toString("base64url");
}

/** Only this hash is stored, so a leaked database does not open any link. */
export function hashShareToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}
