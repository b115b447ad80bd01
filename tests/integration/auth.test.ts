import { describe, expect, it } from "vitest";
import { BASE_URL, Client, signedIn, uniqueEmail } from "../support/http";
import { withTestDb } from "../support/db";
import { waitForMail, signUp } from "../support/mail";

describe("sign-up, sign-in, me, sign-out", () => {
  it("walks the whole session life cycle", async () => {
    const email = uniqueEmail("cycle");
    const client = new Client();
    const up = await signUp(client, { email, password: "correct horse 1", displayName: "Tess Ide" });
    expect(up.status).toBe(201);
    expect(up.body.user?.role).toBe("maker");

    const fresh = new Client();
    expect((await fresh.get("/api/v1/me")).status).toBe(401);
    const signIn = await fresh.post("/api/v1/auth/signin", { email: email.toUpperCase(), password: "correct horse 1" });
    expect(signIn.status).toBe(200);
    const me = await fresh.get("/api/v1/me");
    expect(me.status).toBe(200);
    expect(me.body.user?.email).toBe(email);

    expect((await fresh.post("/api/v1/auth/signout")).status).toBe(200);
    expect((await fresh.get("/api/v1/me")).status).toBe(401);
  });

  it("sets the session cookie HttpOnly, SameSite=Lax, path / and not Secure over http", async () => {
    const email = uniqueEmail("cookie");
    const client = new Client();
    const r = await signUp(client, { email, password: "long enough pw", displayName: "C" });
    const cookie = r.headers.getSetCookie().find((c) => c.startsWith("sinkwise_session="));
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toMatch(/Path=\//i);
    expect(BASE_URL.startsWith("http://")).toBe(true);
    expect(cookie).not.toMatch(/Secure/i);
  });

  it("refuses bad sign-ups with a message naming the field, and writes nothing", async () => {
    const client = new Client();
    const badEmail = await signUp(client, { email: "not-an-address", password: "long enough pw", displayName: "X" });
    expect(badEmail.status).toBe(400);
    expect(badEmail.body.error?.path).toBe("email");
    expect(badEmail.body.error?.message).toMatch(/valid e-mail/);

    const email = uniqueEmail("short");
    const short = await signUp(client, { email, password: "short", displayName: "X" });
    expect(short.status).toBe(400);
    expect(short.body.error?.path).toBe("password");
    expect(short.body.error?.message).toMatch(/at least 10 characters/);
    // Nothing was written: the address is still free to sign up with.
    expect((await signUp(new Client(), { email, password: "long enough pw", displayName: "X" })).status).toBe(201);

  });

  it("answers a sign-up of a taken address exactly as one of a free address, and mails the owner instead", async () => {
    const taken = uniqueEmail("taken");
    expect((await signUp(new Client(), { email: taken, password: "long enough pw", displayName: "Owner" })).status).toBe(201);
    const free = uniqueEmail("free");
    const again = await new Client().post("/api/v1/auth/signup", { email: taken, password: "another long pw", displayName: "Y" });
    const fresh = await new Client(BASE_URL, "203.0.113.61").post("/api/v1/auth/signup", { email: free, password: "another long pw", displayName: "Y" });
    expect(again.status).toBe(202);
    expect(fresh.status).toBe(202);
    expect(again.body.message).toBe(String(fresh.body.message).replace(free, taken));
    expect(Object.keys(again.body).sort()).toEqual(Object.keys(fresh.body).sort());
    // The owner learns of it; the free address gets its link; no second account for the taken one.
    const note = await waitForMail(taken, "Someone tried to make a Sinkwise account");
    expect(note.text).toContain("/reset");
    await waitForMail(free, "Finish making your Sinkwise account");
    const accounts = await withTestDb(async (c) => {
      const [rows] = await c.query("SELECT COUNT(*) AS n FROM user WHERE email = ?", [taken]);
      return Number((rows as { n: number }[])[0]?.n);
    });
    expect(accounts).toBe(1);
  });

  it("makes the account only when the mailed link is used, once", async () => {
    const email = uniqueEmail("link-once");
    const client = new Client();
    expect((await client.post("/api/v1/auth/signup", { email, password: "long enough pw", displayName: "Once" })).status).toBe(202);
    expect((await new Client().post("/api/v1/auth/signin", { email, password: "long enough pw" })).status).toBe(401);
    const mail = await waitForMail(email, "Finish making your Sinkwise account");
    const token = /\/signup\/finish\/([A-Za-z0-9_-]+)/.exec(mail.text ?? "")?.[1] ?? "";
    const stored = await withTestDb(async (c) => {
      const [rows] = await c.query("SELECT token_hash AS h FROM signup_request WHERE email = ?", [email]);
      return (rows as { h: string }[]).map((r) => r.h);
    });
    expect(stored).toHaveLength(1);
    expect(stored[0]).not.toContain(token);
    const made = await client.post("/api/v1/auth/signup-confirm", { token });
    expect(made.status).toBe(201);
    expect((await client.get("/api/v1/me")).body.user?.email).toBe(email);
    const twice = await new Client().post("/api/v1/auth/signup-confirm", { token });
    expect(twice.status).toBe(400);
    expect(twice.body.error?.message).toMatch(/already been used/);
    expect((await new Client().post("/api/v1/auth/signup-confirm", { token: "x".repeat(43) })).status).toBe(400);
  });

  it("gives one message for a wrong password and an unknown account", async () => {
    const client = new Client(BASE_URL, "203.0.113.50");
    const wrong = await client.post("/api/v1/auth/signin", { email: "maker@sinkwise.test", password: "definitely wrong" });
    const unknown = await client.post("/api/v1/auth/signin", { email: uniqueEmail("nobody"), password: "definitely wrong" });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error?.message).toBe(unknown.body.error?.message);
    expect(wrong.body.error?.code).toBe(unknown.body.error?.code);
  });

  it("answers bad JSON with 400 rather than a server error", async () => {
    const r = await new Client().request("POST", "/api/v1/auth/signin", "{not json", { "content-type": "application/json" });
    expect(r.status).toBe(400);
    expect(r.body.error?.code).toBe("bad_request:signin");
  });
});

