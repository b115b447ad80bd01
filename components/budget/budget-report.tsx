"use client";

import dynamic from "next/dynamic";
import { useState } from "react";
import { problemLabel } from "@/lib/messages";
import { CautionsPanel } from "./cautions-panel";
import { ElectricalPanel } from "./electrical-panel";
import { type TempUnit, VERDICT_STYLE } from "./format";
import { HeadroomTable } from "./headroom-table";
import { HeatPathDiagram } from "./heat-path-diagram";
import { ModesTable } from "./modes-table";
// The leaf module, not the barrel: the barrel would bring the unit parser into the page.
import { VERDICTS } from "@/lib/retrofit/limits";
import { NodeTemperatures } from "./node-temperatures";
import type { Evaluation, Scenario } from "./types";
import { WhatItTakes } from "./what-it-takes";
import { formatInUnit, formatMoney } from "@/lib/units/figures";
import { partsCostTrace } from "@/lib/retrofit/derivations";
import { Traceable } from "./trace-view";

// Charts (Chart.js) load when one is shown, not with the page.
function ChartLoading() {
  return <div className="h-72 animate-pulse rounded bg-line/30" aria-busy="true" aria-label="Loading the chart" />;
}
const LadderChart = dynamic(() => import("./ladder-chart").then((m) => m.LadderChart), { ssr: false, loading: ChartLoading });
const WarmupChart = dynamic(() => import("./warmup-chart").then((m) => m.WarmupChart), { ssr: false, loading: ChartLoading });
const DeratingCharts = dynamic(() => import("./derating-charts").then((m) => m.DeratingCharts), { ssr: false, loading: ChartLoading });

function Panel({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="space-y-3 rounded-lg border border-line bg-white/60 p-4">
      <h2 className="font-semibold">{title}</h2>
      {children}
    </section>
  );
}

/** Everything the Budget shows for one evaluation; also used by share links and Side by side. */
export function BudgetReport({ evaluation, ambientC, unit = "C" }: { evaluation: Evaluation; ambientC: number; unit?: TempUnit }) {
  // Open on the scenario that needs attention most: the worst verdict, the first of equals.
  const rank = (v: string | null | undefined) => (v ? VERDICTS.indexOf(v as (typeof VERDICTS)[number]) : -1);
  const worst = evaluation.scenarios.reduce<Scenario | undefined>((w, s) => (!w || rank(s.thermal?.verdict) > rank(w.thermal?.verdict) ? s : w), undefined);
  const [scenarioId, setScenarioId] = useState(worst?.id ?? "");
  const scenario = evaluation.scenarios.find((s) => s.id === scenarioId) ?? evaluation.scenarios[0];
  const errors = evaluation.problems.filter((p) => p.severity !== "info");
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-center gap-3">
        <span className="text-sm text-ink-soft">Overall</span>
        <span data-testid="overall-verdict" className={`rounded border px-2 py-1 text-sm font-semibold ${VERDICT_STYLE[evaluation.verdict ?? ""] ?? "border-line"}`}>
          {evaluation.verdict ?? "could not be worked out"}
        </span>
      </div>
      {errors.length > 0 && (
        <section aria-label="Problems" className="rounded-lg border border-over/30 bg-over/5 p-3 text-sm" data-testid="problems">
          <h2 className="mb-1 font-medium">What Sinkwise could not settle</h2>
          <ul className="list-disc space-y-0.5 pl-5">
            {errors.map((p, i) => (
              <li key={i}><span className="font-medium">{problemLabel(p.field)}</span>: {p.message}</li>
            ))}
          </ul>
        </section>
      )}
      <CautionsPanel cautions={evaluation.cautions} />
      <Panel title="Modes at a glance"><ModesTable evaluation={evaluation} /></Panel>
      {scenario && (
        <>
          <div role="tablist" aria-label="Scenario" className="no-print flex flex-wrap gap-2">
            {evaluation.scenarios.map((s) => (
              <button
                key={s.id}
                role="tab"
                aria-selected={s.id === scenario.id}
                onClick={() => setScenarioId(s.id)}
                className={`rounded-full border px-3 py-1 text-sm ${s.id === scenario.id ? "border-ember bg-ember text-white" : "border-line bg-white hover:border-ember"}`}
              >
                {s.kind === "charging" ? "Charging" : `Mode: ${s.name}`}
                {s.thermal?.verdict && <span className="ml-1 opacity-80">· {s.thermal.verdict}</span>}
              </button>
            ))}
          </div>
          <div className="grid gap-5 lg:grid-cols-2">
            <Panel title="Headroom to every limit"><HeadroomTable scenario={scenario} unit={unit} ambientC={ambientC} /></Panel>
            <Panel title="Temperature ladder: where the rise goes"><LadderChart scenario={scenario} ambientC={ambientC} /></Panel>
            <Panel title="Warm-up from a cold start"><WarmupChart scenario={scenario} /></Panel>
            <Panel title="What it takes"><WhatItTakes scenario={scenario} /></Panel>
          </div>
          <Panel title="Derating: operating points on the part curves"><DeratingCharts scenario={scenario} /></Panel>
          <Panel title="The heat path, as solved">
            <HeatPathDiagram scenario={scenario} ambientC={ambientC} unit={unit} />
            <h3 className="text-sm font-medium">Temperature of every place (open one for the heat flows in and out of it)</h3>
            <NodeTemperatures scenario={scenario} ambientC={ambientC} unit={unit} />
          </Panel>
        </>
      )}
      <Panel title="Electrical: pack, runtime and charging"><ElectricalPanel evaluation={evaluation} /></Panel>
      {evaluation.costs.lines.length > 0 && (
        <Panel title="Cost">
          <ul className="text-sm">
            {evaluation.costs.lines.map((l) => (
              <li key={l.slot}>{l.count} × {l.name}: {l.totalEur === null ? "no price" : formatMoney(l.totalEur)}</li>
            ))}
          </ul>
          <p className="text-sm">
            Parts: <strong><Traceable label={formatMoney(evaluation.costs.totalEur)} trace={partsCostTrace(evaluation.costs)} /></strong>
            {evaluation.costs.comparableNewLightEur !== null && ` · a comparable new light: ${formatMoney(evaluation.costs.comparableNewLightEur)}`}
            {evaluation.costs.savingEur !== null && ` · ${evaluation.costs.savingEur >= 0 ? "saving" : "extra"} ${formatMoney(Math.abs(evaluation.costs.savingEur))}`}
          </p>
          {/* A result cached before masses were worked out has none. */}
          {(evaluation.mass as Evaluation["mass"] | undefined) && evaluation.mass.totalKg > 0 && (
            <p className="text-sm">Mass of the parts that give one: <Traceable label={formatInUnit(evaluation.mass.totalKg, "kg")} trace={evaluation.mass.trace} /></p>
          )}
        </Panel>
      )}
    </div>
  );
}
