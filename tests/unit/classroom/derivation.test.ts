import katex from "katex";
import { describe, expect, it } from "vitest";
import { isLate, isRevealed, withinTolerance } from "@/lib/classroom/access";
import { deriveExample, hideValues, valueOf } from "@/lib/classroom/derivation";
import { keyFigures } from "@/lib/classroom/key-figures";
import { equationTex } from "@/lib/classroom/tex";
import { evaluateBuild } from "@/lib/retrofit";
import { inspection, lantern } from "../retrofit/fixtures/builds";

const evaluation = evaluateBuild(lantern(), { skipWarmup: true, skipWhatItTakes: true });

describe("the derivation of a worked example", () => {
  const d = deriveExample(evaluation)!;
  const scenario = evaluation.scenarios.find((s) => s.id === d.scenarioId)!;

  it("follows the first driver mode in the order a student works it, with the evaluation's own numbers", () => {
    expect(scenario.kind).toBe("mode");
    expect(d.heat.map((h) => h.key).slice(0, 4)).toEqual(["heat:vf", "heat:emitter-power", "heat:emitter-heat", "heat:driver-loss"]);
    expect(d.links.map((l) => l.result.value)).toEqual(scenario.thermal!.links.map((l) => l.kelvinPerWatt));
    expect(d.network.map((n) => n.temperature.value)).toEqual(scenario.thermal!.nodes.map((n) => scenario.thermal!.temperaturesC[n.id]));
    expect(d.limits.map((l) => l.headroom.value)).toEqual(scenario.thermal!.limits.map((l) => l.headroomK));
    expect(d.verdict.value).toBe(scenario.thermal!.verdict);
    // Every source is named on every step (a book, a standard or an honest mark).
    for (const s of [...d.heat, ...d.links]) expect(s.source.length).toBeGreaterThan(5);
  });

  it("closes each node's balance: heat put in equals heat carried away", () => {
    const total = d.network.reduce((a, n) => a + (n.sourceW ?? 0), 0);
    expect(total).toBeGreaterThan(0);
    for (const n of d.network) expect(Math.abs(n.residualW)).toBeLessThan(1e-4 * Math.max(1, total));
  });

  it("follows another scenario when asked, and lists the ones it could follow", () => {
    const other = d.scenarios.find((s) => s.id !== d.scenarioId);
    if (other) expect(deriveExample(evaluation, other.id)!.scenarioId).toBe(other.id);
    expect(d.scenarios.map((s) => s.id)).toContain(d.scenarioId);
  });

  it("blanks hidden values wherever they appear, hides the verdict with a headroom, and keeps the rest", () => {
    const hidden = hideValues(d, ["node:junction", "limit:junction", d.links[0]!.key]);
    expect(hidden.network.find((n) => n.node === "junction")!.temperature).toMatchObject({ value: null, hidden: true });
    expect(hidden.limits.find((l) => l.key === "limit:junction")!.temperature.value).toBeNull();
    expect(hidden.links[0]!.result.value).toBeNull();
    expect(hidden.links[1]!.result.value).toBe(d.links[1]!.result.value);
    expect(hidden.verdict).toEqual({ value: null, hidden: true });
    expect(JSON.stringify(hidden)).not.toContain(String(d.network.find((n) => n.node === "junction")!.temperature.value));
    // The original is untouched and still answers the question.
    expect(valueOf(d, "node:junction")!.value).toBe(scenario.thermal!.temperaturesC.junction);
    expect(valueOf(d, "no:such")).toBeNull();
  });

  it("offers every heat, link, node and limit value for hiding, once each", () => {
    const keys = d.hideable.map((h) => h.key);
    expect(new Set(keys).size).toBe(keys.length);
    expect(keys.length).toBe(d.heat.length + d.links.length + d.network.length + d.limits.length);
  });
});

describe("equations typeset for KaTeX", () => {
  it("turns every trace equation of two demo-like builds into TeX KaTeX reads", () => {
    const all = [evaluation, evaluateBuild(inspection(), { skipWarmup: true, skipWhatItTakes: true })].flatMap((e) => {
      const x = deriveExample(e)!;
      const walk = (s: (typeof x.links)[number]): string[] => [s.equation, ...s.parts.flatMap(walk)];
      return [...x.heat, ...x.links].flatMap(walk);
    });
    expect(all.length).toBeGreaterThan(10);
    for (const eq of all) expect(() => katex.renderToString(equationTex(eq), { throwOnError: true, strict: false }), eq).not.toThrow();
  });

  it("keeps subscripts, exponents and Greek letters", () => {
    expect(equationTex("P_loss = P_out·(1/η − 1)")).toBe("P_{\\mathrm{loss}} = P_{\\mathrm{out}}\\cdot (1/\\eta  - 1)");
    expect(equationTex("Nu_L = 0.54·Ra_L^(1/4)")).toContain("^{1/4}");
    expect(equationTex("q = ε·σ·A·(T⁴ − T∞⁴)")).toContain("^{4}");
  });
});

describe("classroom rules", () => {
  it("checks answers within a tolerance of the value's size", () => {
    expect(withinTolerance(101.9, 100, 2)).toBe(true);
    expect(withinTolerance(102.1, 100, 2)).toBe(false);
    expect(withinTolerance(-0.985, -1, 2)).toBe(true);
  });
  it("reveals by hand or once the date has passed", () => {
    const now = new Date("2026-10-01T12:00:00Z");
    expect(isRevealed({ revealedAt: null, revealAt: null }, now)).toBe(false);
    expect(isRevealed({ revealedAt: null, revealAt: new Date("2026-10-01T11:59:00Z") }, now)).toBe(true);
    expect(isRevealed({ revealedAt: null, revealAt: new Date("2026-10-02T00:00:00Z") }, now)).toBe(false);
    expect(isRevealed({ revealedAt: now, revealAt: null }, now)).toBe(true);
  });
  it("marks a hand-in after the due date late", () => {
    const due = new Date("2026-10-01T18:00:00Z");
    expect(isLate(new Date("2026-10-01T17:59:59Z"), due)).toBe(false);
    expect(isLate(new Date("2026-10-01T18:00:01Z"), due)).toBe(true);
  });
  it("takes the roster's key figures as the hottest over the driver modes", () => {
    const f = keyFigures(evaluation);
    const junctions = evaluation.scenarios.filter((s) => s.kind === "mode" && s.thermal).map((s) => s.thermal!.temperaturesC.junction!);
    expect(f.junctionC).toBe(Math.max(...junctions));
    expect(f.verdict).toBe(evaluation.verdict);
  });
});
