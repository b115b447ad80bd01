import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { airPropertiesAt, maxSourcePower, naturalConvectionCoefficient, solveSteady, solveTransient, type Network } from "@/lib/thermal";
import { compileNetwork } from "@/lib/thermal/compile";
import { NaturalConvectionLink } from "@/lib/thermal/solver/convection-kernel";
import { linearNetwork, net } from "./helpers";

/**
 * The speed-ups of the solver loops (bucket lookup of the air table, analytic derivatives
 * of natural convection, LU on the fill pattern, workspaces kept between solves) must not
 * change what the engine answers. These checks pin each one to the plain form.
 */

const SURFACES = ["vertical-plate", "horizontal-plate-up", "horizontal-plate-down", "horizontal-cylinder"] as const;

describe("natural-convection kernel", () => {
  it("equals the traced coefficient at every row and 5 °C bucket edge of the air table, and beyond it", () => {
    const fluidK = 290.15;
    for (let filmC = -60; filmC <= 170; filmC += 2.5) {
      // Surface temperature whose film temperature with 17 °C air is filmC (never equal to the air).
      const surfaceK = 2 * (filmC + 273.15) - fluidK;
      if (surfaceK <= 0) continue;
      for (const surface of SURFACES) {
        const link = new NaturalConvectionLink(1, surface, 0.08);
        const out = new Float64Array(3);
        link.evaluate(surfaceK, fluidK, out, false);
        const h = naturalConvectionCoefficient(surface, 0.08, surfaceK, fluidK).coefficientWPerM2K;
        expect(out[0]! / (surfaceK - fluidK)).toBeCloseTo(h, 12);
      }
    }
    // The table's own rows come back exactly at their temperatures.
    expect(airPropertiesAt(25 + 273.15).conductivityWPerMK).toBe(0.02551);
  });

  it("analytic derivatives match central differences of the heat: laminar and turbulent, hot and cold, inside and beyond the air table", () => {
    const out = new Float64Array(3);
    const q = (link: NaturalConvectionLink, ti: number, tj: number) => {
      link.evaluate(ti, tj, out, false);
      return out[0]!;
    };
    for (const surface of SURFACES) {
      // L = 1.5 m puts Ra above 10⁹ for tens of kelvin (the turbulent branches).
      for (const lengthM of [0.05, 1.5]) {
        const link = new NaturalConvectionLink(0.01, surface, lengthM);
        for (const [ti, tj] of [[340, 298], [300, 298.5], [280, 300], [420, 300], [600, 300], [230, 200]] as const) {
          link.evaluate(ti, tj, out, true);
          const [di, dj] = [out[1]!, out[2]!];
          const e = 1e-4 * Math.abs(ti - tj);
          const ci = (q(link, ti + e, tj) - q(link, ti - e, tj)) / (2 * e);
          const cj = (q(link, ti, tj + e) - q(link, ti, tj - e)) / (2 * e);
          expect(Math.abs(di / ci - 1)).toBeLessThan(1e-6);
          expect(Math.abs(dj / cj - 1)).toBeLessThan(1e-6);
        }
      }
    }
  });
});

/** A network with a fill-in: a ring of n nodes, each shedding heat to ambient, so elimination joins its neighbours. */
function ring(n: number, watts: number): Network {
  const nodes = Array.from({ length: n }, (_, i) => ({ id: `r${i}`, heatCapacityJPerK: 2 + i }));
  const links = nodes.flatMap((node, i) => [
    { from: node.id, to: `r${(i + 1) % n}`, type: "resistance" as const, kelvinPerWatt: 1 + (i % 3) },
    { from: node.id, to: "ambient", type: "natural-convection" as const, areaM2: 0.002, surface: "vertical-plate" as const, characteristicLengthM: 0.04 },
  ]);
  return net({ ambientC: 25, nodes, links, sources: [{ node: "r0", watts }] });
}

