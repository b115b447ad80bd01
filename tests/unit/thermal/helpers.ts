import fc from "fast-check";
import { networkSchema, type Network, type NetworkInput } from "@/lib/thermal";

/** Parses a literal network the way a route would, so tests exercise the real input path. */
export const net = (n: NetworkInput): Network => networkSchema.parse(n);

export interface LinearCase {
  network: Network;
  /** Conductance of every link, in the order of `network.links`. */
  conductances: number[];
  /** Node index of each link end, −1 for ambient. */
  ends: [number, number][];
  capacities: number[];
  watts: number[];
}

/**
 * Random connected linear networks: a spanning tree to ambient (so every node has a path)
 * plus extra links, each a resistance, a conduction slab or a convection face.
 */
export const linearNetwork = (opts: { maxNodes?: number; capacity?: [number, number]; conductance?: [number, number] } = {}) =>
  fc
    .record({
      n: fc.integer({ min: 1, max: opts.maxNodes ?? 10 }),
      ambientC: fc.double({ min: -20, max: 60, noNaN: true }),
      seed: fc.array(fc.double({ min: 0, max: 1, noNaN: true, maxExcluded: true }), { minLength: 200, maxLength: 200 }),
      extra: fc.integer({ min: 0, max: 15 }),
    })
    .map(({ n, ambientC, seed, extra }): LinearCase => {
      let s = 0;
      const next = () => seed[s++ % seed.length]!;
      const [gMin, gMax] = opts.conductance ?? [0.05, 5];
      const [cMin, cMax] = opts.capacity ?? [1, 100];
      const g = () => gMin * (gMax / gMin) ** next();
      const ids = Array.from({ length: n }, (_, i) => `n${i}`);
      const ends: [number, number][] = [];
      for (let i = 0; i < n; i++) ends.push([i, i === 0 ? -1 : Math.floor(next() * (i + 1)) - 1]);
      for (let e = 0; e < extra; e++) {
        const a = Math.floor(next() * n);
        let b = Math.floor(next() * (n + 1)) - 1;
        if (b === a) b = -1;
        ends.push([a, b]);
      }
      const conductances = ends.map(() => g());
      const links = ends.map(([a, b], i) => {
        const from = ids[a]!;
        const to = b < 0 ? "ambient" : ids[b]!;
        const G = conductances[i]!;
        const kind = i % 3;
        if (kind === 0) return { from, to, type: "resistance" as const, kelvinPerWatt: 1 / G };
        if (kind === 1) return { from, to, type: "conduction" as const, lengthM: 0.01, areaM2: 1e-4, conductivityWPerMK: (G * 0.01) / 1e-4 };
        return { from, to, type: "convection" as const, areaM2: 0.01, coefficientWPerM2K: G / 0.01 };
      });
      const capacities = ids.map(() => cMin * (cMax / cMin) ** next());
      const watts = ids.map(() => (next() < 0.3 ? 0 : next() * 20));
      const network = net({
        ambientC,
        nodes: ids.map((id, i) => ({ id, heatCapacityJPerK: capacities[i]! })),
        links,
        sources: ids.map((id, i) => ({ node: id, watts: watts[i]! })).filter((x) => x.watts > 0),
      });
      return { network, conductances, ends, capacities, watts };
    });

/** Conductance matrix G and right-hand side b of G·T = P + g_amb·T_amb for a linear case (°C works since the system is linear). */
export function linearSystem(c: LinearCase): { G: number[][]; b: number[] } {
  const n = c.network.nodes.length;
  const G = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const b = c.watts.slice();
  c.ends.forEach(([i, j], l) => {
    const g = c.conductances[l]!;
    G[i]![i]! += g;
    if (j >= 0) {
      G[j]![j]! += g;
      G[i]![j]! -= g;
      G[j]![i]! -= g;
    } else b[i]! += g * c.network.ambientC;
  });
  return { G, b };
}

/**
 * Random non-linear networks: a linear case whose ambient links alternate into natural
 * convection and radiation of comparable size (so the answer is dominated by neither).
 */
export const mixedNetwork = (opts: { maxNodes?: number } = {}) =>
  linearNetwork({ maxNodes: opts.maxNodes ?? 10 }).map((c): Network => {
    const surfaces = ["vertical-plate", "horizontal-plate-up", "horizontal-plate-down", "horizontal-cylinder"] as const;
    const links = c.network.links.map((l, i) => {
      if (l.to !== "ambient" || i % 2 === 1) return l;
      const g = c.conductances[i]!;
      if (i % 4 === 0) return { from: l.from, to: l.to, type: "natural-convection" as const, areaM2: g / 6, surface: surfaces[i % 4]!, characteristicLengthM: 0.05 };
      return { from: l.from, to: l.to, type: "radiation" as const, areaM2: g / 6, emissivity: 0.9 };
    });
    return net({ ...c.network, links });
  });
