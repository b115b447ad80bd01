import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AMBIENT_ID, breakdownRise, solveSteady, traceLink, type Network } from "@/lib/thermal";
import { ladderTotalTrace, nodeBalanceTrace, partsCostTrace, savingTrace } from "@/lib/retrofit/derivations";
import { massSummary } from "@/lib/retrofit/mass";
import type { ResolvedBuild } from "@/lib/retrofit/resolved";
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

describe("a ladder's total expands to ambient plus its rungs", () => {
  it("T = T_ambient + every rung + the rest, equal to the node's solved temperature (fast-check)", () => {
    fc.assert(
      fc.property(mixedNetwork(), (n) => {
        const r = solveSteady(n);
        for (const node of n.nodes) {
          const b = breakdownRise(n, r, node.id);
          const steps = b.steps.map((st) => ({ place: `${st.from} → ${st.to}`, deltaK: st.deltaK, watts: st.watts, kelvinPerWatt: st.kelvinPerWatt }));
          const t = ladderTotalTrace({ riseK: b.riseK, remainderK: b.remainderK, steps }, node.id, n.ambientC);
          // The sum the trace shows adds up to what it claims, and to the solver's temperature (energy conservation on a thermal circuit).
          const sum = t.inputs.reduce((a, x) => a + x.value, 0);
          expect(Math.abs(sum - t.result.value)).toBeLessThanOrEqual(1e-9 * (1 + Math.abs(sum)));
          expect(Math.abs(t.result.value - r.temperaturesC[node.id]!)).toBeLessThanOrEqual(1e-6 * (1 + Math.abs(t.result.value)));
          expect(t.inputs.filter((x) => x.symbol.startsWith("ΔT") && x.symbol !== "ΔT_rest")).toHaveLength(steps.length);
        }
      }),
      { numRuns: 40 },
    );
  });

  it("names each rung with its watts and K/W and cites its source", () => {
    // Hand check: 2 W through 3 K/W then 5 K/W above 25 °C: rungs of 6 K and 10 K, 41 °C at the junction.
    const t = ladderTotalTrace({ riseK: 16, remainderK: 0, steps: [{ place: "junction to sink", deltaK: 6, watts: 2, kelvinPerWatt: 3 }, { place: "sink to air", deltaK: 10, watts: 2, kelvinPerWatt: 5 }] }, "LED junction", 25);
    expect(t.result.value).toBe(41);
    expect(t.equation).toBe("T = T_ambient + ΔT1 + ΔT2");
    expect(t.inputs.map((x) => x.name)).toEqual(["ambient air", "junction to sink (2.00 W × 3.00 K/W)", "sink to air (2.00 W × 5.00 K/W)"]);
    expect(t.source).toMatch(/Incropera/);
  });
});

describe("parts cost and saving expand to their sums", () => {
  const costs = { totalEur: 23.5, unpriced: 1, comparableNewLightEur: 40, savingEur: 16.5, lines: [{ name: "Buck driver", count: 1, totalEur: 6.5 }, { name: "18650 cell", count: 2, totalEur: 17 }, { name: "Salvaged sink", count: 1, totalEur: null }] };
  it("adds every priced line and says how many have no price", () => {
    const t = partsCostTrace(costs);
    expect(t.inputs.map((x) => [x.name, x.value])).toEqual([["1 × Buck driver", 6.5], ["2 × 18650 cell", 17]]);
    expect(t.inputs.reduce((a, x) => a + x.value, 0)).toBe(t.result.value);
    expect(t.notes).toEqual(["1 part has no price and is left out."]);
    expect(t.source).toMatch(/^as entered/);
  });
  it("saving is the new light's price minus the parts, or nothing without a new light's price", () => {
    const s = savingTrace(costs)!;
    expect(s.result.value).toBe(s.inputs[0]!.value - s.inputs[1]!.value);
    expect(savingTrace({ ...costs, comparableNewLightEur: null, savingEur: null })).toBeNull();
  });
});

describe("the build's mass", () => {
  const build = (strap: boolean, cellKg: number | undefined) =>
    ({
      housing: { name: "Square lantern body", specs: { massKg: 0.3 } },
      lightEngine: { heatsink: { name: "Salvaged sink", specs: { massKg: 0.05 } } },
      driver: { part: { name: "Buck driver", specs: {} }, massKg: 0.006, cooling: strap ? { kind: "strapped", spreader: { name: "Copper tape", specs: { material: "copper-pure", thicknessM: 0.00005, widthM: 0.01, lengthM: 0.06 } } } : { kind: "floating" } },
      pack: { series: 1, parallel: 2, cell: { name: "18650", specs: cellKg === undefined ? {} : { massKg: cellKg } } },
    }) as unknown as ResolvedBuild;

  it("adds the parts that give a mass and a strap from its material's density", () => {
    const m = massSummary(build(true, 0.046));
    // Hand check: 300 + 50 + 2 × 46 + 6 g, and copper 8933 kg/m³ (Incropera Table A.1) × 0.05 mm × 10 mm × 60 mm = 0.268 g.
    expect(m.totalKg).toBeCloseTo(0.448 + 8933 * 0.00005 * 0.01 * 0.06, 12);
    expect(m.trace.inputs.reduce((a, x) => a + x.value, 0)).toBeCloseTo(m.trace.result.value, 12);
    expect(m.unknown).toEqual([]);
    expect(massSummary(build(false, 0.046)).totalKg).toBeCloseTo(0.448, 12);
  });

  it("names what gives no mass and leaves it out", () => {
    const m = massSummary(build(false, undefined));
    expect(m.unknown).toEqual(["2 × 18650"]);
    expect(m.totalKg).toBeCloseTo(0.356, 12);
    expect(m.trace.notes.join(" ")).toContain("No mass given, left out: 2 × 18650.");
  });
});
