import { describe, expect, it } from "vitest";
import { editorFieldFor, problemLabel } from "@/components/builds/editor-problems";
import { designLabels, labelsForSubject, plainIssues } from "@/lib/messages";
import { KIND_DEFINITIONS, PART_KINDS, partSchema } from "@/lib/parts";
import { buildDesignSchema, evaluateBuild, quickCheckInputSchema, resolveBuild } from "@/lib/retrofit";
import { DESIGN_LABELS } from "@/lib/retrofit/design-labels";
import { GOOD_PARTS } from "../parts/fixtures";
import { headlampDesign, inspectionDesign, lanternDesign } from "../retrofit/fixtures/builds";

// What no message a person reads may contain: a machine path ("design.pack.chargerCount",
// "points[3]", "specs.finCount") or the validation library's own wording.
const MACHINE_PATH = /\b[a-z][A-Za-z0-9]*\.[a-z][A-Za-z0-9]*\b|\[\d+\]|\b[a-z]+[A-Z][A-Za-z]*M2?\b/;
const LIBRARY_WORDING = /Invalid input|Invalid option|expected (int|number|string|object|array)|received (undefined|number|string|object|array|null)|Too (big|small)|Unrecognized key|Required\b/;

function expectPlain(message: string) {
  expect(message, message).not.toMatch(MACHINE_PATH);
  expect(message, message).not.toMatch(LIBRARY_WORDING);
  expect(message, message).not.toMatch(/NaN|undefined|\[object/);
}

const designMessages = (design: unknown) => {
  const r = buildDesignSchema.safeParse(design);
  return r.success ? [] : plainIssues(r.error, designLabels);
};

describe("problems in plain words: validation of a design", () => {
  it("names the field by its label on screen and says what is wrong", () => {
    const issues = designMessages({ ...lanternDesign, pack: { ...lanternDesign.pack, chargerCount: 2.5 } });
    expect(issues.map((i) => i.message)).toEqual(["Chargers in parallel: must be a whole number"]);
    expect(issues[0]!.path).toBe("pack.chargerCount");
  });

  it("a strap picked for cooling but left empty names the strap field, not the union", () => {
    const issues = designMessages({ ...lanternDesign, driver: { part: lanternDesign.driver!.part, cooling: { kind: "strapped" } } });
    expect(issues.map((i) => i.message)).toEqual(["Strap / spreader: required"]);
  });

  it("a typed-in heatsink with a bad fin count names the slot and the field", () => {
    const sink = { name: "salvaged", inline: { rating: "geometry", baseLengthM: "60 mm", baseWidthM: "40 mm", baseThicknessM: "4 mm", finCount: "ten", finHeightM: "20 mm", finThicknessM: "1 mm", finSpacingM: "4 mm", material: "aluminium-6063-t5" } };
    const issues = designMessages({ ...lanternDesign, lightEngine: { ...lanternDesign.lightEngine, heatsink: sink } });
    expect(issues).toHaveLength(1);
    expect(issues[0]!.message).toMatch(/^Heatsink › Fin count: /);
    expect(issues[0]!.path).toBe("lightEngine.heatsink.inline.finCount");
  });

  it("walks bad values into every field of the design: each message is plain and names a label", () => {
    const bad: unknown[] = ["abc", -5, 1e12, 2.5, "", null, { x: 1 }, [1]];
    const seen: string[] = [];
    for (const field of Object.keys(DESIGN_LABELS)) {
      for (const value of bad) {
        const design = structuredClone(lanternDesign) as Record<string, unknown>;
        const keys = field.split(".");
        let at = design;
        for (const k of keys.slice(0, -1)) {
          if (typeof at[k] !== "object" || at[k] === null) at[k] = {};
          at = at[k] as Record<string, unknown>;
        }
        at[keys.at(-1)!] = value;
        for (const issue of designMessages(design)) {
          expectPlain(issue.message);
          expect(issue.label.length).toBeGreaterThan(0);
          seen.push(issue.message);
        }
      }
    }
    expect(seen.length).toBeGreaterThan(100);
  });
});

describe("problems in plain words: parts, the Quick check and unknown bodies", () => {
  it("walks bad values into every field of every part kind", () => {
    let count = 0;
    for (const kind of PART_KINDS) {
      for (const field of KIND_DEFINITIONS[kind].fields) {
        for (const value of ["abc", -1, 1e12, "", null, { x: 1 }]) {
          const body = { ...GOOD_PARTS[kind], specs: { ...(GOOD_PARTS[kind].specs as object), [field.key]: value } };
          const r = partSchema.safeParse(body);
          if (r.success) continue;
          for (const issue of plainIssues(r.error, labelsForSubject("part", body))) {
            expectPlain(issue.message);
            count++;
          }
        }
      }
    }
    expect(count).toBeGreaterThan(100);
  });

  const geometry = { rating: "geometry", baseLengthM: "60 mm", baseWidthM: "60 mm", baseThicknessM: "5 mm", finCount: "8", finHeightM: "30 mm", finThicknessM: "1.5 mm", material: "aluminium-6063-t5", finish: "as-supplied" };
  const check = (g: Record<string, unknown>) => {
    const r = quickCheckInputSchema.safeParse({ heatWatts: "7 W", ambientC: "25 °C", sink: { geometry: g } });
    return r.success ? { ok: true as const, data: r.data } : { ok: false as const, issues: plainIssues(r.error, labelsForSubject("check")) };
  };

  it("Quick check: each bad geometry value is named by its field, never 'sink: Invalid input'", () => {
    for (const [key, label] of [["baseWidthM", "Base width (across the fins)"], ["finHeightM", "Fin height"], ["finCount", "Fin count"], ["baseThicknessM", "Base thickness"]] as const) {
      const r = check({ ...geometry, [key]: "-3" });
      expect(r.ok).toBe(false);
      if (r.ok) continue;
      expect(r.issues[0]!.path).toBe(`sink.geometry.${key}`);
      expect(r.issues[0]!.message.startsWith(`${label}: `), r.issues[0]!.message).toBe(true);
      r.issues.forEach((i) => expectPlain(i.message));
    }
  });

  it("Quick check: an empty gap is worked out from width, count and thickness", () => {
    const r = check(geometry);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // (60 − 8 × 1.5) / 7 = 6.857 mm
    const sink = r.data.sink as { geometry: { finSpacingM: number }; gapWorkedOut?: boolean };
    expect(sink.gapWorkedOut).toBe(true);
    expect(sink.geometry.finSpacingM).toBeCloseTo(0.048 / 7, 9);
  });

  it("Quick check: fins that do not fit, and a given gap too wide for the base, are errors naming the field", () => {
    const tooMany = check({ ...geometry, finCount: "50" });
    expect(tooMany.ok).toBe(false);
    if (!tooMany.ok) expect(tooMany.issues[0]).toMatchObject({ path: "sink.geometry.finCount", message: expect.stringMatching(/^Fin count: 50 fins 1\.5 mm thick take 75 mm, which does not fit on a base 60 mm wide$/) });
    const wideGap = check({ ...geometry, finSpacingM: "10 mm" });
    expect(wideGap.ok).toBe(false);
    if (!wideGap.ok) expect(wideGap.issues[0]).toMatchObject({ path: "sink.geometry.finSpacingM", message: expect.stringMatching(/^Gap between fins: 8 fins 1\.5 mm thick with gaps of 10 mm need 82 mm, more than the 60 mm base width/) });
    const fits = check({ ...geometry, finSpacingM: "6.8 mm" });
    expect(fits.ok).toBe(true);
  });

  it("an unknown body still gets words, not paths", () => {
    const r = buildDesignSchema.safeParse({ lightEngine: { count: 1 }, colour: "red" });
    expect(r.success).toBe(false);
    if (!r.success) plainIssues(r.error, designLabels).forEach((i) => expectPlain(i.message));
  });
});

describe("every editor problem maps to a field label on screen", () => {
  it("each problem the evaluation of the example builds raises has a label, and a placed one an editor field", () => {
    let n = 0;
    for (const design of [lanternDesign, headlampDesign, inspectionDesign]) {
      for (const variant of [design, { ...design, pack: { ...design.pack, series: 3 } }, { ...design, environment: { ...design.environment, ambientC: 55 } }]) {
        const resolved = resolveBuild(buildDesignSchema.parse(variant), () => undefined);
        const problems = resolved.ok ? [...resolved.problems, ...evaluateBuild(resolved.build).problems] : resolved.problems;
        for (const p of problems) {
          const label = problemLabel(p.field);
          expect(label, p.field).not.toMatch(MACHINE_PATH);
          const target = editorFieldFor(p.field);
          if (target !== null) expect(Object.keys(DESIGN_LABELS), target).toContain(target);
          expectPlain(`${label}: ${p.message}`);
          n++;
        }
      }
    }
    expect(n).toBeGreaterThan(5);
  });

  it("a problem about a part's figure names the slot and the figure as the part's own form labels it", () => {
    expect(problemLabel("driver.part.maxBoardTempC")).toBe(`Driver › ${KIND_DEFINITIONS.driver.fields.find((f) => f.key === "maxBoardTempC")!.label}`);
    expect(problemLabel("lightEngine.emitter.maxTjC")).toBe(`Emitter › ${KIND_DEFINITIONS.emitter.fields.find((f) => f.key === "maxTjC")!.label}`);
    expect(problemLabel("pack.cell.chargeTempMaxC")).toBe(`Cell › ${KIND_DEFINITIONS.cell.fields.find((f) => f.key === "chargeTempMaxC")!.label}`);
  });
});
