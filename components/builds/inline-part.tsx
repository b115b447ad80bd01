"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";
import { fieldHint, inputUnitLabel, placeholderText, kindDefinition, materialOptions, type FieldDef, type PartKind } from "@/lib/parts";
import { STARTER_PARTS } from "@/lib/starter";
import { formatQuantity, METRIC_PREFERENCES } from "@/lib/units";
import type { Json, JsonObject } from "./design-state";

const MATERIALS = materialOptions();
const inputClass = "w-full rounded border border-line bg-white px-2 py-1 text-sm disabled:bg-paper-deep";

export type SlotIssue = { path: string; message: string };

/** A stored number (SI) as a person reads it ("40 mm"); text stays as typed. */
function shown(field: FieldDef, value: Json | undefined): string {
  if (value === undefined || value === null) return "";
  if (typeof value === "number" && field.type === "quantity") return formatQuantity(value, field.quantity, METRIC_PREFERENCES, { digits: 6 });
  return String(value);
}

type ModeRow = { name?: Json; outputCurrentA?: Json; outputPowerW?: Json; efficiency?: Json };

/** The driver's modes typed in: a name, the output current and the efficiency of each. */
function ModesInput({ modes, onChange, issueAt, disabled }: { modes: ModeRow[]; onChange: (m: ModeRow[]) => void; issueAt: (suffix: string) => string | undefined; disabled?: boolean }) {
  const set = (i: number, key: keyof ModeRow, v: string) => onChange(modes.map((m, j) => (j === i ? { ...m, [key]: v === "" ? undefined : v } : m)) as ModeRow[]);
  const current = (m: ModeRow) => (typeof m.outputCurrentA === "number" ? formatQuantity(m.outputCurrentA, "current", METRIC_PREFERENCES) : String(m.outputCurrentA ?? ""));
  const eff = (m: ModeRow) => (typeof m.efficiency === "number" ? `${Number((m.efficiency * 100).toPrecision(4))} %` : String(m.efficiency ?? ""));
  return (
    <div className="col-span-full space-y-1 text-sm">
      <span className="block font-medium">Modes</span>
      {issueAt("modes") && <span role="alert" className="block text-xs text-over">{issueAt("modes")}</span>}
      {modes.length > 0 && (
        <div className="grid grid-cols-[1fr_1fr_1fr_auto] gap-2 text-xs text-ink-soft" aria-hidden>
          <span>Name</span>
          <span>Current into the LEDs</span>
          <span>Efficiency</span>
          <span className="invisible">Remove</span>
        </div>
      )}
      {modes.map((m, i) => (
        <div key={i} className="grid grid-cols-[1fr_1fr_1fr_auto] items-start gap-2" data-field={`mode-${i}`}>
          <input aria-label={`Mode ${i + 1} name`} placeholder="high" value={String(m.name ?? "")} onChange={(e) => set(i, "name", e.target.value)} className={inputClass} disabled={disabled} />
          <input aria-label={`Mode ${i + 1} output current`} placeholder="2.8 A" value={current(m)} onChange={(e) => set(i, "outputCurrentA", e.target.value)} className={inputClass} disabled={disabled} />
          <input aria-label={`Mode ${i + 1} efficiency`} placeholder="85 %" value={eff(m)} onChange={(e) => set(i, "efficiency", e.target.value)} className={inputClass} disabled={disabled} />
          <button type="button" onClick={() => onChange(modes.filter((_, j) => j !== i))} className="text-xs text-ink-soft hover:text-over" disabled={disabled}>Remove</button>
          {[issueAt(`modes.${i}`)].filter(Boolean).map((t) => <span key={t} role="alert" className="col-span-full text-xs text-over">{t}</span>)}
        </div>
      ))}
      <button type="button" onClick={() => onChange([...modes, { name: "", efficiency: "85 %" }])} className="text-xs text-ember" disabled={disabled}>Add a mode</button>
      <span className="block text-xs text-ink-soft">Each mode: its name, the current it drives into the LEDs and its efficiency (output ÷ input power).</span>
    </div>
  );
}

/**
 * A part typed in where it is used: the same unit-aware fields, placeholders and checks as
 * the Parts bin (the design's schema validates it with the kind's own schema), and the
 * choice to keep it in the Parts bin.
 */
