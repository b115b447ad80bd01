import type { Trace } from "@/lib/thermal";
import type { ModeFigures } from "./scenario-mode";
import type { ThermalResult, Warmup } from "./scenario";
import { formatDuration, formatFigure } from "@/lib/units/figures";
import { q, trace } from "./trace";

/** The ambient node's id in every network (lib/thermal reserves it). */
const AMBIENT = "ambient";

const BALANCE_SOURCE =
  'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., §1.3 (conservation of energy) and §3.1.3 (the thermal circuit, q = ΔT/R) — section numbers from memory, check against a copy';

/**
 * How a place's temperature follows from the heat flows at the solution: every link that
 * touches the node with the watts it carries and its resistance there, so that
 * T = T_other + q·R holds for each, and what comes in plus what is made there goes out.
 * Each link's own trace (formula, inputs, source) is a part of this one.
 */
export function nodeBalanceTrace(thermal: Pick<ThermalResult, "nodes" | "links" | "temperaturesC">, nodeId: string, ambientC: number): Trace | null {
  const node = thermal.nodes.find((n) => n.id === nodeId);
  const t = thermal.temperaturesC[nodeId];
  if (!node || t === undefined) return null;
  const placeOf = (id: string) => (id === AMBIENT ? "ambient air" : (thermal.nodes.find((n) => n.id === id)?.place ?? id));
  const tempOf = (id: string) => (id === AMBIENT ? ambientC : (thermal.temperaturesC[id] ?? ambientC));
  const touching = thermal.links.filter((l) => l.from === nodeId || l.to === nodeId);
  const inputs: Trace["inputs"] = [];
  const intermediates: Trace["intermediates"] = [];
  let outW = 0;
  let inW = 0;
  touching.forEach((l, i) => {
    // Watts leaving this node along the link (negative: arriving).
    const leaving = l.from === nodeId ? l.watts : -l.watts;
    const other = l.from === nodeId ? l.to : l.from;
    const k = i + 1;
    inputs.push(q(`T${k}`, `${placeOf(other)} (other end of: ${l.place})`, tempOf(other), "°C"));
    inputs.push(q(`R${k}`, `${l.place}, resistance at the solution`, l.kelvinPerWatt, "K/W"));
    intermediates.push(q(`q${k}`, leaving >= 0 ? `leaves to ${placeOf(other)}` : `arrives from ${placeOf(other)}`, Math.abs(leaving), "W"));
    if (leaving >= 0) outW += leaving;
    else inW -= leaving;
  });
  const made = outW - inW;
  intermediates.push(q("q_out", "heat leaving, all links", outW, "W"), q("q_in", "heat arriving, all links", inW, "W"), q("P", "heat made here (q_out − q_in)", Math.abs(made) < 1e-9 ? 0 : made, "W"));
  return trace({
    element: "node-balance",
    formula: `Heat balance at ${node.place}`,
    equation: touching.length ? `T = T_k + q_k·R_k for each link k; P + Σ q_in = Σ q_out` : "T = T_ambient (no links)",
    inputs,
    intermediates,
    result: q("T", `${node.place} temperature`, t, "°C"),
    source: BALANCE_SOURCE,
    notes: [
      "Each q is the heat the link carries at the solution and R its resistance there (convection and radiation depend on the temperatures reached); every link's own derivation follows.",
    ],
    parts: touching.map((l) => l.trace),
  });
}

const ADDS = "common practice (power and light of identical emitters driven alike add up)";

/**
 * Drive power into the emitters: N emitters at the power each one takes; for a mode given on
 * the battery side, first what the driver passes on of the power it draws (η·P_battery).
 */
