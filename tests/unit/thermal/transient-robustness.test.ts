import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { isThermalInputError, solveSteady, solveTransient, ZERO_CELSIUS_K, type Network, type NetworkInput } from "@/lib/thermal";
import { compileNetwork } from "@/lib/thermal/compile";
import { solveCompiledTransient } from "@/lib/thermal/solver/transient";
import { net } from "./helpers";

/**
 * The lantern demo build in its high mode: a 0.02 J/K junction beside a 56 J/K heatsink and a
 * 165 J/K housing, three nodes without heat capacity (one of them the housing air, reached
 * only through natural convection and the finned heatsink) and an LED whose power falls
 * with temperature. Before step rejection and the limited Newton step, its warm-up threw
 * "warm-up met a singular system at t = 30 s" at stepS 30, 60 and 120 s.
 */
const lantern = net(JSON.parse(readFileSync(new URL("./fixtures/lantern-high-mode.json", import.meta.url), "utf8")) as NetworkInput);

/** Largest |a − b| over every node, comparing `coarse` with `fine` at the coarse instants (`fine` sampled every `ratio`-th point). */
function worstGap(coarse: Record<string, number[]>, fine: Record<string, number[]>, ratio: number): number {
  let worst = 0;
  for (const [id, values] of Object.entries(coarse)) values.forEach((v, k) => (worst = Math.max(worst, Math.abs(v - fine[id]![k * ratio]!))));
  return worst;
}

describe("warm-up of the lantern's high mode (the build that failed)", () => {
  const fine = solveTransient(lantern, { durationS: 3600, stepS: 5 });

  it.each([30, 60])("solves at stepS %i s on the full output grid", (stepS) => {
    const r = solveTransient(lantern, { durationS: 3600, stepS, thresholds: [{ node: "junction", limitC: 150 }] });
    expect(r.timesS).toHaveLength(3600 / stepS + 1);
    r.timesS.forEach((t, k) => expect(t).toBe(k * stepS));
    expect(JSON.stringify(r)).not.toMatch(/null|NaN|Infinity/);
    // The junction passes 150 °C within the first minutes (about 2 min at 5 s steps).
    const crossing = r.crossings![0]!.timeS!;
    const fineCrossing = solveTransient(lantern, { durationS: 3600, stepS: 5, thresholds: [{ node: "junction", limitC: 150 }] }).crossings![0]!.timeS!;
    expect(Math.abs(crossing - fineCrossing)).toBeLessThan(stepS);
  });

  it("30 s steps follow a 5 s warm-up within 1 K at every instant", () => {
    const r = solveTransient(lantern, { durationS: 3600, stepS: 30 });
    expect(worstGap(r.temperaturesC, fine.temperaturesC, 6)).toBeLessThan(1);
  });

  it("60 s steps follow a 5 s warm-up within 2 K at every instant", () => {
    // Not 1 K: the 5.5 J/K driver board climbs some 130 K with a time constant of a few
    // minutes, and a 60 s step (backward Euler first) is then 1.9 K behind at t = 120 s;
    // that is discretisation error, shrinking with the step (0.6 K at 30 s), not a solver fault.
    const r = solveTransient(lantern, { durationS: 3600, stepS: 60 });
    expect(worstGap(r.temperaturesC, fine.temperaturesC, 12)).toBeLessThan(2);
  });

  it("run long enough, 30 and 60 s steps end within 0.5 K of the steady solution", () => {
    // After one hour the 92 J/K cells are still 4 K below steady, so run for six hours.
    const steady = solveSteady(lantern).temperaturesC;
    for (const stepS of [30, 60]) {
      const r = solveTransient(lantern, { durationS: 6 * 3600, stepS });
      for (const [id, values] of Object.entries(r.temperaturesC)) expect(Math.abs(values.at(-1)! - steady[id]!)).toBeLessThan(0.5);
    }
  });

  it("a step whose Newton iteration fails is retried shorter, and the answer stays on the grid", () => {
    // Eight corrections per step are too few for some 30 s steps of this network, so those
    // are rejected and halved; the result must still follow the warm-up. (It differs from
    // the unhindered 30 s run by up to about 0.15 K: the halved steps are the more accurate.)
    const c = compileNetwork(lantern);
    const options = { durationS: 3600, stepS: 30, initialK: new Float64Array(c.n).fill(c.ambientK), toleranceK: 1e-6, refreshAfter: 4 };
    const free = solveCompiledTransient(c, { ...options, maxIterationsPerStep: 50 });
    const capped = solveCompiledTransient(c, { ...options, maxIterationsPerStep: 8 });
    expect(free.rejectedSteps).toBe(0);
    expect(capped.rejectedSteps).toBeGreaterThan(0);
    expect(capped.timesS).toEqual(free.timesS);
    let gapFree = 0;
    let gapCapped = 0;
    c.ids.forEach((id, i) => {
      const reference = fine.temperaturesC[id]!;
      capped.series[i]!.forEach((v, k) => {
        gapCapped = Math.max(gapCapped, Math.abs(v - ZERO_CELSIUS_K - reference[6 * k]!));
        gapFree = Math.max(gapFree, Math.abs(free.series[i]![k]! - ZERO_CELSIUS_K - reference[6 * k]!));
      });
    });
    expect(gapCapped).toBeLessThan(1);
    expect(gapCapped).toBeLessThanOrEqual(gapFree + 0.01);
  });

  it("when even the shortest retry fails, the existing error is thrown", () => {
    // Two corrections cannot settle a step of this network at any length.
    const run = () => solveTransient(lantern, { durationS: 600, stepS: 30 }, { maxIterationsPerStep: 2 });
    expect(run).toThrow("warm-up did not converge within a step at t = 30 s; try a smaller stepS");
  });
});

