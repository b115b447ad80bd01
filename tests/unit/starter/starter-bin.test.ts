import { describe, expect, it } from "vitest";
import { KIND_SCHEMAS, PART_KINDS } from "@/lib/parts";
import { buildDesignSchema, evaluateBuild, resolveBuild } from "@/lib/retrofit";
import { STARTER_PARTS, STARTING_POINTS, startingDesign } from "@/lib/starter";

describe("the starter bin", () => {
  it("every part reads with its kind's own schema (the same checks as the Parts bin)", () => {
    for (const p of STARTER_PARTS) {
      const r = KIND_SCHEMAS[p.kind].safeParse(p.specs);
      expect(r.success, `${p.key}: ${JSON.stringify(r.error?.issues)}`).toBe(true);
    }
  });

  it("covers what a hobby retrofit needs: emitters of about 1, 3 and 10 W, buck and linear drivers, 18650 and 21700 cells, chargers, protection, three sink sizes, paste/pad/adhesive, tape and strip, housings", () => {
    const keys = STARTER_PARTS.map((p) => p.key);
    for (const k of ["emitter-1w", "emitter-3w", "emitter-10w", "driver-buck-3mode", "driver-linear-3mode", "cell-18650-3000", "cell-21700-5000", "charger-usb-1a", "protection-1cell", "sink-chipset", "sink-finned-mid", "sink-desktop-cpu", "paste", "pad", "adhesive", "copper-tape", "aluminium-strip", "housing-aluminium-torch", "housing-steel-lantern", "housing-brass-lamp"]) {
      expect(keys).toContain(k);
    }
    expect(new Set(STARTER_PARTS.map((p) => p.kind))).toEqual(new Set(PART_KINDS));
    expect(new Set(keys).size).toBe(keys.length);
  });

  it("names parts by description, never by a brand or part number, and never calls them verified", () => {
    for (const p of STARTER_PARTS) {
      const text = `${p.name} ${p.description}`;
      // A part number looks like letters and digits run together (XM-L2, TP4056, DW01).
      expect(text, p.key).not.toMatch(/\b[A-Z]{2,}[-]?\d{2,}[A-Z0-9]*\b/);
      expect(text.toLowerCase(), p.key).not.toContain("verified");
    }
  });

  it("the salvaged sinks' gaps between fins fit their base width", () => {
    for (const p of STARTER_PARTS.filter((x) => x.kind === "heatsink")) {
      const s = KIND_SCHEMAS.heatsink.parse(p.specs) as { rating: string; baseWidthM: number; finCount: number; finThicknessM: number; finSpacingM: number };
      expect(s.finCount * s.finThicknessM + (s.finCount - 1) * s.finSpacingM).toBeCloseTo(s.baseWidthM, 3);
    }
  });
});

describe("new build from a starting point", () => {
  it.each(STARTING_POINTS)("%s: every slot is filled from the starter bin and the Budget works out a verdict", (point) => {
    const design = buildDesignSchema.parse(startingDesign(point));
    expect(design.housing).toBeDefined();
    expect(design.lightEngine.emitter && design.lightEngine.heatsink && design.lightEngine.interface).toBeTruthy();
    expect(design.driver.part).toBeDefined();
    expect(design.pack.cell && design.pack.protection && design.pack.charger).toBeTruthy();
    const resolved = resolveBuild(design, () => undefined);
    expect(resolved.ok).toBe(true);
    if (!resolved.ok) return;
    const ev = evaluateBuild(resolved.build);
    expect(ev.verdict).not.toBeNull();
    expect(ev.modes.length).toBe(3);
    expect(ev.problems.filter((p) => p.severity === "error").map((p) => p.field)).not.toContain("lightEngine.emitter");
    expect(JSON.stringify(ev)).not.toContain("NaN");
  });

  it.each(STARTING_POINTS)("%s: the driver's highest mode drives the emitter no harder than the current the emitter's figures are stated at", (point) => {
    const design = buildDesignSchema.parse(startingDesign(point));
    const resolved = resolveBuild(design, () => undefined);
    expect(resolved.ok).toBe(true);
    if (!resolved.ok) return;
    const emitter = resolved.build.lightEngine.emitter!.specs as { vfRefCurrentA: number };
    const modes = (resolved.build.driver.part!.specs as { modes: { outputCurrentA?: number }[] }).modes;
    const highest = Math.max(...modes.map((m) => m.outputCurrentA ?? 0));
    expect(highest).toBeGreaterThan(0);
    expect(highest, point).toBeLessThanOrEqual(emitter.vfRefCurrentA * 1.0001);
  });
});
