import http from "node:http";
import { describe, expect, it } from "vitest";
import { withTestDb } from "../support/db";
import { BASE_URL, Client, signedIn, uniqueEmail } from "../support/http";

const url = new URL(BASE_URL);

/**
 * Sends a request whose body streams in without a length and never ends by itself: the
 * answer must come while the body is still open (the server stopped reading at its limit),
 * or the promise gives up after `waitMs`.
 */
function endlessBody(path: string, firstBytes: number, waitMs: number): Promise<{ status: number | "no answer"; body: string }> {
  return new Promise((resolve, reject) => {
    const req = http.request(
      { host: url.hostname, port: url.port, path, method: "POST", headers: { "content-type": "application/json", origin: BASE_URL, "transfer-encoding": "chunked" } },
      (res) => {
        let body = "";
        res.setEncoding("utf8");
        res.on("data", (c: string) => (body += c));
        res.on("end", () => {
          clearTimeout(timer);
          req.destroy();
          resolve({ status: res.statusCode ?? 0, body });
        });
      },
    );
    const timer = setTimeout(() => {
      req.destroy();
      resolve({ status: "no answer", body: "" });
    }, waitMs);
    req.on("error", (e) => {
      // The server may close the connection right after answering; the answer already came.
      if (!("code" in e && (e.code === "ECONNRESET" || e.code === "EPIPE"))) reject(e);
    });
    const chunk = Buffer.alloc(64 * 1024, 0x20);
    let sent = 0;
    const pump = () => {
      while (sent < firstBytes) {
        sent += chunk.length;
        if (!req.write(chunk)) return void req.once("drain", pump);
      }
      // …and then hold the body open, as a slow or hostile client would.
    };
    req.write("{\"email\":\"");
    pump();
  });
}

describe("one request pipeline: every body streamed against one limit", () => {
  it("refuses a 50 MB sign-in body with 413 from its declared length, before reading it", async () => {
    const big = Buffer.alloc(50 * 1024 * 1024, 0x20);
    const r = await new Client().send("POST", "/api/v1/auth/signin", big, { "content-type": "application/json" });
    expect(r.status).toBe(413);
    expect(r.body.error?.code).toBe("payload_too_large:body");
    expect(r.body.error?.message).toMatch(/over 1 MB/);
  });

  it("answers 413 to a body without a length as soon as it passes 1 MB, without waiting for its end", async () => {
    const r = await endlessBody("/api/v1/auth/signin", 2 * 1024 * 1024, 20_000);
    expect(r.status).toBe(413);
    expect(JSON.parse(r.body).error.code).toBe("payload_too_large:body");
  });

  it("puts the solvers through the same pipeline: same error shape, same limit", async () => {
    const r = await endlessBody("/api/v1/solve/steady", 2 * 1024 * 1024, 20_000);
    expect(r.status).toBe(413);
    const bad = await new Client(null).request("POST", "/api/v1/solve/steady", "{nodes:", { "content-type": "application/json" });
    expect(bad.status).toBe(400);
    expect(bad.body.error?.code).toBe("bad_request:network");
  });
});

