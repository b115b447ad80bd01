"use client";

import { useMutation } from "@tanstack/react-query";
import { type FormEvent, useState } from "react";
import { VERDICT_STYLE } from "@/components/budget/format";
import { formatAgainstLimit, formatFigure, formatHeadroom } from "@/lib/units/figures";
import { TraceView } from "@/components/budget/trace-view";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";
import { FINISHES, materialOptions } from "@/lib/parts";
import { labelFor, labelsForSubject } from "@/lib/messages";
import type { QuickCheckResult } from "@/lib/retrofit";
import { FIN_DIRECTION_CHOICES } from "@/lib/retrofit/design-labels";
import { QUICK_CHECK_LABELS } from "@/lib/retrofit/quick-check-labels";

const checkLabel = (field: string) => labelFor(field.split(/\.|\[|\]/).filter(Boolean), labelsForSubject("check"));

const MATERIALS = materialOptions();

type Field = { name: string; label: string; placeholder: string; hint?: string; empty?: boolean };

const L = QUICK_CHECK_LABELS;
const GEOMETRY: Field[] = [
  { name: "baseLengthM", label: L["sink.geometry.baseLengthM"], placeholder: "60 mm", hint: "Salvaged sinks: typically 20–100 mm" },
  { name: "baseWidthM", label: L["sink.geometry.baseWidthM"], placeholder: "60 mm", hint: "Salvaged sinks: typically 20–100 mm" },
  { name: "baseThicknessM", label: L["sink.geometry.baseThicknessM"], placeholder: "5 mm", hint: "Typically 2–8 mm" },
  { name: "finCount", label: L["sink.geometry.finCount"], placeholder: "8", hint: "0 for a flat plate" },
  { name: "finHeightM", label: L["sink.geometry.finHeightM"], placeholder: "30 mm", hint: "Above the base; typically 10–40 mm" },
  { name: "finThicknessM", label: L["sink.geometry.finThicknessM"], placeholder: "1.5 mm", hint: "Typically 0.5–2 mm" },
  { name: "finSpacingM", label: L["sink.geometry.finSpacingM"], placeholder: "worked out from width, count and thickness", hint: "Leave empty to have it worked out; if you give it, it is checked against the base width", empty: true },
];

function Input({ f, error }: { f: Field; error?: string }) {
  return (
    <label className="block text-sm">
      <span className="mb-1 block font-medium">{f.label}</span>
      <input name={f.name} placeholder={f.placeholder} defaultValue={f.empty ? "" : f.placeholder} aria-label={f.label} aria-invalid={error ? true : undefined} className="w-full rounded border border-line bg-white px-2 py-1.5" />
      {f.hint && !error && <span className="mt-0.5 block text-xs text-ink-soft">{f.hint}</span>}
      {error && <span role="alert" className="mt-0.5 block text-xs text-over">{error}</span>}
    </label>
  );
}

