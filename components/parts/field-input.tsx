"use client";

import type { UseFormRegister } from "react-hook-form";
import { fieldHint, inputUnitLabel, materialOptions, placeholderText, type FieldDef, type PartKind } from "@/lib/parts";
import { QUANTITY_INFO } from "@/lib/units";
import type { PartFormValues } from "./form-values";
import { inputClass } from "./labels";

const MATERIALS = materialOptions();

/** One specs field: label, input, the unit a bare number means, help and the inline error. */
export function FieldInput({ kind, field, register, error, note }: { kind: PartKind; field: FieldDef; register: UseFormRegister<PartFormValues>; error?: string; note?: string }) {
  const hint = fieldHint(kind, field.key);
  const id = `specs-${field.key}`;
  const name = `specs.${field.key}` as const;
  const unit = inputUnitLabel(field);
  const describedBy = `${unit ? `${id}-unit ` : ""}${id}-help${error ? ` ${id}-error` : ""}`;
  const common = { id, "aria-invalid": error ? true : undefined, "aria-describedby": describedBy, className: `${inputClass} w-full` };
  let control;
  if (field.type === "choice") {
    control = (
      <select {...common} {...register(name)}>
        {!field.required && <option value="">—</option>}
        {field.options.map((o) => (
          <option key={o} value={o}>{o}</option>
        ))}
      </select>
    );
  } else if (field.type === "material") {
    control = (
      <select {...common} {...register(name)}>
        <option value="">—</option>
        {MATERIALS.map((m) => (
          <option key={m.value} value={m.value} title={m.source}>{m.label}</option>
        ))}
      </select>
    );
  } else {
    // The field's own typical value, not the unit's generic example.
    const placeholder = placeholderText(hint, field.type === "quantity" ? QUANTITY_INFO[field.quantity].example : "");
    control = <input {...common} {...register(name)} type="text" inputMode={field.type === "quantity" ? "decimal" : undefined} placeholder={placeholder} autoComplete="off" />;
  }
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium">
        {field.label}
        {field.required && <span className="text-ember"> *</span>}
      </label>
      <div className="flex items-center gap-2">
        {control}
        {unit && <span id={`${id}-unit`} className="min-w-12 font-mono text-xs text-ink-soft">{unit}</span>}
      </div>
      <p id={`${id}-help`} className="text-xs text-ink-soft">
        {field.help}
        {hint?.typical && <span className="block">Typical: {hint.typical}.</span>}
      </p>
      {error && (
        <p id={`${id}-error`} role="alert" className="text-xs text-over">{error}</p>
      )}
      {note && !error && <p className="text-xs text-tight">{note}</p>}
    </div>
  );
}
