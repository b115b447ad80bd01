import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { buildDesignSchema, evaluateBuild, resolveBuild, type BuildDesignInput } from "@/lib/retrofit";
import type { DriverModeInput } from "@/lib/parts";
import { CELL, DRIVER, EMITTER, PASTE } from "./fixtures/parts";

/** Every number in a value, with its path. */
function numbers(v: unknown, path: string, out: [string, number][]): [string, number][] {
  if (typeof v === "number") out.push([path, v]);
  else if (Array.isArray(v)) v.forEach((x, i) => numbers(x, `${path}[${i}]`, out));
  else if (v !== null && typeof v === "object") for (const [k, x] of Object.entries(v)) numbers(x, `${path}.${k}`, out);
  return out;
}

const materials = ["aluminium-6063-t5", "steel-plain-carbon", "brass-cartridge", "copper-pure", "stainless-304"] as const;

const design: fc.Arbitrary<BuildDesignInput> = fc
  .record({
    declared: fc.boolean(),
    kPerW: fc.double({ min: 0.5, max: 60, noNaN: true }),
    fins: fc.integer({ min: 0, max: 14 }),
    finH: fc.double({ min: 0.003, max: 0.04, noNaN: true }),
    count: fc.integer({ min: 1, max: 6 }),
    parallelWiring: fc.boolean(),
    currents: fc.array(fc.double({ min: 0.05, max: 4, noNaN: true }), { minLength: 1, maxLength: 3 }),
    powerMode: fc.option(fc.double({ min: 0.5, max: 15, noNaN: true }), { nil: undefined }),
    area: fc.double({ min: 0.005, max: 0.2, noNaN: true }),
    material: fc.constantFrom(...materials),
    sealed: fc.boolean(),
    mount: fc.constantFrom("in-housing-air", "pressed-to-wall", "through-reflector"),
    cooling: fc.constantFrom("floating", "ground-plane-to-wall", "strapped"),
    series: fc.integer({ min: 1, max: 2 }),
    parallel: fc.integer({ min: 1, max: 4 }),
    charger: fc.constantFrom("none", "linear", "switching"),
    ambientC: fc.double({ min: -20, max: 45, noNaN: true }),
    lying: fc.boolean(),
    breeze: fc.option(fc.double({ min: 0.5, max: 10, noNaN: true }), { nil: undefined }),
    board: fc.boolean(),
  })
  .map((r): BuildDesignInput => {
    const sink = r.declared
      ? { inline: { rating: "declared" as const, sinkToAirKPerW: r.kPerW, ratedAirflow: "natural" as const } }
      : { inline: { rating: "geometry" as const, baseLengthM: 0.05, baseWidthM: 0.05, baseThicknessM: 0.003, finCount: r.fins, finHeightM: r.finH, finThicknessM: 0.0015, finSpacingM: 0.002, material: "aluminium-6063-t5", finish: "anodised" as const } };
    const modes: DriverModeInput[] = r.currents.map((c, i) => ({ name: `m${i}`, outputCurrentA: c, efficiency: 0.85 }));
    if (r.powerMode !== undefined) modes.push({ name: "power", outputPowerW: r.powerMode, efficiency: 0.85 });
    const mount =
      r.mount === "in-housing-air"
        ? { kind: "in-housing-air" as const }
        : r.mount === "pressed-to-wall"
          ? { kind: "pressed-to-wall" as const, interface: PASTE }
          : { kind: "through-reflector" as const, reflector: { material: "aluminium-6063-t5", thicknessM: 0.001, lengthM: 0.03, meanCircumferenceM: 0.1, rimContactAreaM2: 3e-4 } };
    const cooling =
      r.cooling === "strapped"
        ? { kind: "strapped" as const, spreader: { inline: { material: "copper-pure", thicknessM: 70e-6, widthM: 0.02, lengthM: 0.05 } } }
        : r.cooling === "ground-plane-to-wall"
          ? { kind: "ground-plane-to-wall" as const }
          : { kind: "floating" as const };
    return {
      housing: { inline: { material: r.material, wallThicknessM: 0.001, outerAreaM2: r.area, emissivity: 0.5, enclosure: r.sealed ? "sealed" : "vented" } },
      lightEngine: { emitter: EMITTER, count: r.count, wiring: r.parallelWiring ? "parallel" : "series", interface: PASTE, heatsink: sink, mount, ...(r.board ? { board: { areaM2: 5e-4, thicknessM: 0.0016, material: "aluminium-6061-t6" } } : {}) },
      driver: { part: { inline: { ...DRIVER.inline, modes } }, cooling },
      pack: {
        cell: CELL,
        series: r.series,
        parallel: r.parallel,
        ...(r.charger === "none" ? {} : { charger: { inline: r.charger === "linear" ? { topology: "linear" as const, chargeCurrentA: 1, inputVoltageV: 5 } : { topology: "switching" as const, chargeCurrentA: 2, inputVoltageV: 12, efficiency: 0.88 } } }),
      },
      environment: { ambientC: r.ambientC, orientation: r.lying ? "lying" : "upright", air: r.breeze === undefined ? { kind: "still" } : { kind: "breeze", speedMPerS: r.breeze }, contact: "hold-1min" },
    };
  });

describe("properties of evaluateBuild (fast-check)", () => {
  it("never throws and never puts NaN or Infinity anywhere, for random valid builds", () => {
    fc.assert(
      fc.property(design, fc.boolean(), (d, full) => {
        const r = resolveBuild(buildDesignSchema.parse(d), () => undefined);
        expect(r.ok).toBe(true);
        const out = evaluateBuild(r.build, { skipWarmup: !full, skipWhatItTakes: !full });
        const bad = numbers(out, "result", []).filter(([, x]) => !Number.isFinite(x));
        expect(bad).toEqual([]);
        // The JSON-safety net replaces non-finite figures and says so; it must have had nothing to do.
        expect(out.problems.filter((p) => p.message.startsWith("a figure could not be worked out"))).toEqual([]);
        expect(JSON.parse(JSON.stringify(out))).toEqual(out);
      }),
      { numRuns: 60 },
    );
  });
});
