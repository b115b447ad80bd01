import { describe, expect, it } from "vitest";
import { holdAgainst } from "@/lib/bench/hold";

const warmup = { timesS: [0, 600, 1200, 1800], temperaturesC: { sink: [20, 40, 50, 55], wall: [20, 30, 35, 37] } };
const nodes = [{ id: "sink", place: "heatsink" }, { id: "wall", place: "housing wall" }];

describe("holding a build against its measured warm-up", () => {
  it("interpolates the prediction to the reading times, shifts it by the ambients and says which way the model erred", () => {
    const r = holdAgainst({
      readings: [
        { tS: 300, tempC: 29, place: "Heatsink" },
        { tS: 1800, tempC: 51, place: "heatsink" },
        { tS: 1800, tempC: 38.5, place: "housing wall" },
        { tS: 900, tempC: 30, place: "lid" },
      ],
      runAmbientC: 21,
      modelAmbientC: 20,
      nodes,
      warmup,
    });
    const sink = r.places.find((p) => p.nodeId === "sink")!;
    // 300 s lies halfway between 20 and 40 °C: 30 °C, +1 K for the warmer room = 31 °C against 29 °C read.
    expect(sink.measured).toHaveLength(2);
    expect(sink.endDiffK).toBeCloseTo(56 - 51, 12);
    expect(sink.rmsK).toBeCloseTo(Math.sqrt((2 ** 2 + 5 ** 2) / 2), 12);
    expect(r.places.find((p) => p.nodeId === "wall")!.endDiffK).toBeCloseTo(38 - 38.5, 12);
    expect(r.unmatched).toEqual(["lid"]);
    expect(r.verdict).toBe("The model ran hotter than the lamp by 5.0 K at the heatsink at the end of the run.");
  });

  it("agreement within 1 K is said so", () => {
    const r = holdAgainst({ readings: [{ tS: 1800, tempC: 54.6, place: "heatsink" }], runAmbientC: 20, modelAmbientC: 20, nodes, warmup });
    expect(r.verdict).toMatch(/^The model and the lamp agree within 1 K/);
  });
});
