import { beforeAll, describe, expect, it } from "vitest";
import { Client, signedIn } from "../support/http";

let maker: Client;
let reviewer: Client;
let admin: Client;
const anonymous = new Client();

/** A warm-up of a sink near 5 K/W and 90 J/K at 7 W, read every two minutes (0.1 °C steps). */
const readings = [2, 4, 6, 8, 10, 12, 14, 16, 18, 20, 25, 30].map((min) => ({ tS: `${min} min`, tempC: `${(25 + 35 * (1 - Math.exp((-min * 60) / 450))).toFixed(1)} °C` }));
const run = (over: Record<string, unknown> = {}) => ({ title: "Salvaged sink on the bench", conditions: { ambientC: "25 °C", heatW: "7 W", massKg: "100 g", material: "aluminium-6063-t5" }, readings, ...over });

type Saved = { run: { id: string; url: string }; fit: { sinkToAirKPerW: { value: number; low: number; high: number } } };
type Listed = { runs: { id: string; title: string; mine: boolean }[] };

let privateId = "";
let sharedId = "";

beforeAll(async () => {
  [maker, reviewer, admin] = await Promise.all([signedIn("maker@sinkwise.test"), signedIn("reviewer@sinkwise.test"), signedIn("admin@sinkwise.test")]);
  const a = await maker.post("/api/v1/bench/runs", run());
  expect(a.status).toBe(201);
  privateId = (a.body as unknown as Saved).run.id;
  const b = await maker.post("/api/v1/bench/runs", run({ title: "Shared sink run", visibility: "shared" }));
  expect(b.status).toBe(201);
  sharedId = (b.body as unknown as Saved).run.id;
});

describe("bench runs by role", () => {
  it("saving fits the run and answers the fit", async () => {
    const r = await maker.post("/api/v1/bench/runs", run({ title: "Another run" }));
    expect(r.status).toBe(201);
    const s = r.body as unknown as Saved;
    expect(s.run.url).toBe(`/bench/${s.run.id}`);
    expect(s.fit.sinkToAirKPerW.value).toBeGreaterThan(4.5);
    expect(s.fit.sinkToAirKPerW.value).toBeLessThan(5.5);
  });

  it("a private run is the owner's: others get 404, even an admin; nobody signed out", async () => {
    expect((await maker.get(`/api/v1/bench/runs/${privateId}`)).status).toBe(200);
    for (const c of [reviewer, admin]) {
      const r = await c.get(`/api/v1/bench/runs/${privateId}`);
      expect(r.status).toBe(404);
      expect(r.body.error?.code).toBe("not_found:bench_run");
    }
    expect((await anonymous.get(`/api/v1/bench/runs/${privateId}`)).status).toBe(401);
    const listed = (await reviewer.get("/api/v1/bench/runs")).body as unknown as Listed;
    expect(listed.runs.map((x) => x.id)).not.toContain(privateId);
    expect(listed.runs.map((x) => x.id)).toContain(sharedId);
    const own = (await maker.get("/api/v1/bench/runs")).body as unknown as Listed;
    expect(own.runs.find((x) => x.id === privateId)?.mine).toBe(true);
  });

  it("a shared run may be read by anyone signed in, but only its owner keeps a part from it", async () => {
    expect((await reviewer.get(`/api/v1/bench/runs/${sharedId}`)).status).toBe(200);
    const refused = await reviewer.post(`/api/v1/bench/runs/${sharedId}/part`, { name: "Not mine" });
    expect(refused.status).toBe(403);
    const hidden = await reviewer.post(`/api/v1/bench/runs/${privateId}/part`, { name: "Not mine" });
    expect(hidden.status).toBe(404);
    expect((await anonymous.post(`/api/v1/bench/runs/${sharedId}/part`, { name: "x" })).status).toBe(401);
  });

  it("keeping the fit makes a measured heatsink part, once", async () => {
    const r = await maker.post(`/api/v1/bench/runs/${privateId}/part`, { name: "Salvaged sink (measured)" });
    expect(r.status).toBe(201);
    const partId = (r.body.part as { id: string }).id;
    const part = await maker.get(`/api/v1/parts/${partId}`);
    expect(part.status).toBe(200);
    const p = part.body.part as { kind: string; provenance: string; provenanceNote: string; specs: { rating: string; sinkToAirKPerW: number; ratedPowerW: number } };
    expect(p.kind).toBe("heatsink");
    expect(p.provenance).toBe("measured");
    expect(p.specs.rating).toBe("declared");
    expect(p.specs.ratedPowerW).toBeCloseTo(7, 9);
    expect(p.provenanceNote).toMatch(/fitted from the bench run “Salvaged sink on the bench”/);
    const again = await maker.post(`/api/v1/bench/runs/${privateId}/part`, { name: "Twice" });
    expect(again.status).toBe(409);
    const detail = (await maker.get(`/api/v1/bench/runs/${privateId}`)).body.run as { fittedPartId: string };
    expect(detail.fittedPartId).toBe(partId);
  });

  it("bad input saves nothing and names the field or the reading", async () => {
    const before = ((await maker.get("/api/v1/bench/runs")).body as unknown as Listed).runs.length;
    const cases: [unknown, number, string][] = [
      [run({ title: "" }), 400, "title"],
      [run({ readings: [{ tS: 600, tempC: 40 }, { tS: 300, tempC: 50 }] }), 422, "readings[1].tS"],
      [run({ conditions: { ambientC: 25, heatW: 0 } }), 400, "conditions.heatW"],
      [run({ conditions: { ambientC: 25, heatW: 7 }, readings: [{ tS: 1200, tempC: 60 }] }), 422, "readings"],
      [run({ conditions: { ambientC: 25, volts: 3, amps: 2 } }), 400, "conditions.heatFraction"],
      [run({ powered: { kind: "part", partId: "no-such-part" } }), 404, "powered.partId"],
      [run({ powered: { kind: "build", buildId: "no-such-build" } }), 404, "powered.buildId"],
    ];
    for (const [body, status, path] of cases) {
      const r = await maker.post("/api/v1/bench/runs", body);
      expect(r.status, JSON.stringify(r.body)).toBe(status);
      expect(r.body.error?.path).toBe(path);
      expect(JSON.stringify(r.body)).not.toMatch(/NaN|Infinity/);
    }
    const after = ((await maker.get("/api/v1/bench/runs")).body as unknown as Listed).runs.length;
    expect(after).toBe(before);
  });

  it("signed out: 401 for the list and for saving", async () => {
    expect((await anonymous.get("/api/v1/bench/runs")).status).toBe(401);
    expect((await anonymous.post("/api/v1/bench/runs", run())).status).toBe(401);
  });
});
