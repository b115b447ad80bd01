import type { ResolvedPart } from "../resolved";
import { q, SOURCES, trace, type Traced } from "../trace";
import type { PackSummary } from "./pack";

/**
 * CC/CV charging with a stated taper model (common practice for Li-ion):
 *  - CC phase at the full current until the cell reaches its charge-end voltage, having
 *    taken CC_FRACTION of its capacity (80–90 % at moderate rates; 0.9 used);
 *  - CV phase: the current decays exponentially from I to the termination current
 *    I_term = TERMINATION_FRACTION·I, delivering the remaining (1 − CC_FRACTION)·Q:
 *    i(t) = I·e^(−t/τ), ∫ = I·τ·(1 − I_term/I) = (1 − f)·Q  ⇒  τ = (1 − f)·Q/(I − I_term),
 *    t_CV = τ·ln(I/I_term).
 */
export const CC_FRACTION = 0.9;
export const TERMINATION_FRACTION = 0.1;
/** Efficiency assumed for a switching charger that gives none (from memory; small buck chargers 80–90 %). */
export const DEFAULT_SWITCHING_EFFICIENCY = 0.85;

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
}

export function chargePlan(charger: ResolvedPart<"charger">, count: number, pack: PackSummary): ChargePlan {
  const c = charger.specs;
  const i = count * c.chargeCurrentA;
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
  const cc = (CC_FRACTION * qC) / i / 3600;
  const iTerm = TERMINATION_FRACTION * i;
  const tau = ((1 - CC_FRACTION) * qC) / (i - iTerm) / 3600;
  const cv = tau * Math.log(i / iTerm);
  const total = cc + cv;
  const inputs = [q("Q", "pack capacity", qC, "C"), q("I", "charge current", i, "A"), q("f", "share taken in the CC phase", CC_FRACTION, "1"), q("I_term", "termination current (I/10)", iTerm, "A")];
  return {
    chargers: count,
    currentA: i,
    lossW: { value: loss, unit: "W", trace: lossTrace },
    ccHours: { value: cc, unit: "h", trace: trace({ element: "charge-cc", formula: "Constant-current phase", equation: "t_CC = f·Q / I", inputs, result: q("t_CC", "CC phase", cc, "h"), source: `${SOURCES.trade} (CC phase brings Li-ion to about 80–90 %)` }) },
    cvHours: cv,
    totalHours: {
      value: total,
      unit: "h",
      trace: trace({
        element: "charge-time",
        formula: "CC/CV charge time, exponential CV taper",
        equation: "τ = (1 − f)·Q/(I − I_term); t_CV = τ·ln(I/I_term); t = t_CC + t_CV",
        inputs,
        intermediates: [q("t_CC", "CC phase", cc, "h"), q("τ", "CV time constant", tau, "h"), q("t_CV", "CV phase", cv, "h"), q("Q/I", "capacity ÷ current", qC / i / 3600, "h")],
        result: q("t", "time to full (termination)", total, "h"),
        source: `${SOURCES.trade}; the taper model is stated in the notes`,
        notes: ["Cold or aged cells enter CV earlier and charge slower; the charger's own thermal regulation can stretch the CC phase."],
      }),
    },
    capacityOverCurrentH: qC / i / 3600,
    batteryVoltageV: vBat,
  };
}
