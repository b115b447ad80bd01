/** Review words and Side by side limits the screens use, without the schema library. */
import type { CompareItem } from "./api-schemas";

export const MAX_COMPARE = 4;
export const MIN_COMPARE = 2;

/** items → the query string the compare route and page take. */
export function itemsParam(items: readonly CompareItem[]): string {
  return items.map((i) => (i.revision ? `${i.buildId}@${i.revision}` : i.buildId)).join(",");
}

export const VERDICT_STATUSES = ["approved", "changes_requested", "rejected"] as const;
export type VerdictStatus = (typeof VERDICT_STATUSES)[number];

/** Our words for a review's state (PRODUCT.md keeps the verdict words). */
export const REVIEW_STATUS_LABELS = {
  requested: "waiting for a verdict",
  approved: "approved",
  changes_requested: "changes requested",
  rejected: "rejected",
} as const;
