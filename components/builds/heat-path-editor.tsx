"use client";

import { useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { type ReactNode, useMemo, useState } from "react";
import { useSolve } from "@/components/budget/use-solve";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";
import { materialOptions } from "@/lib/parts";
import { FIN_DIRECTION_CHOICES } from "@/lib/retrofit/design-schema";
import { getPath, type Json, type JsonObject, setPath } from "./design-state";
import { ChoiceSelect, IntInput, PartSelect, UnitInput } from "./editor-fields";
import { placeProblems, ProblemsSummary } from "./editor-problems";

const MATERIAL_CHOICES = materialOptions().map((m) => [m.value, m.label] as const);

type Props = { buildId: string; title: string; revision: number; design: JsonObject; canEdit: boolean };

function Section({ title, children, note }: { title: string; children: ReactNode; note?: string }) {
  return (
    <fieldset className="rounded-lg border border-line bg-white/60 p-4">
      <legend className="px-1 text-sm font-semibold">{title}</legend>
      {note && <p className="mb-3 text-xs text-ink-soft">{note}</p>}
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">{children}</div>
    </fieldset>
  );
}

/** The Heat path editor: every slot from the Parts bin, every number with its unit. */
export function HeatPathEditor({ buildId, title, revision, design: initial, canEdit }: Props) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [design, setDesign] = useState<JsonObject>(initial);
  const [note, setNote] = useState("");
  const [error, setError] = useState<{ path: string; message: string } | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  // The checks are of the saved revision: what is on screen may differ until it is saved.
  const solved = useSolve(buildId, revision);
  const problems = useMemo(() => solved.data?.evaluation.problems ?? [], [solved.data]);
  const placed = useMemo(() => placeProblems(problems), [problems]);

  const change = (path: string, value: Json | undefined) => {
    setDesign((d) => setPath(d, path, value));
    setSaved(null);
  };
  const errorAt = (path: string) => (error && error.path === `design.${path}` ? error.message.replace(/^[^:]*: /, "") : undefined);
  const f = (path: string, label: string) => ({ design, path, label, onChange: change, error: errorAt(path), problems: placed.byField.get(path), disabled: !canEdit });
  const kindOf = (path: string) => String(getPath(design, `${path}.kind`) ?? "");

  async function save() {
    setBusy(true);
    setError(null);
    try {
      const r = await fetchJson<{ build: { currentRevision: number } }>(`/api/v1/builds/${buildId}`, { method: "PATCH", body: { design, note } });
      setSaved(`Saved as revision ${r.build.currentRevision}.`);
      setNote("");
      await queryClient.invalidateQueries({ queryKey: ["build", buildId] });
      router.refresh();
    } catch (e) {
      setError(e instanceof ApiClientError ? { path: e.path, message: e.message } : { path: "", message: "Could not save." });
    } finally {
      setBusy(false);
    }
  }

  const mountKind = kindOf("lightEngine.mount") || "in-housing-air";
  const coolingKind = kindOf("driver.cooling") || "floating";
  const airKind = kindOf("environment.air") || "still";

  return (
    <div className="space-y-4" data-testid="heat-path-editor">
      {!canEdit && (
        <p className="rounded border border-line bg-paper-deep px-3 py-2 text-sm">
          Read-only: this build belongs to someone else. Use <em>Copy to my builds</em> to change it.
        </p>
      )}
      <ProblemsSummary
        revision={revision}
        status={solved.status}
        problems={placed.unplaced}
        total={problems.filter((p) => p.severity !== "info").length}
        errorMessage={solved.error?.message}
      />
      <Section title="Housing" note="The shell the heat must finally cross. Sealed housings trap their air.">
        <PartSelect kind="housing" {...f("housing", "Housing")} />
        <ChoiceSelect choices={[["box", "Box (lantern)"], ["tube", "Tube (torch, headlamp)"]]} {...f("housingShape.form", "Shape")} />
      </Section>
      <Section title="Light engine" note="Emitters on their board, the interface, the heatsink and how it is mounted.">
        <PartSelect kind="emitter" {...f("lightEngine.emitter", "Emitter")} />
        <IntInput min={1} max={64} {...f("lightEngine.count", "Emitter count")} />
        <ChoiceSelect choices={[["series", "In series"], ["parallel", "In parallel"]]} {...f("lightEngine.wiring", "Wiring")} />
        <PartSelect kind="interface" {...f("lightEngine.interface", "Board → heatsink interface")} />
        <PartSelect kind="heatsink" {...f("lightEngine.heatsink", "Heatsink")} />
        <ChoiceSelect
          choices={FIN_DIRECTION_CHOICES}
          emptyLabel="Along the lamp (vertical upright, level lying)"
          hint="How the fins stand when the lamp is in use. Air rises through vertical channels; level fins and fins hanging down trap warm air."
          {...f("lightEngine.finDirection", "Fin direction")}
        />
        <ChoiceSelect
          choices={[["in-housing-air", "Heatsink in the housing's air"], ["pressed-to-wall", "Heatsink pressed to the housing wall"], ["through-reflector", "Heat through the reflector to the rim"]]}
          {...f("lightEngine.mount.kind", "Mounting")}
          onChange={(_p, v) => change("lightEngine.mount", v === "through-reflector" ? { kind: v, reflector: { material: MATERIAL_CHOICES[0]?.[0] ?? "" } } : { kind: v ?? "in-housing-air" })}
        />
        {mountKind === "pressed-to-wall" && <PartSelect kind="interface" {...f("lightEngine.mount.interface", "Heatsink → wall interface")} />}
        {mountKind === "pressed-to-wall" && <UnitInput unitHint="e.g. 9 cm^2" {...f("lightEngine.mount.contactAreaM2", "Contact area with the wall")} />}
        {mountKind === "through-reflector" && (
          <>
            <ChoiceSelect choices={MATERIAL_CHOICES} {...f("lightEngine.mount.reflector.material", "Reflector material")} />
            <UnitInput unitHint="e.g. 0.5 mm" {...f("lightEngine.mount.reflector.thicknessM", "Reflector wall thickness")} />
            <UnitInput unitHint="sink to rim, e.g. 30 mm" {...f("lightEngine.mount.reflector.lengthM", "Reflector path length")} />
            <UnitInput unitHint="e.g. 12 cm" {...f("lightEngine.mount.reflector.meanCircumferenceM", "Mean circumference")} />
            <UnitInput unitHint="e.g. 4 cm^2" {...f("lightEngine.mount.reflector.rimContactAreaM2", "Rim contact with the housing")} />
            <PartSelect kind="interface" {...f("lightEngine.mount.interface", "Rim → housing interface")} />
          </>
        )}
      </Section>
      <Section title="Driver" note="Small drivers dump heat through their ground plane; floating free in a closed housing they run hot.">
        <PartSelect kind="driver" {...f("driver.part", "Driver")} />
        <ChoiceSelect
          choices={[["floating", "Floating free in the housing air"], ["ground-plane-to-wall", "Ground plane pressed to the housing"], ["strapped", "Strapped to the housing (spreader + adhesive)"]]}
          {...f("driver.cooling.kind", "Driver cooling")}
          onChange={(_p, v) => change("driver.cooling", { kind: v ?? "floating" })}
        />
        {coolingKind === "ground-plane-to-wall" && <PartSelect kind="interface" {...f("driver.cooling.interface", "Ground plane → wall interface")} />}
        {coolingKind === "strapped" && <PartSelect kind="spreader" {...f("driver.cooling.spreader", "Strap / spreader")} />}
        {coolingKind === "strapped" && <PartSelect kind="interface" {...f("driver.cooling.adhesive", "Adhesive")} />}
      </Section>
      <Section title="Pack and charging" note="Parallel cells add capacity at the same voltage; join them only at equal voltage.">
        <PartSelect kind="cell" {...f("pack.cell", "Cell")} />
        <IntInput min={1} max={16} {...f("pack.series", "Cells in series")} />
        <IntInput min={1} max={32} {...f("pack.parallel", "Cells in parallel")} />
        <PartSelect kind="protection" {...f("pack.protection", "Protection")} />
        <PartSelect kind="charger" {...f("pack.charger", "Charger")} />
        <IntInput min={1} max={16} {...f("pack.chargerCount", "Chargers in parallel")} />
      </Section>
      <Section title="Where and how it is used">
        <UnitInput unitHint="e.g. 25 °C or 77 °F" {...f("environment.ambientC", "Ambient temperature")} />
        <ChoiceSelect choices={[["upright", "Held upright"], ["lying", "Lying on its side"]]} {...f("environment.orientation", "Orientation")} />
        <ChoiceSelect
          choices={[["still", "Still air"], ["breeze", "A breeze"]]}
          {...f("environment.air.kind", "Air")}
          onChange={(_p, v) => change("environment.air", v === "breeze" ? { kind: "breeze", speedMPerS: 1 } : { kind: "still" })}
        />
        {airKind === "breeze" && <IntInput min={1} max={30} {...f("environment.air.speedMPerS", "Breeze speed (m/s)")} />}
        <ChoiceSelect
          choices={[["touch-1s", "Touched briefly (1 s)"], ["grip-10s", "Gripped (10 s)"], ["hold-1min", "Held (1 min)"], ["hold-10min", "Held (10 min)"], ["hold-8h", "Worn / held for hours"]]}
          {...f("environment.contact", "Hand contact")}
        />
        <IntInput min={0} max={100000} {...f("costs.comparableNewLightEur", "Price of a comparable new light (€)")} />
      </Section>
      {canEdit && (
        <div className="no-print sticky bottom-0 flex flex-wrap items-center gap-3 border-t border-line bg-paper/95 py-3">
          <input value={note} onChange={(e) => setNote(e.target.value)} placeholder="What changed (optional)" aria-label="Revision note" className="w-72 rounded border border-line bg-white px-2 py-1.5 text-sm" />
          <button type="button" onClick={save} disabled={busy} className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90 disabled:opacity-50">
            {busy ? "Saving…" : `Save as revision ${revision + 1}`}
          </button>
          <Link href={`/builds/${buildId}/budget`} className="text-sm text-ink-soft hover:text-ember">Open the Budget of “{title}”</Link>
          {saved && <span role="status" className="text-sm text-ok">{saved}</span>}
          {error && <span role="alert" className="text-sm text-over">{error.message}</span>}
        </div>
      )}
    </div>
  );
}
