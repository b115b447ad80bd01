import { interpolate } from "@/lib/curves";
import { modeDrive, type DriverMode } from "@/lib/parts";
import type { ResolvedPart } from "../resolved";
import { q, SOURCES, trace, type Traced } from "../trace";

export interface DriverPoint {
  efficiency: number;
  outputW: number;
  inputW: number;
  lossW: Traced;
}

/**
 * Driver loss P_out·(1/η − 1); η from the efficiency-vs-load curve at the LED current when the
 * part has one, else the mode's figure. A mode given on the battery side keeps its own η: its
 * output was worked out from it, so the power drawn stays what the maker entered.
 */
export function driverAt(driver: ResolvedPart<"driver">, mode: DriverMode, outputW: number, ledCurrentA: number): DriverPoint {
  const curve = modeDrive(mode).side === "battery" ? undefined : driver.curves.efficiencyVsLoad;
  const eta = curve ? interpolate(curve.points, ledCurrentA).y : mode.efficiency;
  const loss = outputW * (1 / eta - 1);
  return {
    efficiency: eta,
    outputW,
    inputW: outputW / eta,
    lossW: {
      value: loss,
      unit: "W",
      trace: trace({
        element: "driver-loss",
        formula: "Converter loss from efficiency",
        equation: "P_loss = P_out·(1/η − 1)",
        inputs: [q("P_out", "power into the emitters", outputW, "W"), q("η", curve ? `efficiency at ${ledCurrentA.toPrecision(3)} A from the efficiency-vs-load curve` : `efficiency of mode "${mode.name}"`, eta, "1")],
        result: q("P_loss", "heat in the driver", loss, "W"),
        source: `${SOURCES.trade}; η from ${SOURCES.datasheet}`,
        notes: curve ? [`The mode's own figure (${(mode.efficiency * 100).toFixed(0)} %) is superseded by the curve.`] : [],
      }),
    },
  };
}
