import { getMaterial, type Trace } from "@/lib/thermal";
import type { ResolvedBuild } from "./resolved";
import { q, trace } from "./trace";

/**
 * The build's mass from the parts that give one: housing, heatsink, cells (times their count),
 * driver board, and a metal strap worked out from its material and size. Emitters, interfaces,
 * protection and charger boards carry no mass field; they weigh a few grams and are left out.
 */
export interface MassSummary {
  totalKg: number;
  /** Parts that could weigh something but give no mass (left out of the total). */
  unknown: string[];
  trace: Trace;
}

export function massSummary(build: ResolvedBuild): MassSummary {
  const inputs: Trace["inputs"] = [];
  const unknown: string[] = [];
  const add = (what: string, kg: number | undefined) => {
    if (kg === undefined || !Number.isFinite(kg)) unknown.push(what);
    else inputs.push(q(`m${inputs.length + 1}`, what, kg, "kg"));
  };
  if (build.housing) add(`housing: ${build.housing.name}`, build.housing.specs.massKg);
  const sink = build.lightEngine.heatsink;
  if (sink) add(`heatsink: ${sink.name}`, sink.specs.massKg);
  const cell = build.pack.cell;
  const cells = build.pack.series * build.pack.parallel;
  if (cell) add(`${cells} × ${cell.name}`, cell.specs.massKg === undefined ? undefined : cells * cell.specs.massKg);
  if (build.driver.part && build.driver.massKg !== undefined) add(`driver board: ${build.driver.part.name}`, build.driver.massKg);
  const c = build.driver.cooling;
  if (c.kind === "strapped") {
    const s = c.spreader.specs;
    const density = getMaterial(s.material)?.densityKgPerM3;
    add(`strap: ${c.spreader.name} (density × thickness × width × length)`, density === undefined ? undefined : density * s.thicknessM * s.widthM * s.lengthM);
  }
  const totalKg = inputs.reduce((a, x) => a + x.value, 0);
  return {
    totalKg,
    unknown,
    trace: trace({
      element: "mass",
      formula: "Mass of the parts that give one",
      equation: inputs.length > 0 ? `m = ${inputs.map((x) => x.symbol).join(" + ")}` : "m = 0",
      inputs,
      result: q("m", "mass", totalKg, "kg"),
      source: "as entered (each part's mass); a strap's from its material's density (the materials list names the handbook)",
      notes: [
        "Emitters, interfaces, protection and charger boards weigh a few grams and are left out.",
        ...(unknown.length > 0 ? [`No mass given, left out: ${unknown.join("; ")}.`] : []),
      ],
    }),
  };
}
