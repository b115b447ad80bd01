import { beforeAll, describe, expect, it } from "vitest";
import { Client, signedIn, uniqueEmail } from "../support/http";
import { createParts } from "../support/retrofit";
import { signUp } from "../support/mail";

let owner: Client;
let stranger: Client;
let buildId = "";

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  stranger = new Client();
  await signUp(stranger, { email: uniqueEmail("solve-stranger"), password: "long enough pw", displayName: "S" });
  const ids = await createParts(owner, "private");
  const design = {
    housing: { partId: ids.housing },
    lightEngine: { emitter: { partId: ids.emitter }, interface: { partId: ids.interface }, heatsink: { partId: ids.heatsink } },
    driver: { part: { partId: ids.driver }, cooling: { kind: "strapped", spreader: { partId: ids.spreader } } },
    pack: { cell: { partId: ids.cell }, parallel: 2, protection: { partId: ids.protection }, charger: { partId: ids.charger } },
  };
  const b = await owner.post("/api/v1/builds", { title: "Solve test lantern", design });
  expect(b.status).toBe(201);
  buildId = (b.body.build as { id: string }).id;
});

type Solve = {
  cached: boolean;
  revision: number;
  evaluation: { verdict: string | null; modes: { name: string }[]; scenarios: { kind: string; thermal: { limits: { id: string; headroomK: number }[] } | null }[] };
};

describe("POST /api/v1/builds/[id]/solve", () => {
  it("evaluates every driver mode and charging, with no NaN anywhere, then serves the cache", async () => {
    const first = await owner.post(`/api/v1/builds/${buildId}/solve`, {});
    expect(first.status).toBe(200);
    const s = first.body as unknown as Solve;
    expect(s.cached).toBe(false);
    // Two driver modes in the fixture (low, high) plus charging.
    expect(s.evaluation.modes.map((m) => m.name)).toEqual(["low", "high"]);
    expect(s.evaluation.scenarios.map((x) => x.kind)).toEqual(["mode", "mode", "charging"]);
    expect(["within budget", "tight", "over budget"]).toContain(s.evaluation.verdict);
    expect(JSON.stringify(first.body)).not.toMatch(/NaN|Infinity/);
    const junction = s.evaluation.scenarios[0]?.thermal?.limits.find((l) => l.id === "junction");
    expect(junction && Number.isFinite(junction.headroomK)).toBe(true);
    // The cache is written after the first answer has gone: poll briefly for the hit.
    let again = await owner.post(`/api/v1/builds/${buildId}/solve`, {});
    for (let i = 0; i < 50 && !(again.body as unknown as Solve).cached; i++) {
      await new Promise((r) => setTimeout(r, 100));
      again = await owner.post(`/api/v1/builds/${buildId}/solve`, {});
    }
    expect((again.body as unknown as Solve).cached).toBe(true);
    expect((again.body as unknown as Solve).evaluation.verdict).toBe(s.evaluation.verdict);
  });

  it("solves an older revision on request and refuses one that does not exist", async () => {
    await owner.patch(`/api/v1/builds/${buildId}`, { design: { lightEngine: {} }, note: "emptied" });
    const old = await owner.post(`/api/v1/builds/${buildId}/solve`, { revision: 1 });
    expect((old.body as unknown as Solve).revision).toBe(1);
    expect((old.body as unknown as Solve).evaluation.modes.length).toBe(2);
    const empty = await owner.post(`/api/v1/builds/${buildId}/solve`, {});
    expect((empty.body as unknown as Solve).evaluation.modes.length).toBe(0);
    expect(JSON.stringify(empty.body)).not.toMatch(/NaN|Infinity/);
    const missing = await owner.post(`/api/v1/builds/${buildId}/solve`, { revision: 99 });
    expect(missing.status).toBe(404);
    expect(missing.body.error?.path).toBe("revision");
  });

  it("refuses anonymous callers and people the build is not shared with", async () => {
    expect((await new Client().post(`/api/v1/builds/${buildId}/solve`, {})).status).toBe(401);
    expect((await stranger.post(`/api/v1/builds/${buildId}/solve`, {})).status).toBe(404);
    // Asking for a revision that exists and one that does not gives a stranger the same answer:
    // the build is read with its revision in one query, and nothing of it shows before access.
    const existing = await stranger.post(`/api/v1/builds/${buildId}/solve`, { revision: 1 });
    const absent = await stranger.post(`/api/v1/builds/${buildId}/solve`, { revision: 99 });
    expect([existing.status, absent.status]).toEqual([404, 404]);
    expect(existing.body).toEqual(absent.body);
    expect(existing.body.error?.path).toBe("id");
  });
});

describe("POST /api/v1/check (no account)", () => {
  it("answers Tj = Ta + P·(Rjsp + Rsink) for a declared sink", async () => {
    // Hand arithmetic: 25 °C + 7 W × (2.5 K/W + 4 K/W) = 70.5 °C; the rating holds at the 28 K the sink reaches, so no correction.
    const r = await new Client().post("/api/v1/check", { heatWatts: "7 W", sink: { declaredKPerW: "4 K/W", ratedDeltaK: "28 K" }, ambientC: "25 °C", rthJspKPerW: "2.5 K/W" });
    expect(r.status).toBe(200);
    expect(r.body.tjC as number).toBeCloseTo(70.5, 3);
    expect(r.body.verdict).toBe("within budget");
    // Rated at the usual 75 K, the same sink does worse at a 28 K rise (laminar h ∝ ΔT^¼, Incropera et al., 6th ed., eq. 9.27): a hotter junction.
    const corrected = await new Client().post("/api/v1/check", { heatWatts: "7 W", sink: { declaredKPerW: "4 K/W" }, ambientC: "25 °C", rthJspKPerW: "2.5 K/W" });
    expect(corrected.body.tjC as number).toBeGreaterThan(72);
  });

  it("names the field of a wrong unit", async () => {
    const r = await new Client().post("/api/v1/check", { heatWatts: "7 mm", sink: { declaredKPerW: "4 K/W" }, ambientC: "25 °C" });
    expect(r.status).toBe(400);
    expect(r.body.error?.path).toBe("heatWatts");
    expect(r.body.error?.message).toContain("expected a power");
  });
});
