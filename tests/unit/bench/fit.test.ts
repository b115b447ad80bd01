import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { firstOrderRise, fitWarmUp, riseAt, type SinkPath } from "@/lib/bench";
import { networkSchema, solveTransient } from "@/lib/thermal";
import { KNOWN_SINK, TRUE_R, TRUE_TAU, parse, syntheticRun } from "./synthetic";

const relWidth = (r: { low: number; high: number; value: number }) => (r.high - r.low) / r.value;

describe("first-order warm-up against its closed form", () => {
  // Closed form of a lumped capacity C behind a constant R, heated by P from ambient:
  // θ(t) = P·R·(1 − e^(−t/RC)); at t = RC it has covered 1 − 1/e ≈ 63.2 % of the way
  // (Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., §5.3 — from memory, check against a copy).
  it("reaches 63.2 % of P·R at one time constant and 86.5 % at two", () => {
    expect(firstOrderRise(7, 5, 90, 450) / 35).toBeCloseTo(1 - Math.exp(-1), 12);
    expect(firstOrderRise(7, 5, 90, 900) / 35).toBeCloseTo(0.8646647, 6);
  });

  it("the integrated model with a constant conductance follows the closed form", () => {
    const flat: SinkPath = { kind: "natural", shape: () => 1, surface: "vertical-plate", characteristicLengthM: 0.05, emissivity: 0.5, emissivityNote: "" };
    const times = Float64Array.from({ length: 50 }, (_, i) => i * 37);
    const out = riseAt(flat, 7, 5, 90, times, new Float64Array(times.length));
    times.forEach((t, i) => expect(Math.abs(out[i]! - firstOrderRise(7, 5, 90, t))).toBeLessThan(1e-5));
  });

  it("the engine's network solver agrees with the closed form for one node behind a resistance", () => {
    const network = networkSchema.parse({
      ambientC: 20,
      nodes: [{ id: "sink", heatCapacityJPerK: 90 }],
      links: [{ from: "sink", to: "ambient", type: "resistance", kelvinPerWatt: 5 }],
      sources: [{ node: "sink", watts: 7 }],
    });
    const tr = solveTransient(network, { durationS: 900, stepS: 0.25 });
    tr.timesS.forEach((t, i) => {
      if (i % 200 === 0) expect(Math.abs(tr.temperaturesC.sink![i]! - 20 - firstOrderRise(7, 5, 90, t))).toBeLessThan(0.02);
    });
  });
});