describe("origin check", () => {
  it("refuses a cross-origin POST and one without an Origin header", async () => {
    const evil = new Client("http://evil.example");
    const r = await evil.post("/api/v1/auth/signin", { email: "maker@sinkwise.test", password: "whatever pw" });
    expect(r.status).toBe(403);
    expect(r.body.error?.code).toBe("forbidden:origin");
    const none = new Client(null);
    expect((await signUp(none, { email: uniqueEmail("o"), password: "long enough pw", displayName: "O" })).status).toBe(403);
  });
});

describe("roles", () => {
  it("gives 401 to anonymous and 403 to a maker on an admin route; the admin gets the list", async () => {
    expect((await new Client().get("/api/v1/admin/users")).status).toBe(401);
    const maker = await signedIn("maker@sinkwise.test");
    const denied = await maker.get("/api/v1/admin/users");
    expect(denied.status).toBe(403);
    expect(denied.body.error?.code).toBe("forbidden:role");
    const admin = await signedIn("admin@sinkwise.test");
    const list = await admin.get("/api/v1/admin/users");
    expect(list.status).toBe(200);
    expect((list.body.users as { email: string }[]).some((u) => u.email === "reviewer@sinkwise.test")).toBe(true);
  });

  it("lets an admin change a role, validating the role name", async () => {
    const email = uniqueEmail("promote");
    const user = new Client();
    const up = await signUp(user, { email, password: "long enough pw", displayName: "P" });
    const id = up.body.user?.id ?? "";
    const admin = await signedIn("admin@sinkwise.test");
    const bad = await admin.patch(`/api/v1/admin/users/${id}`, { role: "wizard" });
    expect(bad.status).toBe(400);
    expect(bad.body.error?.path).toBe("role");
    const ok = await admin.patch(`/api/v1/admin/users/${id}`, { role: "reviewer" });
    expect(ok.status).toBe(200);
    expect((await user.get("/api/v1/me")).body.user?.role).toBe("reviewer");
    expect((await admin.patch("/api/v1/admin/users/no-such-user", { role: "maker" })).status).toBe(404);
  });
});

