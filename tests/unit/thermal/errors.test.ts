import { describe, expect, it } from "vitest";
import { networkSchema, solveSteady, solveTransient, ThermalInputError, type Network } from "@/lib/thermal";
import { net } from "./helpers";

const base: Network = net({
  ambientC: 25,
  nodes: [{ id: "a" }, { id: "b" }],
  links: [
    { from: "a", to: "b", type: "resistance", kelvinPerWatt: 1 },
    { from: "b", to: "ambient", type: "radiation", areaM2: 0.01, emissivity: 0.9 },
  ],
  sources: [{ node: "a", watts: 2 }],
});

function thrown(f: () => unknown): ThermalInputError {
  try {
    f();
  } catch (e) {
    if (e instanceof ThermalInputError) return e;
    throw e;
  }
  throw new Error("expected a ThermalInputError");
}

describe("bad input to the library (callers that skip the schema get the same messages)", () => {
  it("unknown node, duplicate id, reserved ambient, self link, source on ambient", () => {
    const e1 = thrown(() => solveSteady({ ...base, links: [...base.links, { from: "a", to: "zz", type: "resistance", kelvinPerWatt: 1 }] }));
    expect([e1.code, e1.path, e1.message]).toEqual(["bad_request:network", "links[2].to", 'Link 3 › to: link names unknown node "zz"']);
    expect(thrown(() => solveSteady({ ...base, nodes: [...base.nodes, { id: "a" }] })).message).toBe('Node 3 › id: duplicate node id "a" (also node 1)');
    expect(thrown(() => solveSteady({ ...base, nodes: [...base.nodes, { id: "ambient" }] })).path).toBe("nodes[2].id");
    expect(thrown(() => solveSteady({ ...base, links: [...base.links, { from: "a", to: "a", type: "resistance", kelvinPerWatt: 1 }] })).message).toContain("to itself");
    expect(thrown(() => solveSteady({ ...base, sources: [{ node: "ambient", watts: 1 }] })).path).toBe("sources[0].node");
  });

  it("no path to ambient names every stranded node", () => {
    const e = thrown(() => solveSteady({ ...base, nodes: [...base.nodes, { id: "driver" }] }));
    expect(e.code).toBe("unprocessable:network");
    expect(e.message).toBe('no heat path to ambient from node "driver"');
  });

  it("non-convergence within the iteration cap is unprocessable:convergence", () => {
    const e = thrown(() => solveSteady(base, { maxIterations: 1 }));
    expect(e.code).toBe("unprocessable:convergence");
    expect(e.message).toMatch(/did not converge in 1 iterations/);
  });

  it("thermal runaway is named", () => {
    const e = thrown(() => solveSteady({ ...base, sources: [{ node: "a", watts: 2, wattsPerKelvin: 1 }] }));
    expect(e.code).toBe("unprocessable:runaway");
    expect(e.path).toBe("sources[0].wattsPerKelvin");
  });

  it("transient options are checked too", () => {
    expect(thrown(() => solveTransient(base, { durationS: 10, stepS: 0 })).path).toBe("stepS");
    expect(thrown(() => solveTransient(base, { durationS: 1e6, stepS: 1 })).message).toContain("at most");
    expect(thrown(() => solveTransient(base, { durationS: 10, stepS: 1, initialC: { q: 3 } })).path).toBe("initialC.q");
  });

  it("the schema refuses NaN, Infinity, strings, emissivity 0 and fins that do not fit, naming the field", () => {
    const bad = (patch: Record<string, unknown>, path: string) => {
      const r = networkSchema.safeParse({ ...base, ...patch });
      expect(r.success).toBe(false);
      if (!r.success) expect(r.error.issues[0]!.path.join(".")).toBe(path);
    };
    bad({ ambientC: Number.NaN }, "ambientC");
    bad({ ambientC: Infinity }, "ambientC");
    bad({ sources: [{ node: "a", watts: "2" }] }, "sources.0.watts");
    bad({ links: [base.links[0], { from: "b", to: "ambient", type: "radiation", areaM2: 0.01, emissivity: 0 }] }, "links.1.emissivity");
    bad({ links: [base.links[0], { from: "b", to: "ambient", type: "conduction", areaM2: 0.01, lengthM: -1, conductivityWPerMK: 1 }] }, "links.1.lengthM");
    bad(
      {
        links: [
          base.links[0],
          { from: "b", to: "ambient", type: "finned-heatsink", baseWidthM: 0.02, baseLengthM: 0.02, baseThicknessM: 0.003, finCount: 20, finHeightM: 0.01, finThicknessM: 0.001, conductivityWPerMK: 200, emissivity: 0.8 },
        ],
      },
      "links.1.finThicknessM",
    );
  });
});
