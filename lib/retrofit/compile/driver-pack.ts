import { extend, heatCapacity, interfaceLayer, getMaterial, strapResistance, type Trace } from "@/lib/thermal";
import type { ResolvedBuild } from "../resolved";
import { q, seriesTrace, trace } from "../trace";
import { PLACES, type NetworkBuilder } from "./builder";
import { wallSpot, type HousingGeometry } from "./housing";
import { joint } from "./joints";

/** Driver board when the part gives no area: 20 mm × 20 mm (estimate). */
export const DEFAULT_DRIVER_AREA_M2 = 4e-4;
/** Charger board when the build gives none: 26 mm × 17 mm, a common USB charger module (from memory). */
export const DEFAULT_CHARGER_AREA_M2 = 26e-3 * 17e-3;
/** FR-4 with parts: ≈ 1100 J/(kg·K) (from memory); boards ≈ 5 g (driver) and 2 g (charger) unless given. */
const BOARD_SPECIFIC_HEAT = 1100;
/** Solder mask and cell wraps radiate like paint: ε ≈ 0.9 (from memory; Incropera Table A.11 gives 0.9 for paints). */
const BOARD_EMISSIVITY = 0.9;
/** Cell specific heat ≈ 1000 J/(kg·K) (from memory; 18650 cells measure 0.9–1.1 kJ/(kg·K)). */
const CELL_SPECIFIC_HEAT = 1000;
/** Cells packed side by side: 70 % of their surface sees air for packs of two or more (estimate). */
const PACKED_EXPOSURE = 0.7;
/** Tape adhesive when the strap's adhesive is not given: acrylic, 0.5 W/(m·K), 40 µm (from memory). */
const TAPE_ADHESIVE = { conductivityWPerMK: 0.5, bondLineM: 40e-6 };

const boardCapacity = (massKg: number, what: string): { heatCapacityJPerK: number; trace: Trace } =>
  extend(heatCapacity({ massKg, specificHeatJPerKgK: BOARD_SPECIFIC_HEAT }), { trace: trace({ element: "heat-capacity", formula: "Lumped heat capacity", equation: "C = m·c_p", inputs: [q("m", `mass of the ${what}`, massKg, "kg"), q("c_p", "FR-4 with parts (from memory)", BOARD_SPECIFIC_HEAT, "J/(kg·K)")], result: q("C", "heat capacity", massKg * BOARD_SPECIFIC_HEAT, "J/K"), source: "from memory of FR-4 laminate data (≈ 1100 J/(kg·K)) — check against a copy" }) });

/** A board in the housing air: both faces convect to the air and radiate to the wall. */
function boardInAir(b: NetworkBuilder, id: string, areaM2: number, faces: number, g: HousingGeometry, slot: string, place: string): void {
  const l = Math.sqrt(areaM2);
  b.link({ from: id, to: g.inside, type: "natural-convection", areaM2: faces * areaM2, surface: "vertical-plate", characteristicLengthM: l }, `${place} → ${g.inside === "air" ? PLACES.air : "ambient air (vented)"}`, slot);
  b.link({ from: id, to: "wall", type: "radiation", areaM2: faces * areaM2, emissivity: BOARD_EMISSIVITY }, `${place} → housing wall (radiation, ε 0.9 solder mask)`, slot);
}