describe("rate limit", () => {
  it("answers 429 after five failed sign-ins on one account", async () => {
    const email = uniqueEmail("limited");
    await signUp(new Client(), { email, password: "the right one!", displayName: "L" });
    const client = new Client(BASE_URL, "203.0.113.77");
    const statuses: number[] = [];
    for (let i = 0; i < 6; i++) {
      statuses.push((await client.post("/api/v1/auth/signin", { email, password: `wrong ${i} attempt` })).status);
    }
    expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
    expect(statuses[5]).toBe(429);
    // Even the right password is refused while the account is locked.
    const locked = await client.post("/api/v1/auth/signin", { email, password: "the right one!" });
    expect(locked.status).toBe(429);
    expect(locked.body.error?.message).toMatch(/Too many failed sign-in attempts/);
  });
});

describe("password reset by e-mail", () => {
  it("mails a single-use link that sets a new password", async () => {
    const email = uniqueEmail("reset");
    await signUp(new Client(), { email, password: "old password 1", displayName: "R" });
    const anon = new Client();
    const asked = await anon.post("/api/v1/auth/reset-request", { email });
    expect(asked.status).toBe(200);
    const mail = await waitForMail(email, "Reset your Sinkwise password");
    const token = /\/reset\/([A-Za-z0-9_-]+)/.exec(mail.text ?? "")?.[1];
    expect(token).toBeDefined();

    const done = await anon.post("/api/v1/auth/reset-confirm", { token, password: "new password 2" });
    expect(done.status).toBe(200);
    expect((await new Client().post("/api/v1/auth/signin", { email, password: "new password 2" })).status).toBe(200);
    expect((await new Client().post("/api/v1/auth/signin", { email, password: "old password 1" })).status).toBe(401);

    const reused = await anon.post("/api/v1/auth/reset-confirm", { token, password: "third password" });
    expect(reused.status).toBe(400);
    expect(reused.body.error?.message).toMatch(/already been used/);
  });

  it("refuses a link older than an hour", async () => {
    const email = uniqueEmail("expired");
    await signUp(new Client(), { email, password: "old password 1", displayName: "E" });
    await new Client().post("/api/v1/auth/reset-request", { email });
    const mail = await waitForMail(email, "Reset your Sinkwise password");
    const token = /\/reset\/([A-Za-z0-9_-]+)/.exec(mail.text ?? "")?.[1];
    await withTestDb((c) =>
      c.query(
        "UPDATE password_reset_token SET expires_at = UTC_TIMESTAMP(3) - INTERVAL 61 MINUTE WHERE user_id = (SELECT id FROM user WHERE email = ?)",
        [email],
      ),
    );
    const late = await new Client().post("/api/v1/auth/reset-confirm", { token, password: "new password 2" });
    expect(late.status).toBe(400);
    expect(late.body.error?.message).toMatch(/expired/);
    expect((await new Client().post("/api/v1/auth/signin", { email, password: "old password 1" })).status).toBe(200);
  });

  it("refuses a forged token and answers the same for unknown addresses", async () => {
    const anon = new Client();
    const forged = await anon.post("/api/v1/auth/reset-confirm", { token: "A".repeat(43), password: "whatever long" });
    expect(forged.status).toBe(400);
    expect(forged.body.error?.message).toMatch(/not valid/);
    const unknown = await anon.post("/api/v1/auth/reset-request", { email: uniqueEmail("ghost") });
    expect(unknown.status).toBe(200);
  });
});