interface StiffCase {
  network: Network;
  /** Upper bound of the slowest time constant, s (see `stiffNetwork`). */
  slowestS: number;
}

/**
 * Random stiff non-linear networks shaped like a lamp: a tree of resistances to ambient
 * whose nodes have tiny (0.01–0.1 J/K), big (20–200 J/K) or no heat capacity; natural
 * convection and radiation from some of them to ambient and between them; an enclosed-air
 * node without heat capacity reached only by natural convection (the case that broke the
 * lantern); watts on several nodes, one falling with temperature.
 *
 * The slowest time constant is at most trace(G⁻¹·C) = Σ Cᵢ·(G⁻¹)ᵢᵢ, and (G⁻¹)ᵢᵢ, the
 * resistance from node i to ambient, is at most that of its path through the tree: every
 * other link and the falling source only add conductance (Rayleigh's monotonicity law).
 */
const stiffNetwork = fc
  .record({
    n: fc.integer({ min: 2, max: 8 }),
    ambientC: fc.double({ min: -10, max: 45, noNaN: true }),
    seed: fc.array(fc.double({ min: 0, max: 1, noNaN: true, maxExcluded: true }), { minLength: 120, maxLength: 120 }),
    // Three cases in four have the enclosed air, the hard part.
    air: fc.integer({ min: 0, max: 3 }).map((k) => k > 0),
    slope: fc.double({ min: -0.05, max: 0, noNaN: true }),
    referenceC: fc.double({ min: 25, max: 150, noNaN: true }),
  })
  .map(({ n, ambientC, seed, air, slope, referenceC }): StiffCase => {
    let s = 0;
    const next = () => seed[s++ % seed.length]!;
    const ids = Array.from({ length: n }, (_, i) => `n${i}`);
    const nodes: NetworkInput["nodes"] = ids.map((id) => {
      const kind = next();
      if (kind < 0.3) return { id, heatCapacityJPerK: 0.01 * 10 ** next() };
      if (kind < 0.7) return { id, heatCapacityJPerK: 20 * 10 ** next() };
      return { id };
    });
    const links: NetworkInput["links"] = [];
    const pathK = new Array<number>(n).fill(0);
    for (let i = 0; i < n; i++) {
      const parent = i === 0 ? -1 : Math.floor(next() * i);
      const r = 0.2 * 25 ** next();
      links.push({ from: ids[i]!, to: parent < 0 ? "ambient" : ids[parent]!, type: "resistance", kelvinPerWatt: r });
      pathK[i] = r + (parent < 0 ? 0 : pathK[parent]!);
      if (next() < 0.5) {
        const areaM2 = 0.002 + 0.05 * next();
        links.push({ from: ids[i]!, to: "ambient", type: "natural-convection", areaM2, surface: "vertical-plate", characteristicLengthM: 0.02 + 0.1 * next() });
        links.push({ from: ids[i]!, to: "ambient", type: "radiation", areaM2, emissivity: 0.9 });
      }
      if (i > 0 && next() < 0.4) links.push({ from: ids[i]!, to: ids[Math.floor(next() * i)]!, type: "radiation", areaM2: 0.001 + 0.01 * next(), emissivity: 0.9 });
    }
    if (air) {
      nodes.push({ id: "air" });
      for (let i = 0; i < n; i++) {
        if (next() < 0.6) links.push({ from: ids[i]!, to: "air", type: "natural-convection", areaM2: 0.0005 + 0.02 * next(), surface: "horizontal-cylinder", characteristicLengthM: 0.01 + 0.03 * next() });
      }
      links.push({ from: "air", to: ids[0]!, type: "natural-convection", areaM2: 0.06, surface: "vertical-plate", characteristicLengthM: 0.1 });
    }
    const sources: NetworkInput["sources"] = [];
    for (let i = 0; i < n; i++) if (i === n - 1 || next() < 0.4) sources.push({ node: ids[i]!, watts: 15 * next() });
    sources[0] = { ...sources[0]!, wattsPerKelvin: slope, referenceC };
    const slowestS = nodes.reduce((sum, node, i) => sum + (node.heatCapacityJPerK ?? 0) * (pathK[i] ?? 0), 0);
    return { network: net({ ambientC, nodes, links, sources }), slowestS };
  });

