// No "server-only" marker: proxy.ts loads this module outside the server-components layer.

/** Headers every answer carries, page or API. HSTS only when the site is served over https. */
export function commonSecurityHeaders({ https }: { https: boolean }): Record<string, string> {
  return {
    "x-content-type-options": "nosniff",
    "referrer-policy": "strict-origin-when-cross-origin",
    "permissions-policy": "camera=(), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()",
    "x-frame-options": "DENY",
    ...(https ? { "strict-transport-security": "max-age=31536000; includeSubDomains" } : {}),
  };
}

/**
 * The Content-Security-Policy of a page: scripts only with this answer's nonce (the framework
 * puts it on its own scripts) and what those load; no eval outside development (the dev server's
 * refresh needs it); styles from the app and inline (charts and typeset maths set style
 * attributes); nothing may frame a page.
 */
export function pagePolicy({ nonce, https, dev }: { nonce: string; https: boolean; dev: boolean }): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(https ? ["upgrade-insecure-requests"] : []),
  ].join("; ");
}

/** An API answer is data, never a document: nothing in it may run or be framed. */
export const API_POLICY = "default-src 'none'; frame-ancestors 'none'";

/** Adds the headers an answer lacks (a route that set its own, like an attachment's, keeps them). */
export function withSecurityHeaders(response: Response, { https }: { https: boolean }): Response {
  const add = { ...commonSecurityHeaders({ https }), "content-security-policy": API_POLICY };
  try {
    for (const [name, value] of Object.entries(add)) if (!response.headers.has(name)) response.headers.set(name, value);
  } catch {
    // An answer with immutable headers keeps its own.
  }
  return response;
}
