import { isMaterialId, type PartKind } from "@/lib/parts";

/**
 * The starter bin: generic hobby parts a maker recognises by description — no brands, no
 * part numbers. Every value is a plausible estimate for the class of part (provenance
 * `estimate`, never verified); the maker replaces what they know better. Values are typed
 * as a person would type them, so the kinds' own schemas read them (tests check each one).
 */
export interface StarterPart {
  /** Stable key for starting points and tests. */
  readonly key: string;
  readonly kind: PartKind;
  readonly name: string;
  /** What it looks like and what it does, in the words of the trade. */
  readonly description: string;
  readonly specs: Readonly<Record<string, unknown>>;
  readonly costEur: number;
}

const estimateNote = "Starter bin: typical of the class, an estimate — replace with your part's figures.";
export const STARTER_NOTE = estimateNote;

// Gap between fins of a straight-fin sink: (width − n × thickness) / (n − 1).
const gap = (widthMm: number, n: number, tMm: number) => `${((widthMm - n * tMm) / (n - 1)).toFixed(2)} mm`;

const ALL_STARTER_PARTS: readonly StarterPart[] = [
  // Emitters on star boards
  { key: "emitter-1w", kind: "emitter", name: "1 W white emitter on a 20 mm star", description: "Small white emitter on an aluminium star board, run at about 350 mA.", costEur: 1, specs: { rthJspKPerW: "10 K/W", maxTjC: "125 °C", vfV: "3.1 V", vfRefCurrentA: "350 mA", vfTempCoeffVPerK: "-2 mV/K", efficacyLmPerW: "110 lm/W", heatFraction: "75 %", beamAngleDeg: "120°", boardLengthM: "20 mm", boardWidthM: "20 mm" } },
  { key: "emitter-3w", kind: "emitter", name: "3 W white emitter on a 20 mm star", description: "The common hobby torch emitter on an aluminium star, about 700 mA to 1 A.", costEur: 2, specs: { rthJspKPerW: "6 K/W", maxTjC: "135 °C", vfV: "3.2 V", vfRefCurrentA: "700 mA", vfTempCoeffVPerK: "-2 mV/K", efficacyLmPerW: "120 lm/W", heatFraction: "70 %", beamAngleDeg: "120°", boardLengthM: "20 mm", boardWidthM: "20 mm" } },
  { key: "emitter-10w", kind: "emitter", name: "10 W white emitter on a 20 mm star", description: "Large-die white emitter on a copper-core star, about 3 A; needs a real heat path.", costEur: 5, specs: { rthJspKPerW: "1.5 K/W", maxTjC: "150 °C", vfV: "3.0 V", vfRefCurrentA: "3 A", vfTempCoeffVPerK: "-2 mV/K", efficacyLmPerW: "130 lm/W", heatFraction: "70 %", beamAngleDeg: "115°", boardLengthM: "20 mm", boardWidthM: "20 mm" } },
  // One-cell drivers, described by what they draw from the battery
  { key: "driver-buck-3mode", kind: "driver", name: "One-cell 3-mode buck driver, 17 mm round (draws about 0.3 / 0.9 / 2.7 A from the cell)", description: "Small round switching driver for one Li-ion cell: low, medium and high; on high it draws about 2.7 A from a 3.7 V cell.", costEur: 4, specs: { topology: "buck", inputVoltageMinV: "2.8 V", inputVoltageMaxV: "4.2 V", modes: [{ name: "low", outputCurrentA: "350 mA", efficiency: "88 %" }, { name: "medium", outputCurrentA: "1.05 A", efficiency: "88 %" }, { name: "high", outputCurrentA: "2.8 A", efficiency: "85 %" }], maxBoardTempC: "100 °C", boardAreaM2: "2.3 cm²", groundPlaneAreaM2: "1.2 cm²" } },
  { key: "driver-linear-3mode", kind: "driver", name: "One-cell 3-mode linear driver, 17 mm round (draws about 0.35 / 1.4 / 2.8 A from the cell)", description: "Round linear driver for one Li-ion cell: the LED current is what it draws from the battery; the voltage difference becomes heat on the board.", costEur: 3, specs: { topology: "linear", inputVoltageMinV: "3.0 V", inputVoltageMaxV: "4.2 V", modes: [{ name: "low", outputCurrentA: "350 mA", efficiency: "82 %" }, { name: "medium", outputCurrentA: "1.4 A", efficiency: "82 %" }, { name: "high", outputCurrentA: "2.8 A", efficiency: "82 %" }], maxBoardTempC: "100 °C", boardAreaM2: "2.3 cm²", groundPlaneAreaM2: "1.2 cm²" } },
  { key: "driver-buck-3mode-low", kind: "driver", name: "One-cell 3-mode buck driver for 3 W emitters, 17 mm round (draws about 0.1 / 0.3 / 0.65 A from the cell)", description: "The same small round switching driver set for a 3 W emitter: 100 mA, 350 mA and 700 mA into the LED; on high it draws about 0.65 A from a 3.7 V cell.", costEur: 4, specs: { topology: "buck", inputVoltageMinV: "2.8 V", inputVoltageMaxV: "4.2 V", modes: [{ name: "low", outputCurrentA: "100 mA", efficiency: "85 %" }, { name: "medium", outputCurrentA: "350 mA", efficiency: "88 %" }, { name: "high", outputCurrentA: "700 mA", efficiency: "88 %" }], maxBoardTempC: "100 °C", boardAreaM2: "2.3 cm²", groundPlaneAreaM2: "1.2 cm²" } },
  { key: "driver-linear-3mode-low", kind: "driver", name: "One-cell 3-mode linear driver for 1 W emitters, 17 mm round (draws about 0.1 / 0.2 / 0.35 A from the cell)", description: "Round linear driver for one Li-ion cell and a 1 W emitter: the LED current is what it draws from the battery, 350 mA on high.", costEur: 2, specs: { topology: "linear", inputVoltageMinV: "3.0 V", inputVoltageMaxV: "4.2 V", modes: [{ name: "low", outputCurrentA: "100 mA", efficiency: "82 %" }, { name: "medium", outputCurrentA: "200 mA", efficiency: "82 %" }, { name: "high", outputCurrentA: "350 mA", efficiency: "82 %" }], maxBoardTempC: "100 °C", boardAreaM2: "2.3 cm²", groundPlaneAreaM2: "1.2 cm²" } },
  // Cells
  ...(
    [
      ["cell-18650-2000", "18650", 2000, "60 mΩ", "44 g", "1 A", "5 A"],
      ["cell-18650-2600", "18650", 2600, "50 mΩ", "46 g", "1.3 A", "5 A"],
      ["cell-18650-3000", "18650", 3000, "45 mΩ", "47 g", "1.5 A", "10 A"],
      ["cell-18650-3500", "18650", 3500, "40 mΩ", "48 g", "1.7 A", "8 A"],
      ["cell-21700-4000", "21700", 4000, "25 mΩ", "68 g", "2 A", "15 A"],
      ["cell-21700-5000", "21700", 5000, "25 mΩ", "70 g", "2.5 A", "10 A"],
    ] as const
  ).map(([key, size, mah, ir, mass, charge, discharge]) => ({
    key,
    kind: "cell" as const,
    name: `${size} Li-ion cell, ${mah} mAh`,
    description: `Cylindrical ${size} lithium-ion cell of about ${mah} mAh (unprotected; add a protection board).`,
    costEur: size === "21700" ? 6 : 4,
    specs: { chemistry: "li-ion", nominalVoltageV: "3.6 V", chargeEndVoltageV: "4.2 V", cutoffVoltageV: "2.5 V", capacityCoulomb: `${mah} mAh`, internalResistanceOhm: ir, massKg: mass, chargeTempMinC: "0 °C", chargeTempMaxC: "45 °C", dischargeTempMinC: "-20 °C", dischargeTempMaxC: "60 °C", maxChargeCurrentA: charge, maxDischargeCurrentA: discharge },
  })),
  // Charging and protection
  { key: "charger-usb-1a", kind: "charger", name: "One-amp USB linear charger board", description: "The small blue board with a USB socket: a linear one-cell charger, 1 A from 5 V; the difference to the cell voltage becomes heat.", costEur: 1, specs: { topology: "linear", chargeCurrentA: "1 A", inputVoltageV: "5 V", parallelCount: 1 } },
  { key: "charger-usb-05a", kind: "charger", name: "Half-amp USB linear charger board", description: "The same small USB charger board with its current-setting resistor changed for 0.5 A: half the heat of the one-amp setting, twice the charging time.", costEur: 1, specs: { topology: "linear", chargeCurrentA: "0.5 A", inputVoltageV: "5 V", parallelCount: 1 } },
  { key: "protection-1cell", kind: "protection", name: "One-cell protection board (about 3 A trip)", description: "Small board that cuts the cell off at over-charge, over-discharge and over-current.", costEur: 1, specs: { overCurrentTripA: "3 A", overChargeCutoffV: "4.25 V", overDischargeCutoffV: "2.5 V" } },
  { key: "protection-1cell-high", kind: "protection", name: "One-cell protection board (about 8 A trip)", description: "Protection board for high-drain builds: the same cut-offs, a higher current trip.", costEur: 2, specs: { overCurrentTripA: "8 A", overChargeCutoffV: "4.25 V", overDischargeCutoffV: "2.5 V" } },
  // Salvaged-type heatsinks by size class
  { key: "sink-chipset", kind: "heatsink", name: "Small chipset sink (about 40 × 40 mm, 10 mm fins)", description: "The little finned sink from a motherboard chipset or a router: 9 thin fins on a 40 mm square base.", costEur: 0, specs: { rating: "geometry", baseLengthM: "40 mm", baseWidthM: "40 mm", baseThicknessM: "3 mm", finCount: 9, finHeightM: "10 mm", finThicknessM: "1 mm", finSpacingM: gap(40, 9, 1), material: "aluminium-6063-t5", finish: "black-anodised", massKg: "20 g" } },
  { key: "sink-finned-mid", kind: "heatsink", name: "Mid-size finned sink (about 60 × 80 mm, 25 mm fins)", description: "An extruded aluminium sink from an amplifier or power supply: 12 fins, 25 mm tall, on a 60 mm wide base.", costEur: 0, specs: { rating: "geometry", baseLengthM: "80 mm", baseWidthM: "60 mm", baseThicknessM: "5 mm", finCount: 12, finHeightM: "25 mm", finThicknessM: "1.5 mm", finSpacingM: gap(60, 12, 1.5), material: "aluminium-6063-t5", finish: "as-supplied", massKg: "120 g" } },
  { key: "sink-desktop-cpu", kind: "heatsink", name: "Desktop processor sink without its fan (about 90 × 90 mm, 40 mm fins)", description: "A desktop processor cooler with the fan taken off: many thin, close fins made for a fan — they choke in still air.", costEur: 0, specs: { rating: "geometry", baseLengthM: "90 mm", baseWidthM: "90 mm", baseThicknessM: "7 mm", finCount: 36, finHeightM: "40 mm", finThicknessM: "0.8 mm", finSpacingM: gap(90, 36, 0.8), material: "aluminium-6063-t5", finish: "as-supplied", massKg: "350 g" } },
  // Interface materials
  { key: "paste", kind: "interface", name: "Thermal paste (generic grey)", description: "Grey silicone paste from a tube, a thin even layer.", costEur: 1, specs: { specifiedAs: "bulk", conductivityWPerMK: "2 W/(m·K)", bondLineM: "50 µm" } },
  { key: "pad", kind: "interface", name: "Thermal pad, 0.5 mm", description: "Soft silicone pad cut to size; fills uneven gaps at the cost of resistance.", costEur: 1, specs: { specifiedAs: "bulk", conductivityWPerMK: "3 W/(m·K)", bondLineM: "0.5 mm" } },
  { key: "adhesive", kind: "interface", name: "Thermal adhesive (two-part)", description: "Two-part thermally conductive glue: bonds for good, conducts less than paste.", costEur: 3, specs: { specifiedAs: "bulk", conductivityWPerMK: "1 W/(m·K)", bondLineM: "100 µm" } },
  // Spreaders and straps
  { key: "copper-tape", kind: "spreader", name: "Copper tape, 25 mm wide (60 mm strip)", description: "Adhesive copper foil tape, about 0.1 mm thick, used to strap a driver to the body.", costEur: 1, specs: { material: "copper-pure", thicknessM: "0.1 mm", widthM: "25 mm", lengthM: "60 mm" } },
  { key: "aluminium-strip", kind: "spreader", name: "Aluminium strip, 20 × 1 mm (80 mm long)", description: "A strip of aluminium flat bar from the hardware shop, bent to reach the body.", costEur: 1, specs: { material: "aluminium-6061-t6", thicknessM: "1 mm", widthM: "20 mm", lengthM: "80 mm" } },
  // Housings
  { key: "housing-aluminium-torch", kind: "housing", name: "Aluminium torch body (about 25 mm × 120 mm)", description: "An anodised aluminium torch tube with its head and tail cap, closed against the weather.", costEur: 8, specs: { material: "aluminium-6061-t6", wallThicknessM: "1.5 mm", outerAreaM2: "105 cm²", innerAreaM2: "90 cm²", emissivity: "0.8", enclosure: "sealed", massKg: "60 g" } },
  { key: "housing-steel-lantern", kind: "housing", name: "Steel lantern (square, about 120 mm sides)", description: "A painted sheet-steel camping or railway lantern, 120 mm square and 180 mm tall.", costEur: 10, specs: { material: "steel-plain-carbon", wallThicknessM: "0.6 mm", outerAreaM2: "0.115 m²", emissivity: "0.85", enclosure: "sealed", massKg: "400 g" } },
  { key: "housing-brass-lamp", kind: "housing", name: "Brass lamp (bicycle headlamp size)", description: "An old brass lamp body about 70 mm across, aged rather than polished.", costEur: 12, specs: { material: "brass-cartridge", wallThicknessM: "0.8 mm", outerAreaM2: "0.02 m²", emissivity: "0.3", enclosure: "sealed", massKg: "150 g" } },
  { key: "housing-plastic-torch", kind: "housing", name: "Plastic torch body (about 30 mm × 150 mm)", description: "A moulded plastic torch: a poor conductor, so the heat path must not count on the shell.", costEur: 3, specs: { material: "plastic", wallThicknessM: "2 mm", outerAreaM2: "150 cm²", emissivity: "0.9", enclosure: "sealed", massKg: "40 g" } },
];

// A part whose material the materials list does not carry yet (plastic) waits for it.
export const STARTER_PARTS: readonly StarterPart[] = ALL_STARTER_PARTS.filter((p) => typeof p.specs.material !== "string" || isMaterialId(p.specs.material));

export function starterPart(key: string): StarterPart | undefined {
  return STARTER_PARTS.find((p) => p.key === key);
}

/** A starter part as a typed-in slot of a design (its values travel with the build). */
export function starterSlot(key: string): { name: string; inline: Record<string, unknown>; costEur: number } {
  const p = starterPart(key);
  if (!p) throw new Error(`no starter part ${key}`);
  return { name: p.name, inline: { ...p.specs }, costEur: p.costEur };
}
