import "server-only";
import { findExampleByLink } from "@/db/queries/classwork";
import { SHARE_TOKEN_PATTERN } from "@/lib/reviews/share-token";
import { ApiError } from "@/lib/http/api-error";
import { exampleView } from "./examples";
import { hashToken } from "./tokens";

/** What an example's link opens without sign-in: the example as a student sees it, read-only. */
export async function openExampleLink(token: string) {
  const refused = new ApiError("not_found:example", "This link does not open a worked example: it may have been turned off by the instructor.", "token");
  if (!SHARE_TOKEN_PATTERN.test(token)) throw refused;
  const example = await findExampleByLink({ tokenHash: hashToken(token) });
  if (!example || example.visibility !== "link") throw refused;
  return exampleView({ example, canTeach: false });
}
