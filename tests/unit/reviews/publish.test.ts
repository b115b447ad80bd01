import { describe, expect, it } from "vitest";
import { UNPUBLISHED_PART, withholdUnpublished } from "@/lib/reviews/publish";

const trace = (element: string, note: string, value: number) => ({
  element,
  formula: "Declared resistance",
  equation: "R = R_decl",
  inputs: [{ symbol: "R_decl", name: `Rth of ${note}`, value, unit: "K/W" }],
  intermediates: [],
  result: { symbol: "R", name: "resistance", value, unit: "K/W" },
  source: "as entered",
  notes: [`Interface: ${note}.`],
  parts: [],
});

describe("withholding unpublished parts from what a share link carries", () => {
  const evaluation = {
    verdict: "ok",
    scenarios: [{ thermal: { temperaturesC: { junction: 71.2 }, links: [trace("emitter", "Secret LED", 3.14159), trace("sink", "Public sink", 1.5)] } }],
    problems: [{ field: "driver", message: 'the driver "Secret LED" has no mode "turbo"' }],
    costs: { lines: [{ name: "Secret LED", totalEur: 4 }] },
  };
  const out = withholdUnpublished(evaluation, [{ id: "p_secret", name: "Secret LED" }]);

  it("leaves out the workings of a trace that quotes the part, and keeps its figure", () => {
    const [hidden, kept] = out.scenarios[0]!.thermal.links;
    expect(hidden!.inputs).toEqual([]);
    expect(hidden!.notes).toEqual([]);
    expect(hidden!.source).toMatch(/^as entered/);
    expect(hidden!.result.value).toBe(3.14159);
    expect(kept).toEqual(evaluation.scenarios[0]!.thermal.links[1]);
    expect(out.scenarios[0]!.thermal.temperaturesC.junction).toBe(71.2);
  });

  it("never names the part anywhere else", () => {
    expect(JSON.stringify(out)).not.toContain("Secret LED");
    expect(out.problems[0]!.message).toContain(UNPUBLISHED_PART);
    expect(out.costs.lines[0]!.name).toBe(UNPUBLISHED_PART);
  });

  it("returns the value as it is when nothing is withheld", () => {
    expect(withholdUnpublished(evaluation, [])).toBe(evaluation);
  });
});
