import { extend, makeTrace, quantity, type NetworkLink, type Trace } from "@/lib/thermal";
import type { Calibration, CalibrationParameter } from "../design-schema";
import { CALIBRATION_LABELS } from "../design-labels";
import type { LinkCalibration, NetworkBuilder } from "./builder";

export { CALIBRATION_LABELS };

export const CALIBRATION_SOURCE =
  'measured: one factor fitted by least squares to a bench run of the finished build; Press, Teukolsky, Vetterling & Flannery, "Numerical Recipes", 3rd ed., §15.5–15.6 (from memory — check against a copy)';

const convective = (l: NetworkLink) => l.type === "natural-convection" || l.type === "convection";

/** Indices of the links a parameter scales (links it cannot scale by a factor, such as a finned sink's, are left out). */
export function calibratedLinkIndices(parameter: CalibrationParameter, links: readonly NetworkLink[], sinkLink: number | null): number[] {
  switch (parameter) {
    case "sink-rating":
      return sinkLink !== null && links[sinkLink]?.type === "resistance" ? [sinkLink] : [];
    case "inside-air":
      return links.flatMap((l, i) => ((l.from === "air" || l.to === "air") && convective(l) ? [i] : []));
    case "outside-air":
      return links.flatMap((l, i) => ((l.from === "wall" || l.from === "wall-second") && l.to === "ambient" && convective(l) ? [i] : []));
  }
}

/** The link with its conductance multiplied by `f` (its area for a surface, its resistance divided for a resistance). */
export function scaleLink(link: NetworkLink, f: number): NetworkLink {
  switch (link.type) {
    case "resistance":
      return extend(link, { kelvinPerWatt: link.kelvinPerWatt / f });
    case "conduction":
    case "convection":
    case "natural-convection":
    case "radiation":
      return extend(link, { areaM2: link.areaM2 * f });
    case "finned-heatsink":
      return link;
  }
}

/**
 * Applies a revision's calibration to the compiled links: each link the parameter names has
 * its conductance multiplied by the factor, and its place records that (for its trace).
 * Returns how many links were scaled.
 */
export function applyCalibration(b: NetworkBuilder, calibration: Calibration, sinkLink: number | null): number {
  const indices = calibratedLinkIndices(calibration.parameter, b.links, sinkLink);
  for (const i of indices) {
    b.links[i] = scaleLink(b.links[i]!, calibration.factor);
    const place = b.linkPlaces[i];
    if (place) place.calibration = { factor: calibration.factor, parameter: calibration.parameter, runTitle: calibration.run.title, readingCount: calibration.readingCount };
  }
  if (indices.length === 0) b.problems.add("calibration", `the calibration of ${CALIBRATION_LABELS[calibration.parameter].name} has no link to correct in this build (its heat path changed since): it is left out`, "warning");
  return indices.length;
}

/** The trace of a calibrated link: the model's own trace as its part, times the fitted factor. */
export function calibratedTrace(model: Trace, c: LinkCalibration): Trace {
  const conductance = model.result.unit === "W/K";
  const value = conductance ? model.result.value * c.factor : model.result.value / c.factor;
  return makeTrace({
    element: "calibrated",
    formula: `${CALIBRATION_LABELS[c.parameter].name[0]!.toUpperCase()}${CALIBRATION_LABELS[c.parameter].name.slice(1)}, corrected by a bench run`,
    equation: conductance ? "G = f·G_model" : "R = R_model / f",
    inputs: [quantity(conductance ? "G_model" : "R_model", `as modelled: ${model.formula}`, model.result.value, model.result.unit), quantity("f", "factor on the conductance, fitted to the run", c.factor, "1")],
    result: quantity(conductance ? "G" : "R", conductance ? "conductance" : "resistance", value, model.result.unit),
    source: CALIBRATION_SOURCE,
    notes: [`Fitted to the bench run “${c.runTitle}” (${c.readingCount} readings of the finished build): ${CALIBRATION_LABELS[c.parameter].links} × ${c.factor.toFixed(2)}.`],
    parts: [model],
  });
}
