import type { PartKind } from "./common";

/**
 * Placeholders and typical ranges per field (not per unit): what a hobbyist would type for
 * this very field, and the range most parts of the kind fall in. Common practice, rounded;
 * a hint, never a default — an empty field stays empty.
 */
export interface FieldHint {
  readonly placeholder: string;
  readonly typical?: string;
}

export const FIELD_HINTS: Readonly<Record<PartKind, Readonly<Record<string, FieldHint>>>> = {
  emitter: {
    rthJspKPerW: { placeholder: "6 K/W", typical: "1–10 K/W; large dies and copper stars are lowest" },
    maxTjC: { placeholder: "135 °C", typical: "125–150 °C for white LEDs" },
    vfV: { placeholder: "3.1 V", typical: "2.8–3.4 V for one white die" },
    vfRefCurrentA: { placeholder: "700 mA", typical: "350 mA–3 A" },
    vfTempCoeffVPerK: { placeholder: "-2 mV/K", typical: "about −2 mV/K" },
    efficacyLmPerW: { placeholder: "120 lm/W", typical: "90–160 lm/W at the reference point" },
    heatFraction: { placeholder: "0.7", typical: "0.6–0.8 for white phosphor LEDs" },
    beamAngleDeg: { placeholder: "120°", typical: "90–140° bare" },
    boardLengthM: { placeholder: "20 mm", typical: "16 or 20 mm stars" },
    boardWidthM: { placeholder: "20 mm", typical: "16 or 20 mm stars" },
  },
  driver: {
    inputVoltageMinV: { placeholder: "2.8 V", typical: "2.7–3.0 V for one Li-ion cell" },
    inputVoltageMaxV: { placeholder: "4.2 V", typical: "4.2–4.5 V for one Li-ion cell" },
    maxBoardTempC: { placeholder: "100 °C", typical: "85–125 °C" },
    boardAreaM2: { placeholder: "2.3 cm²", typical: "17 mm round ≈ 2.3 cm²; 22 mm ≈ 3.8 cm²" },
    groundPlaneAreaM2: { placeholder: "1.2 cm²", typical: "about half the board area" },
  },
  heatsink: {
    sinkToAirKPerW: { placeholder: "8 K/W", typical: "2–20 K/W in still air for lamp-sized sinks" },
    ratedPowerW: { placeholder: "5 W" },
    ratedAmbientC: { placeholder: "25 °C" },
    baseLengthM: { placeholder: "60 mm", typical: "20–100 mm for salvaged sinks" },
    baseWidthM: { placeholder: "40 mm", typical: "20–100 mm for salvaged sinks" },
    baseThicknessM: { placeholder: "4 mm", typical: "2–8 mm" },
    finCount: { placeholder: "9", typical: "0 (flat plate) to about 40" },
    finHeightM: { placeholder: "15 mm", typical: "8–40 mm" },
    finThicknessM: { placeholder: "1 mm", typical: "0.5–2 mm" },
    finSpacingM: { placeholder: "leave empty: worked out", typical: "3–10 mm; below 5 mm fins choke in still air" },
    emissivity: { placeholder: "0.8", typical: "bare aluminium 0.05–0.1; anodised 0.8–0.9" },
    massKg: { placeholder: "40 g", typical: "10–400 g" },
    heatCapacityJPerK: { placeholder: "leave empty: from the mass", typical: "about 0.9 J/K per gram of aluminium" },
  },
  interface: {
    conductivityWPerMK: { placeholder: "2 W/(m·K)", typical: "paste 1–5, pad 1–6, adhesive 0.5–2 W/(m·K)" },
    bondLineM: { placeholder: "50 µm", typical: "paste 25–100 µm; pads 0.3–1 mm" },
    resistancePerAreaKM2PerW: { placeholder: "0.2 K·cm²/W", typical: "10⁻⁵–10⁻⁴ K·m²/W" },
  },
  spreader: {
    thicknessM: { placeholder: "0.1 mm", typical: "copper tape 0.05–0.1 mm; strip 0.5–2 mm" },
    widthM: { placeholder: "20 mm", typical: "10–30 mm" },
    lengthM: { placeholder: "60 mm", typical: "30–150 mm" },
  },
  housing: {
    wallThicknessM: { placeholder: "1.5 mm", typical: "about 1–3 mm; sheet-steel lanterns 0.5–1 mm" },
    outerAreaM2: { placeholder: "100 cm²", typical: "torch 80–200 cm²; lantern 0.05–0.2 m²" },
    innerAreaM2: { placeholder: "90 cm²", typical: "a little below the outer area" },
    emissivity: { placeholder: "0.85", typical: "painted or anodised 0.8–0.95; polished metal 0.05–0.1" },
    massKg: { placeholder: "60 g", typical: "torch 40–150 g; lantern 200–800 g" },
  },
  cell: {
    nominalVoltageV: { placeholder: "3.6 V", typical: "Li-ion 3.6–3.7 V; LiFePO4 3.2 V; NiMH 1.2 V" },
    chargeEndVoltageV: { placeholder: "4.2 V", typical: "Li-ion 4.2 V; LiFePO4 3.65 V" },
    cutoffVoltageV: { placeholder: "2.5 V", typical: "Li-ion 2.5–3.0 V" },
    capacityCoulomb: { placeholder: "3000 mAh", typical: "18650: 2000–3500 mAh; 21700: 4000–5000 mAh" },
    internalResistanceOhm: { placeholder: "45 mΩ", typical: "20–80 mΩ new" },
    massKg: { placeholder: "47 g", typical: "18650 about 45 g; 21700 about 70 g" },
    chargeTempMinC: { placeholder: "0 °C", typical: "about 0 °C (no charging below freezing)" },
    chargeTempMaxC: { placeholder: "45 °C", typical: "about 45 °C" },
    dischargeTempMinC: { placeholder: "-20 °C", typical: "about −20 °C" },
    dischargeTempMaxC: { placeholder: "60 °C", typical: "about 60 °C" },
    maxChargeCurrentA: { placeholder: "1.5 A", typical: "0.5 C, e.g. 1.5 A for 3000 mAh" },
    maxDischargeCurrentA: { placeholder: "10 A", typical: "5–20 A" },
  },
  charger: {
    chargeCurrentA: { placeholder: "1 A", typical: "0.5–2 A for one cell" },
    inputVoltageV: { placeholder: "5 V", typical: "5 V from USB" },
    efficiency: { placeholder: "85 %", typical: "switching 80–92 %; linear: worked out" },
    parallelCount: { placeholder: "1", typical: "1" },
  },
  protection: {
    overCurrentTripA: { placeholder: "3 A", typical: "2–10 A" },
    overChargeCutoffV: { placeholder: "4.25 V", typical: "4.25–4.3 V for Li-ion" },
    overDischargeCutoffV: { placeholder: "2.5 V", typical: "2.4–2.9 V for Li-ion" },
  },
};

export function fieldHint(kind: PartKind, key: string): FieldHint | undefined {
  return FIELD_HINTS[kind][key];
}

/**
 * The placeholder as shown: an example value reads "e.g. 100 °C", so an empty field never
 * looks filled in; a hint in words ("empty: worked out") is shown as it is.
 */
export function placeholderText(hint: FieldHint | undefined, fallbackExample = ""): string {
  const text = hint?.placeholder ?? fallbackExample;
  return /^[-−\d.]/.test(text) ? `e.g. ${text}` : text;
}
