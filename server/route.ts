import "server-only";
import { verifyRequestOrigin } from "lucia";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { isDatabaseDown } from "@/db/client";
import { ApiError, fromZodError } from "@/lib/http/api-error";

const MAX_BODY_BYTES = 1_000_000;

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wraps a route handler: refuses cross-origin state changes, turns ApiError into our
 * JSON error body, reports an unreachable database as 503 and never leaks internals.
 * `stateless: true` is for POSTs that compute and change nothing (the quick check): they
 * read no session and write nothing, so any origin (curl, another site) may call them.
 */
export function route<C = unknown>(handler: Handler<C>, options: { stateless?: boolean } = {}): Handler<C> {
  return async (request, context) => {
    try {
      if (!options.stateless && !["GET", "HEAD", "OPTIONS"].includes(request.method)) assertSameOrigin(request);
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export function errorResponse(error: unknown): Response {
  if (error instanceof ApiError) {
    return NextResponse.json(error.toBody(), { status: error.status });
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

function assertSameOrigin(request: Request): void {
  const origin = request.headers.get("origin");
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
  if (!origin || !host || !verifyRequestOrigin(origin, [host])) {
    throw new ApiError("forbidden:origin", "Cross-origin request refused.");
  }
}

/** Reads a JSON body (at most 1 MB) and parses it with the schema; errors name the field. */
export async function readJson<T extends z.ZodType>(
  request: Request,
  schema: T,
  subject: string,
): Promise<z.infer<T>> {
  const text = await request.text();
  if (Buffer.byteLength(text) > MAX_BODY_BYTES) {
    throw new ApiError(`payload_too_large:${subject}`, "The request body is over 1 MB.");
  }
  let value: unknown;
  try {
    value = text.length === 0 ? {} : JSON.parse(text);
  } catch {
    throw new ApiError(`bad_request:${subject}`, "The request body is not valid JSON.");
  }
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw fromZodError(parsed.error, subject, value);
  return parsed.data;
}

export function json(body: unknown, status = 200): Response {
  return NextResponse.json(body, { status });
}
