"use client";

import dynamic from "next/dynamic";
import type { ReactNode } from "react";
import type { PartKind } from "@/lib/parts";
import type { Problem } from "@/lib/retrofit";
import { formatQuantity, METRIC_PREFERENCES, type Quantity } from "@/lib/units";
import { STARTER_PARTS, starterSlot } from "@/lib/starter";
import { FieldProblems } from "./editor-problems";
import type { SlotIssue } from "./inline-part";
import { getPath, type Json, type JsonObject } from "./design-state";
import { usePartOptions } from "./use-part-options";

/** A typed-in part's fields, loaded when a slot holds one (kept out of the editor's first load). */
const InlinePart = dynamic(() => import("./inline-part").then((m) => m.InlinePart), {
  ssr: false,
  loading: () => <div className="h-24 animate-pulse rounded bg-line/30" aria-busy="true" aria-label="Loading the part's fields" />,
});

export type FieldProps = {
  design: JsonObject;
  path: string;
  label: string;
  onChange: (path: string, value: Json | undefined) => void;
  error?: string;
  /** What the evaluation of the saved revision found about this field. */
  problems?: readonly Problem[];
  disabled?: boolean;
};

export function FieldShell({ label, error, children, hint, problems, field }: { label: string; error?: string; children: ReactNode; hint?: string; problems?: readonly Problem[]; field?: string }) {
  return (
    <label className="block scroll-mt-24 scroll-mb-32 text-sm" data-field={field} data-field-error={error ? "true" : undefined}>
      <span className="mb-1 block font-medium">{label}</span>
      {children}
      {hint && !error && <span className="mt-1 block text-xs text-ink-soft">{hint}</span>}
      {error && <span role="alert" className="mt-1 block text-xs text-over">{error}</span>}
      <FieldProblems problems={problems} />
    </label>
  );
}

const inputClass = "w-full rounded border border-line bg-white px-2 py-1.5 disabled:bg-paper-deep";

/**
 * A slot: a part from the Parts bin, one from the starter bin (copied in as typed-in values,
 * marked as estimates), a part typed in right here, or nothing. A typed-in part shows its
 * fields under the slot; a part from the bin can be copied in to edit.
 */
export function PartSelect({ kind, issues = [], ...p }: FieldProps & { kind: PartKind; issues?: readonly SlotIssue[] }) {
  const options = usePartOptions(kind);
  const slot = getPath(p.design, p.path);
  const current = slot && typeof slot === "object" && !Array.isArray(slot) ? slot : undefined;
  const partId = typeof current?.partId === "string" ? current.partId : "";
  const isInline = Boolean(current && "inline" in current);
  const inlineName = isInline ? String(current?.name ?? "") || "no name yet" : null;
  const starters = STARTER_PARTS.filter((s) => s.kind === kind);
  const picked = (options.data ?? []).find((o) => o.id === partId);
  const onSelect = (value: string) => {
    if (value === "") p.onChange(p.path, undefined);
    else if (value === "__new") p.onChange(p.path, { name: "", inline: {} });
    else if (value.startsWith("starter:")) p.onChange(p.path, starterSlot(value.slice(8)) as unknown as Json);
    else if (value !== "__inline") p.onChange(p.path, { partId: value });
  };
  return (
    <>
      <FieldShell label={p.label} error={p.error} problems={p.problems} field={p.path}>
        <select aria-label={p.label} className={inputClass} disabled={p.disabled} value={isInline ? "__inline" : partId} onChange={(e) => onSelect(e.target.value)}>
          <option value="">— none —</option>
          {inlineName !== null && <option value="__inline">{inlineName} (typed in)</option>}
          <option value="__new">Type one in here…</option>
          {(options.data ?? []).length > 0 && (
            <optgroup label="Parts bin">
              {(options.data ?? []).map((o) => (
                <option key={o.id} value={o.id}>
                  {o.name} · {o.provenance}{o.verified ? " ✓" : ""}
                </option>
              ))}
            </optgroup>
          )}
          {starters.length > 0 && (
            <optgroup label="Starter bin (estimates)">
              {starters.map((s) => (
                <option key={s.key} value={`starter:${s.key}`}>{s.name}</option>
              ))}
            </optgroup>
          )}
        </select>
      </FieldShell>
      {picked && !p.disabled && (
        <button type="button" className="self-end justify-self-start pb-2 text-xs text-ink-soft hover:text-ember" onClick={() => p.onChange(p.path, { name: `${picked.name} (edited copy)`, inline: picked.specs as Json })}>
          Copy “{picked.name}” here to edit it
        </button>
      )}
      {isInline && current && <InlinePart kind={kind} slotPath={p.path} slot={current} onChange={p.onChange} issues={issues} disabled={p.disabled} />}
    </>
  );
}

/** A number with a unit, typed as text ("18 mm", "30 °C"); the server parses and checks it as it is typed. */
/**
 * A value with its unit. A value stored as a number (from a starting point or a saved
 * revision) is shown in the unit a person reads it in ("4 cm²", not "0.0004").
 */
export function UnitInput({ unitHint, placeholder, quantity, ...p }: FieldProps & { unitHint: string; placeholder?: string; quantity: Quantity }) {
  const stored = getPath(p.design, p.path);
  const value = typeof stored === "number" ? formatQuantity(stored, quantity, METRIC_PREFERENCES, { digits: 6 }) : stored;
  return (
    <FieldShell label={p.label} error={p.error} problems={p.problems} hint={unitHint} field={p.path}>
      <input
        aria-label={p.label}
        className={inputClass}
        disabled={p.disabled}
        placeholder={placeholder}
        aria-invalid={p.error ? true : undefined}
        value={value === undefined || value === null ? "" : String(value)}
        onChange={(e) => p.onChange(p.path, e.target.value.trim() === "" ? undefined : e.target.value)}
      />
    </FieldShell>
  );
}

export function IntInput({ min, max, ...p }: FieldProps & { min: number; max: number }) {
  const value = getPath(p.design, p.path);
  return (
    <FieldShell label={p.label} error={p.error} problems={p.problems} field={p.path}>
      <input
        aria-label={p.label}
        type="number"
        min={min}
        max={max}
        step={1}
        className={inputClass}
        disabled={p.disabled}
        value={typeof value === "number" ? value : ""}
        onChange={(e) => p.onChange(p.path, e.target.value === "" ? undefined : Number(e.target.value))}
      />
    </FieldShell>
  );
}

/** A choice; with `emptyLabel`, leaving it unset is a choice of its own (the field's default). */
export function ChoiceSelect({ choices, emptyLabel, hint, ...p }: FieldProps & { choices: readonly (readonly [string, string])[]; emptyLabel?: string; hint?: string }) {
  const value = getPath(p.design, p.path);
  const fallback = emptyLabel !== undefined ? "" : choices[0]?.[0];
  return (
    <FieldShell label={p.label} error={p.error} problems={p.problems} hint={hint} field={p.path}>
      <select aria-label={p.label} className={inputClass} disabled={p.disabled} value={typeof value === "string" ? value : fallback} onChange={(e) => p.onChange(p.path, e.target.value === "" && emptyLabel !== undefined ? undefined : e.target.value)}>
        {emptyLabel !== undefined && <option value="">{emptyLabel}</option>}
        {choices.map(([v, l]) => (
          <option key={v} value={v}>{l}</option>
        ))}
      </select>
    </FieldShell>
  );
}