export function compileDriver(b: NetworkBuilder, build: ResolvedBuild, g: HousingGeometry): boolean {
  const d = build.driver.part;
  if (!d) return false;
  const area = d.specs.boardAreaM2 ?? DEFAULT_DRIVER_AREA_M2;
  if (d.specs.boardAreaM2 === undefined) b.problems.add("driver.part.boardAreaM2", "driver board area not given: 20 mm × 20 mm assumed", "info");
  b.node("driver", PLACES.driver, "driver.part", boardCapacity(build.driver.massKg ?? 0.005, "driver board"));
  const c = build.driver.cooling;
  if (c.kind === "floating") {
    boardInAir(b, "driver", area, 2, g, "driver.cooling", "driver board");
    return true;
  }
  // Pressed or strapped, the other face still sees the air.
  boardInAir(b, "driver", area, c.kind === "strapped" ? 2 : 1, g, "driver.cooling", "driver board");
  if (c.kind === "ground-plane-to-wall") {
    const contact = d.specs.groundPlaneAreaM2 && d.specs.groundPlaneAreaM2 > 0 ? d.specs.groundPlaneAreaM2 : area;
    const spot = wallSpot(b, "wall-driver", PLACES.wallDriver, "driver.cooling", contact, g);
    const jt = joint(c.interface, contact, "driver.cooling.interface", b.problems);
    b.resistance("driver", spot, jt.kelvinPerWatt, "driver ground plane → housing wall (interface)", "driver.cooling", jt.trace);
    return true;
  }
  const s = c.spreader.specs;
  const overlap = c.overlapM ?? 0.01;
  const bond = s.widthM * overlap;
  const k = getMaterial(s.material)?.conductivityWPerMK ?? 400;
  const free = Math.max(s.lengthM - 2 * overlap, s.lengthM * 0.2);
  const strap = strapResistance({ lengthM: free, thicknessM: s.thicknessM, widthM: s.widthM, conductivityWPerMK: k });
  const glue = c.adhesive ? joint(c.adhesive, bond, "driver.cooling.adhesive", b.problems) : interfaceLayer({ areaM2: bond, ...TAPE_ADHESIVE });
  if (!c.adhesive) {
    b.problems.add("driver.cooling.adhesive", "strap adhesive not given: acrylic tape adhesive 0.5 W/(m·K), 40 µm assumed (from memory)", "info");
    glue.trace.notes.push("Acrylic tape adhesive assumed: 0.5 W/(m·K), 40 µm (from memory).");
  }
  const spot = wallSpot(b, "wall-driver", PLACES.wallDriver, "driver.cooling", bond, g);
  const r = 2 * glue.kelvinPerWatt + strap.kelvinPerWatt;
  const notes = [`Strap bonded over ${(overlap * 1000).toFixed(0)} mm at each end; the free length between the bonds carries the heat.`];
  b.resistance("driver", spot, r, `strap ${c.spreader.name}: adhesive + strap + adhesive → housing wall`, "driver.cooling", seriesTrace("strap", [glue.trace, strap.trace, glue.trace], r, notes));
  return true;
}

export function compileCells(b: NetworkBuilder, build: ResolvedBuild, g: HousingGeometry): boolean {
  const cell = build.pack.cell;
  if (!cell) return false;
  const n = build.pack.series * build.pack.parallel;
  const d = build.pack.cellDiameterM ?? 0.0184;
  const l = build.pack.cellLengthM ?? 0.065;
  const mass = n * (cell.specs.massKg ?? 0.046);
  const cap = heatCapacity({ massKg: mass, specificHeatJPerKgK: CELL_SPECIFIC_HEAT });
  cap.trace.source = "from memory of published 18650 calorimetry (0.9–1.1 kJ/(kg·K)) — check against a copy";
  if (cell.specs.massKg === undefined) b.problems.add("pack.cell.massKg", "cell mass not given: 46 g (an 18650) assumed", "info");
  b.node("cells", PLACES.cells, "pack.cell", cap);
  const area = n * (Math.PI * d * l + (Math.PI * d * d) / 2) * (n > 1 ? PACKED_EXPOSURE : 1);
  b.link({ from: "cells", to: g.inside, type: "natural-convection", areaM2: area, surface: "horizontal-cylinder", characteristicLengthM: d }, `cells → ${g.inside === "air" ? PLACES.air : "ambient air (vented)"}`, "pack");
  b.link({ from: "cells", to: "wall", type: "radiation", areaM2: area, emissivity: BOARD_EMISSIVITY }, "cells → housing wall (radiation, ε 0.9 wrap)", "pack");
  return true;
}

export function compileCharger(b: NetworkBuilder, build: ResolvedBuild, g: HousingGeometry): boolean {
  if (!build.pack.charger) return false;
  // Chargers in parallel are separate boards: one node (they run alike) with all their area.
  const count = build.pack.chargerCount ?? build.pack.charger.specs.parallelCount ?? 1;
  const area = count * (build.pack.chargerBoardAreaM2 ?? DEFAULT_CHARGER_AREA_M2);
  if (build.pack.chargerBoardAreaM2 === undefined) b.problems.add("pack.chargerBoardAreaM2", "charger board area not given: 26 mm × 17 mm assumed", "info");
  b.node("charger", PLACES.charger, "pack.charger", boardCapacity(0.002 * count, "charger boards"));
  boardInAir(b, "charger", area, 2, g, "pack.charger", "charger board");
  return true;
}
