import { describe, expect, it } from "vitest";
import { buildDesignSchema, evaluateBuild, type BuildDesignInput } from "@/lib/retrofit";
import { headlampDesign, resolved } from "./fixtures/builds";

const upright: BuildDesignInput = { ...headlampDesign, environment: { ...headlampDesign.environment!, orientation: "upright", air: { kind: "still" } } };
const lying: BuildDesignInput = { ...upright, environment: { ...upright.environment!, orientation: "lying" } };
const withFins = (d: BuildDesignInput, finDirection: string): BuildDesignInput => ({ ...d, lightEngine: { ...d.lightEngine, finDirection } as BuildDesignInput["lightEngine"] });
const junction = (d: BuildDesignInput) => evaluateBuild(resolved(d), { skipWarmup: true, skipWhatItTakes: true }).scenarios.find((s) => s.id === "mode:high")!.thermal!.temperaturesC.junction!;
const sinkTrace = (d: BuildDesignInput) =>
  evaluateBuild(resolved(d), { skipWarmup: true, skipWhatItTakes: true }).scenarios.find((s) => s.id === "mode:high")!.thermal!.links.find((l) => l.trace.element === "finned-heatsink")!.trace;

describe("the heatsink's fin direction in a build", () => {
  it("absent, the fins run along the lamp: vertical when it stands upright, level when it lies (the same figures as saying so)", () => {
    expect(junction(upright)).toBe(junction(withFins(upright, "vertical")));
    expect(junction(lying)).toBe(junction(withFins(lying, "horizontal")));
  });

  it("a lying lamp no longer gets vertical channels: level fins run hotter than vertical ones, fins pointing up cooler than hanging down (common practice)", () => {
    expect(junction(lying)).toBeGreaterThan(junction(withFins(lying, "vertical")));
    expect(junction(withFins(lying, "up"))).toBeLessThan(junction(withFins(lying, "down")));
    expect(sinkTrace(lying).notes.join(" ")).toMatch(/Fins level/);
  });

  it("an unknown direction is refused naming the choices in plain words", () => {
    const r = buildDesignSchema.safeParse(withFins(upright, "sideways"));
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path.join(".")).toBe("lightEngine.finDirection");
    expect(r.error!.issues[0]!.message).toBe("choose how the fins stand: vertical, level, pointing up or hanging down");
  });
});
