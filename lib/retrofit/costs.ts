import type { ResolvedBuild, ResolvedPart } from "./resolved";
import type { PartKind } from "@/lib/parts";

export interface CostLine {
  slot: string;
  name: string;
  count: number;
  unitEur: number | null;
  totalEur: number | null;
}

export interface CostSummary {
  lines: CostLine[];
  /** Sum of the lines with a price. */
  totalEur: number;
  /** Lines without a price (left out of the total). */
  unpriced: number;
  comparableNewLightEur: number | null;
  /** New light minus the build; positive: the retrofit is cheaper. */
  savingEur: number | null;
}

export function costSummary(build: ResolvedBuild, chargers: number): CostSummary {
  const lines: CostLine[] = [];
  const add = <K extends PartKind>(slot: string, p: ResolvedPart<K> | undefined, count = 1) => {
    if (!p) return;
    const unit = p.costEur ?? null;
    lines.push({ slot, name: p.name, count, unitEur: unit, totalEur: unit === null ? null : unit * count });
  };
  const le = build.lightEngine;
  add("housing", build.housing);
  add("lightEngine.emitter", le.emitter, le.count);
  add("lightEngine.interface", le.interface);
  add("lightEngine.heatsink", le.heatsink);
  if (le.mount.kind !== "in-housing-air") add("lightEngine.mount.interface", le.mount.interface);
  add("driver.part", build.driver.part);
  const c = build.driver.cooling;
  if (c.kind === "ground-plane-to-wall") add("driver.cooling.interface", c.interface);
  if (c.kind === "strapped") {
    add("driver.cooling.spreader", c.spreader);
    add("driver.cooling.adhesive", c.adhesive);
  }
  add("pack.cell", build.pack.cell, build.pack.series * build.pack.parallel);
  add("pack.protection", build.pack.protection);
  add("pack.charger", build.pack.charger, chargers);
  for (const [i, x] of build.costs.extras.entries()) lines.push({ slot: `costs.extras[${i}]`, name: x.label, count: 1, unitEur: x.costEur, totalEur: x.costEur });
  const total = lines.reduce((s, l) => s + (l.totalEur ?? 0), 0);
  const cmp = build.costs.comparableNewLightEur ?? null;
  return { lines, totalEur: total, unpriced: lines.filter((l) => l.totalEur === null).length, comparableNewLightEur: cmp, savingEur: cmp === null ? null : cmp - total };
}
