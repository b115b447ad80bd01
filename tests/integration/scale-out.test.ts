// Two app processes behind one database behave as one app: the app keeps no state of its
// own (sessions, sign-in limits and the solve cache all live in MariaDB).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type AppProcess, nearbyPort, startApp } from "../support/app-process";
import { BASE_URL, Client, signedIn, uniqueEmail } from "../support/http";
import { createParts, retrofitDesign } from "../support/retrofit";

let second: AppProcess;

beforeAll(async () => {
  second = await startApp(nearbyPort(1));
}, 120_000);

afterAll(async () => {
  await second?.stop();
});

describe("scale-out: two app processes, one database", () => {
  it("a session made on one process works on the other, and signing out on the other ends it on both", async () => {
    const email = uniqueEmail("two-procs");
    const a = new Client();
    expect((await a.post("/api/v1/auth/signup", { email, password: "long enough pw", displayName: "Two Procs" })).status).toBe(201);
    const b = new Client(second.base, undefined, second.base).withCookiesOf(a);
    const me = await b.get("/api/v1/me");
    expect(me.status).toBe(200);
    expect(me.body.user?.email).toBe(email);
    expect((await b.post("/api/v1/auth/signout", {})).status).toBe(200);
    expect((await a.get("/api/v1/me")).status).toBe(401);
  });

  it("counts failed sign-ins across both processes", async () => {
    const email = uniqueEmail("limit-two-procs");
    await new Client().post("/api/v1/auth/signup", { email, password: "long enough pw", displayName: "Limit" });
    const a = new Client(BASE_URL, "198.51.100.7");
    const b = new Client(second.base, "198.51.100.7", second.base);
    const statuses: number[] = [];
    // Alternating processes: a limit kept in each process's memory would allow twice as many.
    for (let i = 0; i < 8; i++) statuses.push((await (i % 2 ? b : a).post("/api/v1/auth/signin", { email, password: "not the password" })).status);
    const first429 = statuses.indexOf(429);
    expect(first429, statuses.join(",")).toBeGreaterThan(0);
    expect(first429, statuses.join(",")).toBeLessThanOrEqual(6);
    // Locked on both, even with the right password.
    expect((await a.post("/api/v1/auth/signin", { email, password: "long enough pw" })).status).toBe(429);
    expect((await b.post("/api/v1/auth/signin", { email, password: "long enough pw" })).status).toBe(429);
  });

  it("a solve cached by one process is served from the cache by the other", async () => {
    const owner = await signedIn("maker@sinkwise.test");
    const ids = await createParts(owner, "private");
    const made = await owner.post("/api/v1/builds", { title: "Two processes lantern", design: retrofitDesign(ids, "floating") });
    expect(made.status).toBe(201);
    const id = (made.body.build as { id: string }).id;
    const first = await owner.post(`/api/v1/builds/${id}/solve`, {});
    expect(first.status).toBe(200);
    expect(first.body.cached).toBe(false);
    const b = new Client(second.base, undefined, second.base).withCookiesOf(owner);
    // The cache write may finish just after the first answer: poll briefly for the hit.
    let again = await b.post(`/api/v1/builds/${id}/solve`, {});
    for (let i = 0; i < 50 && again.body.cached !== true; i++) {
      await new Promise((r) => setTimeout(r, 100));
      again = await b.post(`/api/v1/builds/${id}/solve`, {});
    }
    expect(again.status).toBe(200);
    expect(again.body.cached).toBe(true);
    expect(JSON.stringify(again.body.evaluation)).toBe(JSON.stringify(first.body.evaluation));
  });
});
