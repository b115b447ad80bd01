import type { ResolvedBuild } from "../resolved";
import { q, SOURCES, trace, type Traced } from "../trace";

/** DC internal resistance assumed when the cell gives none: 50 mΩ, a middling 18650 (from memory; 20–80 mΩ new). */
export const DEFAULT_CELL_RESISTANCE_OHM = 0.05;
/** Share of rated capacity a lamp gets out of a pack before the cut-off (common practice: ratings are at a low rate). */
export const USABLE_CAPACITY_FRACTION = 0.9;

export interface PackSummary {
  series: number;
  parallel: number;
  cells: number;
  nominalVoltage: Traced;
  capacityC: Traced;
  capacityMAh: number;
  energyWh: Traced;
  maxVoltageV: number;
  minVoltageV: number;
  internalResistanceOhm: number;
  resistanceAssumed: boolean;
}

export function packSummary(build: ResolvedBuild): PackSummary | null {
  const cell = build.pack.cell;
  if (!cell) return null;
  const { series: s, parallel: p } = build.pack;
  const c = cell.specs;
  const v = s * c.nominalVoltageV;
  const qC = p * c.capacityCoulomb;
  const wh = (v * qC) / 3600;
  return {
    series: s,
    parallel: p,
    cells: s * p,
    nominalVoltage: { value: v, unit: "V", trace: trace({ element: "pack-voltage", formula: "Cells in series add voltage", equation: "V = S·V_cell", inputs: [q("S", "cells in series", s, "1"), q("V_cell", `nominal voltage of ${cell.name}`, c.nominalVoltageV, "V")], result: q("V", "pack nominal voltage", v, "V"), source: SOURCES.trade }) },
    capacityC: { value: qC, unit: "C", trace: trace({ element: "pack-capacity", formula: "Cells in parallel add capacity at the same voltage", equation: "Q = P·Q_cell", inputs: [q("P", "cells in parallel", p, "1"), q("Q_cell", "cell capacity", c.capacityCoulomb, "C")], result: q("Q", "pack capacity", qC, "C"), source: SOURCES.trade, notes: [`${(qC / 3.6).toFixed(0)} mAh (1 mAh = 3.6 C)`] }) },
    capacityMAh: qC / 3.6,
    energyWh: { value: wh, unit: "Wh", trace: trace({ element: "pack-energy", formula: "Stored energy at nominal voltage", equation: "E = V·Q", inputs: [q("V", "pack nominal voltage", v, "V"), q("Q", "pack capacity", qC, "C")], result: q("E", "energy", wh, "Wh"), source: "definition of energy, E = V·Q (1 Wh = 3600 J; any physics textbook)" }) },
    maxVoltageV: s * c.chargeEndVoltageV,
    minVoltageV: s * c.cutoffVoltageV,
    internalResistanceOhm: c.internalResistanceOhm ?? DEFAULT_CELL_RESISTANCE_OHM,
    resistanceAssumed: c.internalResistanceOhm === undefined,
  };
}

/** Heat in the cells from a pack current: every cell carries I/P, and there are S·P of them. */
export function cellHeat(pack: PackSummary, packCurrentA: number): Traced {
  const i = packCurrentA / pack.parallel;
  const w = pack.cells * i * i * pack.internalResistanceOhm;
  return {
    value: w,
    unit: "W",
    trace: trace({
      element: "cell-heat",
      formula: "Joule heat in the cells",
      equation: "P = S·P·(I_pack/P)²·R_cell",
      inputs: [q("I_pack", "pack current", packCurrentA, "A"), q("S·P", "cells", pack.cells, "1"), q("P", "cells in parallel", pack.parallel, "1"), q("R_cell", "internal resistance per cell", pack.internalResistanceOhm, "Ω")],
      intermediates: [q("I_cell", "current per cell", i, "A")],
      result: q("P_cells", "heat in the cells", w, "W"),
      source: pack.resistanceAssumed ? `${SOURCES.ohm}; R_cell assumed 50 mΩ (from memory of typical 18650 datasheets — check against a copy)` : SOURCES.ohm,
      notes: ["Entropic (reversible) heat is left out; it is small against I²R at lamp currents."],
    }),
  };
}

/** Runtime on one mode: usable charge ÷ pack current, at the nominal voltage throughout. */
export function runtime(pack: PackSummary, packCurrentA: number): Traced {
  const usable = (pack.capacityC.value ?? 0) * USABLE_CAPACITY_FRACTION;
  const h = packCurrentA > 0 ? usable / packCurrentA / 3600 : null;
  return {
    value: h,
    unit: "h",
    trace: trace({
      element: "runtime",
      formula: "Runtime at constant drain",
      equation: "t = f_usable·Q / I_pack",
      inputs: [q("Q", "pack capacity", pack.capacityC.value ?? 0, "C"), q("f_usable", "usable share of the rating", USABLE_CAPACITY_FRACTION, "1"), q("I_pack", "pack current at nominal voltage", packCurrentA, "A")],
      result: q("t", "runtime", h ?? 0, "h"),
      source: SOURCES.trade,
      notes: [
        "Assumes: pack at its nominal voltage for the whole run (the drain rises a little as the voltage falls), the driver regulating until the cut-off, no thermal step-down, 90 % of the rated capacity usable.",
      ],
    }),
  };
}
