import { getMaterial } from "../materials";
import { ThermalInputError } from "../errors";
import { elementResult, makeTrace, quantity, type ElementResult, type Trace } from "../trace";

const INCROPERA = 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed.';

/** A declared resistance, e.g. Rth(j-sp) from a datasheet or a heatsink's rating. */
export function declaredResistance(input: { kelvinPerWatt: number; source?: string }): ElementResult {
  const trace = makeTrace({
    element: "resistance",
    formula: "Declared thermal resistance",
    equation: "R = R_declared",
    inputs: [quantity("R", "declared resistance", input.kelvinPerWatt, "K/W")],
    result: quantity("R", "resistance", input.kelvinPerWatt, "K/W"),
    source: input.source ?? "as entered by the network's author (datasheet or measurement)",
  });
  return elementResult(1 / input.kelvinPerWatt, trace);
}

/** One-dimensional conduction through a slab, R = L/(k·A). */
export function conductionResistance(input: { lengthM: number; areaM2: number; conductivityWPerMK: number }): ElementResult {
  const r = input.lengthM / (input.conductivityWPerMK * input.areaM2);
  const trace = makeTrace({
    element: "conduction",
    formula: "Plane wall, one-dimensional conduction",
    equation: "R = L / (k·A)",
    inputs: [
      quantity("L", "length along the heat flow", input.lengthM, "m"),
      quantity("A", "cross-section", input.areaM2, "m²"),
      quantity("k", "conductivity", input.conductivityWPerMK, "W/(m·K)"),
    ],
    result: quantity("R", "resistance", r, "K/W"),
    source: `${INCROPERA}, eq. 3.6`,
  });
  return elementResult(1 / r, trace);
}

/** Convection with a given coefficient, R = 1/(h·A). */
export function convectionResistance(input: { areaM2: number; coefficientWPerM2K: number }): ElementResult {
  const g = input.areaM2 * input.coefficientWPerM2K;
  const trace = makeTrace({
    element: "convection",
    formula: "Newton's law of cooling",
    equation: "G = h·A",
    inputs: [quantity("A", "area", input.areaM2, "m²"), quantity("h", "heat transfer coefficient", input.coefficientWPerM2K, "W/(m²·K)")],
    result: quantity("G", "conductance", g, "W/K"),
    source: `${INCROPERA}, eq. 1.3a`,
  });
  return elementResult(g, trace);
}

export type InterfaceInput =
  | { areaM2: number; bondLineM: number; conductivityWPerMK: number }
  | { areaM2: number; resistancePerAreaM2KPerW: number };

/** A thermal interface (grease, pad, adhesive, solder): bond line / (k·A), or R″/A from a datasheet. */
export function interfaceLayer(input: InterfaceInput): ElementResult {
  let r: number;
  let trace: Trace;
  if ("resistancePerAreaM2KPerW" in input) {
    r = input.resistancePerAreaM2KPerW / input.areaM2;
    trace = makeTrace({
      element: "interface",
      formula: "Interface resistance from resistance per area",
      equation: "R = R″ / A",
      inputs: [quantity("R″", "resistance per area", input.resistancePerAreaM2KPerW, "m²·K/W"), quantity("A", "contact area", input.areaM2, "m²")],
      result: quantity("R", "resistance", r, "K/W"),
      source: `${INCROPERA}, §3.1.4 (thermal contact resistance, eq. 3.20)`,
    });
  } else {
    r = input.bondLineM / (input.conductivityWPerMK * input.areaM2);
    trace = makeTrace({
      element: "interface",
      formula: "Interface layer as a thin slab",
      equation: "R = BLT / (k·A)",
      inputs: [
        quantity("BLT", "bond-line thickness", input.bondLineM, "m"),
        quantity("k", "layer conductivity", input.conductivityWPerMK, "W/(m·K)"),
        quantity("A", "contact area", input.areaM2, "m²"),
      ],
      result: quantity("R", "resistance", r, "K/W"),
      source: `${INCROPERA}, eq. 3.6 applied to the bond line`,
      notes: ["Contact resistance at the two faces of the layer is not included; add it as resistance per area if known."],
    });
  }
  return elementResult(1 / r, trace);
}

/** A thin strap or tape carrying heat along its length, R = L/(k·t·w). */
export function strapResistance(input: { lengthM: number; thicknessM: number; widthM: number; conductivityWPerMK: number }): ElementResult {
  const r = input.lengthM / (input.conductivityWPerMK * input.thicknessM * input.widthM);
  const trace = makeTrace({
    element: "strap",
    formula: "Thin strap, conduction along its length",
    equation: "R = L / (k·t·w)",
    inputs: [
      quantity("L", "length", input.lengthM, "m"),
      quantity("t", "thickness", input.thicknessM, "m"),
      quantity("w", "width", input.widthM, "m"),
      quantity("k", "conductivity", input.conductivityWPerMK, "W/(m·K)"),
    ],
    result: quantity("R", "resistance", r, "K/W"),
    source: `${INCROPERA}, eq. 3.6 with A = t·w`,
    notes: ["Adhesive layers at the two ends are separate interface elements."],
  });
  return elementResult(1 / r, trace);
}

export type HeatCapacityInput =
  | { massKg: number; specificHeatJPerKgK: number }
  | { massKg: number; materialId: string }
  | { volumeM3: number; materialId: string };

/** Heat capacity of a lumped part, C = m·c_p (mass given, or volume × the material's density). */
export function heatCapacity(input: HeatCapacityInput): { heatCapacityJPerK: number; trace: Trace } {
  let mass: number;
  let cp: number;
  let source: string;
  const inputs = [];
  if ("specificHeatJPerKgK" in input) {
    mass = input.massKg;
    cp = input.specificHeatJPerKgK;
    source = "specific heat as entered by the network's author";
    inputs.push(quantity("m", "mass", mass, "kg"), quantity("c_p", "specific heat", cp, "J/(kg·K)"));
  } else {
    const material = getMaterial(input.materialId);
    if (!material) throw new ThermalInputError("bad_request:material", `unknown material "${input.materialId}"`, "materialId");
    cp = material.specificHeatJPerKgK;
    source = material.source;
    if ("massKg" in input) {
      mass = input.massKg;
      inputs.push(quantity("m", "mass", mass, "kg"));
    } else {
      mass = input.volumeM3 * material.densityKgPerM3;
      inputs.push(quantity("V", "volume", input.volumeM3, "m³"), quantity("ρ", `density of ${material.name}`, material.densityKgPerM3, "kg/m³"));
    }
    inputs.push(quantity("c_p", `specific heat of ${material.name}`, cp, "J/(kg·K)"));
  }
  const c = mass * cp;
  return {
    heatCapacityJPerK: c,
    trace: makeTrace({
      element: "heat-capacity",
      formula: "Lumped heat capacity",
      equation: "C = m·c_p",
      inputs,
      intermediates: [quantity("m", "mass", mass, "kg")],
      result: quantity("C", "heat capacity", c, "J/K"),
      source,
    }),
  };
}
