import { describe, expect, it } from "vitest";
import { driverModeSchema, formatModesCell, modesSchema, parseModesCell } from "@/lib/parts";
import { evaluateBuild, type BuildDesignInput } from "@/lib/retrofit";
import { driveTrace } from "@/lib/retrofit/derivations";
import { lanternDesign, resolved } from "./fixtures/builds";
import { DRIVER } from "./fixtures/parts";

type ModeIn = Record<string, unknown>;
const withModes = (modes: ModeIn[], design: BuildDesignInput = lanternDesign): BuildDesignInput => ({
  ...design,
  driver: { ...design.driver, part: { ...DRIVER, inline: { ...DRIVER.inline, modes } } as typeof DRIVER },
});
const evaluate = (d: BuildDesignInput) => evaluateBuild(resolved(d), { skipWarmup: true, skipWhatItTakes: true });
const V_PACK = 3.6; // the fixture's one 3.6 V cell

describe("driver modes given on the battery side, as kits are sold", () => {
  it("a mode is a current or power out, or a current or power from the battery: exactly one", () => {
    expect(driverModeSchema.parse({ name: "high", inputPowerW: "9 W", efficiency: "85 %" }).inputPowerW).toBe(9);
    expect(driverModeSchema.parse({ name: "high", inputCurrentA: "2 A", efficiency: "85 %" }).inputCurrentA).toBe(2);
    const two = driverModeSchema.safeParse({ name: "high", inputPowerW: 9, outputCurrentA: 2, efficiency: 0.85 });
    expect(two.success).toBe(false);
    expect(two.error!.issues[0]!.message).toBe("give one figure: an output current or power, or the current or power drawn from the battery, not two");
    const none = driverModeSchema.safeParse({ name: "high", efficiency: 0.85 });
    expect(none.error!.issues[0]!.message).toBe("give an output current or power, or the current or power drawn from the battery");
  });

  it("the CSV modes cell reads and writes “from the battery”", () => {
    const cell = "low: 350 mA, 90 %; high: 9 W from the battery, 85 %; turbo: 3 A from battery, 80 %";
    const r = parseModesCell(cell);
    if (!r.ok) throw new Error(r.message);
    const modes = modesSchema.parse(r.modes);
    expect(modes.map((m) => [m.outputCurrentA, m.inputPowerW, m.inputCurrentA])).toEqual([[0.35, undefined, undefined], [undefined, 9, undefined], [undefined, undefined, 3]]);
    expect(formatModesCell(modes)).toBe("low: 0.35 A, 90 %; high: 9 W from the battery, 85 %; turbo: 3 A from the battery, 80 %");
  });

  it("9 W from the battery at 85 %: the emitters get η·P = 7.65 W and the pack gives 9 W (energy balance of a converter, P_out = η·P_in — common practice)", () => {
    const ev = evaluate(withModes([{ name: "high", inputPowerW: 9, efficiency: 0.85 }]));
    const s = ev.scenarios.find((x) => x.id === "mode:high")!;
    expect(s.mode!.driveW).toBeCloseTo(0.85 * 9, 3);
    expect(s.mode!.driverInputW).toBeCloseTo(9, 3);
    expect(s.mode!.packCurrentA!).toBeCloseTo(9 / V_PACK, 3);
    expect(s.mode!.driverLoss.value!).toBeCloseTo(9 * 0.15, 3);
    expect(ev.modes[0]!.entered).toEqual({ side: "battery", quantity: "power", value: 9 });
    const t = driveTrace(s.mode!);
    expect(t.equation).toBe("P_drive = η·P_battery");
    expect(t.result.value).toBeCloseTo(7.65, 3);
  });

  it("2 A from the battery at 85 %: P = η·I·V at the pack's nominal voltage, and the pack current is the 2 A entered", () => {
    const ev = evaluate(withModes([{ name: "high", inputCurrentA: 2, efficiency: 0.85 }]));
    const s = ev.scenarios.find((x) => x.id === "mode:high")!;
    expect(s.mode!.driveW).toBeCloseTo(0.85 * 2 * V_PACK, 3);
    expect(s.mode!.packCurrentA!).toBeCloseTo(2, 6);
    expect(driveTrace(s.mode!).inputs.find((q) => q.symbol === "V_pack")!.value).toBeCloseTo(V_PACK, 9);
  });

  it("a battery current without cells in the build, or a pack outside the driver's input range, is refused on that mode", () => {
    const noPack = evaluate({ ...withModes([{ name: "high", inputCurrentA: 2, efficiency: 0.85 }]), pack: { series: 1, parallel: 1 } });
    expect(noPack.problems).toContainEqual(expect.objectContaining({ field: "driver.modes[0]", severity: "error", message: expect.stringMatching(/add the cells/) }));
    expect(JSON.stringify(noPack)).not.toMatch(/NaN/);
    const twoCells = evaluate({ ...withModes([{ name: "high", inputPowerW: 9, efficiency: 0.85 }]), pack: { ...lanternDesign.pack, series: 2 } });
    expect(twoCells.problems).toContainEqual(expect.objectContaining({ field: "driver.modes[0]", severity: "error", message: expect.stringMatching(/outside the driver's input range 2\.80–4\.20 V/) }));
  });

  it("a mode given on the output side is unchanged, and says it was entered as an output", () => {
    const ev = evaluate(lanternDesign);
    expect(ev.modes.find((m) => m.name === "high")!.entered).toEqual({ side: "output", quantity: "current", value: 2.8 });
  });
});