describe("fitting a synthetic warm-up of a known sink", () => {
  it(`the known sink: R ≈ ${TRUE_R.toFixed(2)} K/W, τ ≈ ${TRUE_TAU.toFixed(0)} s (a lamp-sized sink)`, () => {
    expect(TRUE_R).toBeGreaterThan(3);
    expect(TRUE_R).toBeLessThan(6);
  });

  it("±0.3 K noise over two time constants: R within 5 %, C within 15 %, true values inside the intervals", () => {
    for (const seed of [1, 2, 3, 4, 5, 6]) {
      const fit = fitWarmUp(parse(syntheticRun({ runS: 2 * TRUE_TAU, everyS: 10, noiseK: 0.3, seed })));
      expect(Math.abs(fit.sinkToAirKPerW.value / TRUE_R - 1)).toBeLessThan(0.05);
      expect(Math.abs(fit.heatCapacityJPerK.value / KNOWN_SINK.capacityJPerK - 1)).toBeLessThan(0.15);
      expect(fit.sinkToAirKPerW.low).toBeLessThan(TRUE_R * 1.002);
      expect(fit.sinkToAirKPerW.high).toBeGreaterThan(TRUE_R * 0.998);
      expect(fit.rmsK).toBeGreaterThan(0.1);
      expect(fit.rmsK).toBeLessThan(0.3);
      expect(fit.timeConstantS).toBeCloseTo(fit.sinkToAirKPerW.value * fit.heatCapacityJPerK.value, 6);
      expect(fit.warnings).toEqual([]);
    }
  });

  it("a clean run recovers R within 0.5 % and C within 2 %", () => {
    const fit = fitWarmUp(parse(syntheticRun({ runS: 2 * TRUE_TAU, everyS: 5, noiseK: 0, seed: 1 })));
    expect(fit.sinkToAirKPerW.value / TRUE_R).toBeCloseTo(1, 2);
    expect(Math.abs(fit.heatCapacityJPerK.value / KNOWN_SINK.capacityJPerK - 1)).toBeLessThan(0.02);
  });

  it("the interval widens with the noise (fast-check)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1e6 }), fc.double({ min: 0.1, max: 0.3, noNaN: true }), fc.double({ min: 1.5, max: 3, noNaN: true }), (seed, noise, factor) => {
        const quiet = fitWarmUp(parse(syntheticRun({ runS: 2 * TRUE_TAU, everyS: 10, noiseK: noise, seed })));
        const loud = fitWarmUp(parse(syntheticRun({ runS: 2 * TRUE_TAU, everyS: 10, noiseK: noise * factor, seed })));
        expect(relWidth(loud.sinkToAirKPerW)).toBeGreaterThan(relWidth(quiet.sinkToAirKPerW));
        expect(relWidth(loud.heatCapacityJPerK)).toBeGreaterThan(relWidth(quiet.heatCapacityJPerK));
      }),
      { numRuns: 15 },
    );
  });

  it("the interval widens with a shorter run (fast-check)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1e6 }), fc.double({ min: 0.1, max: 0.4, noNaN: true }), (seed, noise) => {
        const long = fitWarmUp(parse(syntheticRun({ runS: 2 * TRUE_TAU, everyS: 10, noiseK: noise, seed })));
        const short = fitWarmUp(parse(syntheticRun({ runS: 0.8 * TRUE_TAU, everyS: 10, noiseK: noise, seed })));
        expect(relWidth(short.sinkToAirKPerW)).toBeGreaterThan(relWidth(long.sinkToAirKPerW));
        expect(relWidth(short.heatCapacityJPerK)).toBeGreaterThan(relWidth(long.heatCapacityJPerK));
      }),
      { numRuns: 15 },
    );
  });

  it("a run shorter than one time constant is warned about in plain words", () => {
    const fit = fitWarmUp(parse(syntheticRun({ runS: 0.6 * TRUE_TAU, everyS: 10, noiseK: 0.3, seed: 9 })));
    expect(fit.warnings.join(" ")).toMatch(/shorter than the sink's time constant/);
  });

  it("noisy readings are warned about", () => {
    const fit = fitWarmUp(parse(syntheticRun({ runS: 2 * TRUE_TAU, everyS: 10, noiseK: 3, seed: 4, startS: 60 })));
    expect(fit.warnings.join(" ")).toMatch(/scatter by .* K \(RMS\)/);
  });

  it("the answer has no NaN or Infinity and the curve ends near the last reading", () => {
    const raw = syntheticRun({ runS: 2 * TRUE_TAU, everyS: 30, noiseK: 0.3, seed: 7 });
    const fit = fitWarmUp(parse(raw));
    expect(JSON.stringify(fit)).not.toMatch(/NaN|Infinity|null/);
    const last = raw.readings.at(-1)!;
    expect(Math.abs(fit.curve.at(-1)!.tempC - Number(last.tempC))).toBeLessThan(0.6);
  });
});

describe("the bench result of common practice", () => {
  // Common practice: about 10 W electrical (7 W of heat) into an emitter on a finned sink of
  // about 100 g of aluminium holds it at about 60 °C after 20 minutes in 25 °C air, which the
  // trade reads as roughly 4–5 K/W ((60 − 25)/7 = 5 K/W, taking the sink as settled).
  it("7 W, 25 °C, 60 °C after 20 min, 100 g of aluminium → roughly 4–5 K/W; the capacity comes from the mass", () => {
    const fit = fitWarmUp(parse({ ambientC: "25 °C", heatW: "7 W", readings: [{ tS: "20 min", tempC: "60 °C" }], massKg: "100 g", material: "aluminium-6063-t5" }));
    // The fit also credits the few percent of the rise still to come after 20 minutes,
    // so it lands at the top of the trade's range rather than below it.
    expect(fit.sinkToAirKPerW.value).toBeGreaterThan(4);
    expect(fit.sinkToAirKPerW.value).toBeLessThan(5.5);
    // 0.1 kg × 900 J/(kg·K) (Incropera Table A.1, aluminium alloys ≈ 900 J/(kg·K))
    expect(fit.heatCapacityJPerK.from).toBe("mass");
    expect(fit.heatCapacityJPerK.value).toBeGreaterThan(85);
    expect(fit.heatCapacityJPerK.value).toBeLessThan(97);
    expect(fit.trace.notes.join(" ")).toMatch(/comes from the mass/);
    expect(fit.trace.source).toMatch(/Incropera/);
  });

  it("volts, amps and the emitter's heat fraction give the heat", () => {
    const fit = fitWarmUp(parse({ ambientC: 25, volts: "3.1 V", amps: "3.2 A", heatFraction: "70 %", readings: [{ tS: 1200, tempC: 60 }], massKg: 0.1 }));
    expect(fit.heatW).toBeCloseTo(3.1 * 3.2 * 0.7, 9);
    expect(fit.trace.notes.join(" ")).toMatch(/aluminium-6063-t5 assumed/);
  });
});
