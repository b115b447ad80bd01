import { describe, expect, it } from "vitest";
import { BASE_URL, DEMO_PASSWORD, signedIn } from "../support/http";

// What a browser is told about each answer: OWASP Secure Headers Project (the usual set),
// W3C Content Security Policy Level 3 §6 (directives, nonces, 'strict-dynamic').
function policyOf(res: Response): Map<string, string> {
  const text = res.headers.get("content-security-policy") ?? "";
  return new Map(
    text
      .split(";")
      .map((d) => d.trim())
      .filter(Boolean)
      .map((d) => {
        const [name, ...rest] = d.split(/\s+/);
        return [name!, rest.join(" ")] as const;
      }),
  );
}

function expectCommonHeaders(res: Response): void {
  expect(res.headers.get("x-content-type-options")).toBe("nosniff");
  expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
  expect(res.headers.get("permissions-policy")).toContain("camera=()");
  // The test server is served over plain http: HSTS there would be meaningless (RFC 6797 §7.2).
  expect(res.headers.get("strict-transport-security")).toBeNull();
}

describe("security headers", () => {
  it("a page carries a policy with a fresh script nonce that the page's own scripts bear, and no eval", async () => {
    const [a, b] = await Promise.all([fetch(`${BASE_URL}/`), fetch(`${BASE_URL}/`)]);
    expect(a.status).toBe(200);
    expectCommonHeaders(a);
    const policy = policyOf(a);
    const script = policy.get("script-src") ?? "";
    const nonce = /'nonce-([^']+)'/.exec(script)?.[1];
    expect(nonce, `script-src was "${script}"`).toBeTruthy();
    expect(script).toContain("'strict-dynamic'");
    expect(script).not.toContain("unsafe-eval");
    expect(script).not.toContain("unsafe-inline");
    expect(policy.get("frame-ancestors")).toBe("'none'");
    expect(policy.get("object-src")).toBe("'none'");
    expect(policy.get("base-uri")).toBe("'self'");
    expect(/'nonce-([^']+)'/.exec(policyOf(b).get("script-src") ?? "")?.[1]).not.toBe(nonce);

    const html = await a.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag, tag).toContain(`nonce="${nonce}"`);
  });

  it("a signed-in page and the sign-in redirect carry them too", async () => {
    const maker = await signedIn("maker@sinkwise.test", DEMO_PASSWORD);
    const page = await maker.fetchRaw("GET", "/builds");
    expect(page.status).toBe(200);
    expectCommonHeaders(page);
    expect(policyOf(page).get("frame-ancestors")).toBe("'none'");
    const redirect = await fetch(`${BASE_URL}/builds`, { redirect: "manual" });
    expect([302, 303, 307, 308]).toContain(redirect.status);
    expectCommonHeaders(redirect);
  });

  it("an API answer, success or error, says it is data that nothing may run or frame", async () => {
    for (const path of ["/api/v1/health", "/api/v1/builds/not-a-build", "/api/v1/builds"]) {
      const res = await fetch(`${BASE_URL}${path}`);
      expectCommonHeaders(res);
      const policy = policyOf(res);
      expect(policy.get("default-src"), path).toBe("'none'");
      expect(policy.get("frame-ancestors"), path).toBe("'none'");
    }
  });
});
