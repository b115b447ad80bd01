import type { BuildEvaluation } from "./evaluate";
import type { Warmup } from "./scenario";

/** Samples a chart needs along a warm-up: about one per pixel column of a small chart. */
export const CHART_POINTS = 121;

/**
 * The evaluation as the Budget's charts draw it: each warm-up keeps every node's curve (the
 * warm-up chart plots the limited ones, a bench run's overlay any place it was measured at)
 * at most `maxPoints` samples, always the first and the last. Everything else (figures, traces, crossings) is untouched, so a thinned
 * answer reads the same on screen; the full curves are one request away.
 */
export function forCharts(evaluation: BuildEvaluation, maxPoints = CHART_POINTS): BuildEvaluation {
  return {
    ...evaluation,
    scenarios: evaluation.scenarios.map((s) => {
      if (!s.warmup) return s;
      return { ...s, warmup: thinWarmup(s.warmup, maxPoints) };
    }),
  };
}

function thinWarmup(w: Warmup, maxPoints: number): Warmup {
  const n = w.timesS.length;
  const keep: number[] = [];
  if (n <= maxPoints) for (let i = 0; i < n; i++) keep.push(i);
  else {
    // Evenly spaced indices from the first to the last sample.
    for (let k = 0; k < maxPoints; k++) keep.push(Math.round((k * (n - 1)) / (maxPoints - 1)));
  }
  const pick = (xs: readonly number[]) => keep.map((i) => xs[i]!);
  const temperaturesC: Record<string, number[]> = {};
  for (const [node, xs] of Object.entries(w.temperaturesC)) temperaturesC[node] = pick(xs);
  return { ...w, timesS: pick(w.timesS), temperaturesC };
}
