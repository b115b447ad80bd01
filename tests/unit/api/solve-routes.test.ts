import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { POST as steady } from "@/app/api/v1/solve/steady/route";
import { POST as transient } from "@/app/api/v1/solve/transient/route";

const post = (handler: (r: Request, context: unknown) => Promise<Response>, body: string, path: string) =>
  handler(new Request(`http://127.0.0.1:3000/api/v1/solve/${path}`, { method: "POST", headers: { "content-type": "application/json" }, body }), {});

const good = {
  ambientC: 25,
  nodes: [{ id: "junction", label: "LED junction", heatCapacityJPerK: 0.05 }, { id: "sink", heatCapacityJPerK: 50 }, { id: "case" }],
  links: [
    { from: "junction", to: "sink", type: "resistance", kelvinPerWatt: 2.5 },
    { from: "sink", to: "case", type: "conduction", lengthM: 0.001, areaM2: 0.0004, conductivityWPerMK: 205 },
    { from: "case", to: "ambient", type: "convection", areaM2: 0.01, coefficientWPerM2K: 8 },
    { from: "case", to: "ambient", type: "natural-convection", areaM2: 0.01, surface: "vertical-plate", characteristicLengthM: 0.1 },
    { from: "case", to: "ambient", type: "radiation", areaM2: 0.01, emissivity: 0.85 },
  ],
  sources: [{ node: "junction", watts: 7 }],
};

interface ErrorBody {
  error: { code: string; message: string; path: string };
}

async function expectError(res: Response, status: number, code: string, path?: string): Promise<ErrorBody> {
  expect(res.status).toBe(status);
  const body = (await res.json()) as ErrorBody;
  expect(body.error.code).toBe(code);
  expect(typeof body.error.message).toBe("string");
  if (path !== undefined) expect(body.error.path).toBe(path);
  return body;
}

describe("POST /api/v1/solve/steady", () => {
  it("answers the PRODUCT.md example network with the documented shape", async () => {
    const res = await post(steady, JSON.stringify(good), "steady");
    expect(res.status).toBe(200);
    const body = (await res.json()) as Record<string, unknown>;
    expect(body.converged).toBe(true);
    expect(typeof body.iterations).toBe("number");
    expect(Object.keys(body.temperaturesC as object).sort()).toEqual(["case", "junction", "sink"]);
    const links = body.links as { from: string; to: string; type: string; watts: number; kelvinPerWatt: number }[];
    expect(links).toHaveLength(5);
    expect(links[0]).toMatchObject({ from: "junction", to: "sink", type: "resistance" });
    expect(links[0]!.watts).toBeCloseTo(7, 9);
    expect(Math.abs(body.energyBalanceW as number)).toBeLessThan(7e-6);
  });

  it("bad JSON is 400 naming the subject", async () => {
    await expectError(await post(steady, "{nodes:", "steady"), 400, "bad_request:network", "");
  });

  it("a body over 1 MB is 413", async () => {
    const big = JSON.stringify({ ...good, pad: "x".repeat(1024 * 1024) });
    await expectError(await post(steady, big, "steady"), 413, "payload_too_large:body");
  });

  it("names the field: unknown node, duplicate id, reserved ambient, zero area, emissivity 1.2, string for a number", async () => {
    const cases: [unknown, string, string][] = [
      [{ ...good, links: [...good.links, { from: "case", to: "nowhere", type: "resistance", kelvinPerWatt: 1 }] }, "links[5].to", 'link names unknown node "nowhere"'],
      [{ ...good, nodes: [...good.nodes, { id: "sink" }] }, "nodes[3].id", 'duplicate node id "sink"'],
      [{ ...good, nodes: [...good.nodes, { id: "ambient" }] }, "nodes[3].id", 'node id "ambient" is reserved'],
      [{ ...good, links: [{ ...good.links[2], areaM2: 0 }, ...good.links.slice(1)] }, "links[0].areaM2", "positive"],
      [{ ...good, links: [...good.links.slice(0, 4), { ...good.links[4], emissivity: 1.2 }] }, "links[4].emissivity", "emissivity must be in (0, 1]"],
      [{ ...good, ambientC: "25" }, "ambientC", "Ambient: must be a number"],
    ];
    for (const [body, path, fragment] of cases) {
      const e = await expectError(await post(steady, JSON.stringify(body), "steady"), 400, "bad_request:network", path);
      expect(e.error.message).toContain(fragment);
    }
  });

  it("more than 500 nodes is refused", async () => {
    const nodes = Array.from({ length: 501 }, (_, i) => ({ id: `n${i}` }));
    const links = nodes.map((n) => ({ from: n.id, to: "ambient", type: "resistance", kelvinPerWatt: 1 }));
    const e = await expectError(await post(steady, JSON.stringify({ ambientC: 25, nodes, links }), "steady"), 400, "bad_request:network", "nodes");
    expect(e.error.message).toContain("500");
  });

  it("a node with no path to ambient is 422 and is named", async () => {
    const body = { ...good, nodes: [...good.nodes, { id: "driver" }, { id: "cells" }], links: [...good.links, { from: "driver", to: "cells", type: "resistance", kelvinPerWatt: 3 }] };
    const e = await expectError(await post(steady, JSON.stringify(body), "steady"), 422, "unprocessable:network", "nodes[3].id");
    expect(e.error.message).toBe('no heat path to ambient from nodes "driver", "cells"');
  });

  it("thermal runaway (a source growing faster than the links carry heat away) is 422, not a 500", async () => {
    const body = { ...good, sources: [{ node: "junction", watts: 7, wattsPerKelvin: 5 }] };
    const res = await post(steady, JSON.stringify(body), "steady");
    expect([422]).toContain(res.status);
    const b = (await res.json()) as ErrorBody;
    expect(b.error.code.startsWith("unprocessable:")).toBe(true);
  });
});

