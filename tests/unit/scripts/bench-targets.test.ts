import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { target } from "../../../scripts/bench-targets";

/** The figure and the limit as a target's line prints them. */
function shown(line: string): { figure: string; limit: string; verdict: string } {
  const m = /: (\S+) ms \(target [≤<] (\S+) ms\): (ok|over)$/.exec(line);
  if (!m) throw new Error(`unexpected line: ${line}`);
  return { figure: m[1]!, limit: m[2]!, verdict: m[3]! };
}

describe("npm run bench's targets", () => {
  it("never print a figure equal to a limit it is judged against, however close the two are", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 1000, noNaN: true }), fc.integer({ min: -3, max: 3 }), (limit, ulps) => {
        // A figure a few representable steps from the limit, on either side.
        let value = limit;
        for (let i = 0; i < Math.abs(ulps); i++) value = ulps > 0 ? value + Number.EPSILON * Math.max(1, value) : value - Number.EPSILON * Math.max(1, value);
        const line = shown(target("close", value, limit, "ms"));
        expect(line.verdict).toBe(value <= limit ? "ok" : "over");
        if (value !== limit) expect(line.figure).not.toBe(line.limit);
      }),
    );
  });

  it("prints one decimal when that already tells the two apart", () => {
    expect(shown(target("apart", 9.2, 10, "ms"))).toEqual({ figure: "9.2", limit: "10.0", verdict: "ok" });
    expect(shown(target("at the limit", 10.58, 10.58, "ms"))).toEqual({ figure: "10.6", limit: "10.6", verdict: "ok" });
  });
});
