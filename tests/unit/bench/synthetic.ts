import { fitInputSchema, type FitInputRaw } from "@/lib/bench";
import { networkSchema, solveSteady, solveTransient } from "@/lib/thermal";

/**
 * A known sink for synthetic runs: 100 g of aluminium (C = 90 J/K), a 0.0216 m² vertical
 * face of 50 mm in still air, emissivity 0.5, 7 W, 25 °C. Its warm-up comes from the
 * engine's own network solver, so the fit is checked against the model it claims to use.
 */
export const KNOWN_SINK = { heatW: 7, ambientC: 25, capacityJPerK: 90, areaM2: 0.0216, lengthM: 0.05, emissivity: 0.5 } as const;

const network = networkSchema.parse({
  ambientC: KNOWN_SINK.ambientC,
  nodes: [{ id: "sink", heatCapacityJPerK: KNOWN_SINK.capacityJPerK }],
  links: [
    { from: "sink", to: "ambient", type: "natural-convection", areaM2: KNOWN_SINK.areaM2, surface: "vertical-plate", characteristicLengthM: KNOWN_SINK.lengthM },
    { from: "sink", to: "ambient", type: "radiation", areaM2: KNOWN_SINK.areaM2, emissivity: KNOWN_SINK.emissivity },
  ],
  sources: [{ node: "sink", watts: KNOWN_SINK.heatW }],
});

/** The known sink's resistance at 7 W: the steady rise over the heat. */
export const TRUE_R = (solveSteady(network).temperaturesC.sink! - KNOWN_SINK.ambientC) / KNOWN_SINK.heatW;
export const TRUE_TAU = TRUE_R * KNOWN_SINK.capacityJPerK;

const STEP_S = 0.5;
const clean = solveTransient(network, { durationS: Math.ceil((3 * TRUE_TAU) / 10) * 10, stepS: STEP_S });

/** Park–Miller minimal standard generator: the same noise for the same seed. */
export function uniformNoise(seed: number): () => number {
  let s = (Math.abs(Math.floor(seed)) % 2147483646) + 1;
  return () => {
    s = (s * 16807) % 2147483647;
    return s / 2147483647 - 0.5;
  };
}

/** Readings every `everyS` from `startS` (or the first interval) up to `runS`, with uniform noise of ±`noiseK`. */
export function syntheticRun(opts: { runS: number; everyS: number; noiseK: number; seed: number; startS?: number }): FitInputRaw {
  const rnd = uniformNoise(opts.seed);
  const every = Math.round(opts.everyS / STEP_S);
  const readings: { tS: number; tempC: number }[] = [];
  const first = Math.max(every, Math.round((opts.startS ?? 0) / STEP_S));
  for (let i = first; i < clean.timesS.length && clean.timesS[i]! <= opts.runS + 1e-9; i += every) {
    readings.push({ tS: clean.timesS[i]!, tempC: clean.temperaturesC.sink![i]! + 2 * opts.noiseK * rnd() });
  }
  return { ambientC: KNOWN_SINK.ambientC, heatW: KNOWN_SINK.heatW, readings, finish: undefined };
}

export const parse = (raw: FitInputRaw) => fitInputSchema.parse(raw);
