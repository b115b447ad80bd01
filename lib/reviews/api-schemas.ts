import { z } from "zod";
import { itemsParam, MAX_COMPARE, MIN_COMPARE, REVIEW_STATUS_LABELS, VERDICT_STATUSES, type VerdictStatus } from "./words";

export { itemsParam, MAX_COMPARE, MIN_COMPARE, REVIEW_STATUS_LABELS, VERDICT_STATUSES, type VerdictStatus };

/** Inputs of the review, share-link, notification and comparison routes: the one definition. */


export const requestReviewSchema = z.strictObject({
  reviewerEmail: z
    .string({ error: "Give the reviewer's e-mail address." })
    .trim()
    .toLowerCase()
    .pipe(z.email({ error: "Give the reviewer's e-mail address." }).max(254)),
  revision: z.number({ error: "A revision is a whole number from 1." }).int().positive().optional(),
  message: z.string().trim().max(2000, { error: "Keep the message under 2000 characters." }).default(""),
});

/**
 * Where a comment is pinned: a node of the heat path by its id ("junction"), a link by
 * "from->to" ("driver->wall-driver"), or a figure of the Budget by its key ("mode:High/headroom").
 */
export const ANCHOR_KEY_PATTERN = /^[A-Za-z0-9][A-Za-z0-9 :._/>#()-]*$/;
export const anchorSchema = z.strictObject({
  kind: z.enum(["node", "link", "figure"], { error: "An anchor is a node, a link or a figure." }),
  key: z.string({ error: "Name the node, link or figure the comment is pinned to." }).trim().min(1, { error: "Name the node, link or figure the comment is pinned to." }).max(120).regex(ANCHOR_KEY_PATTERN, { error: "Use the node id, 'from->to' for a link, or the figure key." }),
});

export const commentSchema = z.strictObject({
  anchor: anchorSchema,
  body: z.string({ error: "Write the comment." }).trim().min(1, { error: "Write the comment." }).max(4000, { error: "Keep a comment under 4000 characters." }),
});

export const verdictSchema = z.strictObject({
  status: z.enum(VERDICT_STATUSES, { error: "The verdict is approved, changes_requested or rejected." }),
  summary: z.string({ error: "Summary: write a sentence or two saying why." }).trim().min(1, { error: "Summary: write a sentence or two saying why." }).max(4000, { error: "Summary: keep it under 4000 characters." }),
});

export const createShareSchema = z.strictObject({
  revision: z.number({ error: "A revision is a whole number from 1." }).int().positive().optional(),
  /** Days until the link stops working; absent: it works until revoked. */
  expiresInDays: z.number({ error: "Expiry is a number of days." }).int({ error: "Expiry is a whole number of days." }).min(1, { error: "Expiry is 1 to 365 days." }).max(365, { error: "Expiry is 1 to 365 days." }).optional(),
});

/** A review's share link: the reviewed revision is fixed by the review; only the expiry is chosen. */
export const createReviewShareSchema = createShareSchema.omit({ revision: true });

export const markReadSchema = z.strictObject({
  /** Absent: mark every notification read. */
  ids: z.array(z.string().trim().min(1).max(40)).max(200).optional(),
});


export const compareItemSchema = z.strictObject({
  buildId: z.string().trim().min(1).max(40).regex(/^[A-Za-z0-9_-]+$/, { error: "A build id has letters, digits, - and _ only." }),
  revision: z.number().int().positive().optional(),
});
export type CompareItem = z.infer<typeof compareItemSchema>;

const itemsArray = z
  .array(compareItemSchema)
  .min(MIN_COMPARE, { error: `Builds to compare: pick at least ${MIN_COMPARE}.` })
  .max(MAX_COMPARE, { error: `Builds to compare: pick at most ${MAX_COMPARE}.` });

/** `?items=buildId[@rev],…` → items; the whole list is refused if any entry is malformed. */
export const compareQuerySchema = z.strictObject({
  items: z
    .string({ error: "Give items=buildId[@revision],… (two to four)." })
    .trim()
    .min(1, { error: "Give items=buildId[@revision],… (two to four)." })
    .max(400)
    .transform((text, ctx) => {
      const out: CompareItem[] = [];
      for (const [i, raw] of text.split(",").entries()) {
        const m = /^([A-Za-z0-9_-]{1,40})(?:@([1-9][0-9]{0,6}))?$/.exec(raw.trim());
        if (!m) {
          ctx.addIssue({ code: "custom", message: `"${raw.trim().slice(0, 60)}" is not buildId or buildId@revision.`, path: [i] });
          return z.NEVER;
        }
        out.push(m[2] ? { buildId: m[1]!, revision: Number(m[2]) } : { buildId: m[1]! });
      }
      return out;
    })
    .pipe(itemsArray),
});

export const saveComparisonSchema = z.strictObject({
  title: z.string({ error: "Give the comparison a title." }).trim().min(1, { error: "Give the comparison a title." }).max(160),
  items: itemsArray,
});

