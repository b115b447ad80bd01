import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { NetworkCheck, networkSchema, sourceSweep, steadyTemperatures, type Network } from "@/lib/thermal";
import { mixedNetwork, net } from "./helpers";

/**
 * An evaluation solves one heat path many times with other values (each mode's heat, a
 * throttled charge current): the schema check and the solves it saves work on must give
 * what checking and solving each network from scratch gives.
 */

/** networkSchema's first issue, as the evaluation reports it. */
function wholeIssue(n: Network): { path: PropertyKey[]; message: string } | null {
  const parsed = networkSchema.safeParse(n);
  const i = parsed.success ? undefined : parsed.error.issues[0];
  return i ? { path: i.path, message: i.message } : null;
}

/** Values a compiled network might get wrong: out of range, not finite, of the wrong kind. */
const VALUES = [0, -1, 1e-13, 0.5, 2, 1e12, Number.NaN, Number.POSITIVE_INFINITY, "x", "ambient", "no-such-node"] as const;

/** One field of one element set to another value (kept only if the element has that field). */
const change = fc.record({
  part: fc.constantFrom("nodes", "links", "sources"),
  at: fc.nat(),
  field: fc.constantFrom("id", "heatCapacityJPerK", "from", "to", "kelvinPerWatt", "areaM2", "emissivity", "characteristicLengthM", "surface", "node", "watts"),
  value: fc.constantFrom(...VALUES),
});

function changed(n: Network, c: { part: "nodes" | "links" | "sources"; at: number; field: string; value: unknown }): Network {
  const list = n[c.part] as Record<string, unknown>[];
  if (list.length === 0) return n;
  const i = c.at % list.length;
  if (!(c.field in list[i]!)) return n;
  return { ...n, [c.part]: list.map((e, k) => (k === i ? { ...e, [c.field]: c.value } : e)) };
}

describe("schema check of repeated networks (fast-check)", () => {
  it("reports the first issue the whole schema reports, at the same path, after any changes to a network that passed", () => {
    fc.assert(
      fc.property(mixedNetwork(), fc.array(change, { minLength: 1, maxLength: 3 }), fc.double({ min: 0.2, max: 5, noNaN: true }), (n, changes, f) => {
        const check = new NetworkCheck();
        expect(check.firstIssue(n)).toBeNull();
        // The same path with other heat, as the next mode compiles it: passes, and is checked for what changed.
        const reheated = { ...n, sources: n.sources.map((s) => ({ ...s, watts: s.watts * f })) };
        expect(check.firstIssue(reheated)).toEqual(wholeIssue(reheated));
        const bad = changes.reduce(changed, reheated);
        expect(check.firstIssue(bad)).toEqual(wholeIssue(bad));
        // After a network that failed, the next is checked whole.
        expect(check.firstIssue(n)).toBeNull();
      }),
      { numRuns: 300 },
    );
  });

  it("checks a network of another shape whole (a link more)", () => {
    const n = net({ ambientC: 20, nodes: [{ id: "a" }], links: [{ from: "a", to: "ambient", type: "resistance", kelvinPerWatt: 2 }], sources: [{ node: "a", watts: 1 }] });
    const check = new NetworkCheck();
    expect(check.firstIssue(n)).toBeNull();
    const more = { ...n, links: [...n.links, { from: "a", to: "b", type: "resistance" as const, kelvinPerWatt: 2 }] };
    expect(check.firstIssue(more)).toEqual(wholeIssue(more));
    expect(check.firstIssue(more)?.path).toEqual(["links", 1, "to"]);
  });
});

describe("one heat path under changing sources (fast-check)", () => {
  it("gives the temperatures a solve of the network with those sources gives", () => {
    fc.assert(
      fc.property(mixedNetwork(), fc.array(fc.double({ min: 0.2, max: 3, noNaN: true }), { minLength: 1, maxLength: 4 }), (n, scales) => {
        const solve = sourceSweep(n);
        let last: Record<string, number> | undefined;
        for (const f of scales) {
          const sources = n.sources.map((s) => ({ ...s, watts: s.watts * f }));
          const start = last;
          last = solve(sources, { toleranceK: 1e-4 }, start);
          expect(last).toEqual(steadyTemperatures({ ...n, sources }, { toleranceK: 1e-4 }, start));
        }
      }),
      { numRuns: 60 },
    );
  });
});
