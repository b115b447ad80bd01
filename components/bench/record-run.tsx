"use client";

import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { ApiClientError } from "@/components/ui/fetch-json";
import { BENCH_LABELS, benchFieldOf } from "@/lib/bench/labels";
import { FINISHES, materialOptions } from "@/lib/parts";
import { FitChart } from "./fit-chart-lazy";
import { FitSummary } from "./fit-summary";
import type { ImportedReading } from "./readings-import";
import { ReadingsImport } from "./readings-import-lazy";
import { useFit, useSaveRun } from "./use-bench";

const MATERIALS = materialOptions();
const box = "w-full rounded border border-line bg-white px-2 py-1.5";

export interface PoweredOption {
  value: string;
  label: string;
  group: "Parts" | "Builds";
}

/** A refusal in words: the reading by its number, the field by its label; never a schema path. */
function describe(err: ApiClientError): string {
  const stripped = err.message.replace(/^[\w.[\]]+: /, "");
  const reading = /readings\[(\d+)\]\.(tS|tempC)$/.exec(err.path);
  if (reading && !/^Reading \d+/.test(stripped)) return `Reading ${Number(reading[1]) + 1}: ${reading[2] === "tS" ? "time" : "temperature"} ${stripped}`;
  // The API names the field by its label on this form; a message about a reading names the reading.
  const label = BENCH_LABELS[benchFieldOf(err.path)];
  if (!label || err.message.startsWith(`${label}: `) || /^(Reading|One reading|The |No )/.test(stripped)) return err.message;
  return `${label}: ${stripped}`;
}

/** The fields with a text box of their own: their message shows beside it. */
const TYPED_FIELDS = new Set(["title", "mode", "heatW", "volts", "amps", "heatFraction", "ambientC", "massKg"]);

function Field({ name, label, placeholder, hint, error }: { name: string; label: string; placeholder: string; hint?: string; error?: string }) {
  return (
    <label className="block text-sm">
      <span className="mb-1 block font-medium">{label}</span>
      <input name={name} aria-label={label} placeholder={placeholder} className={box} />
      {hint && !error && <span className="mt-0.5 block text-xs text-ink-soft">{hint}</span>}
      {error && <span role="alert" className="mt-0.5 block text-xs text-over">{error}</span>}
    </label>
  );
}