export function driveTrace(mode: Pick<ModeFigures, "driveW" | "emitterPower"> & Partial<Pick<ModeFigures, "entered" | "driverEfficiency" | "driverInputW">>): Trace {
  const one = mode.emitterPower.value ?? 0;
  const n = one > 0 ? Math.round(mode.driveW / one) : 0;
  const perEmitter = trace({
    element: "drive",
    formula: "Electrical power into the emitters",
    equation: "P_drive = N·P_emitter",
    inputs: [q("N", "emitters", n, "1"), q("P_emitter", "power of one emitter", one, "W")],
    result: q("P_drive", "drive power", mode.driveW, "W"),
    source: ADDS,
    parts: [mode.emitterPower.trace],
  });
  const e = mode.entered;
  if (!e || e.side !== "battery" || mode.driverEfficiency === undefined || mode.driverInputW === undefined) return perEmitter;
  const eta = mode.driverEfficiency;
  const fromCurrent = e.quantity === "current";
  const v = fromCurrent && e.value > 0 ? mode.driverInputW / e.value : null;
  return trace({
    element: "drive",
    formula: "Power into the emitters from the power the mode draws from the battery",
    equation: fromCurrent ? "P_drive = η·I_battery·V_pack" : "P_drive = η·P_battery",
    inputs: [
      ...(fromCurrent ? [q("I_battery", "current drawn from the battery, as entered by the part's author", e.value, "A"), q("V_pack", "pack's nominal voltage", v ?? 0, "V")] : [q("P_battery", "power drawn from the battery, as entered by the part's author", e.value, "W")]),
      q("η", "efficiency of the mode, as entered by the part's author", eta, "1"),
    ],
    result: q("P_drive", "drive power into the emitters", mode.driveW, "W"),
    source: "energy balance of the converter, P_out = η·P_in (common practice); figures as entered by the part's author",
    notes: [
      fromCurrent
        ? "Worked out at the pack's nominal voltage: as the pack runs down its voltage falls and so does the power of a mode held at a battery current."
        : "A mode held at a battery power keeps its light as the pack runs down; the current it draws rises as the voltage falls.",
    ],
    parts: [perEmitter],
  });
}

/** Light of all emitters at their operating junction temperature. */
export function totalFluxTrace(mode: Pick<ModeFigures, "totalFluxLm" | "fluxPerEmitter">): Trace | null {
  if (mode.totalFluxLm === null || !mode.fluxPerEmitter || mode.fluxPerEmitter.value === null || mode.fluxPerEmitter.value <= 0) return null;
  const one = mode.fluxPerEmitter.value;
  return trace({
    element: "flux",
    formula: "Light of every emitter, hot",
    equation: "Φ = N·Φ_emitter",
    inputs: [q("N", "emitters", Math.round(mode.totalFluxLm / one), "1"), q("Φ_emitter", "flux of one emitter at its junction temperature", one, "lm")],
    result: q("Φ", "total flux", mode.totalFluxLm, "lm"),
    source: ADDS,
    parts: [mode.fluxPerEmitter.trace],
  });
}

const WARMUP_SOURCE =
  'the warm-up from ambient, the heat network\'s transient solved step by step (implicit Euler); method as in Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., §5.10 (finite-difference transient) — section from memory, check against a copy';

/** When a place first reaches its limit in the warm-up (or that it does not within it). */
export function limitTimeTrace(w: Pick<Warmup, "durationS" | "crossings">, limitId: string, place: string): Trace | null {
  const c = w.crossings.find((x) => x.limitId === limitId);
  if (!c) return null;
  return trace({
    element: "limit-time",
    formula: `Time for ${place} to reach its limit`,
    equation: "t: T(t) = T_limit, T(0) = T_ambient",
    inputs: [q("T_limit", `${place} limit`, c.limitC, "°C"), q("t_run", "length of the warm-up worked out", w.durationS, "s")],
    result: q("t", "time to the limit", c.timeS ?? w.durationS, "s"),
    source: WARMUP_SOURCE,
    notes: c.timeS === null ? [`Not reached within the warm-up (${formatDuration(w.durationS)}).`] : [],
  });
}

/** The largest current any mode draws from the pack. */
export function peakPackCurrentTrace(modes: readonly { name: string; packCurrentA: number | null }[]): Trace | null {
  const drawn = modes.filter((m): m is { name: string; packCurrentA: number } => m.packCurrentA !== null);
  if (drawn.length === 0) return null;
  return trace({
    element: "peak-current",
    formula: "Largest pack current of any mode",
    equation: "I_peak = max(I_mode)",
    inputs: drawn.map((m, i) => q(`I${i + 1}`, `pack current in mode "${m.name}"`, m.packCurrentA, "A")),
    result: q("I_peak", "peak pack current", Math.max(...drawn.map((m) => m.packCurrentA)), "A"),
    source: "common practice (the protection must carry the heaviest mode's draw)",
  });
}

