import { type NextRequest, NextResponse } from "next/server";

// Only a redirect hint for signed-out visitors: every page and route checks the session itself.
const SIGNED_IN_PREFIXES = ["/parts", "/builds", "/compare", "/reviews", "/classes", "/admin"];

export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  const needsSession = SIGNED_IN_PREFIXES.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  if (needsSession && !request.cookies.has("sinkwise_session") && !request.cookies.has("__Host-sinkwise_session")) {
    const url = request.nextUrl.clone();
    url.pathname = "/signin";
    url.search = "";
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = { matcher: ["/((?!api|_next|favicon.ico).*)"] };
