// The role × route × method matrix: every handler under app/api must have a row in
// tests/integration/access/matrix.ts, and every role gets exactly the status its row says.
import { beforeAll, describe, expect, it } from "vitest";
import { makeWorld, ROLES, type Role, type World } from "../support/access-world";
import { routeHandlers } from "../support/routes";
import { MATRIX } from "./access/matrix";

describe("access matrix: coverage", () => {
  it("has exactly one row for every handler in app/api/**/route.ts", () => {
    const handlers = routeHandlers().map((h) => h.key);
    expect(handlers.length).toBeGreaterThan(40);
    const rows = MATRIX.map((r) => r.route);
    expect(rows.filter((r, i) => rows.indexOf(r) !== i), "rows listed twice").toEqual([]);
    expect(handlers.filter((h) => !rows.includes(h)), "routes without a row in tests/integration/access/matrix.ts").toEqual([]);
    expect(rows.filter((r) => !handlers.includes(r)), "rows naming no route").toEqual([]);
  });
});

describe("access matrix: every role × route × method", () => {
  let world: World;
  beforeAll(async () => {
    world = await makeWorld();
  }, 120_000);

  for (const row of MATRIX) {
    it(row.route, async () => {
      const [method] = row.route.split(" ");
      const seen = {} as Record<Role, number>;
      for (const role of ROLES) {
        const path = await row.path(world);
        const body = row.body?.(world);
        const client = row.ownSession ? await world.session(role) : world.clients[role];
        const r = body instanceof FormData ? await client.send(method!, path, body) : await client.request(method!, path, body);
        // A 5xx is never an answer to an access question.
        expect(r.status, `${role}: ${JSON.stringify(r.body).slice(0, 300)}`).toBeLessThan(500);
        seen[role] = r.status;
      }
      const want = Object.fromEntries(ROLES.map((role, i) => [role, row.expect[i]]));
      if (process.env.MATRIX_RECORD) console.log(`MATRIX ${row.route} ${ROLES.map((r) => seen[r]).join(", ")}`);
      else expect(seen).toEqual(want);
    }, 60_000);
  }
});
