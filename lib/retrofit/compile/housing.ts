import { airPropertiesAt, conductionResistance, emissivityFor, getMaterial, heatCapacity, spreadingResistance, toKelvin, type Surface } from "@/lib/thermal";
import type { ResolvedBuild, ResolvedPart } from "../resolved";
import { q, seriesTrace, SOURCES, trace } from "../trace";
import { PLACES, type NetworkBuilder } from "./builder";

/** Combined outer coefficient (convection + radiation) used only as the far-side boundary of spreading in the wall: ≈ 10 W/(m²·K) in still air (estimate). */
const WALL_BOUNDARY_WPERM2K = 10;

export interface HousingGeometry {
  outerAreaM2: number;
  innerAreaM2: number;
  /** Box: side; tube: diameter. */
  lengthM: number;
  form: "box" | "tube";
  tubeLengthM: number;
  wallThicknessM: number;
  conductivity: number;
  sealed: boolean;
  /** Node that inside surfaces convect to: the enclosed air, or ambient for a vented housing. */
  inside: string;
}

export function housingGeometry(build: ResolvedBuild, housing: ResolvedPart<"housing">): HousingGeometry {
  const s = housing.specs;
  const form = build.housingShape.form;
  const a = s.outerAreaM2;
  // Without a stated size the housing is taken as a cube (box) or a tube four diameters long.
  const length = build.housingShape.characteristicLengthM ?? (form === "box" ? Math.sqrt(a / 6) : Math.sqrt(a / (4 * Math.PI)));
  const material = getMaterial(s.material);
  return {
    outerAreaM2: a,
    innerAreaM2: s.innerAreaM2 ?? a,
    lengthM: length,
    form,
    tubeLengthM: form === "tube" ? a / (Math.PI * length) : length,
    wallThicknessM: s.wallThicknessM,
    conductivity: material?.conductivityWPerMK ?? 50,
    sealed: s.enclosure === "sealed",
    inside: s.enclosure === "sealed" ? "air" : "ambient",
  };
}

function outerEmissivity(given: number | undefined, material: string): { e: number; note: string } {
  if (given !== undefined && given > 0) return { e: given, note: "emissivity from the housing part" };
  const t = emissivityFor(material, "as-supplied") ?? emissivityFor(material, "oxidised");
  return t ? { e: t.emissivity, note: `no emissivity on the part: ${t.source}, as supplied` } : { e: 0.5, note: "no emissivity on the part and none in the table: 0.5 assumed" };
}

/** Forced convection over the outer surface in a breeze: flat plate (box) or cylinder in cross-flow (tube). */
function breezeCoefficient(g: HousingGeometry, speed: number, ambientC: number) {
  const air = airPropertiesAt(toKelvin(ambientC));
  const re = (speed * g.lengthM) / air.kinematicViscosityM2PerS;
  const pr = air.prandtl;
  let nu: number;
  let source: string;
  let equation: string;
  if (g.form === "tube") {
    nu = 0.3 + ((0.62 * Math.sqrt(re) * pr ** (1 / 3)) / (1 + (0.4 / pr) ** (2 / 3)) ** 0.25) * (1 + (re / 282000) ** (5 / 8)) ** (4 / 5);
    equation = "Nu_D = 0.3 + 0.62·Re^½·Pr^⅓/[1 + (0.4/Pr)^⅔]^¼ · [1 + (Re/282000)^⅝]^⅘";
    source = `Churchill & Bernstein (1977), as ${SOURCES.incropera}, eq. 7.54`;
  } else {
    nu = 0.664 * Math.sqrt(re) * pr ** (1 / 3);
    equation = "Nu_L = 0.664·Re_L^½·Pr^⅓ (laminar flat plate)";
    source = `${SOURCES.incropera}, eq. 7.30`;
  }
  const h = (nu * air.conductivityWPerMK) / g.lengthM;
  return trace({
    element: "forced-convection",
    formula: g.form === "tube" ? "Cylinder in cross-flow" : "Flat plate in parallel flow, average",
    equation: `${equation}; h = Nu·k/L`,
    inputs: [q("V", "breeze speed", speed, "m/s"), q("L", g.form === "tube" ? "diameter" : "length along the flow", g.lengthM, "m"), q("T∞", "air temperature", ambientC, "°C")],
    intermediates: [q("Re", "Reynolds number", re, "1"), q("Pr", "Prandtl number", pr, "1"), q("Nu", "Nusselt number", nu, "1")],
    result: q("h", "heat transfer coefficient", h, "W/(m²·K)"),
    source: `${source}; air: ${air.source}`,
    notes: ["Forced convection alone (natural convection is small beside it in a breeze); air properties at ambient."],
  });
}

/**
 * Housing wall and (sealed) air nodes with every path to ambient. A housing of two
 * materials has a wall node for each, every outside path shared by area, and the two joined
 * by conduction along the wall (each part from its middle to the joint, as plane walls in
 * series).
 */
