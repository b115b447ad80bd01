import { describe, expect, it } from "vitest";
import { evaluateBuild } from "@/lib/retrofit";
import { inspection } from "./fixtures/builds";

describe("charger board limit while charging", () => {
  it("checks the charger board against 100 °C (common practice: charger chips throttle near 110–120 °C junction)", () => {
    const r = evaluateBuild(inspection(), { skipWhatItTakes: true });
    const charging = r.scenarios.find((s) => s.kind === "charging");
    const limit = charging?.thermal?.limits.find((l) => l.id === "charger-board");
    expect(limit?.limitC).toBe(100);
    expect(limit?.node).toBe("charger");
    // The verdict follows the charger's own temperature like any other limit.
    const t = charging?.thermal?.temperaturesC.charger ?? Number.NaN;
    expect(limit?.headroomK).toBeCloseTo(100 - t, 9);
    expect(limit?.verdict).toBe(t > 100 ? "over budget" : t > 90 ? "tight" : "within budget");
    // Modes do not carry it: the charger is idle while the light runs.
    expect(r.scenarios.filter((s) => s.kind === "mode").every((s) => !s.thermal?.limits.some((l) => l.id === "charger-board"))).toBe(true);
  });
});
