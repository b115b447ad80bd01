import { declaredResistance, getMaterial, heatCapacity, interfaceLayer, spreadingResistance, strapResistance, type Trace } from "@/lib/thermal";
import { finDirectionOf } from "../design-schema";
import type { ResolvedBuild } from "../resolved";
import { q, scaledTrace, seriesTrace, SOURCES, trace } from "../trace";
import { PLACES, type NetworkBuilder } from "./builder";
import type { HousingGeometry } from "./housing";
import { wallSpot } from "./housing";
import { joint } from "./joints";
import { baseAreaM2, compileSinkToAir, sinkCapacity } from "./heatsink";

/** Solder footprint of a mid-power package when the build gives none: 3.5 mm × 3.5 mm (a common package size). */
export const DEFAULT_FOOTPRINT_M2 = 3.5e-3 * 3.5e-3;
/** Heat capacity of one emitter package, ≈ 30 mg of ceramic and silicon at ≈ 700 J/(kg·K) (estimate). */
export const EMITTER_CAPACITY_J_PER_K = 0.02;

export interface LightEngineOut {
  /** Index of the sink's own link to the air (the "required resistance" link), if the build has a sink. */
  sinkLink: number | null;
  sinkRadiationLink: number | null;
  sinkEstimateKPerW: number | null;
}

/**
 * junction → solder point → (board) → heatsink → air, and/or → housing wall. N identical
 * emitters share one junction node: their parallel paths are R/N and their heat adds, so
 * the node's temperature is each emitter's Tj.
 */
