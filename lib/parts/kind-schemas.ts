/**
 * The zod schema of each part kind's specs, built from the kind's field definitions
 * (lib/parts/kinds/*). Kept apart from the definitions so screens that only show parts
 * load no schema library.
 */
import { z } from "zod";
import { buildSpecsSchema, buildVariantSpecsSchema } from "./fields";
import { EMITTER_FIELDS } from "./kinds/emitter";
import { DRIVER_FIELDS } from "./kinds/driver";
import { FIN_FIELDS, HEATSINK_FIELDS, workedOutFinGap } from "./kinds/heatsink";
import { INTERFACE_FIELDS } from "./kinds/interface";
import { SPREADER_FIELDS } from "./kinds/spreader";
import { HOUSING_FIELDS } from "./kinds/housing";
import { CELL_FIELDS, WINDOWS } from "./kinds/cell";
import { CHARGER_FIELDS } from "./kinds/charger";
import { PROTECTION_FIELDS } from "./kinds/protection";

export const emitterSpecsSchema = buildSpecsSchema(EMITTER_FIELDS);
export type EmitterSpecs = import("zod").output<typeof emitterSpecsSchema>;

export const driverSpecsSchema = buildSpecsSchema(DRIVER_FIELDS).superRefine((specs, ctx) => {
  if (specs.inputVoltageMinV > specs.inputVoltageMaxV) {
    ctx.addIssue({ code: "custom", path: ["inputVoltageMaxV"], message: "must not be below the minimum input voltage" });
  }
  if (specs.groundPlaneAreaM2 !== undefined && specs.boardAreaM2 !== undefined && specs.groundPlaneAreaM2 > 2 * specs.boardAreaM2) {
    ctx.addIssue({ code: "custom", path: ["groundPlaneAreaM2"], message: "must not exceed both sides of the board" });
  }
});
export type DriverSpecs = z.output<typeof driverSpecsSchema>;

/**
 * A sink described by its geometry: a gap between fins left empty is worked out from the
 * base width, the fin count and the fin thickness (fins that do not fit on the base are
 * left without a gap; the evaluation names the fin count).
 */
export const heatsinkSpecsSchema = buildVariantSpecsSchema(HEATSINK_FIELDS, "rating")
  .superRefine((specs, ctx) => {
    if (specs.rating !== "geometry") return;
    if (specs.material === undefined) ctx.addIssue({ code: "custom", path: ["material"], message: "required when the heatsink is described by its geometry" });
    if (specs.finCount > 0) {
      for (const key of FIN_FIELDS) {
        if (specs[key] === undefined) ctx.addIssue({ code: "custom", path: [key], message: "required when there are fins" });
      }
    }
  })
  .transform((specs) => {
    if (specs.rating !== "geometry" || specs.finSpacingM !== undefined || specs.finCount < 1 || specs.finThicknessM === undefined) return specs;
    const gap = specs.finCount === 1 ? specs.baseWidthM : workedOutFinGap(specs.baseWidthM, specs.finCount, specs.finThicknessM);
    return gap === null || gap <= 0 ? specs : { ...specs, finSpacingM: gap };
  });
export type HeatsinkSpecs = z.output<typeof heatsinkSpecsSchema>;

export const interfaceSpecsSchema = buildVariantSpecsSchema(INTERFACE_FIELDS, "specifiedAs");
export type InterfaceSpecs = z.output<typeof interfaceSpecsSchema>;

export const spreaderSpecsSchema = buildSpecsSchema(SPREADER_FIELDS);
export type SpreaderSpecs = z.output<typeof spreaderSpecsSchema>;

export const housingSpecsSchema = buildSpecsSchema(HOUSING_FIELDS).superRefine((specs, ctx) => {
  if (specs.innerAreaM2 !== undefined && specs.innerAreaM2 > specs.outerAreaM2) {
    ctx.addIssue({ code: "custom", path: ["innerAreaM2"], message: "must not exceed the outer area" });
  }
  if (specs.secondMaterial !== undefined && specs.secondAreaM2 === undefined) {
    ctx.addIssue({ code: "custom", path: ["secondAreaM2"], message: "required when a second material is given" });
  }
  if (specs.secondAreaM2 !== undefined && specs.secondMaterial === undefined) {
    ctx.addIssue({ code: "custom", path: ["secondMaterial"], message: "required when the second material's area is given" });
  }
  if (specs.secondAreaM2 !== undefined && specs.secondAreaM2 >= specs.outerAreaM2) {
    ctx.addIssue({ code: "custom", path: ["secondAreaM2"], message: "must be less than the outer area (the two materials' areas add up to it)" });
  }
});
export type HousingSpecs = z.output<typeof housingSpecsSchema>;

export const cellSpecsSchema = buildSpecsSchema(CELL_FIELDS).superRefine((specs, ctx) => {
  if (!(specs.cutoffVoltageV < specs.nominalVoltageV)) {
    ctx.addIssue({ code: "custom", path: ["cutoffVoltageV"], message: "must be below the nominal voltage" });
  }
  if (!(specs.nominalVoltageV < specs.chargeEndVoltageV)) {
    ctx.addIssue({ code: "custom", path: ["chargeEndVoltageV"], message: "must be above the nominal voltage" });
  }
  for (const [min, max] of WINDOWS) {
    const low = specs[min];
    const high = specs[max];
    if (low !== undefined && high !== undefined && !(low < high)) {
      ctx.addIssue({ code: "custom", path: [max], message: "must be above the minimum of the window" });
    }
  }
});
export type CellSpecs = z.output<typeof cellSpecsSchema>;

export const chargerSpecsSchema = buildSpecsSchema(CHARGER_FIELDS);
export type ChargerSpecs = z.output<typeof chargerSpecsSchema>;

export const protectionSpecsSchema = buildSpecsSchema(PROTECTION_FIELDS).superRefine((specs, ctx) => {
  if (!(specs.overDischargeCutoffV < specs.overChargeCutoffV)) {
    ctx.addIssue({ code: "custom", path: ["overChargeCutoffV"], message: "must be above the over-discharge cut-off" });
  }
});
export type ProtectionSpecs = z.output<typeof protectionSpecsSchema>;

export const KIND_SCHEMAS = {
  emitter: emitterSpecsSchema,
  driver: driverSpecsSchema,
  heatsink: heatsinkSpecsSchema,
  interface: interfaceSpecsSchema,
  spreader: spreaderSpecsSchema,
  housing: housingSpecsSchema,
  cell: cellSpecsSchema,
  charger: chargerSpecsSchema,
  protection: protectionSpecsSchema,
} as const;