describe("warm-up of random stiff non-linear networks at large steps (fast-check)", () => {
  it("either succeeds with finite temperatures ending near steady, or throws ThermalInputError", () => {
    let solved = 0;
    let refused = 0;
    let compared = 0;
    fc.assert(
      fc.property(stiffNetwork, fc.constantFrom(30, 60, 120, 300, 900, 3600), ({ network, slowestS }, stepS) => {
        // Twelve of the slowest time constants leave e⁻¹² ≈ 6·10⁻⁶ of the rise still to come.
        const durationS = stepS * Math.max(4, Math.min(2000, Math.ceil((12 * slowestS) / stepS)));
        let warm: ReturnType<typeof solveTransient>;
        try {
          warm = solveTransient(network, { durationS, stepS });
        } catch (e) {
          expect(isThermalInputError(e)).toBe(true);
          refused++;
          return;
        }
        solved++;
        expect(warm.timesS).toHaveLength(Math.round(durationS / stepS) + 1);
        expect(JSON.stringify(warm)).not.toMatch(/null|NaN|Infinity/);
        // Only when the duration covered twelve time constants is the end at steady.
        if (durationS < 12 * slowestS) return;
        compared++;
        const steady = solveSteady(network).temperaturesC;
        for (const [id, values] of Object.entries(warm.temperaturesC)) expect(Math.abs(values.at(-1)! - steady[id]!)).toBeLessThan(0.05);
      }),
      { numRuns: 200 },
    );
    // The property must not hold vacuously by refusing everything: these networks all have a stable steady state.
    // The comparison with steady must not be skipped for most cases (only the slowest are cut at 2000 steps).
    expect(compared).toBeGreaterThan(0.8 * solved);
    expect(refused).toBeLessThanOrEqual(0.05 * (solved + refused));
  });
});
