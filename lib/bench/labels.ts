import type { LabelResolver } from "@/lib/messages";

/**
 * The labels of the bench run form's fields, by the name the API gives them: the form shows
 * them and every message about a run or a fit names its field with them.
 */
export const BENCH_LABELS: Readonly<Record<string, string>> = {
  title: "Title",
  powered: "What was powered",
  mode: "Driver mode",
  ambientC: "Ambient",
  heatW: "Heat into the sink",
  volts: "Volts",
  amps: "Amps",
  heatFraction: "Heat fraction",
  orientation: "Orientation",
  air: "Air",
  massKg: "Sink mass",
  material: "Material",
  finish: "Finish",
  readings: "Readings",
  visibility: "Visibility",
  notes: "Notes",
};

/** The form field a run's or a fit's API path belongs to ("conditions.heatW" → "heatW", "powered.mode" → "mode"). */
export function benchFieldOf(path: string): string {
  if (path === "powered.mode") return "mode";
  return path.replace(/^conditions\./, "").split(/[.[]/)[0] ?? "";
}

/**
 * For the routes that read a run or a fit: the form's labels for its own fields (a reading's
 * fields are named by the reading). Passed to readJson by those routes, so the labels stay
 * out of every other screen's bundle.
 */
export const benchLabels: LabelResolver = (path) => {
  const own = path.length === 1 || (path.length === 2 && (path[0] === "conditions" || (path[0] === "powered" && path[1] === "mode")));
  return own ? (BENCH_LABELS[benchFieldOf(path.join("."))] ?? null) : null;
};