/** A figure taken as the part's author entered it (a rating, a trip current). */
export function enteredTrace(what: string, partName: string, value: number, unit: string): Trace {
  return trace({
    element: "entered",
    formula: what,
    equation: `${what} = part rating`,
    inputs: [],
    result: q("x", what, value, unit),
    source: `as entered by the part's author: ${partName}`,
  });
}

/**
 * A ladder's total: the place's temperature is ambient plus the rise across every link the
 * heat crosses on its way out (the rungs), plus what the ladder does not split into rungs
 * (heat arriving from other sources along the way). Each rung is ΔT = q·R at the solution.
 */
export function ladderTotalTrace(
  ladder: { riseK: number; remainderK: number; steps: readonly { place: string; deltaK: number; watts: number; kelvinPerWatt: number }[] },
  place: string,
  ambientC: number,
): Trace {
  const rungs = ladder.steps.map((s, i) => q(`ΔT${i + 1}`, `${s.place} (${formatFigure(s.watts, "power")} × ${formatFigure(s.kelvinPerWatt, "thermalResistance")})`, s.deltaK, "K"));
  const rest = Math.abs(ladder.remainderK) > 1e-9 ? [q("ΔT_rest", "rise not split into rungs (heat from other sources joining the path)", ladder.remainderK, "K")] : [];
  return trace({
    element: "ladder-total",
    formula: `Temperature of ${place}: ambient plus every rung of the ladder`,
    equation: `T = T_ambient + ${[...rungs, ...rest].map((r) => r.symbol).join(" + ") || "0"}`,
    inputs: [q("T_ambient", "ambient air", ambientC, "°C"), ...rungs, ...rest],
    result: q("T", `${place} temperature`, ambientC + ladder.riseK, "°C"),
    source: BALANCE_SOURCE,
    notes: ["Each rung is the heat the link carries times its resistance at the solution; its own derivation is on the heat path and in the place's heat balance."],
  });
}

/** Parts cost: the sum of the priced lines (a line without a price is left out and said so). */
export function partsCostTrace(costs: { totalEur: number; unpriced: number; lines: readonly { name: string; count: number; totalEur: number | null }[] }): Trace {
  const priced = costs.lines.filter((l): l is typeof l & { totalEur: number } => l.totalEur !== null);
  return trace({
    element: "parts-cost",
    formula: "Parts cost: every priced part times its count",
    equation: priced.length > 0 ? `C = ${priced.map((_, i) => `C${i + 1}`).join(" + ")}` : "C = 0",
    inputs: priced.map((l, i) => q(`C${i + 1}`, `${l.count} × ${l.name}`, l.totalEur, "€")),
    result: q("C", "parts cost", costs.totalEur, "€"),
    source: "as entered (each part's price in the Parts bin or the build)",
    notes: costs.unpriced > 0 ? [`${costs.unpriced} part${costs.unpriced > 1 ? "s have" : " has"} no price and ${costs.unpriced > 1 ? "are" : "is"} left out.`] : [],
  });
}

/** Saving against a comparable new light (positive: the retrofit is cheaper). */
export function savingTrace(costs: { totalEur: number; comparableNewLightEur: number | null; savingEur: number | null; unpriced: number; lines: readonly { name: string; count: number; totalEur: number | null }[] }): Trace | null {
  if (costs.comparableNewLightEur === null || costs.savingEur === null) return null;
  return trace({
    element: "saving",
    formula: "Saving against a comparable new light",
    equation: "S = C_new − C_parts",
    inputs: [q("C_new", "a comparable new light", costs.comparableNewLightEur, "€"), q("C_parts", "parts cost of the retrofit", costs.totalEur, "€")],
    result: q("S", "saving", costs.savingEur, "€"),
    source: "as entered by the build's author (the new light's price)",
    parts: [partsCostTrace(costs)],
  });
}
