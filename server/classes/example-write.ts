import "server-only";
import type { Derivation } from "@/lib/classroom/derivation";
import { ApiError } from "@/lib/http/api-error";
import { appUrl } from "@/server/reviews/mail";
import { hashToken, newToken } from "./tokens";

/** Refuses hidden keys that name no value of the derivation (e.g. a link the build does not have). */
export function assertHideable(derivation: Derivation | null, hidden: readonly string[]): void {
  const known = new Set((derivation?.hideable ?? []).map((h) => h.key));
  hidden.forEach((key, i) => {
    if (!known.has(key)) throw new ApiError("bad_request:example", `"${key}" is not a value of this example's derivation, so it cannot be hidden.`, `hidden[${i}]`);
  });
}

/** A fresh link for anyone-with-the-link visibility: the token is shown once, only its hash is kept. */
export function newExampleLink(): { tokenHash: string; url: string } {
  const token = newToken();
  return { tokenHash: hashToken(token), url: appUrl(`/examples/link/${token}`) };
}
