import { z } from "zod";
import { formatNumber, parseQuantity, unitField } from "@/lib/units";

export const MAX_DRIVER_MODES = 12;

/**
 * A driver mode delivers either a regulated current (most LED drivers) or a regulated power;
 * exactly one of the two is given. Efficiency is output ÷ input power at that mode.
 */
export const driverModeSchema = z
  .strictObject({
    name: z.string({ error: "required" }).trim().min(1, "required").max(40, "must be at most 40 characters"),
    outputCurrentA: unitField("current", { gt: 0, required: false }),
    outputPowerW: unitField("power", { gt: 0, required: false }),
    efficiency: unitField("percent", { gt: 0, max: 1 }),
  })
  .superRefine((mode, ctx) => {
    const given = (mode.outputCurrentA !== undefined ? 1 : 0) + (mode.outputPowerW !== undefined ? 1 : 0);
    if (given !== 1) {
      ctx.addIssue({
        code: "custom",
        path: ["outputCurrentA"],
        message: given === 0 ? "give an output current or an output power" : "give an output current or an output power, not both",
      });
    }
  });

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
 * One CSV cell holds all modes: `low: 350 mA, 90 %; high: 2.8 A, 85 %`. The output's unit
 * says whether it is a current or a power; a bare number is a current in A.
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
    const asPower = parseQuantity(output, "power");
    modes.push(asPower.ok ? { name, outputPowerW: output, efficiency } : { name, outputCurrentA: output, efficiency });
  }
  return { ok: true, modes };
}

/** The inverse of parseModesCell, in A / W and % so a spreadsheet reads it. */
export function formatModesCell(modes: readonly DriverMode[]): string {
  return modes
    .map((mode) => {
      const output =
        mode.outputCurrentA !== undefined ? `${formatNumber(mode.outputCurrentA, 12)} A` : `${formatNumber(mode.outputPowerW ?? 0, 12)} W`;
      return `${mode.name}: ${output}, ${formatNumber(mode.efficiency * 100, 12)} %`;
    })
    .join("; ");
}
