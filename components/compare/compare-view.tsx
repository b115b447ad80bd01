"use client";

import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { VERDICT_STYLE } from "@/components/budget/format";
import { Traceable } from "@/components/budget/trace-view";
import { ApiClientError } from "@/components/ui/fetch-json";
import { formatInUnit } from "@/lib/units/figures";
import type { FigureRow } from "@/lib/compare";
import type { CompareItem } from "@/lib/reviews/api-schemas";
import { OverlaidWarmups, SideBySideLadders } from "./compare-charts";
import { type CompareAnswer, useCompare, useSaveComparison } from "./use-compare";

const JUDGED = { better: "bg-ok/10 text-ok", worse: "bg-over/10 text-over", same: "text-ink-soft" } as const;

function show(row: FigureRow, v: number | string | null): string {
  if (row.kind === "verdict") return typeof v === "string" ? v : "–";
  if (row.kind === "time" && v === null) return "not reached";
  if (typeof v !== "number" || !Number.isFinite(v)) return "–";
  return formatInUnit(v, row.unit);
}

function signed(row: FigureRow, d: number | null): string {
  if (d === null || !Number.isFinite(d)) return "";
  // A difference is shown like the figure itself; one that rounds away to nothing is "±0".
  const size = formatInUnit(Math.abs(d), row.unit);
  if (!/[1-9]/.test(size)) return "±0";
  return `${d > 0 ? "+" : "−"}${size}`;
}

function Figures({ data }: { data: CompareAnswer }) {
  const groups = [...new Set(data.figures.map((f) => f.group))];
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid="compare-figures">
        <thead className="text-xs text-ink-soft">
          <tr>
            <th className="py-1 pr-3 font-medium">Figure</th>
            {data.columns.map((c, i) => (
              <th key={i} className="py-1 pr-3 font-medium">{c.variantNote ?? c.title} <span className="font-normal">r{c.revision}</span></th>
            ))}
          </tr>
        </thead>
        {groups.map((g) => (
          <tbody key={g}>
            <tr><th colSpan={data.columns.length + 1} className="pt-3 pb-1 text-xs font-semibold uppercase tracking-wide text-ember">{g}</th></tr>
            {data.figures.filter((f) => f.group === g).map((f) => (
              <tr key={f.key} className="border-t border-line" data-figure={f.key}>
                <td className="py-1 pr-3 text-ink-soft">{f.label}</td>
                {f.values.map((v, i) => {
                  const j = f.judgements[i];
                  return (
                    <td key={i} className={`py-1 pr-3 ${j && j !== "same" ? JUDGED[j] : ""}`}>
                      {f.kind === "verdict" && typeof v === "string" ? <span className={`rounded border px-1.5 text-xs ${VERDICT_STYLE[v] ?? ""}`}>{v}</span> : <Traceable label={show(f, v)} trace={f.traces?.[i]} />}
                      {i > 0 && f.deltas[i] !== null && <span className="ml-1.5 text-xs">{signed(f, f.deltas[i] ?? null)}</span>}
                      {i > 0 && f.kind === "time" && j && j !== "same" && f.deltas[i] === null && <span className="ml-1.5 text-xs">{j}</span>}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        ))}
      </table>
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
      {savedTitle === null && <SaveForm items={items} title={title} />}
      <section className="space-y-2 rounded-lg border border-line bg-white/60 p-4">
        <h2 className="font-semibold">What differs</h2>
        <Differences data={data} />
      </section>
      <section className="space-y-2 rounded-lg border border-line bg-white/60 p-4">
        <h2 className="font-semibold">Every figure</h2>
        <p className="text-xs text-ink-soft">Deltas against the first column; green is better, red is worse.</p>
        <Figures data={data} />
      </section>
      <section className="space-y-2 rounded-lg border border-line bg-white/60 p-4">
        <h2 className="font-semibold">Warm-up, overlaid</h2>
        <OverlaidWarmups data={data} />
      </section>
      <section className="space-y-2 rounded-lg border border-line bg-white/60 p-4">
        <h2 className="font-semibold">Temperature ladders</h2>
        <SideBySideLadders data={data} />
      </section>
    </div>
  );
}
