"use client";

import dynamic from "next/dynamic";
import { useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { type ReactNode, useEffect, useMemo, useState } from "react";
import { useSolve } from "@/components/budget/use-solve";
import { VERDICT_STYLE } from "@/components/budget/format";
import { useMe } from "@/components/shell/use-me";
import { formatHeadroom } from "@/lib/units/figures";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";
import { materialOptions } from "@/lib/parts";
import { FIN_DIRECTION_CHOICES } from "@/lib/retrofit/design-labels";
import { getPath, type Json, type JsonObject, setPath } from "./design-state";
import { ChoiceSelect, IntInput, PartSelect, UnitInput } from "./editor-fields";
import { editorFieldFor, placeProblems, ProblemsSummary } from "./editor-problems";
import { useDesignPreview } from "./use-design-preview";
import { DESIGN_LABELS, type DesignField } from "@/lib/retrofit/design-labels";
import type { Calibration } from "@/lib/retrofit/design-schema";

/** The live check draws what the preview answers, so it loads beside that first answer, not before the page. */
const LiveCheck = dynamic(() => import("./live-check").then((m) => m.LiveCheck), {
  ssr: false,
  loading: () => <div className="h-40 animate-pulse rounded bg-line/30" aria-busy="true" aria-label="Loading the live check" />,
});

// Only a calibrated revision shows it: loaded when shown, out of the page's first load.
const CalibrationSection = dynamic(() => import("./calibration-section").then((m) => m.CalibrationSection));

const MATERIAL_CHOICES = materialOptions().map((m) => [m.value, m.label] as const);

/** `calibration`: the bench-run calibration the saved revision carries (read on the server), or null. */
type Props = { buildId: string; title: string; revision: number; design: JsonObject; canEdit: boolean; calibration: Calibration | null };

function Section({ title, children, note }: { title: string; children: ReactNode; note?: string }) {
  return (
    <fieldset className="rounded-lg border border-line bg-white/60 p-4">
      <legend className="px-1 text-sm font-semibold">{title}</legend>
      {note && <p className="mb-3 text-xs text-ink-soft">{note}</p>}
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">{children}</div>
    </fieldset>
  );
}

/** Every field the editor can show; conditional ones (reflector, breeze) only when their kind is picked. */
const EDITOR_FIELDS: readonly DesignField[] = [
  "housing", "housingShape.form", "lightEngine.emitter", "lightEngine.count", "lightEngine.wiring", "lightEngine.interface", "lightEngine.heatsink",
  "lightEngine.finDirection", "lightEngine.mount.kind", "lightEngine.mount.interface", "lightEngine.mount.contactAreaM2", "lightEngine.mount.reflector.material",
  "lightEngine.mount.reflector.thicknessM", "lightEngine.mount.reflector.lengthM", "lightEngine.mount.reflector.meanCircumferenceM",
  "lightEngine.mount.reflector.rimContactAreaM2", "driver.part", "driver.cooling.kind", "driver.cooling.interface", "driver.cooling.spreader",
  "driver.cooling.adhesive", "pack.cell", "pack.series", "pack.parallel", "pack.protection", "pack.charger", "pack.chargerCount",
  "environment.ambientC", "environment.orientation", "environment.air.kind", "environment.air.speedMPerS", "environment.contact",
  "costs.comparableNewLightEur",
];

/** Design paths as the API names them ("design.pack.chargerCount" → "pack.chargerCount"). */
const designPath = (path: string) => path.replace(/^design\./, "").replace(/\[(\d+)\]/g, ".$1");

/** The on-screen field a validation message belongs to: the longest field path it starts with, else the field for its slot. */
function fieldForIssue(path: string, fields: readonly string[]): string | null {
  const p = designPath(path);
  const hit = [...fields].sort((a, b) => b.length - a.length).find((f) => p === f || p.startsWith(`${f}.`));
  return hit ?? editorFieldFor(p);
}

/**
 * The Heat path editor: every slot from the Parts bin, every number with its unit. What is
 * on screen is checked as it is edited (the preview route evaluates the unsaved draft and
 * writes nothing); saving makes the revision.
 */
export function HeatPathEditor({ buildId, title, revision, design: initial, canEdit, calibration }: Props) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [design, setDesign] = useState<JsonObject>(initial);
  const [note, setNote] = useState("");
  const [saveIssues, setSaveIssues] = useState<readonly { path: string; message: string }[]>([]);
  const [saved, setSaved] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [scrollTick, setScrollTick] = useState(0);
  // What the last saved revision holds, as edited here (the server stores it in SI units).
  const [savedJson, setSavedJson] = useState(() => JSON.stringify(initial));
  const dirty = JSON.stringify(design) !== savedJson;
  const solved = useSolve(buildId, revision);
  const preview = useDesignPreview(buildId, design, dirty && canEdit);
  const live = dirty && canEdit;
  const evaluation = live ? (preview.answer?.valid ? preview.answer.evaluation : null) : (solved.data?.evaluation ?? null);
  const problems = useMemo(() => evaluation?.problems ?? [], [evaluation]);
  const placed = useMemo(() => placeProblems(problems), [problems]);
  const checking = live ? preview.status === "checking" : solved.isPending;
  const me = useMe();
  // The nearest limit over every case, for the save bar: the verdict stays in sight while editing.
  const worst = useMemo(() => {
    const limits = (evaluation?.scenarios ?? []).flatMap((s) => s.thermal?.limits ?? []);
    return limits.reduce<(typeof limits)[number] | null>((w, l) => (w === null || l.headroomK < w.headroomK ? l : w), null);
  }, [evaluation]);
  const liveIssues = useMemo(() => (live && preview.answer && !preview.answer.valid ? preview.answer.issues : []), [live, preview.answer]);

  // Every field rendered registers its path here, so a message finds the field it concerns.
  const fields: string[] = [];
  const issues = [...liveIssues, ...saveIssues];
  const placedIssues = new Map<string, string[]>();
  const unplacedIssues: string[] = [];
  const placeIssues = () => {
    placedIssues.clear();
    unplacedIssues.length = 0;
    for (const i of issues) {
      const target = fieldForIssue(i.path, fields);
      if (target && fields.includes(target)) placedIssues.set(target, [...(placedIssues.get(target) ?? []), i.message]);
      else unplacedIssues.push(i.message);
    }
  };

  useEffect(() => {
    if (scrollTick === 0) return;
    const first = document.querySelector<HTMLElement>("[data-field-error='true']");
    if (first) {
      first.scrollIntoView({ block: "center", behavior: "smooth" });
      first.querySelector<HTMLElement>("input, select")?.focus({ preventScroll: true });
    }
  }, [scrollTick]);

  const change = (path: string, value: Json | undefined) => {
    setDesign((d) => setPath(d, path, value));
    setSaved(null);
    setSaveIssues([]);
  };
  const f = (path: DesignField) => {
    fields.push(path);
    // Issues inside a typed-in part go to its own fields (InlinePart); the rest to this field.
    const inside = (i: { path: string }) => designPath(i.path).startsWith(`${path}.inline.`) || designPath(i.path) === `${path}.name`;
    const mine = issues.filter((i) => fieldForIssue(i.path, EDITOR_FIELDS) === path && !inside(i)).map((i) => i.message);
    return { design, path, label: DESIGN_LABELS[path], onChange: change, error: mine.length ? mine.join("; ") : undefined, problems: placed.byField.get(path), disabled: !canEdit, issues: issues.filter(inside) };
  };
  const kindOf = (path: string) => String(getPath(design, `${path}.kind`) ?? "");

  async function save() {
    if (liveIssues.length > 0) {
      setScrollTick((t) => t + 1);
      return;
    }
    setBusy(true);
    setSaveIssues([]);
    try {
      const r = await fetchJson<{ build: { currentRevision: number } }>(`/api/v1/builds/${buildId}`, { method: "PATCH", body: { design, note } });
      setSaved(`Saved as revision ${r.build.currentRevision}.`);
      setSavedJson(JSON.stringify(design));
      setNote("");
      await queryClient.invalidateQueries({ queryKey: ["build", buildId] });
      router.refresh();
    } catch (e) {
      setSaveIssues([e instanceof ApiClientError ? { path: e.path, message: e.message } : { path: "", message: "Could not save: the server did not answer. Try again." }]);
      setScrollTick((t) => t + 1);
    } finally {
      setBusy(false);
    }
  }

  const mountKind = kindOf("lightEngine.mount") || "in-housing-air";
  const coolingKind = kindOf("driver.cooling") || "floating";
  const airKind = kindOf("environment.air") || "still";

  const sections = (
    <>
      <Section title="Housing" note="The shell the heat must finally cross. Sealed housings trap their air.">
        <PartSelect kind="housing" {...f("housing")} />
        <ChoiceSelect choices={[["box", "Box (lantern)"], ["tube", "Tube (torch, headlamp)"]]} {...f("housingShape.form")} />
      </Section>
      <Section title="Light engine" note="Emitters on their board, the interface, the heatsink and how it is mounted.">
        <PartSelect kind="emitter" {...f("lightEngine.emitter")} />
        <IntInput min={1} max={64} {...f("lightEngine.count")} />
        <ChoiceSelect choices={[["series", "In series"], ["parallel", "In parallel"]]} {...f("lightEngine.wiring")} />
        <PartSelect kind="interface" {...f("lightEngine.interface")} />
        <PartSelect kind="heatsink" {...f("lightEngine.heatsink")} />
        <ChoiceSelect
          choices={FIN_DIRECTION_CHOICES}
          emptyLabel="Along the lamp (vertical upright, level lying)"
          hint="How the fins stand when the lamp is in use. Air rises through vertical channels; level fins and fins hanging down trap warm air."
          {...f("lightEngine.finDirection")}
        />
        <ChoiceSelect
          choices={[["in-housing-air", "Heatsink in the housing's air"], ["pressed-to-wall", "Heatsink pressed to the housing wall"], ["through-reflector", "Heat through the reflector to the rim"]]}
          {...f("lightEngine.mount.kind")}
          onChange={(_p, v) => change("lightEngine.mount", v === "through-reflector" ? { kind: v, reflector: { material: MATERIAL_CHOICES[0]?.[0] ?? "" } } : { kind: v ?? "in-housing-air" })}
        />
        {mountKind === "pressed-to-wall" && <PartSelect kind="interface" {...f("lightEngine.mount.interface")} />}
        {mountKind === "pressed-to-wall" && <UnitInput unitHint="e.g. 9 cm²" quantity="area" {...f("lightEngine.mount.contactAreaM2")} />}
        {mountKind === "through-reflector" && (
          <>
            <ChoiceSelect choices={MATERIAL_CHOICES} {...f("lightEngine.mount.reflector.material")} />
            <UnitInput unitHint="e.g. 0.5 mm" quantity="length" {...f("lightEngine.mount.reflector.thicknessM")} />
            <UnitInput unitHint="sink to rim, e.g. 30 mm" quantity="length" {...f("lightEngine.mount.reflector.lengthM")} />
            <UnitInput unitHint="e.g. 12 cm" quantity="length" {...f("lightEngine.mount.reflector.meanCircumferenceM")} />
            <UnitInput unitHint="e.g. 4 cm²" quantity="area" {...f("lightEngine.mount.reflector.rimContactAreaM2")} />
            <PartSelect kind="interface" {...f("lightEngine.mount.interface")} />
          </>
        )}
      </Section>
      <Section title="Driver" note="Small drivers dump heat through their ground plane; floating free in a closed housing they run hot.">
        <PartSelect kind="driver" {...f("driver.part")} />
        <ChoiceSelect
          choices={[["floating", "Floating free in the housing air"], ["ground-plane-to-wall", "Ground plane pressed to the housing"], ["strapped", "Strapped to the housing (spreader + adhesive)"]]}
          {...f("driver.cooling.kind")}
          onChange={(_p, v) => change("driver.cooling", { kind: v ?? "floating" })}
        />
        {coolingKind === "ground-plane-to-wall" && <PartSelect kind="interface" {...f("driver.cooling.interface")} />}
        {coolingKind === "strapped" && <PartSelect kind="spreader" {...f("driver.cooling.spreader")} />}
        {coolingKind === "strapped" && <PartSelect kind="interface" {...f("driver.cooling.adhesive")} />}
      </Section>
      <Section title="Pack and charging" note="Parallel cells add capacity at the same voltage; join them only at equal voltage.">
        <PartSelect kind="cell" {...f("pack.cell")} />
        <IntInput min={1} max={16} {...f("pack.series")} />
        <IntInput min={1} max={32} {...f("pack.parallel")} />
        <PartSelect kind="protection" {...f("pack.protection")} />
        <PartSelect kind="charger" {...f("pack.charger")} />
        <IntInput min={1} max={16} {...f("pack.chargerCount")} />
      </Section>
      <Section title="Where and how it is used">
        <UnitInput unitHint="e.g. 25 °C or 77 °F" quantity="temperature" {...f("environment.ambientC")} />
        <ChoiceSelect choices={[["upright", "Held upright"], ["lying", "Lying on its side"]]} {...f("environment.orientation")} />
        <ChoiceSelect
          choices={[["still", "Still air"], ["breeze", "A breeze"]]}
          {...f("environment.air.kind")}
          onChange={(_p, v) => change("environment.air", v === "breeze" ? { kind: "breeze", speedMPerS: 1 } : { kind: "still" })}
        />
        {airKind === "breeze" && <IntInput min={1} max={30} {...f("environment.air.speedMPerS")} />}
        <ChoiceSelect
          choices={[["touch-1s", "Touched briefly (1 s)"], ["grip-10s", "Gripped (10 s)"], ["hold-1min", "Held (1 min)"], ["hold-10min", "Held (10 min)"], ["hold-8h", "Worn / held for hours"]]}
          {...f("environment.contact")}
        />
        <IntInput min={0} max={100000} {...f("costs.comparableNewLightEur")} />
      </Section>
      {calibration && <CalibrationSection saved={calibration} current={getPath(design, "calibration")} canEdit={canEdit} onChange={(v) => change("calibration", v)} />}
    </>
  );
  placeIssues();

  return (
    <div className="space-y-4" data-testid="heat-path-editor">
      {!canEdit && (
        <p className="rounded border border-line bg-paper-deep px-3 py-2 text-sm">
          Read-only: this build belongs to someone else. Use <em>Copy to my builds</em> to change it.
        </p>
      )}
      <ProblemsSummary
        revision={revision}
        unsaved={live}
        status={live ? (preview.status === "error" ? "error" : preview.answer ? "success" : "pending") : solved.status}
        problems={placed.unplaced}
        total={problems.filter((p) => p.severity !== "info").length + issues.length}
        errorMessage={live ? (preview.error ?? undefined) : solved.error?.message}
      />
      {unplacedIssues.length > 0 && (
        <ul role="alert" className="space-y-0.5 rounded border border-over/40 bg-white px-3 py-2 text-sm text-over" data-testid="unplaced-issues">
          {unplacedIssues.map((m) => <li key={m}>{m}</li>)}
        </ul>
      )}
      {sections}
      <section id="live-check" className="scroll-mt-20 rounded-lg border border-line bg-white/60 p-4">
        <h2 className="mb-2 font-semibold">What the build means thermally</h2>
        <LiveCheck
          evaluation={evaluation}
          unsaved={live}
          revision={revision}
          checking={checking}
          ambientC={typeof getPath(design, "environment.ambientC") === "number" ? (getPath(design, "environment.ambientC") as number) : 25}
        />
      </section>
      {canEdit && (
        // Solid and in the flow at the end of the editor: it sticks to the bottom while
        // scrolling, and fields keep a scroll margin so one in focus is never under it.
        <div className="no-print sticky bottom-0 z-10 flex flex-wrap items-center gap-3 border-t border-line bg-paper py-3 shadow-[0_-4px_8px_rgba(0,0,0,0.06)]" data-testid="save-bar">
          <input value={note} onChange={(e) => setNote(e.target.value)} placeholder="What changed (optional)" aria-label="Revision note" className="w-72 rounded border border-line bg-white px-2 py-1.5 text-sm" />
          <button type="button" onClick={save} disabled={busy || !dirty} className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90 disabled:opacity-50">
            {busy ? "Saving…" : `Save as revision ${revision + 1}`}
          </button>
          <a href="#live-check" className="flex items-center gap-1.5 text-sm text-ink-soft hover:text-ember" data-testid="bar-verdict" title="What the build means thermally, below">
            <span>{live ? "Draft" : `Revision ${revision}`}:</span>
            <span className={`rounded border px-1.5 text-xs font-semibold ${VERDICT_STYLE[evaluation?.verdict ?? ""] ?? "border-line"}`}>{evaluation?.verdict ?? (checking ? "checking…" : liveIssues.length > 0 ? "fix the marked fields" : "not worked out yet")}</span>
            {worst && <span className="text-xs">headroom {formatHeadroom(worst.headroomK, { temperatureUnit: me.data?.temperatureUnit ?? "C" })} ({worst.place})</span>}
          </a>
          {dirty ? <span className="text-xs text-ember" data-testid="unsaved-note">Unsaved changes: the figures are of the draft.</span> : <Link href={`/builds/${buildId}/budget`} className="text-sm text-ink-soft hover:text-ember">Open the Budget of “{title}”</Link>}
          {saved && <span role="status" className="text-sm text-ok">{saved}</span>}
          {issues.length > 0 && <span role="alert" className="text-sm text-over">{issues.length === 1 ? "One field needs attention" : `${issues.length} fields need attention`}: see the message beside it.</span>}
        </div>
      )}
    </div>
  );
}
