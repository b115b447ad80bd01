import type { CurveKind } from "@/lib/curves";
import type { PartKind } from "./common";
import type { FieldDef } from "./fields";
import { CELL_FIELDS } from "./kinds/cell";
import { CHARGER_FIELDS } from "./kinds/charger";
import { DRIVER_FIELDS } from "./kinds/driver";
import { EMITTER_FIELDS } from "./kinds/emitter";
import { HEATSINK_FIELDS } from "./kinds/heatsink";
import { HOUSING_FIELDS } from "./kinds/housing";
import { INTERFACE_FIELDS } from "./kinds/interface";
import { PROTECTION_FIELDS } from "./kinds/protection";
import { SPREADER_FIELDS } from "./kinds/spreader";

export interface KindDefinition {
  readonly kind: PartKind;
  readonly label: string;
  /** Every specs field, in form order; variant fields say which option they belong to. */
  readonly fields: readonly FieldDef[];
  /** The choice field that picks a variant (heatsink: rating; interface: specifiedAs). */
  readonly discriminator?: string;
  readonly curveKinds: readonly CurveKind[];
  /** 2–4 specs keys worth a table column in the Parts bin. */
  readonly mainFigures: readonly string[];
}

export const KIND_DEFINITIONS = {
  emitter: {
    kind: "emitter",
    label: "Emitter",
    fields: EMITTER_FIELDS,
    curveKinds: ["fluxVsTj", "fluxVsCurrent", "vfVsCurrent", "currentVsTemperature"],
    mainFigures: ["rthJspKPerW", "maxTjC", "vfV", "efficacyLmPerW"],
  },
  driver: {
    kind: "driver",
    label: "Driver",
    fields: DRIVER_FIELDS,
    curveKinds: ["efficiencyVsLoad", "currentVsTemperature"],
    mainFigures: ["topology", "inputVoltageMinV", "inputVoltageMaxV", "modes"],
  },
  heatsink: {
    kind: "heatsink",
    label: "Heatsink",
    fields: HEATSINK_FIELDS,
    discriminator: "rating",
    curveKinds: [],
    mainFigures: ["rating", "sinkToAirKPerW", "finCount", "massKg"],
  },
  interface: {
    kind: "interface",
    label: "Interface material",
    fields: INTERFACE_FIELDS,
    discriminator: "specifiedAs",
    curveKinds: [],
    mainFigures: ["conductivityWPerMK", "bondLineM", "resistancePerAreaKM2PerW"],
  },
  spreader: {
    kind: "spreader",
    label: "Spreader / strap",
    fields: SPREADER_FIELDS,
    curveKinds: [],
    mainFigures: ["material", "thicknessM", "widthM", "lengthM"],
  },
  housing: {
    kind: "housing",
    label: "Housing",
    fields: HOUSING_FIELDS,
    curveKinds: [],
    mainFigures: ["material", "outerAreaM2", "enclosure", "emissivity"],
  },
  cell: {
    kind: "cell",
    label: "Cell",
    fields: CELL_FIELDS,
    curveKinds: [],
    mainFigures: ["chemistry", "capacityCoulomb", "nominalVoltageV", "maxDischargeCurrentA"],
  },
  charger: {
    kind: "charger",
    label: "Charger",
    fields: CHARGER_FIELDS,
    curveKinds: [],
    mainFigures: ["topology", "chargeCurrentA", "inputVoltageV"],
  },
  protection: {
    kind: "protection",
    label: "Protection",
    fields: PROTECTION_FIELDS,
    curveKinds: [],
    mainFigures: ["overCurrentTripA", "overChargeCutoffV", "overDischargeCutoffV"],
  },
} as const satisfies Record<PartKind, KindDefinition>;

export function kindDefinition(kind: PartKind): KindDefinition {
  return KIND_DEFINITIONS[kind];
}

/** The field definition for a specs key of a kind, or undefined. */
export function specsField(kind: PartKind, key: string): FieldDef | undefined {
  return KIND_DEFINITIONS[kind].fields.find((def: FieldDef) => def.key === key);
}
