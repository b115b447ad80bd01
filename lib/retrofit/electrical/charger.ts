import type { ResolvedPart } from "../resolved";
import { q, SOURCES, trace, type Traced } from "../trace";
import type { PackSummary } from "./pack";

/**
 * CC/CV charging of Li-ion with a first-order taper (common practice; a stated model, not a
 * cell's datasheet):
 *  - CV phase: at the charge-end voltage the current falls as i(t) = I·e^(−t/τ) with a cell
 *    time constant τ ≈ 0.55 h, until the termination current I_term = C/20. The CV phase
 *    therefore delivers Q_CV = I·τ·(1 − I_term/I) and lasts t_CV = τ·ln(I/I_term): both grow
 *    with the charge current, so a fast charge spends longer in its tail.
 *  - CC phase: the rest of the capacity at the full current, t_CC = (Q − Q_CV)/I.
 * With these figures a 1C charge takes about 2.1 h and a 0.37C charge about 3.3 h, as the
 * trade quotes (1C: roughly 2–3 h in all; a gentle charge about 3 h).
 */
export const CV_TIME_CONSTANT_H = 0.55;
/** Termination current as a share of the capacity per hour: C/20. */
export const TERMINATION_C_RATE = 0.05;
/** Efficiency assumed for a switching charger that gives none (from memory; small buck chargers 80–90 %). */
export const DEFAULT_SWITCHING_EFFICIENCY = 0.85;
/** Die regulation temperature of a small linear charger chip when the part gives none (from memory of typical datasheets — check against a copy). */
export const DEFAULT_REGULATION_C = 120;

export interface ChargePlan {
  chargers: number;
  currentA: number;
  lossW: Traced;
  ccHours: Traced;
  cvHours: number;
  totalHours: Traced;
  /** Capacity ÷ current, the naive figure the taper model improves on. */
  capacityOverCurrentH: number;
  batteryVoltageV: number;
  /** What the chargers would deliver without thermal regulation, A. */
  ratedCurrentA: number;
  /** Set when a linear charger's die regulation holds the current below its rating. */
  throttle: { regulationC: number; fromPart: boolean; ratedHours: number } | null;
}

/** The charge time at a current by the taper model above, with its parts (hours). */
export function taperHours(capacityC: number, currentA: number): { cc: number; cv: number; tau: number; iTerm: number; ccShare: number } {
  const qAh = capacityC / 3600;
  const iTerm = TERMINATION_C_RATE * qAh;
  if (!(currentA > iTerm)) return { cc: currentA > 0 ? qAh / currentA : Infinity, cv: 0, tau: CV_TIME_CONSTANT_H, iTerm, ccShare: 1 };
  const qCv = Math.min(qAh, currentA * CV_TIME_CONSTANT_H * (1 - iTerm / currentA));
  const cc = (qAh - qCv) / currentA;
  const cv = CV_TIME_CONSTANT_H * Math.log(currentA / iTerm);
  return { cc, cv, tau: CV_TIME_CONSTANT_H, iTerm, ccShare: 1 - qCv / qAh };
}

