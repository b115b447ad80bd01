"use client";

import dynamic from "next/dynamic";
import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { VERDICT_STYLE } from "@/components/budget/format";
import { Traceable } from "@/components/budget/trace-view";
import { ApiClientError } from "@/components/ui/fetch-json";
import { compareFormat, SIGNIFICANCE, type FigureRow } from "@/lib/compare";
import type { CompareItem } from "@/lib/reviews/api-schemas";
import { CompareSummary } from "./compare-summary";
import { ScenarioColumns } from "./scenario-columns";
import { type CompareAnswer, useCompare, useSaveComparison } from "./use-compare";

// Charts (Chart.js) load when shown, not with the page.
const OverlaidWarmups = dynamic(() => import("./compare-charts").then((m) => m.OverlaidWarmups), { ssr: false });

const JUDGED = { better: "bg-ok/10 text-ok", worse: "bg-over/10 text-over", same: "" } as const;

function show(row: FigureRow, v: number | string | null): string {
  if (row.kind === "verdict") return typeof v === "string" ? v : compareFormat.DASH;
  if (row.kind === "time" && v === null) return "not reached";
  // A headroom reads as on the Budget: a negative one never rounds to "0 K".
  if (row.unit === "K" && row.key.includes("/headroom:") && typeof v === "number") return compareFormat.kelvin(v);
  return typeof v === "number" ? compareFormat.inUnit(v, row.unit) : compareFormat.DASH;
}

function FigureRowView({ f }: { f: CompareAnswer["figures"][number] }) {
  return (
    <tr className="border-t border-line" data-figure={f.key} data-matters={f.matters || undefined}>
      <td className="py-1 pr-3 text-ink-soft">{f.label}</td>
      {f.values.map((v, i) => {
        const j = f.judgements[i];
        const limit = f.limits?.[i] ?? null;
        // A temperature beside its limit: both at one precision, so a failing value never reads equal to it.
        const against = limit !== null && typeof v === "number" ? compareFormat.celsiusAgainst(v, limit, "max") : null;
        return (
          <td key={i} className={`py-1 pr-3 ${j ? JUDGED[j] : ""}`} data-judgement={j ?? undefined}>
            {f.kind === "verdict" && typeof v === "string" ? <span className={`rounded border px-1.5 text-xs ${VERDICT_STYLE[v] ?? ""}`}>{v}</span> : <Traceable label={against ? against.value : show(f, v)} trace={f.traces?.[i]} />}
            {against && <span className="ml-1 text-xs text-ink-soft">(limit <Traceable label={against.limit} trace={f.limitTraces?.[i]} />)</span>}
            {i > 0 && f.deltas[i] !== null && <span className="ml-1.5 text-xs">{compareFormat.signedInUnit(f.deltas[i] ?? null, f.unit)}</span>}
            {i > 0 && f.kind === "time" && j && j !== "same" && f.deltas[i] === null && <span className="ml-1.5 text-xs">{j}</span>}
          </td>
        );
      })}
    </tr>
  );
}

/** Every figure, grouped by scenario; in each group the rows that differ come first, the rest behind one switch. */
function Figures({ data }: { data: CompareAnswer }) {
  const [all, setAll] = useState(false);
  const groups = [...new Set(data.figures.map((f) => f.group))];
  const quiet = data.figures.filter((f) => !f.matters).length;
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-3 text-xs text-ink-soft">
        <span>Deltas against the first column. Green is better for that row, red is worse (a hotter place is never green); a change under {SIGNIFICANCE.kelvin} K or {SIGNIFICANCE.relative * 100} % is shown plain.</span>
        {quiet > 0 && (
          <button type="button" onClick={() => setAll((x) => !x)} className="rounded border border-line px-2 py-0.5 text-ink hover:border-ember" aria-expanded={all}>
            {all ? "Show only the rows that differ" : `Show all rows (${quiet} more that differ by less than that)`}
          </button>
        )}
      </div>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm" data-testid="compare-figures">
          <thead className="text-xs text-ink-soft">
            <tr>
              <th className="py-1 pr-3 font-medium">Figure</th>
              {data.columns.map((c, i) => (
                <th key={i} className="py-1 pr-3 font-medium">{data.columnNames[i]} <span className="font-normal">r{c.revision}</span></th>
              ))}
            </tr>
          </thead>
          {groups.map((g) => {
            const rows = data.figures.filter((f) => f.group === g);
            const shown = [...rows.filter((f) => f.matters), ...(all ? rows.filter((f) => !f.matters) : [])];
            return (
              <tbody key={g}>
                <tr><th colSpan={data.columns.length + 1} className="pt-3 pb-1 text-xs font-semibold uppercase tracking-wide text-ember">{g}</th></tr>
                {shown.map((f) => <FigureRowView key={f.key} f={f} />)}
                {shown.length === 0 && <tr><td colSpan={data.columns.length + 1} className="py-1 text-xs text-ink-soft">Nothing here differs by {SIGNIFICANCE.kelvin} K or {SIGNIFICANCE.relative * 100} % or more.</td></tr>}
              </tbody>
            );
          })}
        </table>
      </div>
    </div>
  );
}

