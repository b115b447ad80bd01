"use client";

import { VERDICT_STYLE } from "@/components/budget/format";
import { HeatPathDiagram } from "@/components/budget/heat-path-diagram";
import type { Evaluation, Scenario } from "@/components/budget/types";
import { useMe } from "@/components/shell/use-me";
import { formatAgainstLimit, formatFigure, formatHeadroom } from "@/lib/units/figures";

function worstLimit(s: Scenario) {
  const limits = s.thermal?.limits ?? [];
  return limits.reduce<(typeof limits)[number] | null>((worst, l) => (worst === null || l.headroomK < worst.headroomK ? l : worst), null);
}

/**
 * What the design on screen means thermally, worked out as it is edited: the verdict of
 * each mode and of charging, the headroom to the nearest limit, and the heat path of the
 * first mode. `unsaved` marks figures of a draft that is not a revision yet.
 */
export function LiveCheck({ evaluation, unsaved, revision, checking, ambientC }: { evaluation: Evaluation | null; unsaved: boolean; revision: number; checking: boolean; ambientC: number }) {
  const me = useMe();
  const unit = me.data?.temperatureUnit ?? "C";
  const state = unsaved ? "Unsaved draft" : `Revision ${revision} as saved`;
  if (!evaluation) {
    return (
      <p className="text-sm text-ink-soft" data-testid="live-check" data-unsaved={unsaved}>
        {state}: {checking ? "checking…" : "fix the fields marked above to see the verdict."}
      </p>
    );
  }
  const first = evaluation.scenarios.find((s) => s.kind === "mode" && s.thermal) ?? evaluation.scenarios.find((s) => s.thermal);
  return (
    <section className="space-y-3" data-testid="live-check" data-unsaved={unsaved} aria-live="polite">
      <div className="flex flex-wrap items-center gap-2">
        <span className={`rounded px-2 py-0.5 text-xs font-medium ${unsaved ? "bg-ember-soft text-ember" : "bg-paper-deep text-ink-soft"}`} data-testid="live-state">
          {state}
        </span>
        <span className={`rounded border px-2 py-0.5 text-sm font-semibold ${VERDICT_STYLE[evaluation.verdict ?? ""] ?? "border-line"}`} data-testid="live-verdict">
          {evaluation.verdict ?? "not worked out yet"}
        </span>
        {checking && <span className="text-xs text-ink-soft">checking the latest change…</span>}
      </div>
      {evaluation.scenarios.length > 0 && (
        <table className="w-full text-sm" data-testid="live-modes">
          <thead>
            <tr className="text-left text-xs text-ink-soft">
              <th className="py-1 font-normal">Case</th>
              <th className="py-1 font-normal">Verdict</th>
              <th className="py-1 font-normal">Headroom</th>
              <th className="py-1 font-normal">Nearest limit</th>
            </tr>
          </thead>
          <tbody>
            {evaluation.scenarios.map((s) => {
              const w = worstLimit(s);
              const shown = w ? formatAgainstLimit(w.temperatureC, w.limitC, w.kind, "temperature", { temperatureUnit: unit }) : null;
              return (
                <tr key={s.id} className="border-t border-line">
                  <td className="py-1">{s.kind === "charging" ? "Charging" : `Mode “${s.name}”`}</td>
                  <td className="py-1">
                    <span className={`rounded border px-1.5 text-xs ${VERDICT_STYLE[s.thermal?.verdict ?? ""] ?? "border-line"}`}>{s.thermal?.verdict ?? "not worked out"}</span>
                  </td>
                  <td className="py-1 tabular-nums">{w ? formatHeadroom(w.headroomK, { temperatureUnit: unit }) : "–"}</td>
                  <td className="py-1 text-xs text-ink-soft">{w && shown ? `${w.place}: ${shown.value} ${shown.relation} ${shown.limit}` : "–"}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      {first?.thermal ? (
        <figure className="space-y-2">
          <figcaption className="text-xs text-ink-soft">
            {state}, mode “{first.name}”: each box is a place that holds a temperature, each line a way the heat crosses (thicker: more watts).
          </figcaption>
          <HeatPathDiagram scenario={first} ambientC={ambientC} unit={unit} />
          <ul className="grid gap-x-4 text-xs text-ink-soft sm:grid-cols-2">
            {first.thermal.links.filter((l) => Math.abs(l.watts) > 1e-6).map((l) => (
              <li key={l.index}>{l.place}: {formatFigure(l.watts, "power")}</li>
            ))}
          </ul>
        </figure>
      ) : (
        <p className="text-sm text-ink-soft">Pick an emitter and a driver (or cells and a charger) to see the heat path.</p>
      )}
    </section>
  );
}