/** The charge at the chargers' rated current, or at a lower current their die regulation holds (`heldA`). */
export function chargePlan(charger: ResolvedPart<"charger">, count: number, pack: PackSummary, heldA?: number): ChargePlan {
  const c = charger.specs;
  const rated = count * c.chargeCurrentA;
  const i = heldA !== undefined ? Math.min(heldA, rated) : rated;
  // The battery sits near its nominal voltage through most of the CC phase.
  const vBat = pack.nominalVoltage.value ?? 0;
  let loss: number;
  let lossTrace;
  if (c.topology === "linear") {
    loss = Math.max(0, (c.inputVoltageV - vBat) * i);
    lossTrace = trace({
      element: "charger-loss",
      formula: "Linear charger: the voltage it drops times the current",
      equation: "P = (V_in − V_bat)·I_charge",
      inputs: [q("V_in", "input voltage", c.inputVoltageV, "V"), q("V_bat", "battery voltage (pack nominal, average over CC)", vBat, "V"), q("I_charge", `charge current (${count} charger${count > 1 ? "s" : ""})`, i, "A")],
      result: q("P", "heat in the charger", loss, "W"),
      source: SOURCES.trade,
      notes: ["Highest early in the CC phase (battery voltage low), falling as it rises and in the CV taper."],
    });
  } else {
    const eta = c.efficiency ?? DEFAULT_SWITCHING_EFFICIENCY;
    const out = vBat * i;
    loss = out * (1 / eta - 1);
    lossTrace = trace({
      element: "charger-loss",
      formula: "Switching charger loss from efficiency",
      equation: "P = P_out·(1/η − 1), P_out = V_bat·I_charge",
      inputs: [q("V_bat", "battery voltage (pack nominal)", vBat, "V"), q("I_charge", "charge current", i, "A"), q("η", c.efficiency !== undefined ? "efficiency" : "efficiency, assumed 85 % (from memory)", eta, "1")],
      result: q("P", "heat in the charger", loss, "W"),
      source: SOURCES.trade,
    });
  }
  const qC = pack.capacityC.value ?? 0;
  const t = taperHours(qC, i);
  const total = t.cc + t.cv;
  const ratedHours = heldA !== undefined ? ((r) => r.cc + r.cv)(taperHours(qC, rated)) : total;
  const regulationC = c.regulationTempC ?? DEFAULT_REGULATION_C;
  const throttled = heldA !== undefined && i < rated;
  const inputs = [q("Q", "pack capacity", qC / 3600, "Ah"), q("I", throttled ? "charge current the chips can hold at their regulation temperature" : "charge current", i, "A"), q("τ", "CV time constant (first-order taper)", t.tau, "h"), q("I_term", "termination current (C/20)", t.iTerm, "A")];
  const TAPER = `${SOURCES.trade}: a 1C Li-ion charge takes roughly 2–3 h in all, a gentle one about 3 h; first-order CV taper with τ = ${CV_TIME_CONSTANT_H} h and termination at C/20 (a stated model)`;
  const notes = ["Cold or aged cells enter CV earlier and charge slower."];
  if (throttled) notes.push(`The linear charger chips regulate their die at ${regulationC} °C${c.regulationTempC === undefined ? " (from memory of typical datasheets — check against a copy)" : ""}: in this housing they hold ${i.toFixed(2)} A instead of ${rated.toFixed(2)} A, so the charge takes ${total.toFixed(1)} h instead of ${ratedHours.toFixed(1)} h.`);
  return {
    chargers: count,
    currentA: i,
    lossW: { value: loss, unit: "W", trace: lossTrace },
    ccHours: { value: t.cc, unit: "h", trace: trace({ element: "charge-cc", formula: "Constant-current phase", equation: "Q_CV = I·τ·(1 − I_term/I); t_CC = (Q − Q_CV)/I", inputs, intermediates: [q("f_CC", "share of the charge taken at constant current", t.ccShare, "1")], result: q("t_CC", "CC phase", t.cc, "h"), source: TAPER }) },
    cvHours: t.cv,
    totalHours: {
      value: total,
      unit: "h",
      trace: trace({
        element: "charge-time",
        formula: "CC/CV charge time, first-order constant-voltage taper",
        equation: "i_CV(t) = I·e^(−t/τ); Q_CV = I·τ·(1 − I_term/I); t_CC = (Q − Q_CV)/I; t_CV = τ·ln(I/I_term); t = t_CC + t_CV",
        inputs,
        intermediates: [q("f_CC", "share of the charge taken at constant current", t.ccShare, "1"), q("t_CC", "CC phase", t.cc, "h"), q("t_CV", "CV phase", t.cv, "h"), q("Q/I", "capacity ÷ current", qC / 3600 / i, "h")],
        result: q("t", "time to full (termination)", total, "h"),
        source: TAPER,
        notes,
      }),
    },
    capacityOverCurrentH: qC / i / 3600,
    batteryVoltageV: vBat,
    ratedCurrentA: rated,
    throttle: throttled ? { regulationC, fromPart: c.regulationTempC !== undefined, ratedHours } : null,
  };
}
