import { getMaterial } from "@/lib/thermal";
import { formatQuantity, QUANTITY_INFO, type UnitPreferences } from "@/lib/units";
import type { PartKind } from "./common";
import type { FieldDef } from "./fields";
import { FROM_BATTERY, modeDrive } from "./mode-drive";
import type { DriverMode } from "./modes";
import { KIND_DEFINITIONS } from "./registry";

/** A table column for one of a kind's main figures. */
export interface FigureColumn {
  readonly key: string;
  readonly label: string;
  readonly field: FieldDef;
}

export function mainFigureColumns(kind: PartKind): FigureColumn[] {
  const def = KIND_DEFINITIONS[kind];
  return def.mainFigures.flatMap((key) => {
    const field = def.fields.find((f: FieldDef) => f.key === key);
    return field ? [{ key, label: field.label, field }] : [];
  });
}

function isModes(value: unknown): value is DriverMode[] {
  return Array.isArray(value);
}

/** How a stored specs value reads in a table cell or on the part page; "—" when absent. */
export function formatFieldValue(field: FieldDef, value: unknown, prefs: UnitPreferences): string {
  if (value === undefined || value === null) return "—";
  switch (field.type) {
    case "quantity":
      return typeof value === "number" ? formatQuantity(value, field.quantity, prefs) : "—";
    case "material":
      // The handbook name reads better than the id; an unknown id is shown as stored.
      return typeof value === "string" ? (getMaterial(value)?.name ?? value) : "—";
    case "modes":
      // A table cell has room for the range, not every mode.
      return isModes(value) ? summariseModes(value, prefs) : "—";
    default:
      return String(value);
  }
}

/** A mode's figure as entered, in the reader's units: "2.8 A", "9 W from the battery". */
export function modeFigureText(mode: Parameters<typeof modeDrive>[0], prefs: UnitPreferences, digits = 3): string {
  const d = modeDrive(mode);
  return `${formatQuantity(d.value, d.quantity, prefs, { digits })}${d.side === "battery" ? ` ${FROM_BATTERY}` : ""}`;
}

function summariseModes(modes: readonly DriverMode[], prefs: UnitPreferences): string {
  return modes.map((mode) => `${mode.name} ${modeFigureText(mode, prefs)}`).join(" · ");
}

/** The unit a form shows beside a quantity input (what a bare number there means). */
export function inputUnitLabel(field: FieldDef): string {
  if (field.type !== "quantity") return "";
  return (field.bareUnit ?? QUANTITY_INFO[field.quantity].bare).label;
}
