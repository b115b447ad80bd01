import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { prepareTransient, solveSteady, solveTransient, steadyTemperatures } from "@/lib/thermal";
import { mixedNetwork, net } from "./helpers";

/**
 * The searches and fixed points start each steady solve from the last answer, and a warm-up
 * runs its chunks on one compilation: the answers must be those of a solve from scratch.
 */
describe("solves started from an earlier answer (fast-check)", () => {
  it("a warm start from a nearby answer gives the cold start's temperatures (both converge to 1e-6 K)", () => {
    fc.assert(
      fc.property(mixedNetwork(), fc.double({ min: 0.5, max: 2, noNaN: true }), (n, f) => {
        // The same heat path with every source scaled: the kind of neighbour a search visits.
        const near = solveSteady(net({ ...n, sources: n.sources.map((s) => ({ ...s, watts: s.watts * f })) })).temperaturesC;
        const cold = solveSteady(n).temperaturesC;
        const warm = solveSteady(n, undefined, near).temperaturesC;
        const only = steadyTemperatures(n, undefined, near);
        for (const id of Object.keys(cold)) {
          expect(Math.abs(warm[id]! - cold[id]!)).toBeLessThan(2e-6);
          expect(only[id]).toBe(warm[id]);
        }
      }),
      { numRuns: 150 },
    );
  });

  it("a start that is no answer at all (every node at 5000 °C) still ends at the steady state", () => {
    fc.assert(
      fc.property(mixedNetwork(), (n) => {
        const cold = solveSteady(n).temperaturesC;
        const far = Object.fromEntries(n.nodes.map((x) => [x.id, 5000]));
        const warm = solveSteady(n, undefined, far).temperaturesC;
        for (const id of Object.keys(cold)) expect(Math.abs(warm[id]! - cold[id]!)).toBeLessThan(2e-6);
      }),
      { numRuns: 60 },
    );
  });

  it("a warm-up in chunks on one compilation equals the same chunks solved one by one", () => {
    fc.assert(
      fc.property(mixedNetwork({ maxNodes: 6 }), (n) => {
        const run = prepareTransient(n);
        let initialC: Record<string, number> | undefined;
        for (let chunk = 0; chunk < 3; chunk++) {
          const options = { durationS: 300, stepS: 30, ...(initialC ? { initialC } : {}) };
          const a = run.solve(options);
          const b = solveTransient(n, options);
          expect(a.temperaturesC).toEqual(b.temperaturesC);
          initialC = Object.fromEntries(Object.entries(a.temperaturesC).map(([id, v]) => [id, v[v.length - 1]!]));
        }
      }),
      { numRuns: 40 },
    );
  });
});
