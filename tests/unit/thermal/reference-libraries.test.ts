import fc from "fast-check";
import { expm, inv, matrix, multiply, subtract, identity, type Matrix } from "mathjs";
import { Matrix as MlMatrix, solve as mlSolve } from "ml-matrix";
import { OdexSolver } from "../../support/odex";
import { describe, expect, it } from "vitest";
import { naturalConvectionCoefficient, solveSteady, solveTransient, STEFAN_BOLTZMANN } from "@/lib/thermal";
import { linearNetwork, linearSystem, net } from "./helpers";

describe("against general-purpose numerical libraries", () => {
  it("steady temperatures of random linear networks equal ml-matrix's LU solve of G·T = b", () => {
    fc.assert(
      fc.property(linearNetwork({ maxNodes: 15 }), (c) => {
        const { G, b } = linearSystem(c);
        const ref = mlSolve(new MlMatrix(G), MlMatrix.columnVector(b)).getColumn(0);
        const r = solveSteady(c.network);
        c.network.nodes.forEach((node, i) => {
          const scale = Math.max(1, Math.abs(ref[i]!));
          expect(Math.abs(r.temperaturesC[node.id]! - ref[i]!) / scale).toBeLessThan(1e-9);
        });
      }),
      { numRuns: 150 },
    );
  });

  it("warm-up of random linear networks follows the exact matrix exponential x(t) = e^{At}x₀ + A⁻¹(e^{At} − I)b (mathjs expm)", () => {
    fc.assert(
      fc.property(linearNetwork({ maxNodes: 6 }), (c) => {
        const n = c.network.nodes.length;
        const { G, b } = linearSystem(c);
        // C·dT/dt = b − G·T  ⇒  dT/dt = A·T + β with A = −C⁻¹G, β = C⁻¹b
        const A = G.map((row, i) => row.map((g) => -g / c.capacities[i]!));
        const beta = b.map((v, i) => v / c.capacities[i]!);
        const rowSum = Math.max(...A.map((row) => row.reduce((s, v) => s + Math.abs(v), 0)));
        const stepS = Math.min(1, 0.02 / rowSum);
        const durationS = Math.min(200, 4000 * stepS);
        const x0 = new Array<number>(n).fill(c.network.ambientC);
        const tr = solveTransient(c.network, { durationS, stepS });
        const Am = matrix(A);
        const Ainv = inv(Am);
        const rise = Math.max(1e-6, ...c.network.nodes.map((node) => Math.abs(solveSteady(c.network).temperaturesC[node.id]! - c.network.ambientC)));
        for (const frac of [0.1, 0.37, 1]) {
          const k = Math.round((tr.timesS.length - 1) * frac);
          const t = tr.timesS[k]!;
          const E = expm(multiply(Am, t) as Matrix);
          const x = (multiply(E, x0) as Matrix).toArray() as number[];
          const part = (multiply(multiply(Ainv, subtract(E, identity(n))), beta) as Matrix).toArray() as number[];
          c.network.nodes.forEach((node, i) => {
            expect(Math.abs(tr.temperaturesC[node.id]![k]! - (x[i]! + part[i]!))).toBeLessThan(5e-3 * rise + 1e-7);
          });
        }
      }),
      { numRuns: 40 },
    );
  });

  it("a stiff network (0.05 J/K junction on a 50 J/K sink) at 1 s steps matches the matrix exponential after the first seconds", () => {
    const network = net({
      ambientC: 25,
      nodes: [
        { id: "j", heatCapacityJPerK: 0.05 },
        { id: "s", heatCapacityJPerK: 50 },
      ],
      links: [
        { from: "j", to: "s", type: "resistance", kelvinPerWatt: 2.5 },
        { from: "s", to: "ambient", type: "resistance", kelvinPerWatt: 3 },
      ],
      sources: [{ node: "j", watts: 7 }],
    });
    const A = matrix([
      [-1 / (2.5 * 0.05), 1 / (2.5 * 0.05)],
      [1 / (2.5 * 50), -(1 / 2.5 + 1 / 3) / 50],
    ]);
    const beta = [7 / 0.05, 25 / 3 / 50];
    const tr = solveTransient(network, { durationS: 1200, stepS: 1 });
    for (const t of [5, 30, 120, 600, 1200]) {
      const E = expm(multiply(A, t) as Matrix);
      const x = (multiply(E, [25, 25]) as Matrix).toArray() as number[];
      const part = (multiply(multiply(inv(A), subtract(E, identity(2))), beta) as Matrix).toArray() as number[];
      // Rise is 7 × 5.5 = 38.5 K at the junction; ask for 0.5 % of it.
      expect(Math.abs(tr.temperaturesC.j![t]! - (x[0]! + part[0]!))).toBeLessThan(0.2);
      expect(Math.abs(tr.temperaturesC.s![t]! - (x[1]! + part[1]!))).toBeLessThan(0.2);
    }
  });

  it("non-stiff non-linear warm-up (radiation and natural convection) agrees with the odex Gragg–Bulirsch–Stoer integrator", () => {
    const network = net({
      ambientC: 20,
      nodes: [
        { id: "board", heatCapacityJPerK: 20 },
        { id: "case", heatCapacityJPerK: 80 },
      ],
      links: [
        { from: "board", to: "case", type: "resistance", kelvinPerWatt: 1.5 },
        { from: "case", to: "ambient", type: "natural-convection", areaM2: 0.02, surface: "vertical-plate", characteristicLengthM: 0.1 },
        { from: "case", to: "ambient", type: "radiation", areaM2: 0.02, emissivity: 0.9 },
      ],
      sources: [{ node: "board", watts: 4 }],
    });
    const steps = 900;
    const tr = solveTransient(network, { durationS: steps, stepS: 1 });
    // The integrator is what is under test here: the right-hand side uses the engine's own
    // correlation (checked against Incropera elsewhere) and writes the energy balance again.
    const hNat = (tsC: number) => naturalConvectionCoefficient("vertical-plate", 0.1, tsC + 273.15, 293.15).coefficientWPerM2K;
    const sigma = STEFAN_BOLTZMANN;
    const f = (_t: number, y: number[]) => {
      const [b, c] = y as [number, number];
      const qbc = (b - c) / 1.5;
      const tk = c + 273.15;
      const qc = hNat(c) * 0.02 * (c - 20) + 0.9 * sigma * 0.02 * (tk ** 4 - 293.15 ** 4);
      return [(4 - qbc) / 20, (qbc - qc) / 80];
    };
    const solver = new OdexSolver(2);
    solver.denseOutput = true;
    solver.absoluteTolerance = solver.relativeTolerance = 1e-10;
    const ref: number[][] = [];
    solver.solve(f, 0, [20, 20], steps, solver.grid(1, (_x, y) => ref.push(y.slice())));
    for (const k of [60, 300, 900]) {
      expect(Math.abs(tr.temperaturesC.board![k]! - ref[k]![0]!)).toBeLessThan(0.02);
      expect(Math.abs(tr.temperaturesC.case![k]! - ref[k]![1]!)).toBeLessThan(0.02);
    }
  });
});