export function compileHousing(b: NetworkBuilder, build: ResolvedBuild, housing: ResolvedPart<"housing">, g: HousingGeometry): void {
  const s = housing.specs;
  const second = s.secondMaterial !== undefined && s.secondAreaM2 !== undefined && s.secondAreaM2 < g.outerAreaM2 ? { material: s.secondMaterial, areaM2: s.secondAreaM2, thicknessM: s.secondWallThicknessM ?? s.wallThicknessM } : null;
  const mainShare = second ? 1 - second.areaM2 / g.outerAreaM2 : 1;
  const cap =
    s.massKg !== undefined
      ? heatCapacity({ massKg: s.massKg * mainShare, materialId: s.material })
      : heatCapacity({ volumeM3: g.outerAreaM2 * mainShare * s.wallThicknessM, materialId: s.material });
  b.node("wall", PLACES.wall, "housing", cap);
  const em = outerEmissivity(housing.specs.emissivity, s.material);
  outside(b, build, g, "wall", mainShare, em, second ? ` (${getMaterial(s.material)?.name ?? s.material} part)` : "");
  if (second) {
    const m2 = getMaterial(second.material);
    b.node("wall-second", PLACES.wallSecond, "housing.secondMaterial", heatCapacity({ volumeM3: second.areaM2 * second.thicknessM, materialId: second.material }));
    outside(b, build, g, "wall-second", 1 - mainShare, outerEmissivity(undefined, second.material), ` (${m2?.name ?? second.material} part)`);
    // Heat crosses the joint along the wall: a ring as long as the housing's girth.
    const girth = g.form === "tube" ? Math.PI * g.lengthM : 4 * g.lengthM;
    const k1 = g.conductivity;
    const k2 = m2?.conductivityWPerMK ?? 0.2;
    const l1 = (g.outerAreaM2 * mainShare) / girth / 2;
    const l2 = second.areaM2 / girth / 2;
    const a1 = conductionResistance({ lengthM: l1, areaM2: girth * s.wallThicknessM, conductivityWPerMK: k1 });
    const a2 = conductionResistance({ lengthM: l2, areaM2: girth * second.thicknessM, conductivityWPerMK: k2 });
    const r = a1.kelvinPerWatt + a2.kelvinPerWatt;
    b.resistance("wall", "wall-second", r, "along the housing wall, across the joint of its two materials", "housing.secondMaterial", seriesTrace("housing-joint", [a1.trace, a2.trace], r, [`Each part conducts from its middle to the joint (${(l1 * 1000).toFixed(0)} mm and ${(l2 * 1000).toFixed(0)} mm) through a ring ${(girth * 1000).toFixed(0)} mm round; the joint itself taken as perfect.`]));
  }
  if (g.sealed) {
    b.node("air", PLACES.air, "housing");
    b.link({ from: "air", to: "wall", type: "natural-convection", areaM2: g.innerAreaM2 * mainShare, surface: "vertical-plate", characteristicLengthM: g.lengthM }, "housing air → inner wall (enclosed air taken as free convection on the inner wall)", "housing");
    if (second) b.link({ from: "air", to: "wall-second", type: "natural-convection", areaM2: g.innerAreaM2 * (1 - mainShare), surface: "vertical-plate", characteristicLengthM: g.lengthM }, "housing air → inner wall, second material", "housing.secondMaterial");
  }
}

/** The outside of a wall node (a share of the housing's outer area): convection to still air or a breeze, and radiation. */
function outside(b: NetworkBuilder, build: ResolvedBuild, g: HousingGeometry, id: string, share: number, em: { e: number; note: string }, what: string): void {
  const env = build.environment;
  // Lying on a table, the face underneath sheds next to nothing into the air: left out (conservative).
  const lyingBox = env.orientation === "lying" && g.form === "box";
  const exposed = (lyingBox ? (g.outerAreaM2 * 5) / 6 : g.outerAreaM2) * share;
  if (env.air.kind === "breeze") {
    const t = breezeCoefficient(g, env.air.speedMPerS, env.ambientC);
    b.link({ from: id, to: "ambient", type: "convection", areaM2: exposed, coefficientWPerM2K: t.result.value }, `housing outside${what} → breeze`, "environment.air", t);
  } else if (g.form === "tube") {
    const surface: Surface = env.orientation === "upright" ? "vertical-plate" : "horizontal-cylinder";
    const l = env.orientation === "upright" ? g.tubeLengthM : g.lengthM;
    b.link({ from: id, to: "ambient", type: "natural-convection", areaM2: exposed, surface, characteristicLengthM: l }, `housing outside${what} → still air (${surface})`, "environment.orientation");
  } else {
    const side = g.lengthM;
    const a = g.outerAreaM2 * share;
    b.link({ from: id, to: "ambient", type: "natural-convection", areaM2: (a * 4) / 6, surface: "vertical-plate", characteristicLengthM: side }, `housing sides${what} → still air`, "environment.orientation");
    b.link({ from: id, to: "ambient", type: "natural-convection", areaM2: a / 6, surface: "horizontal-plate-up", characteristicLengthM: side / 4 }, `housing top${what} → still air`, "environment.orientation");
    if (!lyingBox) b.link({ from: id, to: "ambient", type: "natural-convection", areaM2: a / 6, surface: "horizontal-plate-down", characteristicLengthM: side / 4 }, `housing bottom${what} → still air`, "environment.orientation");
  }
  b.link({ from: id, to: "ambient", type: "radiation", areaM2: exposed, emissivity: em.e }, `housing outside${what} → surroundings (radiation, ε ${em.e.toFixed(2)}${what ? "" : "; " + em.note})`, "housing.emissivity");
}

/** A hot spot on the wall where a part is pressed: spreading from the contact into the wall, to the wall's mean temperature. */
export function wallSpot(b: NetworkBuilder, id: "wall-engine" | "wall-driver", place: string, slot: string, contactAreaM2: number, g: HousingGeometry): string {
  b.node(id, place, slot);
  const r = spreadingResistance({ sourceAreaM2: contactAreaM2, plateAreaM2: g.outerAreaM2, plateThicknessM: g.wallThicknessM, conductivityWPerMK: g.conductivity, sinkCoefficientWPerM2K: WALL_BOUNDARY_WPERM2K });
  r.trace.notes.push(`Boundary on the outer face taken as ${WALL_BOUNDARY_WPERM2K} W/(m²·K) (convection + radiation, estimate); the wall node is the mean of the wall.`);
  b.resistance(id, "wall", r.kelvinPerWatt, `spreading into the housing wall (${place})`, slot, r.trace);
  return id;
}
