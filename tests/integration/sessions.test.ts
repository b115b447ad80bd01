import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { withTestDb } from "../support/db";
import { BASE_URL, Client, uniqueEmail } from "../support/http";

const INBOX = process.env.MAIL_INBOX_URL ?? "http://127.0.0.1:1081";

/** Every reset link mailed to `to`, once at least `count` have arrived. */
async function resetLinks(to: string, count: number): Promise<string[]> {
  const until = Date.now() + 15_000;
  while (Date.now() < until) {
    const mails = (await (await fetch(`${INBOX}/api/email`)).json()) as { subject: string; text?: string; to: { address: string }[] }[];
    const tokens = mails
      .filter((m) => m.to.some((t) => t.address === to) && m.subject.includes("Reset your Sinkwise password"))
      .map((m) => /\/reset\/([A-Za-z0-9_-]+)/.exec(m.text ?? "")?.[1] ?? "");
    if (tokens.length >= count) return tokens;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`fewer than ${count} reset mails to ${to}`);
}

function sessionCookie(client: Client, response: { headers: Headers }): string {
  const set = response.headers.getSetCookie().find((c) => c.startsWith("sinkwise_session="));
  expect(client.hasSession()).toBe(true);
  return (set ?? "").split(";")[0]?.split("=")[1] ?? "";
}

const sha256 = (text: string) => createHash("sha256").update(text).digest("hex");

describe("session tokens are stored hashed and have an absolute lifetime", () => {
  it("keeps only the SHA-256 of the cookie's secret in the database", async () => {
    const email = uniqueEmail("hashed");
    const client = new Client();
    const up = await client.post("/api/v1/auth/signup", { email, password: "long enough pw", displayName: "H" });
    const token = sessionCookie(client, up);
    const [issued, secret] = token.split(".");
    expect(secret).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const ids = await withTestDb(async (c) => {
      const [rows] = await c.query("SELECT s.id FROM user_session s JOIN user u ON u.id = s.user_id WHERE u.email = ?", [email]);
      return (rows as { id: string }[]).map((r) => r.id);
    });
    expect(ids).toEqual([`${issued}.${sha256(secret ?? "")}`]);
    expect(ids.join()).not.toContain(secret);
    // The stored id itself opens nothing.
    const thief = new Client();
    const stolen = await thief.fetchRaw("GET", "/api/v1/me", undefined, { cookie: `sinkwise_session=${ids[0]}` });
    expect(stolen.status).toBe(401);
  });

  it("ends a session 60 days after sign-in even while it is in use", async () => {
    const email = uniqueEmail("absolute");
    const client = new Client();
    await client.post("/api/v1/auth/signup", { email, password: "long enough pw", displayName: "A" });
    const userId = (await client.get("/api/v1/me")).body.user?.id;
    const plant = async (ageDays: number) => {
      const issued = (Date.now() - ageDays * 86_400_000).toString(36);
      const secret = Buffer.alloc(32, ageDays).toString("base64url");
      await withTestDb((c) =>
        c.query("INSERT INTO user_session (id, user_id, expires_at) VALUES (?, ?, UTC_TIMESTAMP() + INTERVAL 20 DAY)", [`${issued}.${sha256(secret)}`, userId]),
      );
      return `${issued}.${secret}`;
    };
    const young = await plant(59);
    const old = await plant(61);
    const me = (token: string) => fetch(`${BASE_URL}/api/v1/me`, { headers: { cookie: `sinkwise_session=${token}` } }).then((r) => r.status);
    expect(await me(young)).toBe(200);
    expect(await me(old)).toBe(401);
    // A client cannot make an old session young by editing the issue time in its cookie.
    const [, oldSecret] = old.split(".");
    expect(await me(`${Date.now().toString(36)}.${oldSecret}`)).toBe(401);
  });
});

describe("password reset", () => {
  it("revokes every other outstanding reset link once one of them is used", async () => {
    const email = uniqueEmail("two-links");
    await new Client().post("/api/v1/auth/signup", { email, password: "old password 1", displayName: "T" });
    expect((await new Client().post("/api/v1/auth/reset-request", { email })).status).toBe(200);
    expect((await new Client().post("/api/v1/auth/reset-request", { email })).status).toBe(200);
    const [first, second] = await resetLinks(email, 2);
    expect(first).not.toBe(second);
    expect((await new Client().post("/api/v1/auth/reset-confirm", { token: second, password: "new password 2" })).status).toBe(200);
    const stale = await new Client().post("/api/v1/auth/reset-confirm", { token: first, password: "new password 3" });
    expect(stale.status).toBe(400);
    expect((await new Client().post("/api/v1/auth/signin", { email, password: "new password 2" })).status).toBe(200);
  });

  it("answers for an unknown address just as for an account, and limits requests per address", async () => {
    const email = uniqueEmail("reset-same");
    await new Client().post("/api/v1/auth/signup", { email, password: "old password 1", displayName: "R" });
    const bodies = new Set<string>();
    const statuses = new Set<number>();
    for (let i = 0; i < 3; i += 1) {
      for (const address of [email, uniqueEmail("nobody")]) {
        const r = await new Client(BASE_URL, `198.51.100.${10 + i}`).post("/api/v1/auth/reset-request", { email: address });
        bodies.add(JSON.stringify(r.body));
        statuses.add(r.status);
      }
    }
    expect([...statuses]).toEqual([200]);
    expect(bodies.size).toBe(1);
    await resetLinks(email, 3);
    // A fourth request for the same address within the hour is refused, from any client.
    const fourth = await new Client(BASE_URL, "198.51.100.99").post("/api/v1/auth/reset-request", { email });
    expect(fourth.status).toBe(429);
    expect(fourth.body.error?.message).toMatch(/Too many reset requests/);
    // …and one client cannot spray addresses: 20 an hour (server/rate-limit.ts).
    const spray = [];
    for (let i = 0; i < 21; i += 1) spray.push((await new Client(BASE_URL, "198.51.100.77").post("/api/v1/auth/reset-request", { email: uniqueEmail("spray") })).status);
    expect(spray.slice(0, 20).every((s) => s === 200)).toBe(true);
    expect(spray[20]).toBe(429);
  });
});