describe("malformed input is a 4xx naming the segment or the field, never a 500", () => {
  it("answers bad percent-encoding in a dynamic segment with 400 naming the segment", async () => {
    const maker = await signedIn("maker@sinkwise.test");
    for (const path of ["/api/v1/builds/%ff", "/api/v1/parts/%ff/attachments", "/api/v1/builds/abc/revisions/%E0%A4%A"]) {
      const r = await maker.get(path);
      expect(r.status, path).toBe(400);
      expect(r.body.error?.code).toBe("bad_request:path");
      expect(r.body.error?.message).toMatch(/is not valid/);
      expect(path).toContain(r.body.error?.path);
    }
    const page = await new Client().fetchRaw("GET", "/share/%ff");
    expect(page.status).toBe(400);
    expect(await page.text()).toMatch(/The address part (&#34;|")%ff(&#34;|") is not valid/);
  });

  it("refuses a lone surrogate in a JSON string with 400 naming the field, and writes nothing", async () => {
    const email = uniqueEmail("surrogate");
    const raw = `{"email":"${email}","password":"long enough pw","displayName":"Tess \\ud800 Ide"}`;
    const r = await new Client().request("POST", "/api/v1/auth/signup", raw, { "content-type": "application/json" });
    expect(r.status).toBe(400);
    expect(r.body.error?.path).toBe("displayName");
    const rows = await withTestDb(async (c) => {
      const [found] = await c.query("SELECT COUNT(*) AS n FROM user WHERE email = ?", [email]);
      return (found as { n: number }[])[0]?.n;
    });
    expect(Number(rows)).toBe(0);
    const maker = await signedIn("maker@sinkwise.test");
    const build = await maker.request("POST", "/api/v1/builds", '{"title":"ok","design":{"lightEngine":{"count":1},"environment":{"ambientC":25}},"summary":"\\udfff"}', {
      "content-type": "application/json",
    });
    expect(build.status).toBe(400);
    expect(build.body.error?.path).toBe("summary");
  });

  it("refuses a copy whose title would grow past 160 characters with 400 naming the title", async () => {
    const maker = await signedIn("maker@sinkwise.test");
    const created = await maker.post("/api/v1/builds", { title: "T".repeat(160), design: { lightEngine: { count: 1 }, environment: { ambientC: 25 } } });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const id = (created.body.build as { id: string }).id;
    const copy = await maker.post(`/api/v1/builds/${id}/fork`, {});
    expect(copy.status).toBe(400);
    expect(copy.body.error?.path).toBe("title");
    expect(copy.body.error?.message).toMatch(/at most 160/);
    const named = await maker.post(`/api/v1/builds/${id}/fork`, { title: "A shorter copy" });
    expect(named.status).toBe(201);
  });
});

describe("sign-in limits cannot be beaten by numbers or by headers", () => {
  it("checks at most five guesses of a burst of 24 wrong passwords and the right one sent at once", async () => {
    const email = uniqueEmail("burst");
    await new Client().post("/api/v1/auth/signup", { email, password: "the right one!", displayName: "B" });
    const attempts = [...Array.from({ length: 24 }, (_, i) => `wrong guess ${i}`), "the right one!"];
    const statuses = await Promise.all(attempts.map((password) => new Client(BASE_URL, "203.0.113.150").post("/api/v1/auth/signin", { email, password }).then((r) => r.status)));
    const checked = statuses.filter((s) => s === 401).length;
    // Five failures per account (server/rate-limit.ts); every other attempt is refused unchecked.
    expect(checked).toBeLessThanOrEqual(5);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(19);
    expect(statuses.every((s) => s === 401 || s === 429 || s === 200)).toBe(true);
  });

  it("keys the address limit on the proxy's own entry, not on what the client wrote before it", async () => {
    // The test server trusts loopback as its proxy (scripts/test.sh): the right-most entry of
    // X-Forwarded-For is the one that proxy wrote; anything left of it is the client's word.
    const real = "198.51.100.77";
    const failures = [];
    for (let i = 0; i < 20; i += 1) {
      failures.push(new Client(BASE_URL, `10.${i}.0.1, ${real}`).post("/api/v1/auth/signin", { email: uniqueEmail("spray"), password: "wrong password" }));
    }
    const done = await Promise.all(failures);
    expect(done.filter((r) => r.status === 401).length).toBe(20);
    const forged = await new Client(BASE_URL, `203.0.113.99, ${real}`).post("/api/v1/auth/signin", { email: uniqueEmail("spray"), password: "wrong password" });
    expect(forged.status).toBe(429);
    // A client cannot pose as another peer either: the front door overwrites that stamp.
    const posing = await new Client(BASE_URL, real).post("/api/v1/auth/signin", { email: uniqueEmail("spray"), password: "wrong password" });
    expect(posing.status).toBe(429);
    const stamped = await new Client(BASE_URL, real).request("POST", "/api/v1/auth/signin", { email: uniqueEmail("spray"), password: "wrong password" }, { "x-sinkwise-peer": "192.0.2.1" });
    expect(stamped.status).toBe(429);
  });
});