describe("POST /api/v1/solve/transient", () => {
  it("answers timesS one per step from 0 to durationS, curves per node and threshold crossings", async () => {
    const res = await post(transient, JSON.stringify({ network: good, durationS: 600, stepS: 10, thresholds: [{ node: "sink", limitC: 40 }, { node: "junction", limitC: 500 }] }), "transient");
    expect(res.status).toBe(200);
    const body = (await res.json()) as { timesS: number[]; temperaturesC: Record<string, number[]>; crossings: { node: string; limitC: number; timeS: number | null }[] };
    expect(body.timesS).toHaveLength(61);
    expect(body.timesS[0]).toBe(0);
    expect(body.timesS.at(-1)).toBe(600);
    expect(body.temperaturesC.sink).toHaveLength(61);
    expect(body.crossings[0]!.timeS).toBeGreaterThan(0);
    expect(body.crossings[1]!.timeS).toBeNull();
  });

  it("rejects a step longer than the duration and unknown threshold nodes with their paths", async () => {
    await expectError(await post(transient, JSON.stringify({ network: good, durationS: 10, stepS: 20 }), "transient"), 400, "bad_request:transient", "stepS");
    await expectError(await post(transient, JSON.stringify({ network: good, durationS: 10, stepS: 1, thresholds: [{ node: "x", limitC: 1 }] }), "transient"), 400, "bad_request:transient", "thresholds[0].node");
    await expectError(await post(transient, JSON.stringify({ network: { ...good, nodes: [] }, durationS: 10, stepS: 1 }), "transient"), 400, "bad_request:transient", "network.nodes");
  });
});

/** Bad payloads: random JSON, and the good network with one field replaced by junk. */
const junk = fc.oneof(
  fc.constant(null),
  fc.string(),
  fc.boolean(),
  fc.integer(),
  fc.double(),
  fc.constantFrom(-1, 0, 1e308, -1e308, "NaN", "Infinity", [], {}),
  fc.array(fc.anything(), { maxLength: 3 }),
);

const mutatedNetwork = fc
  .record({
    where: fc.constantFrom("ambientC", "nodes", "links", "sources", "node", "link", "source"),
    index: fc.nat(10),
    key: fc.constantFrom("id", "from", "to", "type", "kelvinPerWatt", "areaM2", "emissivity", "surface", "lengthM", "heatCapacityJPerK", "watts", "node", "characteristicLengthM", "coefficientWPerM2K"),
    value: junk,
  })
  .map(({ where, index, key, value }) => {
    const copy = JSON.parse(JSON.stringify(good)) as Record<string, unknown> & { nodes: Record<string, unknown>[]; links: Record<string, unknown>[]; sources: Record<string, unknown>[] };
    if (where === "node") copy.nodes[index % copy.nodes.length]![key] = value;
    else if (where === "link") copy.links[index % copy.links.length]![key] = value;
    else if (where === "source") copy.sources[0]![key] = value;
    else (copy as Record<string, unknown>)[where] = value;
    return copy;
  });

const badBody = fc.oneof(
  fc.string().map((s) => s),
  fc.anything().map((v) => JSON.stringify(v) ?? "null"),
  mutatedNetwork.map((n) => JSON.stringify(n)),
);

describe("fuzzing both routes with bad payloads", () => {
  it("steady: never a 500, always { error: { code, message, path } }", async () => {
    await fc.assert(
      fc.asyncProperty(badBody, async (body) => {
        const res = await post(steady, body, "steady");
        if (res.status === 200) return; // a mutation may leave the network valid
        expect([400, 413, 422]).toContain(res.status);
        const b = (await res.json()) as ErrorBody;
        expect(typeof b.error.code).toBe("string");
        expect(typeof b.error.message).toBe("string");
        expect(typeof b.error.path).toBe("string");
      }),
      { numRuns: 300 },
    );
  });

  it("transient: never a 500, always { error: { code, message, path } }", async () => {
    const req = fc.oneof(
      badBody,
      fc.record({ network: mutatedNetwork, durationS: fc.oneof(junk, fc.constant(60)), stepS: fc.oneof(junk, fc.constant(1)), initialC: fc.oneof(junk, fc.constant(undefined)) }).map((v) => JSON.stringify(v)),
    );
    await fc.assert(
      fc.asyncProperty(req, async (body) => {
        const res = await post(transient, body, "transient");
        if (res.status === 200) {
          const text = await res.text();
          expect(text).not.toMatch(/NaN|Infinity|null,|\[null/);
          return;
        }
        expect([400, 413, 422]).toContain(res.status);
        const b = (await res.json()) as ErrorBody;
        expect(typeof b.error.code).toBe("string");
        expect(typeof b.error.message).toBe("string");
        expect(typeof b.error.path).toBe("string");
      }),
      { numRuns: 200 },
    );
  });
});