/** One heat source on one heatsink: Tj, sink temperature, verdict and the K/W you need. */
export function QuickCheckForm() {
  const [mode, setMode] = useState<"declared" | "geometry">("declared");
  const check = useMutation({ mutationFn: (body: unknown) => fetchJson<QuickCheckResult>("/api/v1/check", { method: "POST", body }) });
  const err = check.error instanceof ApiClientError ? check.error : null;
  const errorFor = (path: string) => (err && err.path === path ? err.message : undefined);

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const d = new FormData(e.currentTarget);
    const s = (k: string) => String(d.get(k) ?? "").trim();
    const opt = (k: string) => (s(k) === "" ? undefined : s(k));
    const sink =
      mode === "declared"
        ? { declaredKPerW: s("declaredKPerW"), ratedDeltaK: opt("ratedDeltaK") }
        : {
            finDirection: s("finDirection"),
            geometry: {
              rating: "geometry",
              ...Object.fromEntries(GEOMETRY.map((g) => [g.name, s(g.name)])),
              material: s("material"),
              finish: s("finish"),
            },
          };
    const bondLine = opt("bondLineM");
    check.mutate({
      heatWatts: s("heatWatts"),
      sink,
      ambientC: s("ambientC"),
      rthJspKPerW: opt("rthJspKPerW"),
      maxTjC: opt("maxTjC"),
      interface: bondLine ? { areaM2: s("contactAreaM2"), specs: { specifiedAs: "bulk", bondLineM: bondLine, conductivityWPerMK: s("conductivityWPerMK") } } : undefined,
    });
  }

  const r = check.data;
  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_1fr]">
      <form onSubmit={onSubmit} noValidate className="space-y-4 rounded-lg border border-line bg-white/60 p-4">
        <div className="grid gap-3 sm:grid-cols-2">
          <Input f={{ name: "heatWatts", label: L.heatWatts, placeholder: "7 W", hint: "Electrical power × heat fraction (often 60–80 % for white LEDs)" }} error={errorFor("heatWatts")} />
          <Input f={{ name: "ambientC", label: L.ambientC, placeholder: "25 °C", hint: "Indoors about 20–25 °C; a summer car 40–60 °C" }} error={errorFor("ambientC")} />
          <Input f={{ name: "rthJspKPerW", label: L.rthJspKPerW, placeholder: "2.5 K/W", hint: "From the emitter's datasheet; typically 1–10 K/W" }} error={errorFor("rthJspKPerW")} />
          <Input f={{ name: "maxTjC", label: L.maxTjC, placeholder: "125 °C", hint: "White LEDs: typically 125–150 °C" }} error={errorFor("maxTjC")} />
        </div>
        <fieldset className="space-y-3">
          <legend className="text-sm font-medium">Heatsink</legend>
          <div className="flex gap-4 text-sm">
            <label><input type="radio" name="mode" checked={mode === "declared"} onChange={() => setMode("declared")} /> Declared K/W</label>
            <label><input type="radio" name="mode" checked={mode === "geometry"} onChange={() => setMode("geometry")} /> Measured geometry</label>
          </div>
          {mode === "declared" ? (
            <div className="grid gap-3 sm:grid-cols-2">
              <Input f={{ name: "declaredKPerW", label: L["sink.declaredKPerW"], placeholder: "4 K/W", hint: "Check that the figure is for still air: sellers often quote it with a fan." }} error={errorFor("sink.declaredKPerW")} />
              <Input f={{ name: "ratedDeltaK", label: L["sink.ratedDeltaK"], placeholder: "75 K", empty: true, hint: "The sink-to-air rise the rating holds at; empty: 75 K, a common catalogue basis (from memory). The figure is corrected to the rise your sink reaches." }} error={errorFor("sink.ratedDeltaK")} />
            </div>
          ) : (
            <div className="grid gap-3 sm:grid-cols-2">
              {GEOMETRY.map((g) => <Input key={g.name} f={g} error={errorFor(`sink.geometry.${g.name}`)} />)}
              <label className="block text-sm">
                <span className="mb-1 block font-medium">Material</span>
                <select name="material" aria-label="Material" className="w-full rounded border border-line bg-white px-2 py-1.5" defaultValue="aluminium-6063-t5">
                  {MATERIALS.map((m) => <option key={m.value} value={m.value}>{m.label}</option>)}
                </select>
              </label>
              <label className="block text-sm">
                <span className="mb-1 block font-medium">Finish</span>
                <select name="finish" aria-label="Finish" className="w-full rounded border border-line bg-white px-2 py-1.5" defaultValue="as-supplied">
                  {FINISHES.map((f) => <option key={f} value={f}>{f}</option>)}
                </select>
              </label>
              <label className="block text-sm">
                <span className="mb-1 block font-medium">{L["sink.finDirection"]}</span>
                <select name="finDirection" aria-label="Fin direction" className="w-full rounded border border-line bg-white px-2 py-1.5" defaultValue="vertical">
                  {FIN_DIRECTION_CHOICES.map(([v, l]) => <option key={v} value={v}>{l}</option>)}
                </select>
                <span className="mt-0.5 block text-xs text-ink-soft">How the fins stand in use: air rises through vertical channels; level fins and fins hanging down trap warm air.</span>
                {errorFor("sink.finDirection") && <span role="alert" className="mt-0.5 block text-xs text-over">{errorFor("sink.finDirection")}</span>}
              </label>
            </div>
          )}
        </fieldset>
        <fieldset className="grid gap-3 sm:grid-cols-3">
          <legend className="mb-1 text-sm font-medium">Interface (optional)</legend>
          <label className="block text-sm"><span className="mb-1 block">Bond line</span><input name="bondLineM" placeholder="e.g. 50 µm" aria-label="Bond line" className="w-full rounded border border-line bg-white px-2 py-1.5" /></label>
          <label className="block text-sm"><span className="mb-1 block">Conductivity</span><input name="conductivityWPerMK" placeholder="e.g. 3 W/(m·K)" aria-label="Conductivity" className="w-full rounded border border-line bg-white px-2 py-1.5" /></label>
          <label className="block text-sm"><span className="mb-1 block">Contact area</span><input name="contactAreaM2" placeholder="e.g. 2.5 cm²" aria-label="Contact area" className="w-full rounded border border-line bg-white px-2 py-1.5" /></label>
        </fieldset>
        <button type="submit" className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90" disabled={check.isPending}>
          {check.isPending ? "Working…" : "Check it"}
        </button>
        {err && !["heatWatts", "ambientC", "rthJspKPerW", "maxTjC"].includes(err.path) && !err.path.startsWith("sink.") && (
          <p role="alert" className="text-sm text-over">{err.message}</p>
        )}
        {err && err.path.startsWith("sink.") && !errorFor(err.path) && <p role="alert" className="text-sm text-over">{err.message}</p>}
      </form>
      <section aria-live="polite" className="space-y-3" data-testid="quick-check-result">
        {!r && <p className="text-sm text-ink-soft">Fill in what you know and press “Check it”. Sinkwise solves the junction → solder point → sink → air path, with convection and radiation worked out at the temperatures reached.</p>}
        {r && (
          <>
            <div className="flex items-center gap-3">
              <span className={`rounded border px-2 py-1 text-sm font-semibold ${VERDICT_STYLE[r.verdict ?? ""] ?? "border-line"}`} data-testid="quick-verdict">{r.verdict ?? "could not be worked out"}</span>
              <span className="text-sm text-ink-soft">headroom {formatHeadroom(r.headroomK)} to {formatFigure(r.maxTjC, "temperature")}</span>
            </div>
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
              <dt className="text-ink-soft">Junction</dt><dd className="font-medium">{formatAgainstLimit(r.tjC, r.maxTjC, "max", "temperature").value}</dd>
              <dt className="text-ink-soft">Solder point</dt><dd>{formatFigure(r.solderPointC, "temperature")}</dd>
              <dt className="text-ink-soft">Heatsink</dt><dd>{formatFigure(r.sinkC, "temperature")}</dd>
              {r.finGapM !== null && (
                <>
                  <dt className="text-ink-soft">Gap between fins</dt>
                  <dd data-testid="fin-gap">{formatFigure(r.finGapM, "length")} {r.finGapWorkedOut ? "(worked out from width, count and thickness)" : "(from the base width; checked against the gap you gave)"}</dd>
                </>
              )}
              <dt className="text-ink-soft">Sink-to-air, this sink</dt><dd>{formatFigure(r.sinkKPerW, "thermalResistance")}</dd>
              <dt className="text-ink-soft">Needed for the budget (10 K margin)</dt><dd>{r.requiredForBudgetKPerW === null ? "–" : `≤ ${formatFigure(r.requiredForBudgetKPerW, "thermalResistance")}`}</dd>
              <dt className="text-ink-soft">Needed to just reach the limit</dt><dd>{r.requiredForLimitKPerW === null ? "–" : `≤ ${formatFigure(r.requiredForLimitKPerW, "thermalResistance")}`}</dd>
            </dl>
            {r.problems.length > 0 && (
              <ul className="list-disc pl-5 text-xs text-ink-soft">{r.problems.map((p, i) => <li key={i}>{checkLabel(p.field)}: {p.message}</li>)}</ul>
            )}
            <details className="rounded border border-line bg-white p-3">
              <summary className="cursor-pointer text-sm font-medium">How these numbers were worked out</summary>
              <div className="mt-2 space-y-3">{r.traces.map((t, i) => <TraceView key={i} trace={t} />)}</div>
            </details>
            <p className="text-xs text-ink-soft">An estimate for a sink in open air. Inside a closed housing it runs hotter: model the whole retrofit as a build. Hot heatsinks burn; confirm with a thermocouple.</p>
          </>
        )}
      </section>
    </div>
  );
}
