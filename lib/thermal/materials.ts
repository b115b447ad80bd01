/**
 * Solids a lamp retrofit is made of. Conductivity, density and specific heat near 300 K;
 * emissivity by surface finish near room temperature. Every row names the table it comes
 * from. The values were transcribed from memory of those printed tables (the third digit
 * deserves a check against a copy before a worked example leans on it).
 */
export type Finish = "polished" | "as-supplied" | "oxidised" | "anodised" | "black-anodised" | "painted";

export interface Material {
  id: string;
  name: string;
  conductivityWPerMK: number;
  densityKgPerM3: number;
  specificHeatJPerKgK: number;
  /** Emissivity by finish; only the finishes the material is actually sold in. */
  emissivity: Partial<Record<Finish, number>>;
  source: string;
  emissivitySource: string;
}

const INCROPERA_A1 = 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., Table A.1 (metallic solids, 300 K)';
const INCROPERA_A3 = 'Incropera et al., "Fundamentals of Heat and Mass Transfer", 6th ed., Table A.3 (common materials, 300 K)';
const ASM_VOL2 = '"ASM Handbook, Vol. 2: Properties and Selection — Nonferrous Alloys" (wrought aluminium alloy data sheets)';
const POLYMERS = 'J. E. Mark (ed.), "Physical Properties of Polymers Handbook", 2nd ed., Springer 2007 (thermal conductivity and heat capacity chapters; typical unfilled grades near 300 K; values from memory — check against a copy)';
const POLYMER_EMISSIVITY = "from memory of published total emissivities of plastics (0.85–0.95 for opaque grades) — check against a copy";
const INCROPERA_A11 = 'Incropera et al., "Fundamentals of Heat and Mass Transfer", 6th ed., Table A.11 (total normal emissivity)';

