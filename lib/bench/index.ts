/** Bench runs: a measured warm-up turned into the engine's numbers. Pure, no I/O. */
export { fitInputSchema, readingSchema, MAX_READINGS, READINGS_BODY_LIMIT, type FitInput, type FitInputRaw, type Reading } from "./schema";
export { fitWarmUp, benchHeatW, type FitResult, type FitRange } from "./fit";
export { firstOrderRise, riseAt, naturalPath, linearPath, benchEmissivity, BENCH_CHARACTERISTIC_LENGTH_M, type PathKind, type SinkPath } from "./sink-model";
export { leastSquares, studentT975, type LeastSquaresProblem, type LeastSquaresResult } from "./least-squares";
