import type { z } from "zod";
import { ApiError, fromZodError } from "@/lib/http/api-error";
import { isThermalInputError } from "@/lib/thermal";

/** Request bodies above this are refused with 413 before parsing (a 500-node, 2,000-link network is well under it). */
export const MAX_BODY_BYTES = 1024 * 1024;

const json = (body: unknown, status: number) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json; charset=utf-8", "cache-control": "no-store" } });

const errorResponse = (e: ApiError) => json(e.toBody(), e.status);

/** Reads the body as text, stopping as soon as it passes the limit so a huge upload is never held in memory. */
async function readBodyText(request: Request): Promise<string | ApiError> {
  const tooLarge = () => new ApiError("payload_too_large:body", `request body is larger than ${MAX_BODY_BYTES} bytes`, "");
  const declared = Number(request.headers.get("content-length"));
  if (Number.isFinite(declared) && declared > MAX_BODY_BYTES) return tooLarge();
  if (!request.body) return "";
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > MAX_BODY_BYTES) {
      await reader.cancel();
      return tooLarge();
    }
    chunks.push(value);
  }
  const all = new Uint8Array(size);
  let offset = 0;
  for (const c of chunks) {
    all.set(c, offset);
    offset += c.byteLength;
  }
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(all);
  } catch {
    return new ApiError("bad_request:body", "request body is not valid UTF-8", "");
  }
}

/**
 * The whole life of a solve request: read (≤ 1 MB), JSON.parse, validate with the schema,
 * call the engine, answer. Engine errors keep their code and path; anything unexpected is
 * logged and answered as a JSON 500 without details.
 */
export async function handleSolve<S extends z.ZodType>(request: Request, schema: S, subject: string, solve: (input: z.infer<S>) => unknown): Promise<Response> {
  try {
    const text = await readBodyText(request);
    if (text instanceof ApiError) return errorResponse(text);
    let raw: unknown;
    try {
      raw = JSON.parse(text);
    } catch {
      return errorResponse(new ApiError("bad_request:json", "request body is not valid JSON", ""));
    }
    const parsed = schema.safeParse(raw);
    if (!parsed.success) return errorResponse(fromZodError(parsed.error, subject));
    return json(solve(parsed.data), 200);
  } catch (e) {
    if (isThermalInputError(e)) return errorResponse(new ApiError(e.code, e.message, e.path));
    console.error(`solve/${subject}: unexpected error`, e);
    return json({ error: { code: "internal:solve", message: "the solver failed unexpectedly", path: "" } }, 500);
  }
}
