import { describe, expect, it } from "vitest";
import { fitWarmUp } from "@/lib/bench";
import { partFromFit } from "@/lib/bench/keep-part";
import { saveRunSchema } from "@/lib/bench/run-schema";
import { partSchema } from "@/lib/parts";

describe("keeping a fit as a heatsink part", () => {
  it("a measured, declared sink rated at the run's heat and ambient, with the interval in its source note", () => {
    const run = saveRunSchema.parse({
      title: "Salvaged sink",
      conditions: { ambientC: "22 °C", heatW: "7 W", massKg: "100 g", material: "aluminium-6063-t5", finish: "black-anodised" },
      readings: [{ tS: "20 min", tempC: "56 °C" }],
    });
    const fit = fitWarmUp({ ...run.conditions, readings: run.readings });
    const part = partSchema.parse(partFromFit({ name: "Salvaged sink", visibility: "private", runTitle: run.title, runDate: new Date("2026-11-30T10:00:00Z"), run, fit }));
    expect(part.kind).toBe("heatsink");
    expect(part.provenance).toBe("measured");
    if (part.kind !== "heatsink" || part.specs.rating !== "declared") throw new Error("expected a declared heatsink");
    expect(part.specs.sinkToAirKPerW).toBeCloseTo(fit.sinkToAirKPerW.value, 12);
    expect(part.specs.ratedPowerW).toBe(7);
    expect(part.specs.ratedAmbientC).toBeCloseTo(22, 9);
    expect(part.specs.ratedAirflow).toBe("natural");
    expect(part.specs.massKg).toBeCloseTo(0.1, 12);
    // The fitted capacity goes with the part (here from the mass: 0.1 kg × 900 J/(kg·K) of 6063).
    expect(part.specs.heatCapacityJPerK).toBeCloseTo(fit.heatCapacityJPerK.value, 9);
    expect(part.specs.heatCapacityJPerK).toBeGreaterThan(80);
    expect(part.provenanceNote).toMatch(/^Measured: fitted from the bench run “Salvaged sink” of 2026-11-30 at 7\.00 W of heat, 22\.0 °C ambient, upright, still air\. R = \d\.\d\d K\/W \(95 % interval \d\.\d\d–\d\.\d\d K\/W\); heat capacity 90\.\d J\/K \(from the mass\)/);
  });
});
