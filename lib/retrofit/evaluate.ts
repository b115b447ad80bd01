import type { ModeDrive } from "@/lib/parts";
import { NetworkCheck } from "@/lib/thermal";
import { cautionsFor, type Caution } from "./cautions";
import { checkPackVoltage, selectedModes } from "./checks";
import { costSummary, type CostSummary } from "./costs";
import { massSummary, type MassSummary } from "./mass";
import type { ChargePlan } from "./electrical/charger";
import { packSummary, type PackSummary } from "./electrical/pack";
import { jsonSafe } from "./json-safe";
import { worstVerdict, type Verdict } from "./limits";
import { resolveOptions, type EvaluateOptions } from "./options";
import { ProblemList, type Problem } from "./problems";
import type { ResolvedBuild } from "./resolved";
import { chargerCount, runCharging } from "./scenario-charging";
import { runMode, type ScenarioResult } from "./scenario-mode";
import type { Traced } from "./trace";

export const EVALUATION_VERSION = 1;

export interface ModeSummary {
  name: string;
  modeIndex: number;
  verdict: Verdict | null;
  driveW: number | null;
  /** The mode's figure as entered, shown beside what the emitters get. */
  entered: ModeDrive | null;
  totalFluxLm: number | null;
  packCurrentA: number | null;
  runtime: Traced | null;
  /** Time the first limit is reached in the warm-up, s; null if none is within it. */
  firstLimitS: number | null;
  firstLimit: string | null;
}

export interface BuildEvaluation {
  version: typeof EVALUATION_VERSION;
  /** Worst verdict over every scenario that could be worked out; null if none could. */
  verdict: Verdict | null;
  scenarios: ScenarioResult[];
  modes: ModeSummary[];
  electrical: {
    pack: PackSummary | null;
    charge: ChargePlan | null;
    peakPackCurrentA: number | null;
    protectionTripA: number | null;
  };
  cautions: Caution[];
  costs: CostSummary;
  /** Mass of the parts that give one (what a heavier or lighter variant weighs). */
  mass: MassSummary;
  problems: Problem[];
}

/**
 * Evaluates a resolved build: every selected driver mode (steady, warm-up, limits, "what it
 * takes") and charging. Pure and JSON-safe: a figure that cannot be worked out is null and
 * a problem names the field; the function does not throw for any build the schema accepts.
 */
export function evaluateBuild(build: ResolvedBuild, options: EvaluateOptions = {}): BuildEvaluation {
  const o = resolveOptions(options);
  const problems = new ProblemList();
  const pack = packSummary(build);
  if (!pack) problems.add("pack.cell", "the build has no cells: runtime, pack current and charging are left out", "warning");
  else if (pack.resistanceAssumed) problems.add("pack.cell.internalResistanceOhm", "cell internal resistance not given: 50 mΩ assumed", "info");
  checkPackVoltage(build, pack, problems);
  // One schema check for every network: between scenarios only the heat changes, so each is checked for what changed.
  const check = new NetworkCheck();
  const scenarios: ScenarioResult[] = selectedModes(build, problems).map(({ mode, index }) => runMode(build, mode, index, pack, o, problems, check));
  const charging = runCharging(build, pack, o, problems, check);
  if (charging.scenario) scenarios.push(charging.scenario);

  const modes: ModeSummary[] = scenarios
    .filter((s) => s.kind === "mode")
    .map((s) => {
      const first = (s.warmup?.crossings ?? []).filter((c) => c.timeS !== null).sort((a, b) => (a.timeS ?? 0) - (b.timeS ?? 0))[0];
      return {
        name: s.name,
        modeIndex: s.modeIndex ?? 0,
        verdict: s.thermal?.verdict ?? null,
        driveW: s.mode?.driveW ?? null,
        entered: s.mode?.entered ?? null,
        totalFluxLm: s.mode?.totalFluxLm ?? null,
        packCurrentA: s.mode?.packCurrentA ?? null,
        runtime: s.mode?.runtime ?? null,
        firstLimitS: first?.timeS ?? null,
        firstLimit: first?.limitId ?? null,
      };
    });
  const currents = modes.map((m) => m.packCurrentA).filter((x): x is number => x !== null);
  const touchTight = scenarios.some((s) => s.thermal?.limits.some((l) => l.id === "touch" && l.headroomK < o.marginK));
  const result: BuildEvaluation = {
    version: EVALUATION_VERSION,
    verdict: worstVerdict(scenarios.map((s) => s.thermal?.verdict ?? null)),
    scenarios,
    modes,
    electrical: {
      pack,
      charge: charging.plan,
      peakPackCurrentA: currents.length ? Math.max(...currents) : null,
      protectionTripA: build.pack.protection?.specs.overCurrentTripA ?? null,
    },
    cautions: cautionsFor(build, { maxDriveW: Math.max(0, ...modes.map((m) => m.driveW ?? 0)), hotSurface: touchTight }),
    costs: costSummary(build, chargerCount(build)),
    mass: massSummary(build),
    problems: [],
  };
  const safe = jsonSafe(result, problems);
  safe.problems = problems.list;
  return safe;
}
