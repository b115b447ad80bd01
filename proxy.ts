import { type NextRequest, NextResponse } from "next/server";
import { commonSecurityHeaders, pagePolicy } from "@/server/http/security-headers";

// Only a redirect hint for signed-out visitors: every page and route checks the session itself.
const SIGNED_IN_PREFIXES = ["/parts", "/builds", "/compare", "/reviews", "/classes", "/admin", "/bench"];

/**
 * Every page answer gets a fresh script nonce in its Content-Security-Policy (the framework
 * reads the policy from the request and puts the nonce on its own scripts) and the common
 * security headers. API routes add theirs in the route wrapper.
 */
export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  const https = (process.env.APP_URL ?? "").startsWith("https://");
  const needsSession = SIGNED_IN_PREFIXES.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  if (needsSession && !request.cookies.has("sinkwise_session") && !request.cookies.has("__Host-sinkwise_session")) {
    const url = request.nextUrl.clone();
    url.pathname = "/signin";
    url.search = "";
    return withHeaders(NextResponse.redirect(url), https);
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const policy = pagePolicy({ nonce, https, dev: process.env.NODE_ENV === "development" });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("content-security-policy", policy);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("content-security-policy", policy);
  return withHeaders(response, https);
}

function withHeaders(response: NextResponse, https: boolean): NextResponse {
  for (const [name, value] of Object.entries(commonSecurityHeaders({ https }))) response.headers.set(name, value);
  return response;
}

export const config = {
  matcher: [{ source: "/((?!api|_next/static|_next/image|favicon.ico|icon).*)", missing: [{ type: "header", key: "next-router-prefetch" }] }],
};