export function compileLightEngine(b: NetworkBuilder, build: ResolvedBuild, g: HousingGeometry, sinkToAirKPerW: number | null, sinkRiseK: number | null = null): LightEngineOut | null {
  const le = build.lightEngine;
  const e = le.emitter;
  if (!e) {
    b.problems.add("lightEngine.emitter", "the build has no emitter");
    return null;
  }
  const n = le.count;
  const sink = le.heatsink;
  const mount = le.mount;
  if (!sink && mount.kind === "in-housing-air") {
    b.problems.add("lightEngine.heatsink", "the light engine sits in the housing air with no heatsink: give a heatsink, or press the board to the housing wall");
    return null;
  }
  const fp = le.footprintM2 ?? DEFAULT_FOOTPRINT_M2;
  if (le.footprintM2 === undefined) b.problems.add("lightEngine.footprintM2", "emitter footprint not given: 3.5 mm × 3.5 mm assumed for spreading", "info");

  const cj = n * EMITTER_CAPACITY_J_PER_K;
  b.node("junction", PLACES.junction, "lightEngine.emitter", {
    heatCapacityJPerK: cj,
    trace: trace({ element: "heat-capacity", formula: "Emitter packages", equation: "C = N·C_package", inputs: [q("N", "emitters", n, "1"), q("C_package", "one package (≈ 30 mg at ≈ 700 J/(kg·K), estimate)", EMITTER_CAPACITY_J_PER_K, "J/K")], result: q("C", "heat capacity", cj, "J/K"), source: "common practice (a small emitter package weighs tens of milligrams; estimate)" }),
  });
  b.node("solder", PLACES.solder, "lightEngine.emitter");
  const rj = declaredResistance({ kelvinPerWatt: e.specs.rthJspKPerW, source: `Rth(j-sp) of ${e.name}, ${SOURCES.datasheet}` });
  rj.trace.notes.push(n > 1 ? `${n} emitters side by side: parallel paths, R = Rth(j-sp)/${n}.` : "One emitter.");
  b.resistance("junction", "solder", e.specs.rthJspKPerW / n, "junction → solder point (Rth j-sp)", "lightEngine.emitter", rj.trace);

  const sinkArea = sink ? baseAreaM2(sink.specs) : undefined;
  const sinkK = sink ? (getMaterial(sink.specs.material ?? "")?.conductivityWPerMK ?? undefined) : undefined;
  const sinkThick = sink && sink.specs.rating === "geometry" ? sink.specs.baseThicknessM : undefined;
  // Spreading needs the resistance beyond the plate; the caller passes the last solve's value.
  const beyond = sinkToAirKPerW ?? 5;

  /** Spreading from a source into the sink base, when the base is known. */
  const intoBase = (sourceAreaM2: number, shares: number): Trace[] => {
    if (sinkArea === undefined || sinkK === undefined || sinkThick === undefined) return [];
    const r = spreadingResistance({ sourceAreaM2, plateAreaM2: sinkArea / shares, plateThicknessM: sinkThick, conductivityWPerMK: sinkK, sinkResistanceKPerW: beyond * shares });
    return [r.trace];
  };

  let top = "solder";
  let topArea = fp * n;
  if (le.board) {
    const bd = le.board;
    const k = getMaterial(bd.material)?.conductivityWPerMK ?? 150;
    b.node("board", PLACES.board, "lightEngine.board", heatCapacity({ volumeM3: bd.areaM2 * bd.thicknessM, materialId: bd.material }));
    const parts: Trace[] = [];
    if (bd.dielectricThicknessM !== undefined && bd.dielectricConductivityWPerMK !== undefined) {
      parts.push(interfaceLayer({ areaM2: fp, bondLineM: bd.dielectricThicknessM, conductivityWPerMK: bd.dielectricConductivityWPerMK }).trace);
    }
    const sp = spreadingResistance({ sourceAreaM2: fp, plateAreaM2: bd.areaM2 / n, plateThicknessM: bd.thicknessM, conductivityWPerMK: k, sinkResistanceKPerW: beyond * n });
    parts.push(sp.trace);
    const perEmitter = parts.reduce((s, t) => s + t.result.value, 0);
    const notes = n > 1 ? [`Each of the ${n} emitters spreads into 1/${n} of the board; the ${n} paths are in parallel.`] : [];
    b.resistance("solder", "board", perEmitter / n, "solder point → emitter board (dielectric, spreading)", "lightEngine.board", seriesTrace("board", parts, perEmitter / n, notes));
    top = "board";
    topArea = bd.areaM2;
  }

  let sinkLink: number | null = null;
  let sinkRadiationLink: number | null = null;
  let estimate: number | null = null;
  if (sink) {
    b.node("sink", PLACES.sink, "lightEngine.heatsink", sinkCapacity(sink.specs));
    if (!b.nodePlaces[b.nodePlaces.length - 1]!.heatCapacityTrace) b.problems.add("lightEngine.heatsink.massKg", "heatsink mass unknown: its warm-up is taken as instant (conservative)", "info");
    // The joint is taken over the combined footprint of all N emitters (topArea = N·footprint
    // without a board), so it is already the N paths in parallel: not divided again. The
    // spreading into the base is worked out per emitter (each into 1/N of the base) and the N
    // paths are then in parallel.
    const shares = top === "solder" ? n : 1;
    const jt = joint(le.interface, topArea, "lightEngine.interface", b.problems);
    const spread = intoBase(top === "solder" ? fp : topArea, shares);
    const r = jt.kelvinPerWatt + spread.reduce((s, t) => s + t.result.value / shares, 0);
    const notes = shares > 1 ? [`Interface over the ${n} emitters' combined footprint (${n} × footprint); spreading per emitter into 1/${n} of the base, the ${n} paths in parallel (R_spread/${n}).`] : [];
    b.resistance(top, "sink", r, `interface${spread.length ? " + spreading" : ""}, ${top === "solder" ? "emitter" : "board"} → heatsink`, "lightEngine.interface", seriesTrace("interface", [jt.trace, ...spread.map((t) => (shares > 1 ? scaledTrace(t, shares) : t))], r, notes));
    // Convection to the air around the sink; radiation to the housing wall it sees (air is transparent).
    const out = compileSinkToAir(b, sink.specs, g.inside, "lightEngine.heatsink", build.environment.ambientC, {
      sees: "wall",
      riseK: sinkRiseK,
      finDirection: finDirectionOf(le, build.environment),
    });
    if (!out) return null;
    sinkLink = out.link;
    sinkRadiationLink = out.radiationLink;
    estimate = out.estimateKPerW;
    top = "sink";
    topArea = sinkArea ?? topArea;
  }

  if (mount.kind === "pressed-to-wall") {
    const area = mount.contactAreaM2 ?? topArea;
    const spot = wallSpot(b, "wall-engine", PLACES.wallEngine, "lightEngine.mount", area, g);
    const jt = joint(mount.interface, area, "lightEngine.mount.interface", b.problems);
    b.resistance(top, spot, jt.kelvinPerWatt, `interface, ${top === "sink" ? "heatsink" : "board"} → housing wall`, "lightEngine.mount", jt.trace);
  } else if (mount.kind === "through-reflector") {
    const rf = mount.reflector;
    const k = getMaterial(rf.material)?.conductivityWPerMK ?? 150;
    const spot = wallSpot(b, "wall-engine", PLACES.wallEngine, "lightEngine.mount", rf.rimContactAreaM2, g);
    const along = strapResistance({ lengthM: rf.lengthM, thicknessM: rf.thicknessM, widthM: rf.meanCircumferenceM, conductivityWPerMK: k });
    along.trace.notes.push("Reflector cone taken as a strap as wide as its mean circumference; its joint to the sink is taken as perfect.");
    const jt = joint(mount.interface, rf.rimContactAreaM2, "lightEngine.mount.interface", b.problems);
    const r = along.kelvinPerWatt + jt.kelvinPerWatt;
    b.resistance(top, spot, r, `through the reflector → housing wall`, "lightEngine.mount", seriesTrace("reflector", [along.trace, jt.trace], r));
  }
  return { sinkLink, sinkRadiationLink, sinkEstimateKPerW: estimate };
}
