import { formatFieldValue, kindDefinition, modeFigureText, type DriverMode, type FieldDef } from "@/lib/parts";
import { formatQuantity, type UnitPreferences } from "@/lib/units";
import type { PartDto } from "./types";

function modesList(modes: readonly DriverMode[], prefs: UnitPreferences) {
  return (
    <ul className="space-y-0.5">
      {modes.map((m) => (
        <li key={m.name}>
          <span className="font-medium">{m.name}</span>:{" "}
          {modeFigureText(m, prefs)} at{" "}
          {formatQuantity(m.efficiency, "percent", prefs)} efficiency
        </li>
      ))}
    </ul>
  );
}

/** The part's figures in the viewer's units, with advisory notes beside the field they concern. */
export function PartFields({ part, prefs }: { part: PartDto; prefs: UnitPreferences }) {
  const def = kindDefinition(part.kind);
  const variant = def.discriminator ? part.specs[def.discriminator] : undefined;
  const fields = (def.fields as readonly FieldDef[]).filter((f) => f.variant === undefined || f.variant === variant);
  const notes = new Map(part.notes.map((n) => [n.field, n.message]));
  return (
    <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2" aria-label="Figures">
      {fields.map((field) => {
        const value = part.specs[field.key];
        return (
          <div key={field.key} className="border-b border-line/60 pb-2">
            <dt className="text-xs text-ink-soft">{field.label}</dt>
            <dd className="tabular-nums" data-field={field.key}>
              {field.type === "modes" && Array.isArray(value) ? modesList(value as DriverMode[], prefs) : formatFieldValue(field, value, prefs)}
            </dd>
            {notes.has(field.key) && <dd className="text-xs text-tight">{notes.get(field.key)}</dd>}
          </div>
        );
      })}
    </dl>
  );
}
