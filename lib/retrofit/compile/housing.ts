import { airPropertiesAt, emissivityFor, getMaterial, heatCapacity, spreadingResistance, toKelvin, type Surface } from "@/lib/thermal";
import type { ResolvedBuild, ResolvedPart } from "../resolved";
import { q, SOURCES, trace } from "../trace";
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

function outerEmissivity(housing: ResolvedPart<"housing">): { e: number; note: string } {
  if (housing.specs.emissivity !== undefined && housing.specs.emissivity > 0) return { e: housing.specs.emissivity, note: "emissivity from the housing part" };
  const t = emissivityFor(housing.specs.material, "as-supplied") ?? emissivityFor(housing.specs.material, "oxidised");
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

/** Housing wall and (sealed) air nodes with every path to ambient. */
export function compileHousing(b: NetworkBuilder, build: ResolvedBuild, housing: ResolvedPart<"housing">, g: HousingGeometry): void {
  const s = housing.specs;
  const cap = s.massKg !== undefined ? heatCapacity({ massKg: s.massKg, materialId: s.material }) : heatCapacity({ volumeM3: g.outerAreaM2 * s.wallThicknessM, materialId: s.material });
  b.node("wall", PLACES.wall, "housing", cap);
  const env = build.environment;
  // Lying on a table, the face underneath sheds next to nothing into the air: left out (conservative).
  const lyingBox = env.orientation === "lying" && g.form === "box";
  const exposed = lyingBox ? (g.outerAreaM2 * 5) / 6 : g.outerAreaM2;
  if (env.air.kind === "breeze") {
    const t = breezeCoefficient(g, env.air.speedMPerS, env.ambientC);
    b.link({ from: "wall", to: "ambient", type: "convection", areaM2: exposed, coefficientWPerM2K: t.result.value }, "housing outside → breeze", "environment.air", t);
  } else if (g.form === "tube") {
    const surface: Surface = env.orientation === "upright" ? "vertical-plate" : "horizontal-cylinder";
    const l = env.orientation === "upright" ? g.tubeLengthM : g.lengthM;
    b.link({ from: "wall", to: "ambient", type: "natural-convection", areaM2: exposed, surface, characteristicLengthM: l }, `housing outside → still air (${surface})`, "environment.orientation");
  } else {
    const side = g.lengthM;
    b.link({ from: "wall", to: "ambient", type: "natural-convection", areaM2: (g.outerAreaM2 * 4) / 6, surface: "vertical-plate", characteristicLengthM: side }, "housing sides → still air", "environment.orientation");
    b.link({ from: "wall", to: "ambient", type: "natural-convection", areaM2: g.outerAreaM2 / 6, surface: "horizontal-plate-up", characteristicLengthM: side / 4 }, "housing top → still air", "environment.orientation");
    if (!lyingBox) b.link({ from: "wall", to: "ambient", type: "natural-convection", areaM2: g.outerAreaM2 / 6, surface: "horizontal-plate-down", characteristicLengthM: side / 4 }, "housing bottom → still air", "environment.orientation");
  }
  const em = outerEmissivity(housing);
  b.link({ from: "wall", to: "ambient", type: "radiation", areaM2: exposed, emissivity: em.e }, `housing outside → surroundings (radiation; ${em.note})`, "housing.emissivity");
  if (g.sealed) {
    b.node("air", PLACES.air, "housing");
    b.link({ from: "air", to: "wall", type: "natural-convection", areaM2: g.innerAreaM2, surface: "vertical-plate", characteristicLengthM: g.lengthM }, "housing air → inner wall (enclosed air taken as free convection on the inner wall)", "housing");
  }
}

/** A hot spot on the wall where a part is pressed: spreading from the contact into the wall, to the wall's mean temperature. */
export function wallSpot(b: NetworkBuilder, id: "wall-engine" | "wall-driver", place: string, slot: string, contactAreaM2: number, g: HousingGeometry): string {
  b.node(id, place, slot);
  const r = spreadingResistance({ sourceAreaM2: contactAreaM2, plateAreaM2: g.outerAreaM2, plateThicknessM: g.wallThicknessM, conductivityWPerMK: g.conductivity, sinkCoefficientWPerM2K: WALL_BOUNDARY_WPERM2K });
  r.trace.notes.push(`Boundary on the outer face taken as ${WALL_BOUNDARY_WPERM2K} W/(m²·K) (convection + radiation, estimate); the wall node is the mean of the wall.`);
  b.resistance(id, "wall", r.kelvinPerWatt, `spreading into the housing wall (${place})`, slot, r.trace);
  return id;
}
