import type { z } from "zod";
import { labelsForSubject, type LabelResolver, machinePath, plainIssues } from "@/lib/messages";

/**
 * One place that maps an error code to an HTTP status. Codes look like
 * `bad_request:network` or `forbidden:build`: the part before the colon picks the status,
 * the part after it names what the request was about.
 */
const STATUS_BY_KIND = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unprocessable: 422,
  rate_limited: 429,
  unavailable: 503,
} as const;

export type ErrorKind = keyof typeof STATUS_BY_KIND;
export type ErrorCode = `${ErrorKind}:${string}`;

export class ApiError extends Error {
  readonly code: ErrorCode;
  readonly path: string;
  readonly status: number;

  constructor(code: ErrorCode, message: string, path = "") {
    super(message);
    this.name = "ApiError";
    this.code = code;
    this.path = path;
    const kind = code.split(":")[0] as ErrorKind;
    this.status = STATUS_BY_KIND[kind];
  }

  toBody(): { error: { code: string; message: string; path: string } } {
    return { error: { code: this.code, message: this.message, path: this.path } };
  }
}

/** Formats a zod issue path (`nodes.2.id` → `nodes[2].id`) the way our error bodies name fields. */
export const formatIssuePath = machinePath;

/**
 * Turns a validation error into an ApiError: the message names the field by its label on
 * screen in plain words (lib/messages), the path keeps the machine path of the first issue.
 * `body` lets the labels depend on what was sent (a part's kind); `labels` replaces the
 * subject's labels (a route whose form names its fields its own way).
 */
export function fromZodError(error: z.ZodError, subject: string, body?: unknown, labels?: LabelResolver): ApiError {
  const first = plainIssues(error, labels ?? labelsForSubject(subject, body))[0];
  return new ApiError(`bad_request:${subject}`, first?.message ?? "The request could not be read.", first?.path ?? "");
}
