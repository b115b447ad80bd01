"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useMemo } from "react";
import { type FieldErrors, type Path, type Resolver, useFieldArray, useForm } from "react-hook-form";
import { z } from "zod";
import { ApiClientError } from "@/components/ui/fetch-json";
import type { CurveKind } from "@/lib/curves";
import { COMMON_FIELDS, kindDefinition, PART_SCHEMAS, PROVENANCES, VISIBILITIES, type FieldDef, type Part, type PartKind } from "@/lib/parts";
import type { UnitPreferences } from "@/lib/units";
import { FieldInput } from "./field-input";
import { curveLabel, curveTextErrors, defaultsFor, formToPartInput, type PartFormValues } from "./form-values";
import { buttonClass, inputClass, PROVENANCE_LABELS, quietButtonClass, VISIBILITY_LABELS } from "./labels";
import type { PartDto } from "./types";
import { useSavePart } from "./use-parts";

/** The part schema of the kind, reading the form's text values (one validation for form and API). */
function partResolver(kind: PartKind): Resolver<PartFormValues, unknown, Part> {
  const schema = z.preprocess((values) => formToPartInput(values as PartFormValues, kind), PART_SCHEMAS[kind]);
  const base = zodResolver(schema as unknown as z.ZodType<Part, PartFormValues>);
  return async (values, context, options) => {
    const result = await base(values, context, options);
    const curveErrors = curveTextErrors(values, kind);
    if (Object.keys(curveErrors).length === 0) return result;
    const curvesText = Object.fromEntries(Object.entries(curveErrors).map(([k, message]) => [k, { type: "curve", message }]));
    return { values: {}, errors: { ...result.errors, curvesText } as FieldErrors<PartFormValues> };
  };
}

/** The message at a dotted path in react-hook-form's nested errors ("specs.modes.0.name"). */
function errorAt(errors: FieldErrors<PartFormValues>, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split(".")) {
    if (!node || typeof node !== "object") return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  const message = (node as { message?: unknown } | undefined)?.message;
  return typeof message === "string" ? message : undefined;
}

// API paths print indices as [0]; the form's field names use .0.
const formPath = (apiPath: string) => apiPath.replace(/\[(\d+)\]/g, ".$1");

const CURRENCY = COMMON_FIELDS[4];

