import { z } from "zod";
import { KIND_SCHEMAS } from "@/lib/parts";
import { declaredResistance, explainLinks, isThermalInputError, solveSteady, type Network, type Trace } from "@/lib/thermal";
import { unitField } from "@/lib/units";
import { compileSinkToAir, declaredRise } from "./compile/heatsink";
import type { SpecsOfKind } from "@/lib/parts";
import { FIN_DIRECTIONS } from "@/lib/thermal/correlations";

type HeatsinkSpecs = SpecsOfKind<"heatsink">;
import { NetworkBuilder } from "./compile/builder";
import { joint } from "./compile/joints";
import { requiredLinkResistance } from "./inverse";
import { verdictFor, type Verdict } from "./limits";
import { ProblemList, type Problem } from "./problems";
import { checkFinFit, derivedFinGap, fillFinGap } from "./quick-check-fins";
import { q, trace } from "./trace";

/** Junction limit used when the caller gives none: 125 °C, a common rating of white LEDs (common practice; many allow 150 °C). */
export const QUICK_CHECK_DEFAULT_MAX_TJ_C = 125;

/**
 * The no-account quick check: one heat source on one heatsink in open air. The sink is a
 * declared K/W or its geometry (the heatsink part's fields); an interface and Rth(j-sp)
 * are optional.
 */
/** A sink by its geometry; `gapWorkedOut` is set when the gap between fins was left empty (see quick-check-fins.ts). */
const geometrySinkSchema = z.preprocess(
  fillFinGap,
  z
    .strictObject({
      geometry: KIND_SCHEMAS.heatsink,
      gapWorkedOut: z.boolean().optional(),
      finDirection: z.enum(FIN_DIRECTIONS, { error: "choose how the fins stand: vertical, level, pointing up or hanging down" }).default("vertical"),
    })
    .superRefine((s, ctx) => {
      if (s.geometry.rating === "geometry") checkFinFit(s.geometry, s.gapWorkedOut !== true, ctx, ["geometry"]);
    }),
);

export const quickCheckInputSchema = z.strictObject({
  heatWatts: unitField("power", { gt: 0, max: 500 }),
  sink: z.union([
    z.strictObject({
      declaredKPerW: unitField("thermalResistance", { gt: 0, max: 1000 }),
      /** The rise the rating holds at; absent: the heatsink part's default (see `declaredAtRise`). */
      ratedDeltaK: unitField("temperatureDifference", { gt: 0, max: 200, required: false }),
      ratedAirflow: z.enum(["natural", "forced"], { error: "must be natural or forced" }).default("natural"),
    }),
    geometrySinkSchema,
  ]),
  interface: z.strictObject({ areaM2: unitField("area", { gt: 0, max: 0.1 }), specs: KIND_SCHEMAS.interface }).optional(),
  rthJspKPerW: unitField("thermalResistance", { gt: 0, max: 1000, required: false }),
  ambientC: unitField("temperature", { min: -40, max: 80 }),
  maxTjC: unitField("temperature", { gt: 0, max: 250, required: false }),
});

export type QuickCheckInput = z.output<typeof quickCheckInputSchema>;

export interface QuickCheckResult {
  tjC: number | null;
  solderPointC: number | null;
  sinkC: number | null;
  maxTjC: number;
  headroomK: number | null;
  verdict: Verdict | null;
  /** Present sink-to-air resistance at the solution, and the most it may have for Tj = max and for the 10 K budget margin. */
  sinkKPerW: number | null;
  requiredForLimitKPerW: number | null;
  requiredForBudgetKPerW: number | null;
  network: Network | null;
  traces: Trace[];
  problems: Problem[];
  /** The gap between fins the model used (from width, count and thickness), m; null without fins or for a declared sink. */
  finGapM: number | null;
  /** True when the gap was left empty and worked out; false when it was given (and checked against the width). */
  finGapWorkedOut: boolean;
}

const MARGIN_K = 10;

/** The gap between fins as the model uses it; a given gap far from it is reported, never silently dropped. */
function finGapOf(input: QuickCheckInput, problems: ProblemList): { finGapM: number | null; finGapWorkedOut: boolean } {
  if (!("geometry" in input.sink) || input.sink.geometry.rating !== "geometry") return { finGapM: null, finGapWorkedOut: false };
  const g = input.sink.geometry;
  const workedOut = input.sink.gapWorkedOut === true;
  const used = derivedFinGap(g.baseWidthM, g.finCount, g.finThicknessM ?? 0);
  if (used === null) return { finGapM: null, finGapWorkedOut: workedOut };
  const given = g.finSpacingM;
  if (!workedOut && given !== undefined && Math.abs(given - used) > Math.max(0.1 * used, 0.0003)) {
    const mm = (m: number) => `${Number((m * 1000).toPrecision(3))} mm`;
    problems.add(
      "sink.geometry.finSpacingM",
      `you gave ${mm(given)}, but ${g.finCount} fins ${mm(g.finThicknessM ?? 0)} thick across ${mm(g.baseWidthM)} leave gaps of ${mm(used)}; the check uses ${mm(used)} — measure the width or the gap again`,
      "warning",
    );
  }
  return { finGapM: used, finGapWorkedOut: workedOut };
}

