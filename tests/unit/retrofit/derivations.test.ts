import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AMBIENT_ID, solveSteady, traceLink, type Network } from "@/lib/thermal";
import { nodeBalanceTrace } from "@/lib/retrofit/derivations";
import { mixedNetwork } from "../thermal/helpers";

/** A solved network in the shape the Budget gets it (nodes with places, links with their trace). */
function asThermal(n: Network) {
  const r = solveSteady(n);
  const at = (id: string) => (id === AMBIENT_ID ? n.ambientC : r.temperaturesC[id]!);
  return {
    r,
    thermal: {
      nodes: n.nodes.map((x) => ({ id: x.id, place: x.label ?? x.id, slot: "" })),
      links: n.links.map((l, i) => ({ index: i, from: l.from, to: l.to, place: `${l.from} → ${l.to}`, slot: "", watts: r.links[i]!.watts, kelvinPerWatt: r.links[i]!.kelvinPerWatt, trace: traceLink(l, at(l.from), at(l.to)) })),
      temperaturesC: r.temperaturesC,
    },
  };
}

describe("a node's temperature expands to the heat flows in and out of it", () => {
  it("heat made at each node is its source, and T = T_other + q·R holds on every link (fast-check)", () => {
    fc.assert(
      fc.property(mixedNetwork(), (n) => {
        const { thermal } = asThermal(n);
        for (const node of n.nodes) {
          const t = nodeBalanceTrace(thermal, node.id, n.ambientC)!;
          const made = t.intermediates.find((x) => x.symbol === "P")!.value;
          const source = n.sources.filter((s) => s.node === node.id).reduce((a, s) => a + s.watts, 0);
          const scale = n.sources.reduce((a, s) => a + Math.abs(s.watts), 0) + 1e-9;
          // Conservation of energy at the node (source named in the trace).
          expect(Math.abs(made - source)).toBeLessThanOrEqual(1e-5 * scale + 1e-9);
          const touching = thermal.links.filter((l) => l.from === node.id || l.to === node.id);
          expect(t.parts).toHaveLength(touching.length);
          touching.forEach((l, i) => {
            const other = t.inputs[2 * i]!.value;
            const r = t.inputs[2 * i + 1]!.value;
            const q = t.intermediates[i]!.value;
            expect(Math.abs(Math.abs(t.result.value - other) - q * r)).toBeLessThanOrEqual(1e-6 * (1 + Math.abs(t.result.value - other)));
          });
        }
      }),
      { numRuns: 60 },
    );
  });

  it("names where each flow goes and cites its source", () => {
    const n: Network = {
      ambientC: 25,
      nodes: [{ id: "junction", label: "LED junction" }, { id: "sink", label: "heatsink" }],
      links: [
        { from: "junction", to: "sink", type: "resistance", kelvinPerWatt: 3 },
        { from: "sink", to: "ambient", type: "resistance", kelvinPerWatt: 5 },
      ],
      sources: [{ node: "junction", watts: 2 }],
    };
    const { thermal } = asThermal(n);
    const sink = nodeBalanceTrace(thermal, "sink", 25)!;
    // Hand check: 2 W through 5 K/W above 25 °C is 35 °C; through 3 K/W more, 41 °C.
    expect(sink.result.value).toBeCloseTo(35, 9);
    expect(sink.intermediates.map((x) => x.name)).toEqual(["arrives from LED junction", "leaves to ambient air", "heat leaving, all links", "heat arriving, all links", "heat made here (q_out − q_in)"]);
    expect(sink.source).toMatch(/Incropera/);
    expect(nodeBalanceTrace(thermal, "junction", 25)!.result.value).toBeCloseTo(41, 9);
    expect(nodeBalanceTrace(thermal, "nowhere", 25)).toBeNull();
  });
});
