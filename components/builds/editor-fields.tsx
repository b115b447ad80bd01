"use client";

import type { ReactNode } from "react";
import type { PartKind } from "@/lib/parts";
import type { Problem } from "@/lib/retrofit";
import { FieldProblems } from "./editor-problems";
import { getPath, type Json, type JsonObject } from "./design-state";
import { usePartOptions } from "./use-part-options";

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

export function FieldShell({ label, error, children, hint, problems }: { label: string; error?: string; children: ReactNode; hint?: string; problems?: readonly Problem[] }) {
  return (
    <label className="block text-sm">
      <span className="mb-1 block font-medium">{label}</span>
      {children}
      {hint && !error && <span className="mt-1 block text-xs text-ink-soft">{hint}</span>}
      {error && <span role="alert" className="mt-1 block text-xs text-over">{error}</span>}
      <FieldProblems problems={problems} />
    </label>
  );
}

const inputClass = "w-full rounded border border-line bg-white px-2 py-1.5 disabled:bg-paper-deep";

/** A slot: pick a part of `kind` from the Parts bin, or leave it empty. */
export function PartSelect({ kind, ...p }: FieldProps & { kind: PartKind }) {
  const options = usePartOptions(kind);
  const slot = getPath(p.design, p.path);
  const current = slot && typeof slot === "object" && !Array.isArray(slot) ? slot : undefined;
  const partId = typeof current?.partId === "string" ? current.partId : "";
  const inlineName = current && "inline" in current ? String(current.name ?? `inline ${kind}`) : null;
  return (
    <FieldShell label={p.label} error={p.error} problems={p.problems}>
      <select
        aria-label={p.label}
        className={inputClass}
        disabled={p.disabled}
        value={inlineName ? "__inline" : partId}
        onChange={(e) => p.onChange(p.path, e.target.value ? { partId: e.target.value } : undefined)}
      >
        <option value="">— none —</option>
        {inlineName && <option value="__inline">{inlineName} (typed in)</option>}
        {(options.data ?? []).map((o) => (
          <option key={o.id} value={o.id}>
            {o.name} · {o.provenance}{o.verified ? " ✓" : ""}
          </option>
        ))}
      </select>
    </FieldShell>
  );
}

/** A number with a unit, typed as text ("18 mm", "30 °C"); the server parses and checks it. */
export function UnitInput({ unitHint, ...p }: FieldProps & { unitHint: string }) {
  const value = getPath(p.design, p.path);
  return (
    <FieldShell label={p.label} error={p.error} problems={p.problems} hint={unitHint}>
      <input
        aria-label={p.label}
        className={inputClass}
        disabled={p.disabled}
        defaultValue={value === undefined || value === null ? "" : String(value)}
        onBlur={(e) => p.onChange(p.path, e.target.value.trim() === "" ? undefined : e.target.value.trim())}
      />
    </FieldShell>
  );
}

export function IntInput({ min, max, ...p }: FieldProps & { min: number; max: number }) {
  const value = getPath(p.design, p.path);
  return (
    <FieldShell label={p.label} error={p.error} problems={p.problems}>
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
    <FieldShell label={p.label} error={p.error} problems={p.problems} hint={hint}>
      <select aria-label={p.label} className={inputClass} disabled={p.disabled} value={typeof value === "string" ? value : fallback} onChange={(e) => p.onChange(p.path, e.target.value === "" && emptyLabel !== undefined ? undefined : e.target.value)}>
        {emptyLabel !== undefined && <option value="">{emptyLabel}</option>}
        {choices.map(([v, l]) => (
          <option key={v} value={v}>{l}</option>
        ))}
      </select>
    </FieldShell>
  );
}
