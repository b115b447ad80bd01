import { z } from "zod";

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

/** Formats a zod issue path (`nodes.2.id`) the way our error bodies name fields. */
export function formatIssuePath(path: readonly PropertyKey[]): string {
  return path.map((p) => (typeof p === "number" ? `[${p}]` : String(p))).join(".").replace(/\.\[/g, "[");
}

/** Turns the first zod issue into an ApiError that names the field. */
export function fromZodError(error: z.ZodError, subject: string): ApiError {
  const issue = error.issues[0];
  const path = issue ? formatIssuePath(issue.path) : "";
  // A message that already names its field by its label on screen ("Summary: …") is kept as it
  // is; otherwise the field's path says which one.
  const labelled = issue ? /^[A-Z][A-Za-z' ]{0,40}: /.test(issue.message) : false;
  const message = issue ? `${path && !labelled ? `${path}: ` : ""}${issue.message}` : "Invalid input";
  return new ApiError(`bad_request:${subject}`, message, path);
}
