import { describe, expect, it } from "vitest";
import { evaluateBuild, forCharts } from "@/lib/retrofit";
import { lanternDesign, resolved } from "./fixtures/builds";

// The answer sent for charts keeps every node's curve (the warm-up chart plots the limited
// ones, a bench run's overlay any measured place), at most CHART_POINTS samples each, and
// nothing else changes.
describe("warm-up curves cut to what the charts draw", () => {
  const full = evaluateBuild(resolved(lanternDesign), { warmupIntervals: 480 });
  const chart = forCharts(full, 121);

  it("keeps every node's curve, first and last sample included", () => {
    let thinned = 0;
    for (const [i, s] of full.scenarios.entries()) {
      const c = chart.scenarios[i]!;
      if (!s.warmup) {
        expect(c.warmup).toBeNull();
        continue;
      }
      expect(Object.keys(c.warmup!.temperaturesC).sort()).toEqual(Object.keys(s.warmup.temperaturesC).sort());
      expect(c.warmup!.timesS.length).toBeLessThanOrEqual(121);
      expect(c.warmup!.timesS[0]).toBe(s.warmup.timesS[0]);
      expect(c.warmup!.timesS.at(-1)).toBe(s.warmup.timesS.at(-1));
      for (const node of Object.keys(c.warmup!.temperaturesC)) {
        const ys = c.warmup!.temperaturesC[node]!;
        expect(ys.length).toBe(c.warmup!.timesS.length);
        // Every kept sample is a sample of the full curve at the same time.
        for (const [k, t] of c.warmup!.timesS.entries()) expect(ys[k]).toBe(s.warmup.temperaturesC[node]![s.warmup.timesS.indexOf(t)]);
      }
      expect(c.warmup!.crossings).toEqual(s.warmup.crossings);
      expect(c.warmup!.steadyWithinS).toBe(s.warmup.steadyWithinS);
      if (s.warmup.timesS.length > 121) thinned++;
    }
    expect(thinned).toBeGreaterThan(0);
  });

  it("changes nothing but the warm-up curves", () => {
    const strip = (e: typeof full) => ({ ...e, scenarios: e.scenarios.map((s) => ({ ...s, warmup: null })) });
    expect(strip(chart)).toEqual(strip(full));
  });
});