export function PartForm({ kind, part, prefs }: { kind: PartKind; part?: PartDto; prefs: UnitPreferences }) {
  const router = useRouter();
  const def = kindDefinition(kind);
  const resolver = useMemo(() => partResolver(kind), [kind]);
  const form = useForm<PartFormValues, unknown, Part>({ resolver, defaultValues: defaultsFor(kind, part, prefs), mode: "onSubmit", reValidateMode: "onChange" });
  const { register, handleSubmit, formState, setError, watch, control } = form;
  const modes = useFieldArray({ control, name: "modes" });
  const save = useSavePart(part?.id);
  const variant = def.discriminator ? watch(`specs.${def.discriminator}`) : undefined;
  const errors = formState.errors;
  const notes = new Map((part?.notes ?? []).map((n) => [n.field, n.message]));

  const onSubmit = handleSubmit(async (value) => {
    try {
      const saved = await save.mutateAsync(value);
      router.push(`/parts/${saved.id}`);
      router.refresh();
    } catch (e) {
      if (e instanceof ApiClientError && e.path) setError(formPath(e.path) as Path<PartFormValues>, { type: "server", message: e.message });
      else setError("root", { type: "server", message: e instanceof Error ? e.message : "Could not save the part." });
    }
  });

  const fields = (def.fields as readonly FieldDef[]).filter((f) => f.type !== "modes" && (f.variant === undefined || f.variant === variant));
  const hasModes = (def.fields as readonly FieldDef[]).some((f) => f.type === "modes");
  const errorCount = Object.keys(errors).length;

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6" aria-label={part ? `Edit ${part.name}` : `New ${def.label.toLowerCase()}`}>
      {errors.root && <p role="alert" className="rounded border border-over/40 bg-over/5 p-3 text-sm text-over">{errors.root.message}</p>}
      {errorCount > 0 && !errors.root && <p className="text-sm text-over">Some fields need attention; see the messages beside them.</p>}

      <fieldset className="grid gap-4 rounded-lg border border-line bg-white/60 p-4 sm:grid-cols-2">
        <legend className="px-1 text-sm font-semibold">About this part</legend>
        <div className="space-y-1 sm:col-span-2">
          <label htmlFor="part-name" className="block text-sm font-medium">Name<span className="text-ember"> *</span></label>
          <input id="part-name" {...register("name")} className={`${inputClass} w-full`} aria-invalid={errors.name ? true : undefined} autoComplete="off" />
          {errors.name && <p role="alert" className="text-xs text-over">{errors.name.message}</p>}
        </div>
        <div className="space-y-1">
          <label htmlFor="part-provenance" className="block text-sm font-medium">Provenance</label>
          <select id="part-provenance" {...register("provenance")} className={`${inputClass} w-full`}>
            {PROVENANCES.map((p) => (
              <option key={p} value={p}>{PROVENANCE_LABELS[p]}</option>
            ))}
          </select>
          {errors.provenance && <p role="alert" className="text-xs text-over">{errors.provenance.message}</p>}
        </div>
        <div className="space-y-1">
          <label htmlFor="part-visibility" className="block text-sm font-medium">Visibility</label>
          <select id="part-visibility" {...register("visibility")} className={`${inputClass} w-full`}>
            {VISIBILITIES.map((v) => (
              <option key={v} value={v}>{VISIBILITY_LABELS[v]}</option>
            ))}
          </select>
        </div>
        <div className="space-y-1 sm:col-span-2">
          <label htmlFor="part-note" className="block text-sm font-medium">Source note</label>
          <textarea id="part-note" rows={2} {...register("provenanceNote")} className={`${inputClass} w-full`} placeholder="Which datasheet and page, how it was measured, or what the estimate rests on" />
          {errors.provenanceNote && <p role="alert" className="text-xs text-over">{errors.provenanceNote.message}</p>}
        </div>
        <div className="space-y-1">
          <label htmlFor="part-cost" className="block text-sm font-medium">{CURRENCY.label}</label>
          <div className="flex items-center gap-2">
            <input id="part-cost" {...register("costEur")} className={`${inputClass} w-full`} inputMode="decimal" autoComplete="off" />
            <span className="min-w-12 font-mono text-xs text-ink-soft">EUR</span>
          </div>
          {errors.costEur && <p role="alert" className="text-xs text-over">{errors.costEur.message}</p>}
        </div>
      </fieldset>

      <fieldset className="grid gap-4 rounded-lg border border-line bg-white/60 p-4 sm:grid-cols-2">
        <legend className="px-1 text-sm font-semibold">{def.label} figures</legend>
        <p className="text-xs text-ink-soft sm:col-span-2">Type a value with its unit (“0.8 in”, “45 g”, “2.5 K/W”); a bare number is in the unit shown beside the field.</p>
        {fields.map((field) => (
          <FieldInput key={field.key} kind={kind} field={field} register={register} error={errorAt(errors, `specs.${field.key}`)} note={notes.get(field.key)} />
        ))}
      </fieldset>

      {hasModes && (
        <fieldset className="space-y-3 rounded-lg border border-line bg-white/60 p-4">
          <legend className="px-1 text-sm font-semibold">Modes</legend>
          <p className="text-xs text-ink-soft">Each mode’s figure is what the driver delivers to the emitters, a current (“2.8 A”, “350 mA”) or a power (“3 W”), or what it draws from the battery, as kits are often sold (“9 W from the battery”, “1.2 A from the battery”). Efficiency is output ÷ input power.</p>
          {errorAt(errors, "specs.modes") && <p role="alert" className="text-xs text-over">{errorAt(errors, "specs.modes")}</p>}
          {modes.fields.length > 0 && (
            <div className="flex gap-2 text-xs text-ink-soft" aria-hidden>
              <span className="w-32">Name</span>
              <span className="w-32">Output</span>
              <span className="w-28">Efficiency</span>
            </div>
          )}
          {modes.fields.map((row, index) => {
            const outputError = (["outputCurrentA", "outputPowerW", "inputCurrentA", "inputPowerW"] as const).map((k) => errorAt(errors, `specs.modes.${index}.${k}`)).find(Boolean);
            const rowErrors = [errorAt(errors, `specs.modes.${index}.name`), outputError, errorAt(errors, `specs.modes.${index}.efficiency`)].filter(Boolean);
            return (
              <div key={row.id} className="space-y-1">
                <div className="flex flex-wrap items-center gap-2">
                  <input aria-label={`Mode ${index + 1} name`} {...register(`modes.${index}.name`)} className={`${inputClass} w-32`} placeholder="high" />
                  <input aria-label={`Mode ${index + 1} output`} {...register(`modes.${index}.output`)} className={`${inputClass} w-56`} placeholder="2.8 A or 9 W from the battery" />
                  <input aria-label={`Mode ${index + 1} efficiency`} {...register(`modes.${index}.efficiency`)} className={`${inputClass} w-28`} placeholder="85 %" />
                  <button type="button" className="text-xs text-ink-soft hover:text-over" onClick={() => modes.remove(index)}>Remove</button>
                </div>
                {rowErrors.length > 0 && <p role="alert" className="text-xs text-over">{rowErrors.join("; ")}</p>}
              </div>
            );
          })}
          <button type="button" className={quietButtonClass} onClick={() => modes.append({ name: "", output: "", efficiency: "" })}>Add a mode</button>
        </fieldset>
      )}

      {def.curveKinds.length > 0 && (
        <fieldset className="space-y-4 rounded-lg border border-line bg-white/60 p-4">
          <legend className="px-1 text-sm font-semibold">Curves</legend>
          <p className="text-xs text-ink-soft">Paste two columns from a spreadsheet or type “x, y” per line; a header may name units in brackets, e.g. “Tj [°F], flux [%]”. Leave empty for none.</p>
          {(def.curveKinds as readonly CurveKind[]).map((curveKind) => {
            const error = errorAt(errors, `curvesText.${curveKind}`) ?? errorAt(errors, `curves.${curveKind}`);
            return (
              <div key={curveKind} className="space-y-1">
                <label htmlFor={`curve-${curveKind}`} className="block text-sm font-medium">{curveLabel(curveKind)}</label>
                <textarea id={`curve-${curveKind}`} rows={4} {...register(`curvesText.${curveKind}`)} className={`${inputClass} w-full font-mono text-xs`} aria-invalid={error ? true : undefined} />
                {error && <p role="alert" className="text-xs text-over">{error}</p>}
              </div>
            );
          })}
        </fieldset>
      )}

      <div className="flex gap-3">
        <button type="submit" className={buttonClass} disabled={formState.isSubmitting}>{part ? "Save changes" : "Create part"}</button>
        <button type="button" className={quietButtonClass} onClick={() => router.back()}>Cancel</button>
      </div>
    </form>
  );
}