function Differences({ data }: { data: CompareAnswer }) {
  const differ = data.differences.filter((d) => d.differs);
  const same = data.differences.filter((d) => !d.differs);
  return (
    <div className="space-y-2">
      {differ.length === 0 && <p className="text-sm text-ink-soft">The designs are the same part for part: the columns differ only in revision.</p>}
      <table className="w-full text-left text-sm" data-testid="compare-differences">
        <tbody>
          {differ.map((d) => (
            <tr key={d.slot} className="border-t border-line">
              <th className="py-1 pr-3 font-medium">{d.label}</th>
              {d.values.map((v, i) => (
                <td key={i} className={`py-1 pr-3 ${i > 0 && v !== d.values[0] ? "bg-ember-soft" : ""}`}>{v}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {same.length > 0 && (
        <details className="text-sm">
          <summary className="cursor-pointer text-ink-soft">The same in every column ({same.length})</summary>
          <dl className="mt-1 grid gap-x-4 sm:grid-cols-[14rem_1fr]">
            {same.map((d) => (
              <div key={d.slot} className="contents"><dt className="text-ink-soft">{d.label}</dt><dd>{d.values[0]}</dd></div>
            ))}
          </dl>
        </details>
      )}
    </div>
  );
}

function SaveForm({ items, title }: { items: CompareItem[]; title: string }) {
  const router = useRouter();
  const save = useSaveComparison();
  const err = save.error instanceof ApiClientError ? save.error : null;
  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const t = String(new FormData(event.currentTarget).get("title") ?? "");
    save.mutate({ title: t, items }, { onSuccess: (r) => router.push(r.comparison.url) });
  }
  return (
    <form onSubmit={onSubmit} noValidate className="no-print flex flex-wrap items-end gap-2 text-sm" aria-label="Save the comparison">
      <label>
        <span className="mb-0.5 block text-ink-soft">Title</span>
        <input name="title" defaultValue={title} maxLength={160} className="w-72 rounded border border-line bg-white px-2 py-1" />
      </label>
      <button type="submit" disabled={save.isPending} className="rounded border border-ember px-3 py-1 text-ember disabled:opacity-50">Save the comparison</button>
      {err && <span role="alert" className="text-over">{err.message}</span>}
    </form>
  );
}

/** Side by side: parts and mounting differences first, then every figure, then the charts. */
export function CompareView({ items, savedTitle }: { items: CompareItem[]; savedTitle: string | null }) {
  const compare = useCompare(items);
  if (compare.isPending) return <p className="text-sm text-ink-soft">Working out each build…</p>;
  if (compare.isError) return <p role="alert" className="rounded border border-over/30 bg-over/5 p-3 text-sm text-over">{compare.error.message}</p>;
  const data = compare.data;
  const title = savedTitle ?? data.columns.map((c) => c.variantNote ?? c.title).join(" vs. ");
  return (
    <div className="space-y-6">
      <div className="grid gap-2" style={{ gridTemplateColumns: `repeat(${data.columns.length}, minmax(0, 1fr))` }}>
        {data.columns.map((c, i) => (
          <div key={i} className={`rounded-lg border p-2 text-sm ${i === 0 ? "border-ember" : "border-line"} bg-white/60`} data-testid="compare-column">
            <a href={`/builds/${c.buildId}`} className="font-medium hover:text-ember">{c.title}</a>
            <div className="text-xs text-ink-soft">r{c.revision}{c.revision < c.currentRevision ? ` (current r${c.currentRevision})` : ""} · {c.ownerName}</div>
            {c.variantNote && <div className="text-xs text-ember">{c.variantNote}</div>}
            {c.verdict && <span className={`mt-1 inline-block rounded border px-1.5 text-xs ${VERDICT_STYLE[c.verdict] ?? ""}`}>{c.verdict}</span>}
            {c.problems.length > 0 && <p className="mt-1 text-xs text-tight">{c.problems.length} problem{c.problems.length > 1 ? "s" : ""} noted on its Budget</p>}
          </div>
        ))}
      </div>
      <CompareSummary data={data} />
      {savedTitle === null && <SaveForm items={items} title={title} />}
      <section className="space-y-2 rounded-lg border border-line bg-white/60 p-4">
        <h2 className="font-semibold">What differs</h2>
        <Differences data={data} />
      </section>
      <section className="space-y-2 rounded-lg border border-line bg-white/60 p-4">
        <h2 className="font-semibold">Every figure</h2>
        <Figures data={data} />
      </section>
      <section className="space-y-2 rounded-lg border border-line bg-white/60 p-4">
        <h2 className="font-semibold">Heat paths and ladders, one scenario in every column</h2>
        <ScenarioColumns data={data} ambientC={data.ambientC} />
      </section>
      <section className="space-y-2 rounded-lg border border-line bg-white/60 p-4">
        <h2 className="font-semibold">Warm-up, overlaid</h2>
        <OverlaidWarmups data={data} />
      </section>
    </div>
  );
}