export function InlinePart({ kind, slotPath, slot, onChange, issues, disabled }: { kind: PartKind; slotPath: string; slot: JsonObject; onChange: (path: string, value: Json | undefined) => void; issues: readonly SlotIssue[]; disabled?: boolean }) {
  const def = kindDefinition(kind);
  const queryClient = useQueryClient();
  const [keepState, setKeepState] = useState<{ busy: boolean; message: string | null }>({ busy: false, message: null });
  const inline = (slot.inline && typeof slot.inline === "object" && !Array.isArray(slot.inline) ? slot.inline : {}) as JsonObject;
  // A part just started is open to type in; a filled one (a starting point's) stays folded until asked.
  const [open, setOpen] = useState(Object.keys(inline).length === 0);
  const hasIssues = issues.some((i) => i.path.replace(/^design\./, "").startsWith(`${slotPath}.`));
  // A starter-bin part keeps its name until the maker changes it.
  const fromStarter = STARTER_PARTS.some((p) => p.kind === kind && p.name === slot.name);
  const variant = def.discriminator ? String(inline[def.discriminator] ?? "") : undefined;
  const fields = def.fields.filter((f) => f.variant === undefined || f.variant === variant);
  const rel = (p: string) => p.replace(/\[(\d+)\]/g, ".$1");
  const issueAt = (suffix: string) => {
    const want = `${slotPath}.inline.${suffix}`;
    const hits = issues.filter((i) => rel(i.path) === want || (suffix.startsWith("modes") && rel(i.path).startsWith(`${want}.`)));
    return hits.length ? hits.map((i) => i.message).join("; ") : undefined;
  };
  const setField = (key: string, value: Json | undefined) => onChange(`${slotPath}.inline`, { ...inline, ...{ [key]: value } } as JsonObject);

  async function keep() {
    setKeepState({ busy: true, message: null });
    try {
      const name = String(slot.name ?? "").trim() || `Typed-in ${def.label.toLowerCase()}`;
      const r = await fetchJson<{ part: { id: string } }>("/api/v1/parts", {
        method: "POST",
        body: { kind, name, provenance: "estimate", provenanceNote: "Typed in on the Heat path of a build", visibility: "private", specs: inline, ...(typeof slot.costEur === "number" ? { costEur: slot.costEur } : {}) },
      });
      await queryClient.invalidateQueries({ queryKey: ["part-options", kind] });
      onChange(slotPath, { partId: r.part.id });
      setKeepState({ busy: false, message: null });
    } catch (e) {
      setKeepState({ busy: false, message: e instanceof ApiClientError ? e.message : "Could not keep it in the Parts bin; try again." });
    }
  }

  return (
    <details
      className="col-span-full rounded border border-dashed border-ember/50 bg-white/70 p-3"
      data-testid={`inline-${slotPath}`}
      open={open || hasIssues}
      onToggle={(e) => setOpen((e.currentTarget as HTMLDetailsElement).open)}
    >
      <summary className="cursor-pointer text-sm">
        <span className="font-medium">{String(slot.name ?? "") || `New ${def.label.toLowerCase()}`}</span>
        <span className="text-ink-soft"> · {fromStarter ? "from the starter bin, an estimate: open to change it" : "typed in here"}{hasIssues ? " · needs attention" : ""}</span>
      </summary>
      <p className="my-2 text-xs text-ink-soft">
        It travels with this build. The same checks as the Parts bin apply; what you leave empty stays empty.
      </p>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        <label className="block text-sm" data-field={`${slotPath}.name`}>
          <span className="mb-1 block font-medium">Name</span>
          <input aria-label={`${def.label} name`} value={String(slot.name ?? "")} onChange={(e) => onChange(`${slotPath}.name`, e.target.value === "" ? undefined : e.target.value)} className={inputClass} disabled={disabled} />
        </label>
        {fields.map((f) => {
          if (f.type === "modes") {
            const modes = (Array.isArray(inline.modes) ? inline.modes : []) as ModeRow[];
            return <ModesInput key={f.key} modes={modes} onChange={(m) => setField("modes", m as unknown as Json)} issueAt={issueAt} disabled={disabled} />;
          }
          const error = issueAt(f.key);
          const hint = fieldHint(kind, f.key);
          const label = `${def.label}: ${f.label}`;
          const value = inline[f.key];
          let control;
          if (f.type === "choice" || f.type === "material") {
            const options = f.type === "choice" ? f.options.map((o) => [o, o] as const) : MATERIALS.map((m) => [m.value, m.label] as const);
            control = (
              <select aria-label={label} value={typeof value === "string" ? value : ""} onChange={(e) => (f.key === def.discriminator ? onChange(`${slotPath}.inline`, { [f.key]: e.target.value }) : setField(f.key, e.target.value === "" ? undefined : e.target.value))} className={inputClass} disabled={disabled}>
                <option value="">{f.required ? "— choose —" : "—"}</option>
                {options.map(([v, l]) => <option key={v} value={v}>{l}</option>)}
              </select>
            );
          } else {
            control = <input aria-label={label} aria-invalid={error ? true : undefined} inputMode={f.type === "quantity" ? "decimal" : undefined} placeholder={placeholderText(hint)} value={shown(f, value)} onChange={(e) => setField(f.key, e.target.value.trim() === "" ? undefined : e.target.value)} className={inputClass} disabled={disabled} />;
          }
          const unit = inputUnitLabel(f);
          return (
            <label key={f.key} className="block scroll-mt-24 scroll-mb-32 text-sm" data-field={`${slotPath}.inline.${f.key}`} data-field-error={error ? "true" : undefined}>
              <span className="mb-1 block font-medium">
                {f.label}
                {f.required && <span className="text-ember"> *</span>}
                {unit && <span className="ml-1 font-mono text-xs font-normal text-ink-soft">[{unit}]</span>}
              </span>
              {control}
              {!error && <span className="mt-1 block text-xs text-ink-soft">{f.help}{hint?.typical ? ` Typical: ${hint.typical}.` : ""}</span>}
              {error && <span role="alert" className="mt-1 block text-xs text-over">{error}</span>}
            </label>
          );
        })}
      </div>
      {!disabled && (
        <div className="mt-3 flex flex-wrap items-center gap-3 text-sm">
          <button type="button" onClick={keep} disabled={keepState.busy} className="rounded border border-ember px-3 py-1 text-ember disabled:opacity-50">
            {keepState.busy ? "Keeping…" : "Keep it in my Parts bin"}
          </button>
          {keepState.message && <span role="alert" className="text-over">{keepState.message}</span>}
        </div>
      )}
    </details>
  );
}
