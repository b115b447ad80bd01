import http from "node:http";

// No "server-only" marker: this module is loaded by instrumentation.ts, outside the
// server-components layer, where that marker would throw.

/**
 * The address of the connection's other end, stamped on every request over anything a
 * client sent under that name.
 */
export const PEER_HEADER = "x-sinkwise-peer";

/**
 * The first thing every request meets, before the framework parses its address:
 * - it stamps the socket's peer address on the request (replacing anything a client sent
 *   under that name), so the client address never comes from a forgeable header alone;
 * - it refuses an address whose path is not valid percent-encoded UTF-8 (`/share/%ff`) with a
 *   400 naming the segment, where the framework would answer a bare 500.
 */
export function badPathSegment(url: string): string | null {
  const path = url.split(/[?#]/, 1)[0] ?? "";
  for (const segment of path.split("/")) {
    if (!segment.includes("%")) continue;
    try {
      decodeURIComponent(segment);
    } catch {
      return segment;
    }
  }
  return null;
}

function refuse(req: http.IncomingMessage, res: http.ServerResponse, segment: string): void {
  const shown = segment.length > 60 ? `${segment.slice(0, 60)}…` : segment;
  const message = `The address part "${shown}" is not valid: a % must be followed by two hex digits that spell UTF-8 text.`;
  const api = (req.url ?? "").startsWith("/api/");
  const body = api
    ? JSON.stringify({ error: { code: "bad_request:path", message, path: shown } })
    : `<!doctype html><meta charset="utf-8"><title>Bad address · Sinkwise</title><p>${message.replace(/[&<>"]/g, (c) => `&#${c.charCodeAt(0)};`)}</p><p><a href="/">Sinkwise home</a></p>`;
  res.writeHead(400, {
    "content-type": api ? "application/json; charset=utf-8" : "text/html; charset=utf-8",
    "content-length": Buffer.byteLength(body),
    "cache-control": "no-store",
    "x-content-type-options": "nosniff",
    "content-security-policy": "default-src 'none'; frame-ancestors 'none'",
  });
  res.end(body);
}

const marker = Symbol.for("sinkwise.frontDoor");

export function installFrontDoor(): void {
  const proto = http.Server.prototype as unknown as { emit: (event: string | symbol, ...args: unknown[]) => boolean; [marker]?: true };
  if (proto[marker]) return;
  const original = proto.emit;
  proto[marker] = true;
  proto.emit = function emit(this: http.Server, event: string | symbol, ...args: unknown[]): boolean {
    if (event === "request") {
      const req = args[0] as http.IncomingMessage;
      const res = args[1] as http.ServerResponse;
      req.headers[PEER_HEADER] = req.socket?.remoteAddress ?? "";
      const bad = badPathSegment(req.url ?? "/");
      if (bad !== null) {
        refuse(req, res, bad);
        return true;
      }
    }
    return original.call(this, event, ...args);
  };
}
