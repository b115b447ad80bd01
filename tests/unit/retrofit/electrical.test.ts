import { describe, expect, it } from "vitest";
import { chargePlan, evaluateBuild } from "@/lib/retrofit";
import { inspection, lantern } from "./fixtures/builds";

describe("pack, runtime and charge time against trade check values", () => {
  const r = evaluateBuild(inspection(), { skipWarmup: true, skipWhatItTakes: true });

  it("four 2000 mAh cells in parallel make 8000 mAh at the cell's voltage (common practice)", () => {
    const p = r.electrical.pack!;
    expect(p.capacityMAh).toBeCloseTo(8000, 6);
    expect(p.nominalVoltage.value).toBeCloseTo(3.7, 9);
    // E = 3.7 V · 8 Ah = 29.6 Wh
    expect(p.energyWh.value).toBeCloseTo(29.6, 6);
  });

  const linear1A = { name: "c", specs: { topology: "linear" as const, chargeCurrentA: 1, inputVoltageV: 5 }, curves: {} };
  it("a gentle charge, 3 A into 8 Ah (≈ 0.37C), takes about 3 h (common practice: a gentle Li-ion charge takes about 3 h)", () => {
    const c = chargePlan(linear1A, 3, r.electrical.pack!);
    expect(c.currentA).toBeCloseTo(3, 9); // three 1 A chargers in parallel
    // Q/I = 8 Ah / 3 A = 2.667 h — the naive figure
    expect(c.capacityOverCurrentH).toBeCloseTo(8 / 3, 6);
    expect(c.totalHours.value!).toBeGreaterThanOrEqual(2.7);
    expect(c.totalHours.value!).toBeLessThanOrEqual(3.5);
    // Most of a gentle charge time is spent at constant current.
    expect(c.ccHours.value!).toBeGreaterThan(0.5 * c.totalHours.value!);
    // The trace states the taper model.
    expect(c.totalHours.trace.equation).toContain("e^(−t/τ)");
  });

  it("a 1C charge takes roughly 2–3 h in all, and its constant-voltage tail is a larger share than a gentle charge's (common practice)", () => {
    const pack = r.electrical.pack!;
    // Eight 1 A chargers into 8 Ah: 1C.
    const fast = chargePlan({ name: "c", specs: { topology: "switching", chargeCurrentA: 1, inputVoltageV: 5, efficiency: 0.9 }, curves: {} }, 8, pack);
    expect(fast.currentA).toBeCloseTo(8, 9);
    expect(fast.totalHours.value!).toBeGreaterThanOrEqual(2);
    expect(fast.totalHours.value!).toBeLessThanOrEqual(3);
    const gentle = chargePlan(linear1A, 3, pack);
    expect(fast.cvHours / fast.totalHours.value!).toBeGreaterThan(gentle.cvHours / gentle.totalHours.value!);
    // Not the constant share of before: total ÷ (capacity/current) grows with the rate.
    expect(fast.totalHours.value! / fast.capacityOverCurrentH).toBeGreaterThan(gentle.totalHours.value! / gentle.capacityOverCurrentH);
  });

  it("a 1 A linear charger from 5 V into a 3.7 V cell dissipates about 1.3 W; three of them 3.9 W (common practice)", () => {
    // (V_in − V_bat)·I = (5 − 3.7)·1 = 1.3 W per charger
    expect(chargePlan(linear1A, 3, r.electrical.pack!).lossW.value).toBeCloseTo(3 * 1.3, 9);
    const one = chargePlan({ name: "c", specs: { topology: "linear", chargeCurrentA: 1, inputVoltageV: 5 }, curves: {} }, 1, r.electrical.pack!);
    expect(one.lossW.value).toBeCloseTo(1.3, 9);
  });

  it("three linear chargers in the closed tube reach their die regulation (about 120 °C, from memory of typical datasheets) and throttle: less current, a longer charge, the board held at the regulation temperature", () => {
    const c = r.electrical.charge!;
    expect(c.throttle).not.toBeNull();
    expect(c.currentA).toBeLessThan(c.ratedCurrentA);
    expect(c.totalHours.value!).toBeGreaterThan(c.throttle!.ratedHours);
    const board = r.scenarios.find((s) => s.kind === "charging")!.thermal!.temperaturesC.charger!;
    expect(Math.abs(board - 120)).toBeLessThan(0.5);
    expect(r.problems.some((p) => p.field === "pack.charger" && p.message.includes("instead of"))).toBe(true);
    // The same chargers rated to regulate at 180 °C do not throttle here.
    const b = inspection();
    b.pack.charger = { ...b.pack.charger!, specs: { ...b.pack.charger!.specs, regulationTempC: 180 } };
    const hot = evaluateBuild(b, { skipWarmup: true, skipWhatItTakes: true }).electrical.charge!;
    expect(hot.throttle).toBeNull();
    expect(hot.currentA).toBeCloseTo(3, 9);
  });

  it("a switching charger loses P_out·(1/η − 1)", () => {
    // 3.7 V · 2 A = 7.4 W out at 90 %: 7.4·(1/0.9 − 1) = 0.8222 W
    const sw = chargePlan({ name: "c", specs: { topology: "switching", chargeCurrentA: 2, inputVoltageV: 5, efficiency: 0.9 }, curves: {} }, 1, r.electrical.pack!);
    expect(sw.lossW.value).toBeCloseTo(7.4 * (1 / 0.9 - 1), 9);
  });

  it("runtime = 0.9·Q / I_pack with I_pack = P_in / V_pack, and driver loss = P_out·(1/η − 1)", () => {
    const low = r.scenarios.find((s) => s.id === "mode:low")!.mode!;
    // Driver "low": 0.5 A split over two emitters in parallel, η 0.88.
    expect(low.currentPerEmitterA).toBeCloseTo(0.25, 12);
    expect(low.driverLoss.value).toBeCloseTo(low.driveW * (1 / 0.88 - 1), 9);
    const iPack = low.driveW / 0.88 / 3.7;
    expect(low.packCurrentA).toBeCloseTo(iPack, 9);
    expect(low.runtime!.value).toBeCloseTo((0.9 * 8000 * 3.6) / iPack / 3600, 6);
    // Cell heat: 4 cells each at I/4 through 30 mΩ
    expect(low.cellHeat!.value).toBeCloseTo(4 * (iPack / 4) ** 2 * 0.03, 12);
  });

  it("a regulated-power mode holds N·Vf·I at the set power", () => {
    const high = r.scenarios.find((s) => s.id === "mode:high")!.mode!;
    expect(high.driveW).toBeCloseTo(8, 6);
    expect(2 * high.vf.value! * high.currentPerEmitterA).toBeCloseTo(8, 6);
  });

  it("cost summary adds the priced parts and compares with a new light", () => {
    const c = evaluateBuild(lantern(), { skipWarmup: true, skipWhatItTakes: true }).costs;
    // emitter 4 + sink 3 + driver 6 + cell 5 + protection 1 + charger 1 + housing 0 + extras 2 = 22 EUR
    expect(c.totalEur).toBeCloseTo(22, 9);
    expect(c.savingEur).toBeCloseTo(45 - 22, 9);
  });
});
