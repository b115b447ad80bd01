import { z } from "zod";
import { formatNumber, parseQuantity, unitField } from "@/lib/units";
import { DRIVE_KEYS, FROM_BATTERY, modeDrive, type ModeDrive } from "./mode-drive";

export { FROM_BATTERY, modeDrive, type ModeDrive };

export const MAX_DRIVER_MODES = 12;

/**
 * A driver mode is given as kits are sold: a regulated current or power into the emitters
 * (most LED drivers), or the current or power it draws from the battery ("9 W from the
 * battery"); exactly one of the four. Efficiency is output ÷ input power at that mode.
 */
export const driverModeSchema = z
  .strictObject({
    name: z.string({ error: "required" }).trim().min(1, "required").max(40, "must be at most 40 characters"),
    outputCurrentA: unitField("current", { gt: 0, required: false }),
    outputPowerW: unitField("power", { gt: 0, required: false }),
    /** Current drawn from the battery (at the pack's nominal voltage for the steady figures). */
    inputCurrentA: unitField("current", { gt: 0, max: 100, required: false }),
    /** Power drawn from the battery. */
    inputPowerW: unitField("power", { gt: 0, max: 1000, required: false }),
    efficiency: unitField("percent", { gt: 0, max: 1 }),
  })
  .superRefine((mode, ctx) => {
    const given = DRIVE_KEYS.filter((k) => mode[k] !== undefined).length;
    if (given !== 1) {
      ctx.addIssue({
        code: "custom",
        path: ["outputCurrentA"],
        message: given === 0 ? "give an output current or power, or the current or power drawn from the battery" : "give one figure: an output current or power, or the current or power drawn from the battery, not two",
      });
    }
  });

const FROM_BATTERY_RE = /\s+from\s+(the\s+)?battery\s*$/i;

/** A mode's figure typed as text → the mode field it goes in: the unit picks current or power, "from the battery" the side. */
export function modeFigureField(text: string): { key: (typeof DRIVE_KEYS)[number]; text: string } {
  const battery = FROM_BATTERY_RE.test(text);
  const figure = text.replace(FROM_BATTERY_RE, "").trim();
  const power = parseQuantity(figure, "power").ok;
  return { key: battery ? (power ? "inputPowerW" : "inputCurrentA") : power ? "outputPowerW" : "outputCurrentA", text: figure };
}

export type DriverMode = z.output<typeof driverModeSchema>;
export type DriverModeInput = z.input<typeof driverModeSchema>;

export const modesSchema = z
  .array(driverModeSchema, { error: "required" })
  .min(1, "a driver needs at least one mode")
  .max(MAX_DRIVER_MODES, `at most ${MAX_DRIVER_MODES} modes`)
  .superRefine((modes, ctx) => {
    const seen = new Set<string>();
    modes.forEach((mode, index) => {
      const key = mode.name.toLowerCase();
      if (seen.has(key)) ctx.addIssue({ code: "custom", path: [index, "name"], message: `mode name "${mode.name}" is used twice` });
      seen.add(key);
    });
  });

/**
 * One CSV cell holds all modes: `low: 350 mA, 90 %; high: 9 W from the battery, 85 %`. The
 * figure's unit says whether it is a current or a power (a bare number is a current in A);
 * "from the battery" after it says it is drawn from the battery rather than delivered.
 */
export function parseModesCell(cell: string): { ok: true; modes: DriverModeInput[] } | { ok: false; message: string } {
  const modes: DriverModeInput[] = [];
  const parts = cell.split(";").map((p) => p.trim()).filter((p) => p !== "");
  for (const [index, part] of parts.entries()) {
    const colon = part.indexOf(":");
    const [output, efficiency, ...extra] = (colon < 0 ? "" : part.slice(colon + 1)).split(",").map((s) => s.trim());
    if (colon < 0 || !output || !efficiency || extra.length > 0) {
      return { ok: false, message: `mode ${index + 1} ("${part}"): write it as name: output, efficiency (e.g. high: 2.8 A, 85 %)` };
    }
    const name = part.slice(0, colon).trim();
    const figure = modeFigureField(output);
    modes.push({ name, [figure.key]: figure.text, efficiency });
  }
  return { ok: true, modes };
}

/** The inverse of parseModesCell, in A / W and % so a spreadsheet reads it. */
export function formatModesCell(modes: readonly DriverMode[]): string {
  return modes
    .map((mode) => {
      const d = modeDrive(mode);
      const output = `${formatNumber(d.value, 12)} ${d.quantity === "current" ? "A" : "W"}${d.side === "battery" ? ` ${FROM_BATTERY}` : ""}`;
      return `${mode.name}: ${output}, ${formatNumber(mode.efficiency * 100, 12)} %`;
    })
    .join("; ");
}
