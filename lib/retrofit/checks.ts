import { interpolate } from "@/lib/curves";
import type { DriverMode } from "@/lib/parts";
import type { PackSummary } from "./electrical/pack";
import type { ProblemList } from "./problems";
import type { ResolvedBuild } from "./resolved";

/** The modes to evaluate, with their index in the driver part (for field paths like driver.modes[2]). */
export function selectedModes(build: ResolvedBuild, problems: ProblemList): { mode: DriverMode; index: number }[] {
  const d = build.driver.part;
  if (!d) {
    problems.add("driver.part", "the build has no driver: no mode can be evaluated");
    return [];
  }
  const all = d.specs.modes.map((mode, index) => ({ mode, index }));
  const names = build.driver.selectedModes;
  if (!names) return all;
  const out: { mode: DriverMode; index: number }[] = [];
  names.forEach((name, i) => {
    const hit = all.find((m) => m.mode.name.toLowerCase() === name.toLowerCase());
    if (hit) out.push(hit);
    else problems.add(`driver.selectedModes[${i}]`, `the driver "${d.name}" has no mode "${name}" (it has ${all.map((m) => m.mode.name).join(", ")})`);
  });
  return out;
}

/** The emitter's absolute maximum current: the build's figure, else the top of its allowed-current curve. */
export function emitterMaxCurrent(build: ResolvedBuild): number | undefined {
  if (build.lightEngine.maxCurrentA !== undefined) return build.lightEngine.maxCurrentA;
  const c = build.lightEngine.emitter?.curves.currentVsTemperature;
  return c ? Math.max(...c.points.map((p) => p.y)) : undefined;
}

/** Pack voltage against the driver's input range. */
export function checkPackVoltage(build: ResolvedBuild, pack: PackSummary | null, problems: ProblemList): void {
  const d = build.driver.part;
  if (!d || !pack) return;
  const { inputVoltageMinV: lo, inputVoltageMaxV: hi } = d.specs;
  const v = pack.nominalVoltage.value ?? 0;
  const f = (x: number) => `${x.toFixed(2)} V`;
  if (v < lo || v > hi) problems.add("pack", `the pack's nominal ${f(v)} (${pack.series}S${pack.parallel}P) is outside the driver's input range ${f(lo)}–${f(hi)}`);
  else if (pack.maxVoltageV > hi) problems.add("pack", `a full pack is ${f(pack.maxVoltageV)}, above the driver's maximum input ${f(hi)}: the driver can be damaged`);
  else if (pack.minVoltageV < lo) problems.add("pack", `the driver stops regulating below ${f(lo)}, before the cells reach their cut-off (${f(pack.minVoltageV)}): runtime is shorter and the light dims early`, "warning");
}

/** Per mode: emitter current vs its maximum, protection trip and cell rating vs the pack current. */
export function checkModeCurrents(build: ResolvedBuild, index: number, name: string, currentPerEmitterA: number, packCurrentA: number | null, problems: ProblemList): void {
  const max = emitterMaxCurrent(build);
  const field = `driver.modes[${index}]`;
  if (max !== undefined && currentPerEmitterA > max * (1 + 1e-9)) {
    problems.add(field, `mode "${name}" drives each emitter at ${currentPerEmitterA.toFixed(2)} A, above its absolute maximum of ${max.toFixed(2)} A`);
  }
  const p = build.pack.protection;
  if (p && packCurrentA !== null && p.specs.overCurrentTripA < packCurrentA) {
    problems.add("pack.protection", `mode "${name}" draws ${packCurrentA.toFixed(2)} A from the pack, above the protection's ${p.specs.overCurrentTripA.toFixed(2)} A trip: the light will cut out`);
  }
  const cell = build.pack.cell;
  if (cell?.specs.maxDischargeCurrentA !== undefined && packCurrentA !== null && packCurrentA / build.pack.parallel > cell.specs.maxDischargeCurrentA) {
    problems.add("pack.cell", `mode "${name}" draws ${(packCurrentA / build.pack.parallel).toFixed(2)} A per cell, above its ${cell.specs.maxDischargeCurrentA.toFixed(2)} A rating`);
  }
}

/** Allowed current at a temperature from a derating curve (its x is the temperature the datasheet names), for the Budget's operating point. */
export function deratingPoint(points: readonly { x: number; y: number }[] | undefined, temperatureC: number, currentA: number) {
  if (!points) return null;
  const r = interpolate(points, temperatureC);
  return { temperatureC, currentA, allowedA: r.y, withinCurve: !r.extrapolated, ok: currentA <= r.y };
}
