/**
 * Holding a build against its measured warm-up: the model's warm-up at each place where
 * readings were taken, interpolated to the reading times, the misfit there, and a plain
 * verdict. The prediction is shifted by the difference of the two ambients (a linear
 * network's rises do not depend on the ambient; natural convection and radiation nearly so).
 */
export interface PlaceFit {
  place: string;
  nodeId: string;
  readingCount: number;
  /** Model minus measurement, RMS over the place's readings. */
  rmsK: number;
  /** Model minus measurement at the last reading (positive: the model ran hotter). */
  endDiffK: number;
  predicted: { tS: number; tempC: number }[];
  measured: { tS: number; tempC: number }[];
}

export interface HoldResult {
  places: PlaceFit[];
  /** Readings at places the model has no node for. */
  unmatched: string[];
  ambientShiftK: number;
  verdict: string;
}

function interpolate(times: readonly number[], values: readonly number[], t: number): number {
  if (t <= times[0]!) return values[0]!;
  const last = times.length - 1;
  if (t >= times[last]!) return values[last]!;
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (times[mid]! <= t) lo = mid;
    else hi = mid;
  }
  const f = (t - times[lo]!) / (times[hi]! - times[lo]!);
  return values[lo]! + f * (values[hi]! - values[lo]!);
}

const normal = (s: string) => s.trim().toLowerCase();

export function holdAgainst(input: {
  readings: readonly { tS: number; tempC: number; place: string }[];
  runAmbientC: number;
  modelAmbientC: number;
  nodes: readonly { id: string; place: string }[];
  warmup: { timesS: readonly number[]; temperaturesC: Readonly<Record<string, readonly number[]>> };
}): HoldResult {
  const shift = input.runAmbientC - input.modelAmbientC;
  const byPlace = new Map<string, { tS: number; tempC: number }[]>();
  for (const r of input.readings) {
    const key = normal(r.place);
    byPlace.set(key, [...(byPlace.get(key) ?? []), { tS: r.tS, tempC: r.tempC }]);
  }
  const places: PlaceFit[] = [];
  const unmatched: string[] = [];
  for (const [place, measured] of byPlace) {
    const node = input.nodes.find((n) => normal(n.place) === place);
    const series = node ? input.warmup.temperaturesC[node.id] : undefined;
    if (!node || !series) {
      unmatched.push(place);
      continue;
    }
    const predicted = measured.map((m) => ({ tS: m.tS, tempC: interpolate(input.warmup.timesS, series, m.tS) + shift }));
    const diffs = measured.map((m, i) => predicted[i]!.tempC - m.tempC);
    const rmsK = Math.sqrt(diffs.reduce((s, d) => s + d * d, 0) / diffs.length);
    const curve = input.warmup.timesS.filter((t) => t <= measured[measured.length - 1]!.tS * 1.05).map((t) => ({ tS: t, tempC: interpolate(input.warmup.timesS, series, t) + shift }));
    places.push({ place: node.place, nodeId: node.id, readingCount: measured.length, rmsK, endDiffK: diffs[diffs.length - 1]!, predicted: curve, measured });
  }
  return { places, unmatched, ambientShiftK: shift, verdict: verdictOf(places) };
}

/** "The model ran hotter than the lamp by 4.2 K at the heatsink", from the place with the largest gap at the end of the run. */
function verdictOf(places: PlaceFit[]): string {
  if (places.length === 0) return "No reading was taken at a place the model has, so there is nothing to compare.";
  const worst = [...places].sort((a, b) => Math.abs(b.endDiffK) - Math.abs(a.endDiffK))[0]!;
  const gap = Math.abs(worst.endDiffK);
  if (gap < 1) return `The model and the lamp agree within 1 K at the end of the run (largest gap ${gap.toFixed(1)} K, at the ${worst.place}).`;
  return `The model ran ${worst.endDiffK > 0 ? "hotter" : "colder"} than the lamp by ${gap.toFixed(1)} K at the ${worst.place} at the end of the run.`;
}
