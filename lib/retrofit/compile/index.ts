import type { Network } from "@/lib/thermal";
import type { ProblemList } from "../problems";
import type { ResolvedBuild } from "../resolved";
import { applyCalibration } from "./calibration";
import { NetworkBuilder, type LinkPlace, type NodePlace } from "./builder";
import { compileCells, compileCharger, compileDriver } from "./driver-pack";
import { compileHousing, housingGeometry } from "./housing";
import { compileLightEngine } from "./light-engine";

/** Heat of one scenario, already worked out on the electrical side. */
export interface ScenarioHeat {
  /** Heat at the junction node (all emitters), W, at `junctionRefC`. */
  junctionW: number;
  /** How that heat changes with the junction temperature, W/K (Vf falls as it warms). */
  junctionWPerK: number;
  junctionRefC: number;
  driverW: number;
  cellsW: number;
  chargerW: number;
}

export interface CompiledBuild {
  network: Network;
  nodes: NodePlace[];
  links: LinkPlace[];
  /** Index of the heatsink's own link to the air, for the "required sink resistance" question. */
  sinkLink: number | null;
  /** The sink's radiation link (to the wall inside a housing), taken with `sinkLink` as the sink's whole path. */
  sinkRadiationLink: number | null;
  sinkEstimateKPerW: number | null;
  has: { emitter: boolean; driver: boolean; cells: boolean; charger: boolean };
}

/** The sink's links taken together (convection, and radiation when it has its own link). */
export const sinkLinks = (c: CompiledBuild): number[] => (c.sinkLink === null ? [] : c.sinkRadiationLink === null ? [c.sinkLink] : [c.sinkLink, c.sinkRadiationLink]);

export interface CompileState {
  /** Effective sink-to-air resistance from the previous solve, for the spreading boundary. */
  sinkToAirKPerW: number | null;
  /** The sink's rise above the air around it in the previous solve, for a declared rating's correction. */
  sinkRiseK?: number | null;
}

/**
 * A resolved build + one scenario's heat → network JSON v1 and the map back to named
 * places. Null (with problems) when a part the heat path needs is missing.
 */
export function compileBuild(build: ResolvedBuild, heat: ScenarioHeat, state: CompileState, problems: ProblemList, withLightEngine = true): CompiledBuild | null {
  const housing = build.housing;
  if (!housing) {
    problems.add("housing", "the build has no housing: the heat path ends at its wall, so no temperatures can be worked out");
    return null;
  }
  const b = new NetworkBuilder(build.environment.ambientC, problems);
  const g = housingGeometry(build, housing);
  if (!g.sealed) problems.add("housing.enclosure", "vented housing: the parts inside are taken to convect straight to ambient air (optimistic for small vents); radiation still goes to the wall", "info");
  compileHousing(b, build, housing, g);
  const le = withLightEngine ? compileLightEngine(b, build, g, state.sinkToAirKPerW, state.sinkRiseK ?? null) : null;
  // A light engine that cannot be compiled leaves half a path behind: no network.
  if (withLightEngine && !le) return null;
  const driver = compileDriver(b, build, g);
  const cells = compileCells(b, build, g);
  const charger = compileCharger(b, build, g);
  const has = { emitter: le !== null, driver, cells, charger };
  if (build.calibration) applyCalibration(b, build.calibration, le?.sinkLink ?? null);
  return {
    network: b.network(scenarioSources(heat, has)),
    nodes: b.nodePlaces,
    links: b.linkPlaces,
    sinkLink: le?.sinkLink ?? null,
    sinkRadiationLink: le?.sinkRadiationLink ?? null,
    sinkEstimateKPerW: le?.sinkEstimateKPerW ?? null,
    has,
  };
}

/** The network's sources for a scenario's heat, on the parts the build has. */
export function scenarioSources(heat: ScenarioHeat, has: CompiledBuild["has"]): Network["sources"] {
  const sources: Network["sources"] = [];
  if (has.emitter) sources.push({ node: "junction", watts: heat.junctionW, wattsPerKelvin: heat.junctionWPerK, referenceC: heat.junctionRefC });
  if (has.driver) sources.push({ node: "driver", watts: heat.driverW });
  if (has.cells) sources.push({ node: "cells", watts: heat.cellsW });
  if (has.charger) sources.push({ node: "charger", watts: heat.chargerW });
  return sources;
}
