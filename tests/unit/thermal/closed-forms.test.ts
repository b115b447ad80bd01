import { describe, expect, it } from "vitest";
import { solveSteady, solveTransient } from "@/lib/thermal";
import { net } from "./helpers";

describe("closed forms", () => {
  it("series resistances add: T = T∞ + P·ΣR (Ohm's-law analogy, Incropera §3.1.3)", () => {
    const r = solveSteady(
      net({
        ambientC: 25,
        nodes: [{ id: "j" }, { id: "b" }, { id: "s" }],
        links: [
          { from: "j", to: "b", type: "resistance", kelvinPerWatt: 2.5 },
          { from: "b", to: "s", type: "resistance", kelvinPerWatt: 0.7 },
          { from: "s", to: "ambient", type: "resistance", kelvinPerWatt: 4 },
        ],
        sources: [{ node: "j", watts: 7 }],
      }),
    );
    // 25 + 7 × (2.5 + 0.7 + 4) = 25 + 50.4 = 75.4 °C; sink 25 + 7 × 4 = 53 °C
    expect(r.temperaturesC.j).toBeCloseTo(75.4, 9);
    expect(r.temperaturesC.s).toBeCloseTo(53, 9);
    expect(r.iterations).toBeLessThanOrEqual(2);
  });

  it("parallel paths: R = R1·R2/(R1 + R2), heat splits inversely to resistance", () => {
    const r = solveSteady(
      net({
        ambientC: 20,
        nodes: [{ id: "d" }],
        links: [
          { from: "d", to: "ambient", type: "resistance", kelvinPerWatt: 6 },
          { from: "d", to: "ambient", type: "convection", areaM2: 0.01, coefficientWPerM2K: 100 / 3 },
        ],
        sources: [{ node: "d", watts: 3 }],
      }),
    );
    // R2 = 1/(h·A) = 1/(0.3333) = 3 K/W; R = 6·3/9 = 2 K/W; T = 20 + 3 × 2 = 26 °C; 1 W through R1, 2 W through R2
    expect(r.temperaturesC.d).toBeCloseTo(26, 9);
    expect(r.links[0]!.watts).toBeCloseTo(1, 9);
    expect(r.links[1]!.watts).toBeCloseTo(2, 9);
    expect(r.links[1]!.kelvinPerWatt).toBeCloseTo(3, 9);
  });

  it("a single RC node warms as T∞ + P·R·(1 − e^(−t/RC)) (exact solution of C·dT/dt = P − (T − T∞)/R)", () => {
    const R = 2;
    const C = 50;
    const P = 5;
    const network = net({
      ambientC: 25,
      nodes: [{ id: "m", heatCapacityJPerK: C }],
      links: [{ from: "m", to: "ambient", type: "resistance", kelvinPerWatt: R }],
      sources: [{ node: "m", watts: P }],
    });
    const exact = (t: number) => 25 + P * R * (1 - Math.exp(-t / (R * C)));
    const maxError = (stepS: number) => {
      const tr = solveTransient(network, { durationS: 600, stepS });
      return Math.max(...tr.timesS.map((t, k) => Math.abs(tr.temperaturesC.m![k]! - exact(t))));
    };
    const e1 = maxError(1);
    const e2 = maxError(2);
    expect(e1).toBeLessThan(1e-3 * P * R);
    // Second order: doubling the step multiplies the error by about four.
    expect(e2 / e1).toBeGreaterThan(3);
    expect(e2 / e1).toBeLessThan(5.5);
  });

  it("a long fin cut into 200 nodes matches the analytic adiabatic-tip fin (Incropera Table 3.4, case B)", () => {
    // Aluminium fin k = 200 W/(m·K), 1 mm × 10 mm section, 50 mm long, h = 10 W/(m²·K)
    const k = 200;
    const t = 0.001;
    const w = 0.01;
    const L = 0.05;
    const h = 10;
    const Ac = t * w;
    const P = 2 * (t + w);
    const N = 200;
    const dx = L / N;
    const Q = 1;
    const nodes = Array.from({ length: N + 1 }, (_, i) => ({ id: `x${i}` }));
    const links = [];
    for (let i = 0; i < N; i++) links.push({ from: `x${i}`, to: `x${i + 1}`, type: "conduction" as const, lengthM: dx, areaM2: Ac, conductivityWPerMK: k });
    for (let i = 0; i <= N; i++) {
      const share = i === 0 || i === N ? 0.5 : 1;
      links.push({ from: `x${i}`, to: "ambient", type: "convection" as const, areaM2: P * dx * share, coefficientWPerM2K: h });
    }
    const r = solveSteady(net({ ambientC: 0, nodes, links, sources: [{ node: "x0", watts: Q }] }));
    const m = Math.sqrt((h * P) / (k * Ac));
    const M = Math.sqrt(h * P * k * Ac);
    // q_f = M·θ_b·tanh(mL)  ⇒  θ_b = Q / (M·tanh(mL))
    const thetaB = Q / (M * Math.tanh(m * L));
    expect(r.temperaturesC.x0! / thetaB).toBeCloseTo(1, 4);
    for (const i of [50, 100, 150, 200]) {
      const x = i * dx;
      expect(r.temperaturesC[`x${i}`]! / thetaB).toBeCloseTo(Math.cosh(m * (L - x)) / Math.cosh(m * L), 4);
    }
  });
});
