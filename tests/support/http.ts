// A small HTTP client for integration tests: keeps cookies like a browser and sends the
// Origin header a same-origin page would send.
export const BASE_URL = process.env.SINKWISE_TEST_URL ?? "http://127.0.0.1:3100";

/** The fields tests read most; anything else is there as `unknown` for the test to narrow. */
export type Json = {
  error?: { code: string; message: string; path: string };
  user?: { id: string; email: string; displayName: string; role: string };
  [key: string]: unknown;
};
export type Reply = { status: number; body: Json; headers: Headers };

export class Client {
  private cookies = new Map<string, string>();
  /** `base` is the app process to talk to (another port for the scale-out and fault tests). */
  constructor(
    private readonly origin: string | null = BASE_URL,
    private readonly address = "203.0.113.10",
    private readonly base = BASE_URL,
  ) {}

  /** Takes over another client's cookies (its session), e.g. to use it on another app process. */
  withCookiesOf(other: Client): this {
    for (const [k, v] of other.cookies) this.cookies.set(k, v);
    return this;
  }

  async request(method: string, path: string, body?: unknown, extraHeaders: Record<string, string> = {}): Promise<Reply> {
    const headers: Record<string, string> = {};
    if (body !== undefined) headers["content-type"] = "application/json";
    const raw = body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body);
    return this.send(method, path, raw, { ...headers, ...extraHeaders });
  }

  /** Sends a body as it is (FormData, bytes): fetch sets the multipart content type itself. */
  async send(method: string, path: string, body: BodyInit | undefined, extraHeaders: Record<string, string> = {}): Promise<Reply> {
    const response = await this.fetchRaw(method, path, body, extraHeaders);
    const text = await response.text();
    let parsed: Json = { text };
    try {
      parsed = text ? (JSON.parse(text) as Json) : {};
    } catch {
      // not JSON: keep the text
    }
    return { status: response.status, body: parsed, headers: response.headers };
  }

  /** The raw response (for downloads), with this client's cookies and origin. */
  async fetchRaw(method: string, path: string, body?: BodyInit, extraHeaders: Record<string, string> = {}): Promise<Response> {
    const headers: Record<string, string> = { "x-forwarded-for": this.address, ...extraHeaders };
    if (this.origin) headers.origin = this.origin;
    if (this.cookies.size) headers.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
    const response = await fetch(`${this.base}${path}`, { method, headers, body, redirect: "manual" });
    for (const c of response.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const [name, ...rest] = (pair ?? "").split("=");
      if (!name) continue;
      const value = rest.join("=");
      if (value === "") this.cookies.delete(name.trim());
      else this.cookies.set(name.trim(), value);
    }
    return response;
  }

  get(path: string) {
    return this.request("GET", path);
  }
  post(path: string, body?: unknown) {
    return this.request("POST", path, body ?? {});
  }
  patch(path: string, body: unknown) {
    return this.request("PATCH", path, body);
  }

  hasSession(): boolean {
    return this.cookies.has("sinkwise_session");
  }

  /** The session cookie's value (the token the browser holds), if any. */
  sessionToken(): string | undefined {
    return this.cookies.get("sinkwise_session");
  }
}

export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "";

export async function signedIn(email: string, password = DEMO_PASSWORD, address?: string): Promise<Client> {
  const client = new Client(BASE_URL, address);
  const r = await client.post("/api/v1/auth/signin", { email, password });
  if (r.status !== 200) throw new Error(`sign-in of ${email} failed: ${r.status} ${JSON.stringify(r.body)}`);
  return client;
}

export function uniqueEmail(tag: string): string {
  return `${tag}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 7)}@example.org`;
}
