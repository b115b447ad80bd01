import "server-only";
import { verifyRequestOrigin } from "lucia";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { isDatabaseDown } from "@/db/client";
import { ApiError, formatIssuePath, fromZodError } from "@/lib/http/api-error";
import type { LabelResolver } from "@/lib/messages";
import { isThermalInputError } from "@/lib/thermal";
import { env } from "@/server/env";
import { fromTrustedProxy } from "@/server/http/client-address";
import { withSecurityHeaders } from "@/server/http/security-headers";

/** Every body is at most this unless its route says otherwise (uploads). */
export const MAX_BODY_BYTES = 1_000_000;

type Handler<C> = (request: Request, context: C) => Promise<Response>;

export interface RouteOptions {
  /**
   * For POSTs that compute and change nothing (the quick check, the solvers): they read no
   * session and write nothing, so any origin (curl, another site) may call them.
   */
  readonly stateless?: boolean;
  /** The largest body this route reads, in bytes (default MAX_BODY_BYTES). */
  readonly maxBodyBytes?: number;
  /** The field and words of the 413 when the body is the upload of one field. */
  readonly tooLarge?: { readonly field: string; readonly message: string };
}

interface BodyLimit {
  readonly bytes: number;
  readonly refuse: () => ApiError;
}

// The limit of each request in flight, set by route() and read by readBody().
const bodyLimits = new WeakMap<Request, BodyLimit>();

/**
 * The one request pipeline every API route goes through: refuses cross-origin state
 * changes, refuses a declared body over the route's limit before reading a byte, and maps
 * every error to one JSON shape `{ error: { code, message, path } }` (ApiError keeps its
 * status, engine input errors keep their code and path, an unreachable database is a 503,
 * anything else a 500 without internals). Bodies are read with readBody/readJson below,
 * which stream and stop at the same limit.
 */
export function route<C = unknown>(handler: Handler<C>, options: RouteOptions = {}): Handler<C> {
  const bytes = options.maxBodyBytes ?? MAX_BODY_BYTES;
  const custom = options.tooLarge;
  const limit: BodyLimit = {
    bytes,
    refuse: custom ? () => new ApiError(`payload_too_large:${custom.field}`, custom.message, custom.field) : () => tooLarge(bytes),
  };
  return async (request, context) => withSecurityHeaders(await pipeline(request, context), { https: env().APP_URL.startsWith("https://") });
  async function pipeline(request: Request, context: C): Promise<Response> {
    try {
      if (!options.stateless && !["GET", "HEAD", "OPTIONS"].includes(request.method)) assertSameOrigin(request);
      const declared = Number(request.headers.get("content-length") ?? "");
      if (Number.isFinite(declared) && declared > limit.bytes) throw limit.refuse();
      bodyLimits.set(request, limit);
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  }
}

export function errorResponse(error: unknown): Response {
  if (error instanceof ApiError) {
    return NextResponse.json(error.toBody(), { status: error.status });
  }
  if (isThermalInputError(error)) {
    const mapped = new ApiError(error.code, error.message, error.path);
    return NextResponse.json(mapped.toBody(), { status: mapped.status });
  }
  if (isDatabaseDown(error)) {
    console.error("[api] database unreachable:", (error as Error).message);
    return NextResponse.json(
      new ApiError(
        "unavailable:database",
        "The database is not reachable. Start it with `npm run db:start` (or `npm start`); the app reconnects by itself.",
      ).toBody(),
      { status: 503 },
    );
  }
  console.error("[api] unexpected error:", error);
  return NextResponse.json(
    { error: { code: "internal:server", message: "Something went wrong on our side.", path: "" } },
    { status: 500 },
  );
}

/**
 * Same-origin writes only. The host compared is the request's own Host, or the one a
 * trusted reverse proxy (TRUSTED_PROXY) says the visitor asked for; a client cannot pick it.
 */
function assertSameOrigin(request: Request): void {
  const origin = request.headers.get("origin");
  const forwardedHost = fromTrustedProxy(request) ? request.headers.get("x-forwarded-host")?.split(",")[0]?.trim() : undefined;
  const host = forwardedHost || request.headers.get("host");
  if (!origin || !host || !verifyRequestOrigin(origin, [host])) {
    throw new ApiError("forbidden:origin", "Cross-origin request refused.");
  }
}

function describeBytes(bytes: number): string {
  return bytes >= 1_000_000 ? `${Math.round(bytes / 100_000) / 10} MB` : `${Math.round(bytes / 1000)} kB`;
}

function tooLarge(limit: number): ApiError {
  return new ApiError("payload_too_large:body", `The request body is over ${describeBytes(limit)}.`, "");
}

/**
 * The request body as bytes, read as it streams in and abandoned as soon as it passes the
 * route's limit, so an oversized body is never held in memory.
 */
export async function readBody(request: Request): Promise<Uint8Array<ArrayBuffer>> {
  const limit = bodyLimits.get(request) ?? { bytes: MAX_BODY_BYTES, refuse: () => tooLarge(MAX_BODY_BYTES) };
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit.bytes) {
      await reader.cancel().catch(() => undefined);
      throw limit.refuse();
    }
    chunks.push(value);
  }
  const all = new Uint8Array(size);
  let offset = 0;
  for (const chunk of chunks) {
    all.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return all;
}

/**
 * The first string (key or value) that is not well-formed UTF-16 — a lone surrogate, which
 * JSON's \ud800 escapes can spell but no database column stores — as a field path.
 */
const LONE_SURROGATE = /[\uD800-\uDFFF]/u;

function loneSurrogatePath(value: unknown, path: PropertyKey[] = [], depth = 0): PropertyKey[] | null {
  if (typeof value === "string") return LONE_SURROGATE.test(value) ? path : null;
  if (depth > 64 || value === null || typeof value !== "object") return null;
  const entries: [PropertyKey, unknown][] = Array.isArray(value) ? value.map((v, i) => [i, v]) : Object.entries(value);
  for (const [key, inner] of entries) {
    if (typeof key === "string" && LONE_SURROGATE.test(key)) return [...path, key.replace(/[\uD800-\uDFFF]/gu, "\uFFFD")];
    const found = loneSurrogatePath(inner, [...path, key], depth + 1);
    if (found) return found;
  }
  return null;
}

/** Reads a JSON body (within the route's limit) and parses it with the schema; errors name the field. */
export async function readJson<T extends z.ZodType>(request: Request, schema: T, subject: string, labels?: LabelResolver): Promise<z.infer<T>> {
  const bytes = await readBody(request);
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new ApiError(`bad_request:${subject}`, "The request body is not valid UTF-8 text.");
  }
  let value: unknown;
  try {
    value = text.trim().length === 0 ? {} : JSON.parse(text);
  } catch {
    throw new ApiError(`bad_request:${subject}`, "The request body is not valid JSON.");
  }
  const bad = loneSurrogatePath(value);
  if (bad) {
    const path = formatIssuePath(bad);
    throw new ApiError(`bad_request:${subject}`, `${path ? `${path}: ` : ""}the text holds a broken character (a lone UTF-16 surrogate); type it again.`, path);
  }
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw fromZodError(parsed.error, subject, value, labels);
  return parsed.data;
}

export function json(body: unknown, status = 200): Response {
  return NextResponse.json(body, { status });
}
