import { declaredResistance, emissivityFor, finnedHeatsink, getMaterial, heatCapacity, naturalConvection, radiationExchange, type Finish, type FinnedHeatsinkGeometry, type Trace } from "@/lib/thermal";
import type { SpecsOfKind } from "@/lib/parts";
import type { ProblemList } from "../problems";
import { PLACES, type NetworkBuilder } from "./builder";

type HeatsinkSpecs = SpecsOfKind<"heatsink">;
type GeometrySpecs = Extract<HeatsinkSpecs, { rating: "geometry" }>;

/** Emissivity of a sink: the part's figure, else its material in its finish (Incropera Table A.11), else as supplied. */
export function sinkEmissivity(s: GeometrySpecs | HeatsinkSpecs): { e: number; note: string } {
  if (s.emissivity !== undefined && s.emissivity > 0) return { e: s.emissivity, note: "emissivity from the part" };
  const material = s.material ?? "aluminium-6063-t5";
  const finish: Finish = s.finish ?? "as-supplied";
  const t = emissivityFor(material, finish) ?? emissivityFor(material, "as-supplied");
  return t ? { e: t.emissivity, note: `emissivity of ${material}, ${finish} (${t.source})` } : { e: 0.5, note: "emissivity unknown: 0.5 assumed" };
}

/** Straight-fin geometry for the engine, or null (with a problem) when the fins cannot fit on the base. */
export function finGeometry(s: GeometrySpecs, field: string, problems: ProblemList): FinnedHeatsinkGeometry | null {
  const n = s.finCount;
  const t = s.finThicknessM ?? 0;
  if (s.finSpacingM !== undefined && t > s.finSpacingM) {
    problems.add(`${field}.finThicknessM`, `fins ${(t * 1000).toFixed(2)} mm thick are thicker than the ${(s.finSpacingM * 1000).toFixed(2)} mm gaps between them; check the measurements (the spacing used is worked out from the base width)`, "warning");
  }
  if (n * t >= s.baseWidthM) {
    problems.add(`${field}.finCount`, `${n} fins of ${(t * 1000).toFixed(2)} mm do not fit on a ${(s.baseWidthM * 1000).toFixed(1)} mm base`);
    return null;
  }
  const k = getMaterial(s.material ?? "")?.conductivityWPerMK ?? 200;
  return {
    baseWidthM: s.baseWidthM,
    baseLengthM: s.baseLengthM,
    baseThicknessM: s.baseThicknessM,
    finCount: n,
    finHeightM: s.finHeightM ?? 0.001,
    finThicknessM: t,
    conductivityWPerMK: k,
    emissivity: sinkEmissivity(s).e,
  };
}

export const baseAreaM2 = (s: HeatsinkSpecs): number | undefined => (s.rating === "geometry" ? s.baseLengthM * s.baseWidthM : undefined);

export function sinkCapacity(s: HeatsinkSpecs): { heatCapacityJPerK: number; trace: Trace } | undefined {
  const material = s.material ?? "aluminium-6063-t5";
  if (s.massKg !== undefined) return heatCapacity({ massKg: s.massKg, materialId: material });
  if (s.rating !== "geometry") return undefined;
  const fins = s.finCount * (s.finHeightM ?? 0) * (s.finThicknessM ?? 0) * s.baseLengthM;
  return heatCapacity({ volumeM3: s.baseLengthM * s.baseWidthM * s.baseThicknessM + fins, materialId: material });
}

/**
 * The sink's own path to the air it stands in (`to`): a declared rating, the finned model,
 * or a flat plate for a sink without fins. Returns the index of the link to ask the
 * "required sink resistance" question of, and a first estimate of its resistance.
 */
export function compileSinkToAir(b: NetworkBuilder, s: HeatsinkSpecs, to: string, field: string, guessC: number): { link: number; estimateKPerW: number } | null {
  const where = to === "ambient" ? "ambient air" : PLACES.air;
  if (s.rating === "declared") {
    const r = declaredResistance({ kelvinPerWatt: s.sinkToAirKPerW, source: "the heatsink's declared sink-to-air resistance, as entered by the part's author" });
    if (s.ratedAirflow === "forced") {
      b.problems.add(`${field}.ratedAirflow`, "the sink's resistance is rated with a fan; in still air inside a lamp it will be several times worse", "warning");
      r.trace.notes.push("Rated in forced air: optimistic for still air.");
    }
    r.trace.notes.push("A declared rating includes the sink's radiation and assumes open air at the rated conditions.");
    return { link: b.resistance("sink", to, s.sinkToAirKPerW, `heatsink → ${where} (declared)`, field, r.trace), estimateKPerW: s.sinkToAirKPerW };
  }
  if (s.finCount >= 2) {
    const g = finGeometry(s, field, b.problems);
    if (!g) return null;
    const link = b.link({ from: "sink", to, type: "finned-heatsink", ...g }, `heatsink → ${where} (finned, from geometry)`, field);
    const est = finnedHeatsink({ ...g, surfaceC: guessC + 30, ambientC: guessC });
    return { link, estimateKPerW: est.kelvinPerWatt };
  }
  // A flat plate (or one fin): its open face convects and radiates.
  const area = s.baseLengthM * s.baseWidthM;
  const em = sinkEmissivity(s);
  const link = b.link({ from: "sink", to, type: "natural-convection", areaM2: area, surface: "vertical-plate", characteristicLengthM: s.baseLengthM }, `heatsink plate → ${where} (convection)`, field);
  b.link({ from: "sink", to, type: "radiation", areaM2: area, emissivity: em.e }, `heatsink plate → surroundings (radiation; ${em.note})`, field);
  const h = naturalConvection({ surface: "vertical-plate", areaM2: area, characteristicLengthM: s.baseLengthM, surfaceC: guessC + 30, fluidC: guessC });
  const rad = radiationExchange({ areaM2: area, emissivity: em.e, surfaceC: guessC + 30, surroundingsC: guessC });
  return { link, estimateKPerW: 1 / (h.conductanceWPerK + rad.conductanceWPerK) };
}
