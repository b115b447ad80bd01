/** A driver mode's one figure, read without the schema library (screens that show parts use it). */

export const DRIVE_KEYS = ["outputCurrentA", "outputPowerW", "inputCurrentA", "inputPowerW"] as const;

/** What a mode's figure is: which side of the driver it holds on, and whether it is a current or a power. */
export interface ModeDrive {
  side: "output" | "battery";
  quantity: "current" | "power";
  value: number;
}

/** The one figure a mode was given by. */
export function modeDrive(mode: { outputCurrentA?: number; outputPowerW?: number; inputCurrentA?: number; inputPowerW?: number }): ModeDrive {
  if (mode.inputCurrentA !== undefined) return { side: "battery", quantity: "current", value: mode.inputCurrentA };
  if (mode.inputPowerW !== undefined) return { side: "battery", quantity: "power", value: mode.inputPowerW };
  if (mode.outputCurrentA !== undefined) return { side: "output", quantity: "current", value: mode.outputCurrentA };
  return { side: "output", quantity: "power", value: mode.outputPowerW ?? 0 };
}

/** The words after a figure that say it is drawn from the battery ("9 W from the battery"). */
export const FROM_BATTERY = "from the battery";