/** Record a run: what was powered, the input, the conditions and the readings; fit it, then save it. */
export function RecordRun({ powered }: { powered: PoweredOption[] }) {
  const router = useRouter();
  const [heatMode, setHeatMode] = useState<"watts" | "electrical">("watts");
  const [readings, setReadings] = useState<ImportedReading[] | null>(null);
  const fit = useFit();
  const save = useSaveRun();
  const err = (save.error ?? fit.error) instanceof ApiClientError ? ((save.error ?? fit.error) as ApiClientError) : null;
  const errorKey = err ? benchFieldOf(err.path) : "";
  const errorFor = (key: string) => (err && errorKey === key && TYPED_FIELDS.has(key) ? err.message.replace(/^[^:]*: /, "") : undefined);
  const inline = err !== null && TYPED_FIELDS.has(errorKey) && (errorKey !== "heatW" || heatMode === "watts");
  const generalError = err && !inline ? describe(err) : null;

  function conditionsOf(form: HTMLFormElement) {
    const d = new FormData(form);
    const s = (k: string) => String(d.get(k) ?? "").trim();
    const opt = (k: string) => (s(k) === "" ? undefined : s(k));
    const heat = heatMode === "watts" ? { heatW: s("heatW") } : { volts: s("volts"), amps: s("amps"), heatFraction: opt("heatFraction") };
    return {
      title: s("title"),
      powered: s("powered"),
      mode: s("mode"),
      visibility: s("visibility"),
      air: s("air"),
      conditions: { ambientC: s("ambientC"), ...heat, massKg: opt("massKg"), material: opt("material"), finish: opt("finish"), orientation: s("orientation") },
    };
  }

  const poweredBody = (v: string, mode: string) => {
    const [kind, id] = v.split(":");
    return kind === "part" ? { kind: "part", partId: id } : kind === "build" ? { kind: "build", buildId: id, ...(mode ? { mode } : {}) } : { kind: "none" };
  };

  function onFit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    save.reset();
    const c = conditionsOf(e.currentTarget);
    const sink = (readings ?? []).filter((r) => !r.place || r.place.toLowerCase() === "heatsink");
    fit.mutate({ ...c.conditions, readings: sink.map(({ tS, tempC }) => ({ tS, tempC })) });
  }

  function onSave(form: HTMLFormElement | null) {
    if (!form) return;
    fit.reset();
    const c = conditionsOf(form);
    save.mutate(
      { title: c.title, visibility: c.visibility, air: c.air, powered: poweredBody(c.powered, c.mode), conditions: c.conditions, readings: (readings ?? []).map((r) => ({ tS: r.tS, tempC: r.tempC, place: r.place ?? "heatsink" })) },
      { onSuccess: (answer) => router.push(answer.run.url) },
    );
  }

  const shown = save.data?.fit ?? fit.data ?? null;
  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_1fr]">
      <form id="record-run" onSubmit={onFit} noValidate className="space-y-4 rounded-lg border border-line bg-white/60 p-4" data-testid="record-run">
        <div className="grid gap-3 sm:grid-cols-2">
          <Field name="title" label="Title" placeholder="Salvaged sink, 7 W, kitchen table" error={errorFor("title")} />
          <label className="block text-sm">
            <span className="mb-1 block font-medium">What was powered</span>
            <select name="powered" aria-label="What was powered" className={box} defaultValue="none">
              <option value="none">not recorded</option>
              {(["Parts", "Builds"] as const).map((g) => (
                <optgroup key={g} label={g}>{powered.filter((p) => p.group === g).map((p) => <option key={p.value} value={p.value}>{p.label}</option>)}</optgroup>
              ))}
            </select>
            <span className="mt-0.5 block text-xs text-ink-soft">An emitter part gives its heat fraction; a build makes this a warm-up to hold the build against.</span>
          </label>
          <Field name="mode" label="Driver mode" placeholder="high" error={errorFor("mode")} hint="For a build's warm-up: the mode it ran in (blank: its highest). Name each reading's place as the Budget does: heatsink, housing wall, driver board…" />
        </div>
        <fieldset className="space-y-2">
          <legend className="text-sm font-medium">Heat input</legend>
          <div className="flex gap-4 text-sm">
            <label><input type="radio" name="heatMode" checked={heatMode === "watts"} onChange={() => setHeatMode("watts")} /> Watts of heat</label>
            <label><input type="radio" name="heatMode" checked={heatMode === "electrical"} onChange={() => setHeatMode("electrical")} /> Volts and amps</label>
          </div>
          {heatMode === "watts" ? (
            <Field name="heatW" label="Heat into the sink" placeholder="7 W" hint="Electrical power × the emitter's heat fraction." error={errorFor("heatW")} />
          ) : (
            <div className="grid gap-3 sm:grid-cols-3">
              <Field name="volts" label="Volts" placeholder="3.1 V" error={errorFor("volts")} />
              <Field name="amps" label="Amps" placeholder="3.2 A" error={errorFor("amps")} />
              <Field name="heatFraction" label="Heat fraction" placeholder="70 %" hint="Blank: the emitter part's." error={errorFor("heatFraction")} />
            </div>
          )}
        </fieldset>
        <div className="grid gap-3 sm:grid-cols-3">
          <Field name="ambientC" label="Ambient" placeholder="25 °C" error={errorFor("ambientC")} />
          <label className="block text-sm">
            <span className="mb-1 block font-medium">Orientation</span>
            <select name="orientation" aria-label="Orientation" className={box} defaultValue="upright"><option value="upright">upright (fins vertical)</option><option value="lying">lying (fins up)</option></select>
          </label>
          <label className="block text-sm">
            <span className="mb-1 block font-medium">Air</span>
            <select name="air" aria-label="Air" className={box} defaultValue="still"><option value="still">still</option><option value="fan">a fan blowing</option></select>
          </label>
          <Field name="massKg" label="Sink mass" placeholder="100 g" hint="Optional; needed for a single reading." error={errorFor("massKg")} />
          <label className="block text-sm">
            <span className="mb-1 block font-medium">Material</span>
            <select name="material" aria-label="Material" className={box} defaultValue=""><option value="">not known (aluminium assumed)</option>{MATERIALS.map((m) => <option key={m.value} value={m.value}>{m.label}</option>)}</select>
          </label>
          <label className="block text-sm">
            <span className="mb-1 block font-medium">Finish</span>
            <select name="finish" aria-label="Finish" className={box} defaultValue=""><option value="">not known</option>{FINISHES.map((f) => <option key={f} value={f}>{f}</option>)}</select>
          </label>
        </div>
        <ReadingsImport onReadings={setReadings} />
        <div className="flex flex-wrap items-center gap-3">
          <label className="text-sm">
            <span className="mr-1">Visibility</span>
            <select name="visibility" aria-label="Visibility" className="rounded border border-line bg-white px-2 py-1 text-sm" defaultValue="private"><option value="private">private</option><option value="shared">shared with signed-in users</option></select>
          </label>
          <button type="submit" className="rounded border border-ember px-4 py-2 text-sm font-medium text-ember hover:bg-ember/5" disabled={fit.isPending || !readings}>{fit.isPending ? "Fitting…" : "Fit"}</button>
          <button type="button" onClick={(e) => onSave(e.currentTarget.form)} className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90" disabled={save.isPending || !readings}>{save.isPending ? "Saving…" : "Save run"}</button>
        </div>
        {generalError && <p role="alert" className="text-sm text-over" data-testid="run-error">{generalError}</p>}
      </form>
      <section aria-live="polite" className="space-y-3" data-testid="fit-result">
        {readings && <FitChart series={[{ label: "readings", kind: "readings", points: readings.filter((r) => !r.place || r.place.toLowerCase() === "heatsink") }, ...(shown ? [{ label: "fitted warm-up", kind: "curve" as const, points: shown.curve }] : [])]} />}
        {shown ? <FitSummary fit={shown} /> : <p className="text-sm text-ink-soft">Run the emitter at a known power on the sink from cold, read the sink's temperature every minute or two for 20–30 minutes, and enter the readings. “Fit” works out the sink's resistance to the air and its heat capacity, with how sure the numbers are.</p>}
      </section>
    </div>
  );
}
