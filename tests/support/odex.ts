import { createRequire } from "node:module";

/**
 * odex ships its TypeScript source as the package entry, so importing it makes the strict
 * type check of `next build` and `tsc` compile the package's own code. Loading it through
 * require with the few members the tests use keeps the check on our code only.
 */
export interface OdexSolverInstance {
  denseOutput: boolean;
  absoluteTolerance: number;
  relativeTolerance: number;
  solve(f: (x: number, y: number[]) => number[], x0: number, y0: number[], xEnd: number, out?: unknown): unknown;
  grid(dt: number, out: (x: number, y: number[]) => void): unknown;
}

const load = createRequire(import.meta.url);
export const OdexSolver = (load("odex") as { Solver: new (dimension: number) => OdexSolverInstance }).Solver;
