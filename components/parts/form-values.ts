import { CURVE_KIND_INFO, curveToCsv, parseCurveCsv, type CurveKind } from "@/lib/curves";
import { KIND_DEFINITIONS, kindDefinition, modeFigureField, modeFigureText, type DriverModeInput, type FieldDef, type PartKind } from "@/lib/parts";
import { formatQuantity, parseQuantity, type UnitPreferences } from "@/lib/units";
import type { PartDto } from "./types";

/**
 * What the part form edits: every value as the text a person typed ("0.8 in", "85 %").
 * formToPartInput turns it into the body the part schema reads, so the form, the API and
 * the CSV import share one validation.
 */
export interface PartFormValues {
  name: string;
  provenance: string;
  provenanceNote: string;
  visibility: string;
  costEur: string;
  specs: Record<string, string>;
  modes: { name: string; output: string; efficiency: string }[];
  curvesText: Record<string, string>;
}

const DIGITS = 6;

function fieldText(field: FieldDef, value: unknown, prefs: UnitPreferences): string {
  if (value === undefined || value === null) return "";
  if (field.type === "quantity") return typeof value === "number" ? formatQuantity(value, field.quantity, prefs, { digits: DIGITS }) : String(value);
  return typeof value === "string" ? value : "";
}

type StoredMode = { name: string; outputCurrentA?: number; outputPowerW?: number; inputCurrentA?: number; inputPowerW?: number; efficiency: number };

function modeText(mode: StoredMode, prefs: UnitPreferences) {
  return { name: mode.name, output: modeFigureText(mode, prefs, DIGITS), efficiency: formatQuantity(mode.efficiency, "percent", prefs, { digits: DIGITS }) };
}

/** Form values for a new part of `kind`, or for editing `part` (shown in the user's units). */
export function defaultsFor(kind: PartKind, part: PartDto | undefined, prefs: UnitPreferences): PartFormValues {
  const def = kindDefinition(kind);
  const specs: Record<string, string> = {};
  let modes: PartFormValues["modes"] = [];
  for (const field of def.fields as readonly FieldDef[]) {
    const value = part?.specs[field.key];
    if (field.type === "modes") modes = Array.isArray(value) ? (value as StoredMode[]).map((m) => modeText(m, prefs)) : [];
    else specs[field.key] = fieldText(field, value, prefs);
  }
  // A new part starts with the first option of every required choice (a select cannot be "nothing").
  if (!part) for (const field of def.fields as readonly FieldDef[]) if (field.type === "choice" && field.required) specs[field.key] = field.options[0] ?? "";
  if (!part && kind === "driver") modes = [{ name: "high", output: "", efficiency: "" }];
  const curvesText: Record<string, string> = {};
  for (const curveKind of def.curveKinds as readonly CurveKind[]) {
    const curve = part?.curves[curveKind] as { points: { x: number; y: number }[] } | undefined;
    curvesText[curveKind] = curve ? curveToCsv(curve.points, curveKind) : "";
  }
  return {
    name: part?.name ?? "",
    provenance: part?.provenance ?? "estimate",
    provenanceNote: part?.provenanceNote ?? "",
    visibility: part?.visibility ?? "private",
    costEur: part?.costEur === null || part?.costEur === undefined ? "" : String(part.costEur),
    specs,
    modes,
    curvesText,
  };
}

const blank = (text: string | undefined) => text === undefined || text.trim() === "";

function modeInput(mode: PartFormValues["modes"][number]): DriverModeInput {
  // The figure's unit says whether it is a current or a power, "from the battery" which side, as in the CSV modes cell.
  const figure = modeFigureField(mode.output);
  return { name: mode.name, [figure.key]: figure.text, efficiency: mode.efficiency };
}

/** Form values → the body partSchema reads: blanks left out, the other variant's fields dropped. */
export function formToPartInput(values: PartFormValues, kind: PartKind): Record<string, unknown> {
  const def = kindDefinition(kind);
  const variant = def.discriminator ? values.specs[def.discriminator] : undefined;
  const specs: Record<string, unknown> = {};
  for (const field of def.fields as readonly FieldDef[]) {
    if (field.variant !== undefined && field.variant !== variant) continue;
    if (field.type === "modes") {
      const rows = values.modes.filter((m) => !(blank(m.name) && blank(m.output) && blank(m.efficiency)));
      if (rows.length > 0 || field.required) specs[field.key] = rows.map(modeInput);
      continue;
    }
    const text = values.specs[field.key];
    if (!blank(text)) specs[field.key] = text;
  }
  const curves: Record<string, unknown> = {};
  for (const curveKind of def.curveKinds as readonly CurveKind[]) {
    const text = values.curvesText[curveKind];
    if (blank(text)) continue;
    const parsed = parseCurveCsv(text ?? "", curveKind);
    // A curve that does not parse is reported by curveTextErrors, not sent.
    if (parsed.ok) curves[curveKind] = { points: parsed.points };
  }
  const body: Record<string, unknown> = { kind, name: values.name, provenance: values.provenance, visibility: values.visibility, specs, curves };
  if (!blank(values.provenanceNote)) body.provenanceNote = values.provenanceNote;
  if (!blank(values.costEur)) body.costEur = values.costEur;
  return body;
}

/** Messages for pasted curves that do not parse, keyed by curve kind, with the line. */
export function curveTextErrors(values: PartFormValues, kind: PartKind): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const curveKind of KIND_DEFINITIONS[kind].curveKinds as readonly CurveKind[]) {
    const text = values.curvesText[curveKind];
    if (blank(text)) continue;
    const parsed = parseCurveCsv(text ?? "", curveKind);
    if (!parsed.ok) {
      errors[curveKind] = parsed.errors.map((e) => (e.line === null ? e.message : `line ${e.line}: ${e.message}`)).join("; ");
    }
  }
  return errors;
}

export function curveLabel(kind: CurveKind): string {
  return CURVE_KIND_INFO[kind].label;
}
