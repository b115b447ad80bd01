import { compileBuild, type ScenarioHeat } from "./compile";
import { chargePlan, type ChargePlan } from "./electrical/charger";
import { cellHeat, type PackSummary } from "./electrical/pack";
import { limitsFor } from "./limits";
import { trySteady } from "./operating-point";
import type { ResolvedOptions } from "./options";
import type { ProblemList } from "./problems";
import type { ResolvedBuild } from "./resolved";
import { thermalResult, warmup } from "./scenario";
import type { ScenarioResult } from "./scenario-mode";

/** Charging warm-up spans the CC phase (where the heat is highest), at least an hour and at most four. */
const MIN_CHARGE_WARMUP_S = 3600;
const MAX_CHARGE_WARMUP_S = 4 * 3600;

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

/** Charging: emitter and driver off, charger and cells inside the housing. */
export function runCharging(build: ResolvedBuild, pack: PackSummary | null, o: ResolvedOptions, problems: ProblemList): ChargingOutcome {
  const charger = build.pack.charger;
  if (!charger) {
    problems.add("pack.charger", "no charger in the build: the charging scenario is left out", "info");
    return { plan: null, scenario: null };
  }
  if (!pack) {
    problems.add("pack.cell", "no cells in the build: charging cannot be worked out");
    return { plan: null, scenario: null };
  }
  const plan = chargePlan(charger, chargerCount(build), pack);
  checkCharger(build, plan, pack, problems);
  const cells = cellHeat(pack, plan.currentA);
  const heat: ScenarioHeat = { junctionW: 0, junctionWPerK: 0, junctionRefC: build.environment.ambientC, driverW: 0, cellsW: cells.value ?? 0, chargerW: plan.lossW.value ?? 0 };
  const field = "pack.charger";
  // The light engine is only thermal mass and paths while charging; without it the charge can still be checked.
  const compiled = compileBuild(build, heat, { sinkToAirKPerW: null }, problems) ?? compileBuild(build, heat, { sinkToAirKPerW: null }, problems, false);
  const base: ScenarioResult = { id: "charging", kind: "charging", name: "charging", modeIndex: null, converged: false, iterations: 0, network: null, thermal: null, warmup: null, whatItTakes: null, derating: null, mode: null, charging: null };
  if (!compiled) return { plan, scenario: base };
  const steady = trySteady(compiled, field, problems, true);
  if (!steady) return { plan, scenario: base };
  const defs = limitsFor(build, compiled, steady, true, problems);
  const thermal = thermalResult(compiled, steady, defs, o);
  const duration = Math.min(MAX_CHARGE_WARMUP_S, Math.max(MIN_CHARGE_WARMUP_S, (plan.ccHours.value ?? 1) * 3600));
  return {
    plan,
    scenario: {
      ...base,
      converged: steady.converged,
      iterations: steady.iterations,
      network: compiled.network,
      thermal,
      warmup: o.skipWarmup ? null : warmup(compiled.network, steady, thermal.limits, duration, o, field, problems),
      charging: { chargerLoss: plan.lossW, cellHeat: cells, chargeCurrentA: plan.currentA },
    },
  };
}
