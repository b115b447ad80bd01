import { describe, expect, it } from "vitest";
import { Client } from "../support/http";

type Fit = {
  sinkToAirKPerW: { value: number; low: number; high: number };
  heatCapacityJPerK: { value: number; low: number; high: number; from: string };
  timeConstantS: number;
  rmsK: number;
  warnings: string[];
  trace: { source: string; notes: string[] };
};

const anyone = new Client(null);

/** A warm-up of a sink near 5 K/W and 90 J/K at 7 W, read every two minutes (values rounded to 0.1 °C as a hand thermometer shows them). */
const readings = [2, 4, 6, 8, 10, 12, 14, 16, 18, 20, 25, 30].map((min) => ({ tS: `${min} min`, tempC: `${(25 + 35 * (1 - Math.exp((-min * 60) / 450))).toFixed(1)} °C` }));

describe("POST /api/v1/bench/fit", () => {
  it("fits R and C with intervals, with unit-aware strings, no account needed", async () => {
    const r = await anyone.post("/api/v1/bench/fit", { ambientC: "25 °C", volts: "3.1 V", amps: "3.2258 A", heatFraction: "70 %", readings });
    expect(r.status).toBe(200);
    const fit = r.body as unknown as Fit;
    expect(fit.sinkToAirKPerW.low).toBeLessThan(fit.sinkToAirKPerW.value);
    expect(fit.sinkToAirKPerW.high).toBeGreaterThan(fit.sinkToAirKPerW.value);
    // The readings follow a first-order warm-up of 5 K/W: the natural-convection model fits them within a few per cent.
    expect(fit.sinkToAirKPerW.value).toBeGreaterThan(4.6);
    expect(fit.sinkToAirKPerW.value).toBeLessThan(5.4);
    expect(fit.heatCapacityJPerK.from).toBe("fit");
    expect(fit.timeConstantS).toBeGreaterThan(300);
    expect(fit.rmsK).toBeLessThan(1);
    expect(fit.trace.source).toMatch(/Incropera/);
    expect(JSON.stringify(r.body)).not.toMatch(/NaN|Infinity/);
  });

  it("one reading with the mass: the capacity comes from the mass", async () => {
    const r = await anyone.post("/api/v1/bench/fit", { ambientC: 25, heatW: "7 W", readings: [{ tS: "20 min", tempC: 60 }], massKg: "100 g", material: "aluminium-6063-t5" });
    expect(r.status).toBe(200);
    const fit = r.body as unknown as Fit;
    expect(fit.heatCapacityJPerK.from).toBe("mass");
    expect(fit.trace.notes.join(" ")).toMatch(/comes from the mass/);
  });

  it("bad input: 4xx naming the field, nothing like NaN", async () => {
    const cases: [unknown, number, string, RegExp][] = [
      [{ ambientC: 25, heatW: 7, readings: [{ tS: 1200, tempC: 60 }] }, 422, "readings", /give the mass or at least two readings/],
      [{ ambientC: 25, heatW: 7, readings: [{ tS: 600, tempC: 40 }, { tS: 300, tempC: 50 }] }, 422, "readings[1].tS", /^Reading 2: its time/],
      [{ ambientC: 25, heatW: 7, readings: [{ tS: 60, tempC: 30 }, { tS: 120, tempC: 20 }] }, 422, "readings[1].tempC", /below the ambient/],
      [{ ambientC: 25, heatW: 0, readings }, 400, "heatW", /^Heat into the sink: must be greater than 0 W$/],
      [{ ambientC: 25, heatW: "seven", readings }, 400, "heatW", /./],
      [{ ambientC: 25, heatW: 7 }, 400, "readings", /readings/],
      [{ ambientC: 25, volts: 3, amps: 2, readings }, 400, "heatFraction", /required when the heat is not given in watts/],
    ];
    for (const [body, status, path, message] of cases) {
      const r = await anyone.post("/api/v1/bench/fit", body);
      expect(r.status, JSON.stringify(body)).toBe(status);
      expect(r.body.error?.path).toBe(path);
      expect(r.body.error?.message).toMatch(message);
      expect(JSON.stringify(r.body)).not.toMatch(/NaN|Infinity/);
    }
  });

  it("100,000 readings are refused by count, naming the readings; a body past the route's size names them too", async () => {
    const many = Array.from({ length: 100_000 }, (_, i) => ({ tS: i + 1, tempC: 30 + i / 1e4 }));
    const r = await anyone.post("/api/v1/bench/fit", { ambientC: 25, heatW: 7, readings: many });
    expect(r.status).toBe(400);
    expect(r.body.error).toMatchObject({ path: "readings", message: expect.stringMatching(/at most 99,999 readings/) });
    const huge = Array.from({ length: 99_000 }, (_, i) => ({ tS: `${i + 1} s`, tempC: `${(30 + i / 1e4).toFixed(4)} °C`, note: "x".repeat(60) }));
    const big = await anyone.post("/api/v1/bench/fit", { ambientC: 25, heatW: 7, readings: huge });
    expect(big.status).toBe(413);
    expect(big.body.error).toMatchObject({ path: "readings", message: expect.stringMatching(/^The readings are over 8 MB as sent: a run takes at most 99,999 readings\./) });
  });

  it("malformed JSON is a 400", async () => {
    const r = await anyone.request("POST", "/api/v1/bench/fit", "{not json");
    expect(r.status).toBe(400);
  });
});
