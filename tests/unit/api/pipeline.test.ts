import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { PEER_HEADER, badPathSegment } from "@/server/http/front-door";
import { resolveClientAddress } from "@/server/http/client-address";

// The route wrapper reads TRUSTED_PROXY through server/env, parsed once per module load.
async function loadRoute(trusted: string) {
  vi.resetModules();
  vi.stubEnv("TRUSTED_PROXY", trusted);
  return import("@/server/route");
}

const ok = async () => new Response("done");

function post(headers: Record<string, string>): Request {
  return new Request("http://app.example/api/v1/builds", { method: "POST", headers: { host: "app.example", ...headers }, body: "{}" });
}

describe("origin check", () => {
  beforeEach(() => vi.unstubAllEnvs());
  afterEach(() => vi.unstubAllEnvs());

  it("ignores X-Forwarded-Host from a client that is not the configured proxy", async () => {
    const { route } = await loadRoute("");
    const handler = route(ok);
    const forged = await handler(post({ origin: "http://evil.example", "x-forwarded-host": "evil.example", [PEER_HEADER]: "203.0.113.5" }), {});
    expect(forged.status).toBe(403);
    expect((await forged.json()).error.code).toBe("forbidden:origin");
    const same = await handler(post({ origin: "http://app.example", [PEER_HEADER]: "203.0.113.5" }), {});
    expect(same.status).toBe(200);
  });

  it("believes X-Forwarded-Host only from the proxy named in TRUSTED_PROXY", async () => {
    const { route } = await loadRoute("10.0.0.2");
    const handler = route(ok);
    const viaProxy = post({ origin: "https://sinkwise.example", host: "10.0.0.9:3000", "x-forwarded-host": "sinkwise.example", [PEER_HEADER]: "10.0.0.2" });
    expect((await handler(viaProxy, {})).status).toBe(200);
    const notProxy = post({ origin: "https://sinkwise.example", host: "10.0.0.9:3000", "x-forwarded-host": "sinkwise.example", [PEER_HEADER]: "10.0.0.3" });
    expect((await handler(notProxy, {})).status).toBe(403);
  });
});

describe("client address", () => {
  it("is the socket's peer unless that peer is a trusted proxy", () => {
    expect(resolveClientAddress({ peer: "203.0.113.5", forwardedFor: "1.2.3.4", trusted: [] })).toBe("203.0.113.5");
    expect(resolveClientAddress({ peer: "::ffff:203.0.113.5", forwardedFor: null, trusted: [] })).toBe("203.0.113.5");
    expect(resolveClientAddress({ peer: "10.0.0.2", forwardedFor: "6.6.6.6, 1.2.3.4", trusted: ["10.0.0.2"] })).toBe("1.2.3.4");
    expect(resolveClientAddress({ peer: "10.0.0.2", forwardedFor: "6.6.6.6, 1.2.3.4, 10.0.0.1", trusted: ["10.0.0.2", "10.0.0.1"] })).toBe("1.2.3.4");
    expect(resolveClientAddress({ peer: "10.0.0.2", forwardedFor: null, trusted: ["10.0.0.2"] })).toBe("10.0.0.2");
    expect(resolveClientAddress({ peer: null, forwardedFor: "1.2.3.4", trusted: [] })).toBe("unknown");
  });
});

describe("front door", () => {
  it("finds the segment that is not valid percent-encoding", () => {
    expect(badPathSegment("/api/v1/builds/%ff")).toBe("%ff");
    expect(badPathSegment("/share/%E0%A4%A?x=%ff")).toBe("%E0%A4%A");
    expect(badPathSegment("/api/v1/builds/abc%20def?q=%ff")).toBeNull();
    expect(badPathSegment("/parts/%C3%A9")).toBeNull();
  });
});