/** The check's network at a sink rise (the rise matters only to a declared rating's correction). */
function compileCheck(input: QuickCheckInput, sinkSpecs: HeatsinkSpecs, riseK: number | null, problems: ProblemList) {
  const b = new NetworkBuilder(input.ambientC, problems);
  b.node("junction", "LED junction", "heatWatts");
  b.node("solder", "emitter solder point", "rthJspKPerW");
  b.node("sink", "heatsink", "sink");
  const rj = input.rthJspKPerW ?? 1e-6;
  const tj = declaredResistance({ kelvinPerWatt: rj, source: "Rth(j-sp) as entered by the person running the check" });
  if (input.rthJspKPerW === undefined) tj.trace.notes.push("No Rth(j-sp) given: the junction is taken at the solder point.");
  b.resistance("junction", "solder", rj, "junction → solder point (Rth j-sp)", "rthJspKPerW", tj.trace);
  const jt = input.interface ? joint({ name: "interface", specs: input.interface.specs, curves: {} }, input.interface.areaM2, "interface", problems) : null;
  const rif = jt?.kelvinPerWatt ?? 1e-6;
  b.resistance("solder", "sink", rif, "interface → heatsink", "interface", jt?.trace ?? trace({ element: "interface", formula: "No interface given", equation: "R = 0", inputs: [], result: q("R", "resistance", 0, "K/W"), source: "as entered by the person running the check (no interface given)" }));
  const declared = "declaredKPerW" in input.sink;
  const out = compileSinkToAir(b, sinkSpecs, "ambient", declared ? "sink" : "sink.geometry", input.ambientC, { riseK, finDirection: "finDirection" in input.sink ? input.sink.finDirection : "vertical" });
  const gap = finGapOf(input, problems);
  return { gap, built: out ? { b, out, network: b.network([{ node: "junction", watts: input.heatWatts }]) } : null };
}

export function quickCheck(input: QuickCheckInput): QuickCheckResult {
  const maxTj = input.maxTjC ?? QUICK_CHECK_DEFAULT_MAX_TJ_C;
  const note = (p: ProblemList) => {
    if (input.maxTjC === undefined) p.add("maxTjC", `no junction limit given: ${QUICK_CHECK_DEFAULT_MAX_TJ_C} °C assumed (common practice)`, "info");
    return p;
  };
  const sinkSpecs: HeatsinkSpecs =
    "declaredKPerW" in input.sink
      ? { rating: "declared", sinkToAirKPerW: input.sink.declaredKPerW, ratedAirflow: input.sink.ratedAirflow, ...(input.sink.ratedDeltaK === undefined ? {} : { ratedDeltaK: input.sink.ratedDeltaK }) }
      : input.sink.geometry;
  const empty: QuickCheckResult = { tjC: null, solderPointC: null, sinkC: null, maxTjC: maxTj, headroomK: null, verdict: null, sinkKPerW: null, requiredForLimitKPerW: null, requiredForBudgetKPerW: null, network: null, traces: [], problems: [], finGapM: null, finGapWorkedOut: false };
  // A declared rating holds at its rated rise: the same fixed point on the sink's rise as the Budget's.
  let rise = declaredRise.start(sinkSpecs, input.heatWatts);
  for (let k = 1; ; k++) {
    const problems = note(new ProblemList());
    const { gap, built } = compileCheck(input, sinkSpecs, rise, problems);
    if (!built) return { ...empty, ...gap, problems: problems.list };
    const { b, out: sinkOut, network } = built;
    try {
      const s = solveSteady(network);
      if (rise !== null) {
        const next = declaredRise.at(network, s.temperaturesC, sinkOut.link);
        const settled = declaredRise.moved(rise, next) < declaredRise.tolerance;
        if (!settled && k < MAX_RISE_ITERATIONS) {
          rise = next;
          continue;
        }
        if (!settled) problems.add("sink", `the rated sink's correction for its temperature rise did not settle in ${MAX_RISE_ITERATIONS} steps; figures are from the last one`, "warning");
      }
      const t = s.temperaturesC;
      const headroom = maxTj - (t.junction ?? 0);
      const others = sinkOut.radiationLink === null ? [] : [sinkOut.radiationLink];
      const lim = requiredLinkResistance(network, s, sinkOut.link, "junction", maxTj, 0.02, others);
      const bud = requiredLinkResistance(network, s, sinkOut.link, "junction", maxTj - MARGIN_K, 0.02, others);
      const atSolution = explainLinks(network, s);
      const traces = b.linkPlaces.map((l, i) => l.trace ?? atSolution[i]!);
      return {
        tjC: t.junction ?? null,
        solderPointC: t.solder ?? null,
        sinkC: t.sink ?? null,
        maxTjC: maxTj,
        headroomK: headroom,
        verdict: verdictFor(headroom, MARGIN_K),
        sinkKPerW: (t.sink! - input.ambientC) / input.heatWatts,
        requiredForLimitKPerW: lim.kelvinPerWatt,
        requiredForBudgetKPerW: bud.kelvinPerWatt,
        network,
        traces,
        problems: problems.list,
        ...gap,
      };
    } catch (err) {
      if (!isThermalInputError(err)) throw err;
      problems.add("sink", `no steady state: ${err.message}`);
      return { ...empty, ...gap, network, problems: problems.list };
    }
  }
}

/** Steps of the declared rating's fixed point before the check gives up (it settles in a handful). */
const MAX_RISE_ITERATIONS = 30;
