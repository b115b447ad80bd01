import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solveSteady, type Network } from "@/lib/thermal";
import { linearNetwork, mixedNetwork, net } from "./helpers";

const totalWatts = (n: Network) => n.sources.reduce((s, x) => s + Math.abs(x.watts), 0);

describe("properties of the steady solver (fast-check)", () => {
  it("energy balance: sources minus heat reaching ambient is below 1e-6 of the total, non-linear networks included", () => {
    fc.assert(
      fc.property(mixedNetwork(), (n) => {
        const r = solveSteady(n);
        expect(r.converged).toBe(true);
        // 1e-9 W absolute: the solve places temperatures to about 1e-7 K, and these networks'
        // paths to ambient conduct up to ~0.01 W/K, so a nanowatt source's balance is only
        // known to ~1e-9 W (one was seen to leave 1.0017e-11 W on a 1.6e-8 W source)
        expect(Math.abs(r.energyBalanceW)).toBeLessThanOrEqual(1e-6 * totalWatts(n) + 1e-9);
      }),
      { numRuns: 150 },
    );
  });

  it("no NaN or Infinity anywhere in an answer", () => {
    fc.assert(
      fc.property(mixedNetwork(), (n) => {
        const text = JSON.stringify(solveSteady(n));
        expect(text).not.toMatch(/null|NaN|Infinity/);
      }),
      { numRuns: 100 },
    );
  });

  // Said loosely, "adding a link or lowering a resistance never raises any temperature" is false:
  // a new link from a hot node to a cold one warms the cold one. What holds, and is checked:
  // (1) any new or stronger path to ambient lowers or keeps every temperature (comparison
  // principle for monotone networks, non-linear links included); (2) with a single source,
  // any new or stronger link anywhere lowers or keeps the source's temperature (Rayleigh's
  // monotonicity law for resistor networks).
  it("a new path to ambient never raises any temperature (linear and non-linear)", () => {
    fc.assert(
      fc.property(mixedNetwork(), fc.nat(), fc.double({ min: 0.01, max: 10, noNaN: true }), fc.boolean(), (n, ia, g, radiate) => {
        const ids = n.nodes.map((x) => x.id);
        const from = ids[ia % ids.length]!;
        const extra = radiate ? { from, to: "ambient", type: "radiation" as const, areaM2: g / 6, emissivity: 0.5 } : { from, to: "ambient", type: "resistance" as const, kelvinPerWatt: 1 / g };
        // each solve is converged to 1e-6 K, so compare with twice that
        const before = solveSteady(n).temperaturesC;
        const after = solveSteady(net({ ...n, links: [...n.links, extra] })).temperaturesC;
        for (const id of ids) expect(after[id]!).toBeLessThanOrEqual(before[id]! + 2e-6);
      }),
      { numRuns: 150 },
    );
  });

  it("lowering the resistance of a link to ambient never raises any temperature", () => {
    fc.assert(
      fc.property(mixedNetwork(), fc.nat(), fc.double({ min: 0.05, max: 0.99, noNaN: true }), (n, pick, factor) => {
        const idx = n.links.map((l, i) => (l.type === "resistance" && l.to === "ambient" ? i : -1)).filter((i) => i >= 0);
        fc.pre(idx.length > 0);
        const i = idx[pick % idx.length]!;
        const links = n.links.map((l, k) => (k === i && l.type === "resistance" ? { ...l, kelvinPerWatt: l.kelvinPerWatt * factor } : l));
        const before = solveSteady(n).temperaturesC;
        const after = solveSteady(net({ ...n, links })).temperaturesC;
        for (const id of n.nodes.map((x) => x.id)) expect(after[id]!).toBeLessThanOrEqual(before[id]! + 2e-6);
      }),
      { numRuns: 150 },
    );
  });

  it("single source: adding any link or lowering any resistance never raises the source's temperature (Rayleigh monotonicity)", () => {
    fc.assert(
      fc.property(linearNetwork(), fc.nat(), fc.nat(), fc.nat(), fc.double({ min: 0.01, max: 10, noNaN: true }), fc.double({ min: 0.05, max: 0.99, noNaN: true }), (c, si, ia, ib, g, factor) => {
        const n = c.network;
        const ids = n.nodes.map((x) => x.id);
        const src = ids[si % ids.length]!;
        const one = net({ ...n, sources: [{ node: src, watts: 5 }] });
        const from = ids[ia % ids.length]!;
        let to = ib % (ids.length + 1) === ids.length ? "ambient" : ids[ib % (ids.length + 1)]!;
        if (to === from) to = "ambient";
        const before = solveSteady(one).temperaturesC[src]!;
        const added = solveSteady(net({ ...one, links: [...one.links, { from, to, type: "resistance", kelvinPerWatt: 1 / g }] })).temperaturesC[src]!;
        const lowered = solveSteady(net({ ...one, links: one.links.map((l, k) => (k === ia % one.links.length && l.type === "resistance" ? { ...l, kelvinPerWatt: l.kelvinPerWatt * factor } : l)) })).temperaturesC[src]!;
        expect(added).toBeLessThanOrEqual(before + 1e-9);
        expect(lowered).toBeLessThanOrEqual(before + 1e-9);
      }),
      { numRuns: 150 },
    );
  });

  it("linear networks: rises scale linearly with source power and shift with ambient", () => {
    fc.assert(
      fc.property(linearNetwork(), fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: -30, max: 30, noNaN: true }), (c, k, shift) => {
        const n = c.network;
        const base = solveSteady(n).temperaturesC;
        const scaled = solveSteady(net({ ...n, sources: n.sources.map((s) => ({ ...s, watts: s.watts * k })) })).temperaturesC;
        const shifted = solveSteady(net({ ...n, ambientC: n.ambientC + shift })).temperaturesC;
        for (const id of n.nodes.map((x) => x.id)) {
          const rise = base[id]! - n.ambientC;
          expect(scaled[id]! - n.ambientC).toBeCloseTo(rise * k, 6);
          expect(shifted[id]!).toBeCloseTo(base[id]! + shift, 6);
        }
      }),
      { numRuns: 150 },
    );
  });

  it("non-linear networks converge in few iterations", () => {
    fc.assert(
      fc.property(mixedNetwork(), (n) => {
        expect(solveSteady(n).iterations).toBeLessThan(30);
      }),
      { numRuns: 100 },
    );
  });
});
