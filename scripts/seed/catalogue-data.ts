import type { PartInput } from "@/lib/parts";

// Handbook sources for material rows: the same tables lib/thermal/materials.ts takes its
// properties from, so what the part page cites is what the solver uses.
const INCROPERA_A1 = "Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1 (metallic solids, 300 K)";
const INCROPERA_A11 = "Incropera et al., 6th ed., Table A.11 (total normal emissivity)";
const GENERIC = "generic invented part for the demo workshop; figures typical of the class, not of a product";

/**
 * The shared catalogue for the demo workshop (old lamps refurbished for a coastal hiking
 * club): a square 6 V lantern turned 2-cell Li-ion light, a brass bicycle headlamp, a
 * workshop inspection lamp. Every part is invented and labelled `estimate`; no brands.
 * Keys are stable so other seeds (builds) can refer to these parts.
 */
export const CATALOGUE = {
  "emitter-3v-star": {
    kind: "emitter",
    name: "Generic 3 V white emitter on 16 mm star",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; mid-power white emitter, electrical Rth(j-sp)`,
    costEur: 4.5,
    specs: {
      rthJspKPerW: "2.5 K/W", maxTjC: "150 °C", vfV: "2.95 V", vfRefCurrentA: "1 A", vfTempCoeffVPerK: "-2 mV/K",
      efficacyLmPerW: "140 lm/W", heatFraction: "68 %", beamAngleDeg: "120°", boardLengthM: "16 mm", boardWidthM: "16 mm",
    },
    curves: {
      fluxVsTj: { points: [{ x: 25, y: 1 }, { x: 55, y: 0.95 }, { x: 85, y: 0.89 }, { x: 115, y: 0.83 }, { x: 150, y: 0.76 }] },
      fluxVsCurrent: { points: [{ x: 0.35, y: 0.4 }, { x: 0.7, y: 0.74 }, { x: 1, y: 1 }, { x: 2, y: 1.75 }, { x: 3, y: 2.3 }] },
      vfVsCurrent: { points: [{ x: 0.1, y: 2.65 }, { x: 0.35, y: 2.78 }, { x: 0.7, y: 2.88 }, { x: 1, y: 2.95 }, { x: 2, y: 3.12 }, { x: 3, y: 3.26 }] },
    },
  },
  "emitter-6v-cob": {
    kind: "emitter",
    name: "Generic 6 V warm-white emitter, 20 mm board",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; two dies in series for 2S packs`,
    costEur: 6,
    specs: {
      rthJspKPerW: "1.6 K/W", maxTjC: "135 °C", vfV: "5.8 V", vfRefCurrentA: "700 mA", vfTempCoeffVPerK: "-4 mV/K",
      efficacyLmPerW: "120 lm/W", heatFraction: "72 %", beamAngleDeg: "115°", boardLengthM: "20 mm", boardWidthM: "20 mm",
    },
    curves: { fluxVsTj: { points: [{ x: 25, y: 1 }, { x: 85, y: 0.87 }, { x: 135, y: 0.75 }] } },
  },
  "driver-buck-3mode": {
    kind: "driver",
    name: "Generic 2S buck driver, three modes",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; 17 mm round board meant to be pressed against a metal shelf`,
    costEur: 7,
    specs: {
      topology: "buck", inputVoltageMinV: "6 V", inputVoltageMaxV: "8.4 V",
      modes: [
        { name: "low", outputCurrentA: "350 mA", efficiency: "88 %" },
        { name: "mid", outputCurrentA: "1 A", efficiency: "90 %" },
        { name: "high", outputCurrentA: "2.5 A", efficiency: "86 %" },
      ],
      maxBoardTempC: "100 °C", boardAreaM2: "2.3 cm^2", groundPlaneAreaM2: "1.8 cm^2",
    },
    curves: { efficiencyVsLoad: { points: [{ x: 0.2, y: 0.82 }, { x: 0.5, y: 0.89 }, { x: 1, y: 0.9 }, { x: 2, y: 0.87 }, { x: 2.8, y: 0.84 }] } },
  },
  "driver-linear-1cell": {
    kind: "driver",
    name: "Generic 1-cell linear driver, two modes",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; efficiency is Vf ÷ V_in, shown at a half-charged cell`,
    costEur: 3,
    specs: {
      topology: "linear", inputVoltageMinV: "3 V", inputVoltageMaxV: "4.2 V",
      modes: [
        { name: "low", outputCurrentA: "300 mA", efficiency: "80 %" },
        { name: "high", outputCurrentA: "1.4 A", efficiency: "82 %" },
      ],
      maxBoardTempC: "110 °C", boardAreaM2: "1.5 cm^2", groundPlaneAreaM2: "1 cm^2",
    },
  },
  "heatsink-salvaged-finned": {
    kind: "heatsink",
    name: "Salvaged finned sink (from an old projector)",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; measured-style geometry of a tightly finned fan-cooled sink`,
    costEur: 0,
    specs: {
      rating: "geometry", baseLengthM: "50 mm", baseWidthM: "40 mm", baseThicknessM: "4 mm", finCount: 11,
      finHeightM: "18 mm", finThicknessM: "1 mm", finSpacingM: "2.9 mm", material: "aluminium-6063-t5", finish: "black-anodised", massKg: "62 g",
    },
  },
  "heatsink-declared-star": {
    kind: "heatsink",
    name: "Generic round pin sink, declared 12 K/W",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; seller-style rating in still air at 3 W`,
    costEur: 2.5,
    specs: { rating: "declared", sinkToAirKPerW: "12 K/W", ratedAirflow: "natural", ratedPowerW: "3 W", ratedAmbientC: "25 °C", material: "aluminium-6063-t5", finish: "anodised", massKg: "18 g" },
  },
  "interface-paste": {
    kind: "interface",
    name: "Generic grey thermal paste",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; silicone paste, bond line of a hand-pressed joint`,
    costEur: 3,
    specs: { specifiedAs: "bulk", conductivityWPerMK: "3 W/(m K)", bondLineM: "50 um" },
  },
  "interface-pad": {
    kind: "interface",
    name: "Generic silicone gap pad, 0.5 mm",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; soft pad compressed by about 20 %`,
    costEur: 2,
    specs: { specifiedAs: "bulk", conductivityWPerMK: "1.5 W/(m K)", bondLineM: "0.4 mm" },
  },
  "interface-adhesive-tape": {
    kind: "interface",
    name: "Generic thermal adhesive tape",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; given as resistance per area, as tapes usually are`,
    costEur: 2,
    specs: { specifiedAs: "perArea", resistancePerAreaKM2PerW: "2 K cm^2/W" },
  },
  "spreader-copper-tape": {
    kind: "spreader",
    name: "Copper tape strap, 25 mm × 0.07 mm",
    provenance: "estimate",
    provenanceNote: `copper properties: ${INCROPERA_A1}; tape thickness typical of foil tape without its adhesive`,
    costEur: 1,
    specs: { material: "copper-pure", thicknessM: "0.07 mm", widthM: "25 mm", lengthM: "80 mm" },
  },
  "spreader-aluminium-plate": {
    kind: "spreader",
    name: "Aluminium plate, 2 mm (6061-T6 offcut)",
    provenance: "estimate",
    provenanceNote: `aluminium 6061-T6 properties: ASM Handbook Vol. 2; cut from workshop offcuts`,
    costEur: 1.5,
    specs: { material: "aluminium-6061-t6", thicknessM: "2 mm", widthM: "40 mm", lengthM: "60 mm" },
  },
  "housing-steel-lantern": {
    kind: "housing",
    name: "Square 6 V lantern box, painted steel",
    provenance: "estimate",
    provenanceNote: `steel properties: ${INCROPERA_A1}; emissivity of painted steel: ${INCROPERA_A11}`,
    specs: { material: "steel-plain-carbon", wallThicknessM: "0.6 mm", outerAreaM2: "620 cm^2", innerAreaM2: "600 cm^2", emissivity: 0.9, enclosure: "sealed", massKg: "380 g" },
  },
  "housing-brass-headlamp": {
    kind: "housing",
    name: "Brass bicycle headlamp shell",
    provenance: "estimate",
    provenanceNote: `brass properties: ${INCROPERA_A1}; emissivity of lightly oxidised brass: ${INCROPERA_A11}`,
    specs: { material: "brass-cartridge", wallThicknessM: "0.8 mm", outerAreaM2: "210 cm^2", innerAreaM2: "195 cm^2", emissivity: 0.3, enclosure: "vented", massKg: "240 g" },
  },
  "housing-aluminium-tube": {
    kind: "housing",
    name: "Aluminium inspection lamp tube, anodised",
    provenance: "estimate",
    provenanceNote: `aluminium properties: ${INCROPERA_A1}; emissivity of anodised aluminium: ${INCROPERA_A11}`,
    specs: { material: "aluminium-6063-t5", wallThicknessM: "1.5 mm", outerAreaM2: "150 cm^2", innerAreaM2: "135 cm^2", emissivity: 0.84, enclosure: "sealed", massKg: "110 g" },
  },
  "cell-18650-3000": {
    kind: "cell",
    name: "Generic 18650-size Li-ion cell, 3000 mAh",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; protected cells are longer, check the holder`,
    costEur: 5,
    specs: {
      chemistry: "li-ion", nominalVoltageV: "3.6 V", chargeEndVoltageV: "4.2 V", cutoffVoltageV: "2.5 V", capacityCoulomb: "3000 mAh",
      internalResistanceOhm: "35 mohm", massKg: "46 g", chargeTempMinC: "0 °C", chargeTempMaxC: "45 °C", dischargeTempMinC: "-20 °C",
      dischargeTempMaxC: "60 °C", maxChargeCurrentA: "1.5 A", maxDischargeCurrentA: "10 A",
    },
  },
  "cell-18650-2500-hp": {
    kind: "cell",
    name: "Generic 18650-size high-drain cell, 2500 mAh",
    provenance: "estimate",
    provenanceNote: GENERIC,
    costEur: 6,
    specs: {
      chemistry: "li-ion", nominalVoltageV: "3.6 V", chargeEndVoltageV: "4.2 V", cutoffVoltageV: "2.5 V", capacityCoulomb: "2500 mAh",
      internalResistanceOhm: "20 mohm", massKg: "45 g", chargeTempMinC: "0 °C", chargeTempMaxC: "45 °C", dischargeTempMinC: "-20 °C",
      dischargeTempMaxC: "75 °C", maxChargeCurrentA: "4 A", maxDischargeCurrentA: "20 A",
    },
  },
  "charger-linear-usb": {
    kind: "charger",
    name: "Generic USB linear charger board, 1 A",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; dissipates (V_in − V_bat) × I, most at the start of CV`,
    costEur: 1,
    specs: { topology: "linear", chargeCurrentA: "1 A", inputVoltageV: "5 V", parallelCount: 1 },
  },
  "charger-switching-2s": {
    kind: "charger",
    name: "Generic 2S switching charger board, 2 A",
    provenance: "estimate",
    provenanceNote: GENERIC,
    costEur: 4,
    specs: { topology: "switching", chargeCurrentA: "2 A", inputVoltageV: "12 V", efficiency: "88 %", parallelCount: 1 },
  },
  "protection-1s": {
    kind: "protection",
    name: "Generic one-cell protection board",
    provenance: "estimate",
    provenanceNote: `${GENERIC}; cut-offs typical of single-cell protection ICs`,
    costEur: 1,
    specs: { overCurrentTripA: "4 A", overChargeCutoffV: "4.25 V", overDischargeCutoffV: "2.5 V" },
  },
} as const satisfies Record<string, PartInput>;

export type CatalogueKey = keyof typeof CATALOGUE;
