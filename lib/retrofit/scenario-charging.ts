import { isThermalInputError, monotoneRoot, sourceSweep, type Network, type NetworkCheck } from "@/lib/thermal";
import { compileBuild, scenarioSources, type ScenarioHeat } from "./compile";
import { chargePlan, DEFAULT_REGULATION_C, type ChargePlan } from "./electrical/charger";
import { cellHeat, type PackSummary } from "./electrical/pack";
import { limitsFor } from "./limits";
import { trySteady } from "./operating-point";
import type { ResolvedOptions } from "./options";
import { ProblemList } from "./problems";
import type { ResolvedBuild, ResolvedPart } from "./resolved";
import { MAX_RUN_S, thermalResult, warmup } from "./scenario";
import type { ScenarioResult } from "./scenario-mode";


export function chargerCount(build: ResolvedBuild): number {
  return build.pack.chargerCount ?? build.pack.charger?.specs.parallelCount ?? 1;
}

/** Charger checks that need the pack: input voltage, current per cell. */
function checkCharger(build: ResolvedBuild, plan: ChargePlan, pack: PackSummary, problems: ProblemList): void {
  const c = build.pack.charger!;
  if (c.specs.inputVoltageV <= pack.maxVoltageV) {
    problems.add("pack.charger", `the charger's ${c.specs.inputVoltageV.toFixed(2)} V input cannot bring a ${pack.series}S pack to its ${pack.maxVoltageV.toFixed(2)} V charge-end voltage`);
  }
  const perCell = plan.currentA / pack.parallel;
  const max = build.pack.cell?.specs.maxChargeCurrentA;
  if (max !== undefined && perCell > max) problems.add("pack.charger", `${perCell.toFixed(2)} A per cell is above the cell's ${max.toFixed(2)} A charge rating`, "warning");
}

export interface ChargingOutcome {
  plan: ChargePlan | null;
  scenario: ScenarioResult | null;
}

/** Charging: emitter and driver off, charger and cells inside the housing. `check`: the evaluation's schema check of its networks (see NetworkCheck). */
export function runCharging(build: ResolvedBuild, pack: PackSummary | null, o: ResolvedOptions, problems: ProblemList, check: NetworkCheck): ChargingOutcome {
  const charger = build.pack.charger;
  if (!charger) {
    problems.add("pack.charger", "no charger in the build: the charging scenario is left out", "info");
    return { plan: null, scenario: null };
  }
  if (!pack) {
    problems.add("pack.cell", "no cells in the build: charging cannot be worked out");
    return { plan: null, scenario: null };
  }
  const count = chargerCount(build);
  let plan = chargePlan(charger, count, pack);
  checkCharger(build, plan, pack, problems);
  const field = "pack.charger";
  const base: ScenarioResult = { id: "charging", kind: "charging", name: "charging", modeIndex: null, converged: false, iterations: 0, network: null, thermal: null, warmup: null, whatItTakes: null, derating: null, mode: null, charging: null };
  // The light engine is only thermal mass and paths while charging; without it the charge can still be checked.
  const heatAt = (p: ChargePlan): ScenarioHeat => ({ junctionW: 0, junctionWPerK: 0, junctionRefC: build.environment.ambientC, driverW: 0, cellsW: cellHeat(pack, p.currentA).value ?? 0, chargerW: p.lossW.value ?? 0 });
  const compileAt = (p: ChargePlan, quiet: ProblemList) => {
    const heat = heatAt(p);
    return compileBuild(build, heat, { sinkToAirKPerW: null }, quiet) ?? compileBuild(build, heat, { sinkToAirKPerW: null }, quiet, false);
  };
  let compiled = compileAt(plan, problems);
  if (!compiled) return { plan, scenario: base };
  let steady = trySteady(compiled, field, problems, check);
  if (!steady) return { plan, scenario: base };
  // The charge's heat is all that changes with its current: the search keeps the heat path compiled here.
  const rated = compiled;
  const sourcesAt = (p: ChargePlan) => scenarioSources(heatAt(p), rated.has);
  const held = throttledCurrent(charger, count, pack, plan, steady.temperaturesC.charger, rated.network, sourcesAt);
  if (held !== null) {
    plan = chargePlan(charger, count, pack, held);
    compiled = compileAt(plan, new ProblemList());
    steady = compiled ? trySteady(compiled, field, problems, null) : null;
    if (!compiled || !steady) return { plan, scenario: base };
    const t = plan.throttle!;
    problems.add(field, `the linear charger${count > 1 ? "s" : ""} reach${count > 1 ? "" : "es"} ${t.regulationC} °C (die regulation${t.fromPart ? "" : ", assumed"}) and hold${count > 1 ? "" : "s"} ${plan.currentA.toFixed(2)} A instead of ${plan.ratedCurrentA.toFixed(2)} A: the charge takes ${(plan.totalHours.value ?? 0).toFixed(1)} h instead of ${t.ratedHours.toFixed(1)} h`, "warning");
  }
  const cells = cellHeat(pack, plan.currentA);
  const defs = limitsFor(build, compiled, steady, true, problems);
  const thermal = thermalResult(compiled, steady, defs, o);
  // The warm-up follows the charge to its end (or until the temperatures settle).
  const horizon = Math.min(MAX_RUN_S, (plan.totalHours.value ?? 1) * 3600);
  return {
    plan,
    scenario: {
      ...base,
      converged: steady.converged,
      iterations: steady.iterations,
      network: compiled.network,
      thermal,
      warmup: o.skipWarmup ? null : warmup(compiled.network, steady, thermal.limits, horizon, "charge-done", o, field, problems),
      charging: { chargerLoss: plan.lossW, cellHeat: cells, chargeCurrentA: plan.currentA },
    },
  };
}

/**
 * A linear charger chip cuts its current to hold its die at the regulation temperature. When
 * the steady charger board at the rated current is above it, the current the chips can hold
 * is the one that puts the board there: one search over the current (the die is taken at the
 * board's temperature, a few kelvin optimistic). Null when the charger does not throttle.
 */
function throttledCurrent(charger: ResolvedPart<"charger">, count: number, pack: PackSummary, plan: ChargePlan, boardC: number | undefined, network: Network, sourcesAt: (p: ChargePlan) => Network["sources"]): number | null {
  if (charger.specs.topology !== "linear" || boardC === undefined) return null;
  const reg = charger.specs.regulationTempC ?? DEFAULT_REGULATION_C;
  if (boardC <= reg) return null;
  // Each solve starts from the last answer: the networks differ only in the charge's heat.
  let last: Readonly<Record<string, number>> | undefined;
  const rated = plan.ratedCurrentA;
  try {
    const solveWith = sourceSweep(network);
    const f = (i: number) => {
      last = solveWith(sourcesAt(chargePlan(charger, count, pack, Math.max(i, 1e-6))), { toleranceK: 1e-4 }, last);
      return (last.charger ?? reg) - reg;
    };
    const root = monotoneRoot(f, rated, boardC - reg, rated * 0.7, 0, rated, 0.05, 24);
    return root.x === null ? 0 : Math.max(root.x, 0);
  } catch (err) {
    if (isThermalInputError(err)) return null;
    throw err;
  }
}