/** A chain of n nodes from a source to ambient: same size as the ring, different pattern. */
function chain(n: number): Network {
  const nodes = Array.from({ length: n }, (_, i) => ({ id: `c${i}`, heatCapacityJPerK: 5 }));
  const links = nodes.map((node, i) => ({ from: node.id, to: i + 1 < n ? `c${i + 1}` : "ambient", type: "resistance" as const, kelvinPerWatt: 0.5 }));
  return net({ ambientC: 25, nodes, links, sources: [{ node: "c0", watts: 2 }] });
}

describe("sparse LU and kept workspaces", () => {
  it("the fill pattern holds every entry elimination creates (a ring fills in towards its last node)", () => {
    const c = compileNetwork(ring(12, 3));
    const { ptr, upper, lowerPtr, lower } = c.pattern;
    expect(ptr[c.n]).toBeGreaterThan(12);
    expect(lowerPtr[c.n]).toBe(ptr[c.n]);
    for (let k = 0; k < c.n; k++) {
      for (let p = ptr[k]!; p < ptr[k + 1]!; p++) {
        expect(upper[p]!).toBeGreaterThan(k);
        if (p > ptr[k]!) expect(upper[p]!).toBeGreaterThan(upper[p - 1]!);
        // Row upper[p] of L has column k.
        expect(Array.from(lower.subarray(lowerPtr[upper[p]!]!, lowerPtr[upper[p]! + 1]!))).toContain(k);
      }
    }
  });

  it("networks of the same size with different patterns, solved in turn, answer as if each were alone", () => {
    const a = ring(20, 4);
    const b = chain(20);
    // The chain first: its (sparser) pattern must not stay with the workspace the ring reuses.
    const chainFirst = solveSteady(b);
    const first = solveSteady(a);
    const warm = solveTransient(a, { durationS: 60, stepS: 1 });
    expect(solveSteady(b)).toEqual(chainFirst);
    expect(solveSteady(a)).toEqual(first);
    expect(first.converged).toBe(true);
    expect(Math.abs(first.energyBalanceW)).toBeLessThan(1e-9);
    solveSteady(b);
    expect(solveTransient(a, { durationS: 60, stepS: 1 })).toEqual(warm);
    // The chain is series resistances: 20 × 0.5 K/W × 2 W above ambient at the source.
    expect(chainFirst.temperaturesC.c0).toBeCloseTo(25 + 20, 9);
  });

  it("an inverse search (dozens of solves on one workspace) agrees with a direct check of its answer", () => {
    const network = ring(20, 4);
    const r = maxSourcePower(network, { node: "r0", limitC: 70 });
    const at = solveSteady({ ...network, sources: [{ node: "r0", watts: r.watts }] });
    expect(at.temperaturesC.r0).toBeCloseTo(70, 3);
  });

  it("linear random networks: same answer after a large network has grown the scratch buffer", () => {
    solveSteady(ring(300, 5));
    fc.assert(
      fc.property(linearNetwork({ maxNodes: 12 }), ({ network }) => {
        const before = solveSteady(network);
        solveSteady(ring(64, 1));
        expect(solveSteady(network)).toEqual(before);
      }),
      { numRuns: 25 },
    );
  });
});

describe("answers keyed by node id", () => {
  it('a node called "__proto__" is an ordinary key of the temperatures, steady and warm-up', () => {
    const network = net({
      ambientC: 25,
      nodes: [{ id: "__proto__", heatCapacityJPerK: 1 }, { id: "b" }],
      links: [
        { from: "__proto__", to: "b", type: "resistance", kelvinPerWatt: 1 },
        { from: "b", to: "ambient", type: "resistance", kelvinPerWatt: 1 },
      ],
      sources: [{ node: "__proto__", watts: 1 }],
    });
    const steady = solveSteady(network).temperaturesC;
    expect(Object.keys(steady)).toEqual(["__proto__", "b"]);
    expect(Object.getPrototypeOf(steady)).toBe(Object.prototype);
    expect(steady["__proto__"]).toBeCloseTo(27, 9);
    const warm = solveTransient(network, { durationS: 2, stepS: 1 }).temperaturesC;
    expect(Object.keys(warm)).toEqual(["__proto__", "b"]);
    expect(warm["__proto__"]).toHaveLength(3);
  });
});
