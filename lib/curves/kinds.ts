import type { Quantity, UnitFieldOptions } from "@/lib/units";

export interface CurveAxis {
  readonly label: string;
  readonly quantity: Quantity;
  /** Bounds in the storage unit, checked on every point. */
  readonly bounds: Pick<UnitFieldOptions, "min" | "max" | "gt" | "lt">;
}

export interface CurveKindInfo {
  readonly label: string;
  readonly x: CurveAxis;
  readonly y: CurveAxis;
  readonly help: string;
}

export const CURVE_KINDS = ["fluxVsTj", "fluxVsCurrent", "vfVsCurrent", "efficiencyVsLoad", "currentVsTemperature"] as const;
export type CurveKind = (typeof CURVE_KINDS)[number];

const ABSOLUTE_ZERO_C = -273.15;

/**
 * Relative flux is stored as a fraction of the flux at the datasheet's reference point
 * (1 = 100 %), so a value above 1 (cold junction, overdriven emitter) is allowed.
 */
export const CURVE_KIND_INFO: Readonly<Record<CurveKind, CurveKindInfo>> = {
  fluxVsTj: {
    label: "Relative flux vs junction temperature",
    x: { label: "Junction temperature", quantity: "temperature", bounds: { gt: ABSOLUTE_ZERO_C } },
    y: { label: "Relative flux", quantity: "percent", bounds: { min: 0 } },
    help: "Flux relative to the datasheet's reference (often 25 °C or 85 °C) at constant current.",
  },
  fluxVsCurrent: {
    label: "Relative flux vs current",
    x: { label: "Forward current", quantity: "current", bounds: { min: 0 } },
    y: { label: "Relative flux", quantity: "percent", bounds: { min: 0 } },
    help: "Flux relative to the flux at the reference current, at constant junction temperature.",
  },
  vfVsCurrent: {
    label: "Forward voltage vs current",
    x: { label: "Forward current", quantity: "current", bounds: { min: 0 } },
    y: { label: "Forward voltage", quantity: "voltage", bounds: { gt: 0 } },
    help: "Forward voltage at the datasheet's junction temperature (usually 25 °C).",
  },
  efficiencyVsLoad: {
    label: "Driver efficiency vs load current",
    x: { label: "Output current", quantity: "current", bounds: { min: 0 } },
    y: { label: "Efficiency", quantity: "percent", bounds: { gt: 0, max: 1 } },
    help: "Efficiency (output power ÷ input power) against the LED current the driver delivers.",
  },
  currentVsTemperature: {
    label: "Allowed current vs temperature (derating)",
    x: { label: "Temperature", quantity: "temperature", bounds: { gt: ABSOLUTE_ZERO_C } },
    y: { label: "Allowed current", quantity: "current", bounds: { min: 0 } },
    help: "The maximum current the part may carry at the temperature its datasheet names (ambient, case or solder point).",
  },
};
