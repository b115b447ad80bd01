import type { PartKind } from "@/lib/parts";
import type { FinDirection } from "@/lib/thermal/correlations";
import type { CalibrationParameter, Environment } from "./design-schema";

/**
 * The label of every field of a build design as the Heat path editor shows it. The editor
 * takes its labels from here and every message about a design names the field with them,
 * so what a person reads always matches the screen. Fields without an editor control
 * (they arrive in build files) still have a label in words.
 */
export const DESIGN_LABELS = {
  housing: "Housing",
  "housingShape.form": "Shape",
  "housingShape.characteristicLengthM": "Housing size",
  "lightEngine.emitter": "Emitter",
  "lightEngine.count": "Emitter count",
  "lightEngine.wiring": "Wiring",
  "lightEngine.footprintM2": "Emitter footprint",
  "lightEngine.maxCurrentA": "Emitter maximum current",
  "lightEngine.board": "Emitter board",
  "lightEngine.board.areaM2": "Emitter board area",
  "lightEngine.board.thicknessM": "Emitter board thickness",
  "lightEngine.board.material": "Emitter board material",
  "lightEngine.board.dielectricThicknessM": "Emitter board dielectric thickness",
  "lightEngine.board.dielectricConductivityWPerMK": "Emitter board dielectric conductivity",
  "lightEngine.interface": "Board → heatsink interface",
  "lightEngine.heatsink": "Heatsink",
  "lightEngine.finDirection": "Fin direction",
  "lightEngine.mount": "Mounting",
  "lightEngine.mount.kind": "Mounting",
  "lightEngine.mount.interface": "Mounting interface",
  "lightEngine.mount.contactAreaM2": "Contact area with the wall",
  "lightEngine.mount.reflector": "Reflector",
  "lightEngine.mount.reflector.material": "Reflector material",
  "lightEngine.mount.reflector.thicknessM": "Reflector wall thickness",
  "lightEngine.mount.reflector.lengthM": "Reflector path length",
  "lightEngine.mount.reflector.meanCircumferenceM": "Mean circumference",
  "lightEngine.mount.reflector.rimContactAreaM2": "Rim contact with the housing",
  "driver.part": "Driver",
  "driver.cooling": "Driver cooling",
  "driver.cooling.kind": "Driver cooling",
  "driver.cooling.interface": "Ground plane → wall interface",
  "driver.cooling.spreader": "Strap / spreader",
  "driver.cooling.adhesive": "Adhesive",
  "driver.cooling.overlapM": "Strap overlap",
  "driver.selectedModes": "Driver modes to check",
  "driver.massKg": "Driver mass",
  "pack.cell": "Cell",
  "pack.series": "Cells in series",
  "pack.parallel": "Cells in parallel",
  "pack.protection": "Protection",
  "pack.charger": "Charger",
  "pack.chargerCount": "Chargers in parallel",
  "pack.cellDiameterM": "Cell diameter",
  "pack.cellLengthM": "Cell length",
  "pack.chargerBoardAreaM2": "Charger board area",
  "environment.ambientC": "Ambient temperature",
  "environment.orientation": "Orientation",
  "environment.air": "Air",
  "environment.air.kind": "Air",
  "environment.air.speedMPerS": "Breeze speed (m/s)",
  "environment.contact": "Hand contact",
  "costs.extras": "Extra costs",
  "costs.comparableNewLightEur": "Price of a comparable new light (€)",
  calibration: "Calibration from a bench run",
  "calibration.parameter": "Calibrated figure",
  "calibration.factor": "Calibration factor",
  "calibration.low": "Calibration interval, low end",
  "calibration.high": "Calibration interval, high end",
  "calibration.run": "Calibration bench run",
  "calibration.readingCount": "Calibration readings",
  "calibration.rmsBeforeK": "Misfit before calibrating",
  "calibration.rmsAfterK": "Misfit after calibrating",
  version: "File version",
} as const;

export type DesignField = keyof typeof DESIGN_LABELS;

/** The part slots of a design and the kind of part each holds. */
export const DESIGN_SLOTS = {
  housing: "housing",
  "lightEngine.emitter": "emitter",
  "lightEngine.interface": "interface",
  "lightEngine.heatsink": "heatsink",
  "lightEngine.mount.interface": "interface",
  "driver.part": "driver",
  "driver.cooling.interface": "interface",
  "driver.cooling.spreader": "spreader",
  "driver.cooling.adhesive": "interface",
  "pack.cell": "cell",
  "pack.protection": "protection",
  "pack.charger": "charger",
} as const satisfies Partial<Record<DesignField, PartKind>>;

export type DesignSlot = keyof typeof DESIGN_SLOTS;

export const designLabel = (field: DesignField): string => DESIGN_LABELS[field];

/** Fin directions as the build editor offers them (label, then a line of help). */
export const FIN_DIRECTION_CHOICES: readonly (readonly [FinDirection, string])[] = [
  ["vertical", "Vertical: channels run up and down"],
  ["horizontal", "Level, on an upright base"],
  ["up", "Pointing up from a level base"],
  ["down", "Hanging down under a level base"],
];

/** The fins' direction in use: as given, else along the lamp's axis (vertical when upright, level when lying). */
export function finDirectionOf(le: { finDirection?: FinDirection }, env: { orientation: Environment["orientation"] }): FinDirection {
  return le.finDirection ?? (env.orientation === "upright" ? "vertical" : "horizontal");
}

/** What each calibratable figure is, in the words the Budget and the bench screen use. */
export const CALIBRATION_LABELS: Readonly<Record<CalibrationParameter, { name: string; links: string }>> = {
  "sink-rating": { name: "the heatsink's declared rating", links: "the heatsink's link to the air" },
  "inside-air": { name: "the inside air's coefficient", links: "convection to and from the air inside the housing" },
  "outside-air": { name: "the housing's outside convection", links: "convection from the housing to the air outside" },
};