export const MATERIALS: readonly Material[] = [
  {
    id: "aluminium-pure",
    name: "Aluminium, pure",
    conductivityWPerMK: 237,
    densityKgPerM3: 2702,
    specificHeatJPerKgK: 903,
    emissivity: { polished: 0.05, "as-supplied": 0.09, anodised: 0.84 },
    source: INCROPERA_A1,
    emissivitySource: INCROPERA_A11,
  },
  {
    id: "aluminium-6063-t5",
    name: "Aluminium alloy 6063-T5 (extruded heatsinks)",
    conductivityWPerMK: 209,
    densityKgPerM3: 2700,
    specificHeatJPerKgK: 900,
    emissivity: { polished: 0.05, "as-supplied": 0.09, anodised: 0.84, "black-anodised": 0.88, painted: 0.9 },
    source: ASM_VOL2,
    emissivitySource: INCROPERA_A11,
  },
  {
    id: "aluminium-6061-t6",
    name: "Aluminium alloy 6061-T6 (machined parts, plate)",
    conductivityWPerMK: 167,
    densityKgPerM3: 2700,
    specificHeatJPerKgK: 896,
    emissivity: { polished: 0.05, "as-supplied": 0.09, anodised: 0.84, "black-anodised": 0.88, painted: 0.9 },
    source: ASM_VOL2,
    emissivitySource: INCROPERA_A11,
  },
  {
    id: "aluminium-2024-t6",
    name: "Aluminium alloy 2024-T6",
    conductivityWPerMK: 177,
    densityKgPerM3: 2770,
    specificHeatJPerKgK: 875,
    emissivity: { polished: 0.05, "as-supplied": 0.09, anodised: 0.84 },
    source: INCROPERA_A1,
    emissivitySource: INCROPERA_A11,
  },
  {
    id: "copper-pure",
    name: "Copper, pure (tape, straps, slugs)",
    conductivityWPerMK: 401,
    densityKgPerM3: 8933,
    specificHeatJPerKgK: 385,
    emissivity: { polished: 0.03, "as-supplied": 0.07, oxidised: 0.5, painted: 0.9 },
    source: INCROPERA_A1,
    emissivitySource: INCROPERA_A11,
  },
  {
    id: "brass-cartridge",
    name: "Brass, cartridge (70 Cu – 30 Zn)",
    conductivityWPerMK: 110,
    densityKgPerM3: 8530,
    specificHeatJPerKgK: 380,
    emissivity: { polished: 0.03, "as-supplied": 0.2, oxidised: 0.6, painted: 0.9 },
    source: INCROPERA_A1,
    emissivitySource: INCROPERA_A11,
  },
  {
    id: "bronze-commercial",
    name: "Bronze, commercial (90 Cu – 10 Al)",
    conductivityWPerMK: 52,
    densityKgPerM3: 8800,
    specificHeatJPerKgK: 420,
    emissivity: { polished: 0.1, oxidised: 0.6 },
    source: INCROPERA_A1,
    emissivitySource: INCROPERA_A11,
  },
  {
    id: "steel-plain-carbon",
    name: "Steel, plain carbon",
    conductivityWPerMK: 60.5,
    densityKgPerM3: 7854,
    specificHeatJPerKgK: 434,
    emissivity: { polished: 0.07, oxidised: 0.8, painted: 0.9 },
    source: INCROPERA_A1,
    emissivitySource: INCROPERA_A11,
  },
  {
    id: "stainless-304",
    name: "Stainless steel AISI 304",
    conductivityWPerMK: 14.9,
    densityKgPerM3: 7900,
    specificHeatJPerKgK: 477,
    emissivity: { polished: 0.17, "as-supplied": 0.3, oxidised: 0.6, painted: 0.9 },
    source: INCROPERA_A1,
    emissivitySource: INCROPERA_A11,
  },
  {
    id: "abs",
    name: "ABS plastic",
    conductivityWPerMK: 0.17,
    densityKgPerM3: 1050,
    specificHeatJPerKgK: 1400,
    emissivity: { "as-supplied": 0.9, painted: 0.9 },
    source: POLYMERS,
    emissivitySource: POLYMER_EMISSIVITY,
  },
  {
    id: "polycarbonate",
    name: "Polycarbonate (PC)",
    conductivityWPerMK: 0.2,
    densityKgPerM3: 1200,
    specificHeatJPerKgK: 1200,
    emissivity: { "as-supplied": 0.9, painted: 0.9 },
    source: POLYMERS,
    emissivitySource: POLYMER_EMISSIVITY,
  },
  {
    id: "polyamide-66",
    name: "Polyamide PA 66 (nylon)",
    conductivityWPerMK: 0.25,
    densityKgPerM3: 1140,
    specificHeatJPerKgK: 1670,
    emissivity: { "as-supplied": 0.9, painted: 0.9 },
    source: POLYMERS,
    emissivitySource: POLYMER_EMISSIVITY,
  },
  {
    id: "acrylic-pmma",
    name: "Acrylic (PMMA)",
    conductivityWPerMK: 0.19,
    densityKgPerM3: 1190,
    specificHeatJPerKgK: 1470,
    emissivity: { "as-supplied": 0.9, painted: 0.9 },
    source: POLYMERS,
    emissivitySource: POLYMER_EMISSIVITY,
  },
  {
    id: "glass-soda-lime",
    name: "Glass, plate (soda lime)",
    conductivityWPerMK: 1.4,
    densityKgPerM3: 2500,
    specificHeatJPerKgK: 750,
    emissivity: { "as-supplied": 0.9 },
    source: INCROPERA_A3,
    emissivitySource: INCROPERA_A11,
  },
];

const BY_ID = new Map(MATERIALS.map((m) => [m.id, m]));

export function getMaterial(id: string): Material | undefined {
  return BY_ID.get(id);
}

/** Emissivity of a material in a finish, with the table it comes from; undefined where the table has no such finish. */
export function emissivityFor(materialId: string, finish: Finish): { emissivity: number; source: string } | undefined {
  const m = BY_ID.get(materialId);
  const e = m?.emissivity[finish];
  return m && e !== undefined ? { emissivity: e, source: m.emissivitySource } : undefined;
}
