"use client";

import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, type SortingState, useReactTable } from "@tanstack/react-table";
import Link from "next/link";
import { type FormEvent, useState } from "react";
import { VERDICT_STYLE } from "@/components/budget/format";
import { fmtDate, fmtValue } from "./format";
import { errorMessage, useClassAction } from "./use-class-action";

type Figures = { verdict: string | null; junctionC: number | null; driverBoardC: number | null; housingC: number | null; runtimeH: number | null };
type Latest = { id: string; submittedAt: string; late: boolean; revision: number; buildTitle: string; feedback: string | null; mark: string | null; compareHref: string };
export type RosterRow = { studentId: string; studentName: string; handins: number; latest: Latest | null; figures: Figures | null };

const VERDICT_ORDER: Record<string, number> = { "within budget": 0, tight: 1, "over budget": 2 };
const col = createColumnHelper<RosterRow>();

function FigureCell({ value, starter, unit }: { value: number | null | undefined; starter: number | null | undefined; unit: string }) {
  if (value === null || value === undefined) return <span className="text-ink-soft">–</span>;
  const d = starter !== null && starter !== undefined ? value - starter : null;
  return (
    <span className="whitespace-nowrap font-mono">
      {fmtValue(value, unit)}
      {d !== null && Math.abs(d) >= 0.05 && <span className={`ml-1 text-xs ${d < 0 ? "text-ok" : "text-over"}`}>{d > 0 ? "+" : "−"}{fmtValue(Math.abs(d), unit === "°C" ? "K" : unit)}</span>}
    </span>
  );
}

/** The instructor's roster: each student, handed in or not, when, late, verdict and key figures beside the starter's; sortable. */
export function RosterTable({ rows, starter }: { rows: RosterRow[]; starter: Figures | null }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "student", desc: false }]);
  const [open, setOpen] = useState<string | null>(null);
  const columns = [
    col.accessor("studentName", { id: "student", header: "Student" }),
    col.accessor((r) => r.latest?.submittedAt ?? "", { id: "handedIn", header: "Handed in", cell: (c) => (c.row.original.latest ? <span>{fmtDate(c.row.original.latest.submittedAt)}{c.row.original.handins > 1 && <span className="text-xs text-ink-soft"> ({c.row.original.handins}×)</span>}</span> : <span className="text-ink-soft">not yet</span>) }),
    col.accessor((r) => (r.latest ? (r.latest.late ? 1 : 0) : -1), { id: "late", header: "Late", cell: (c) => (c.row.original.latest ? (c.row.original.latest.late ? <span className="text-over">late</span> : "on time") : "") }),
    col.accessor((r) => (r.figures?.verdict ? VERDICT_ORDER[r.figures.verdict] ?? 3 : 4), { id: "verdict", header: "Verdict", cell: (c) => { const v = c.row.original.figures?.verdict; return v ? <span className={`whitespace-nowrap rounded border px-1 text-xs ${VERDICT_STYLE[v] ?? ""}`}>{v}</span> : "–"; } }),
    col.accessor((r) => r.figures?.junctionC ?? null, { id: "junction", header: "Junction", sortUndefined: "last", cell: (c) => <FigureCell value={c.getValue()} starter={starter?.junctionC} unit="°C" /> }),
    col.accessor((r) => r.figures?.driverBoardC ?? null, { id: "driver", header: "Driver board", cell: (c) => <FigureCell value={c.getValue()} starter={starter?.driverBoardC} unit="°C" /> }),
    col.accessor((r) => r.figures?.housingC ?? null, { id: "housing", header: "Housing surface", cell: (c) => <FigureCell value={c.getValue()} starter={starter?.housingC} unit="°C" /> }),
    col.accessor((r) => r.figures?.runtimeH ?? null, { id: "runtime", header: "Runtime", cell: (c) => <FigureCell value={c.getValue()} starter={starter?.runtimeH} unit="h" /> }),
    col.display({
      id: "actions",
      header: "",
      cell: (c) => {
        const l = c.row.original.latest;
        if (!l) return null;
        return (
          <span className="flex gap-2 whitespace-nowrap text-xs">
            <Link href={l.compareHref} className="hover:text-ember">Side by side</Link>
            <button type="button" onClick={() => setOpen(open === l.id ? null : l.id)} className="hover:text-ember">{l.feedback ? "Feedback ✓" : "Feedback"}</button>
          </span>
        );
      },
    }),
  ];
  const table = useReactTable({ data: rows, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });
  const openRow = rows.find((r) => r.latest?.id === open);
  return (
    <div className="space-y-3">
      <div className="overflow-x-auto">
        <table className="w-full text-sm" data-testid="roster">
          <thead>
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id} className="border-b border-line text-left">
                {g.headers.map((h) => (
                  <th key={h.id} className="px-2 py-1 font-medium">
                    {h.column.getCanSort() ? (
                      <button type="button" onClick={h.column.getToggleSortingHandler()} className="hover:text-ember">
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        {{ asc: " ▲", desc: " ▼" }[h.column.getIsSorted() as string] ?? ""}
                      </button>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            <tr className="border-b border-line bg-ember-soft/40 text-xs">
              <td className="px-2 py-1 italic">Starter</td><td /><td />
              <td className="px-2">{starter?.verdict ? <span className={`whitespace-nowrap rounded border px-1 ${VERDICT_STYLE[starter.verdict] ?? ""}`}>{starter.verdict}</span> : "–"}</td>
              <td className="px-2 font-mono">{fmtValue(starter?.junctionC, "°C")}</td>
              <td className="px-2 font-mono">{fmtValue(starter?.driverBoardC, "°C")}</td>
              <td className="px-2 font-mono">{fmtValue(starter?.housingC, "°C")}</td>
              <td className="px-2 font-mono">{fmtValue(starter?.runtimeH, "h")}</td><td />
            </tr>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-b border-line" data-testid="roster-row">
                {r.getVisibleCells().map((c) => <td key={c.id} className="px-2 py-1">{flexRender(c.column.columnDef.cell, c.getContext())}</td>)}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {openRow?.latest && <FeedbackForm key={openRow.latest.id} handin={openRow.latest} studentName={openRow.studentName} />}
    </div>
  );
}

function FeedbackForm({ handin, studentName }: { handin: Latest; studentName: string }) {
  const save = useClassAction(`/api/v1/handins/${handin.id}/feedback`);
  const [text, setText] = useState(handin.feedback ?? "");
  const [mark, setMark] = useState(handin.mark ?? "");
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    save.mutate({ feedback: text, ...(mark.trim() ? { mark } : {}) });
  }
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Feedback for ${studentName}`} className="space-y-2 rounded-lg border border-line bg-white/60 p-3 text-sm">
      <h3 className="font-medium">Feedback for {studentName} <span className="text-xs font-normal text-ink-soft">on “{handin.buildTitle}”, revision {handin.revision}</span></h3>
      <textarea value={text} onChange={(e) => setText(e.target.value)} rows={4} aria-label="Feedback" className="w-full rounded border border-line bg-white px-2 py-1" />
      <label className="block">Mark (optional)<input value={mark} onChange={(e) => setMark(e.target.value)} maxLength={40} className="ml-2 w-24 rounded border border-line bg-white px-1" /></label>
      <button type="submit" disabled={save.isPending} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">Send feedback</button>
      {save.isSuccess && <p role="status" className="text-ok">Sent: {studentName} is notified in the app and by e-mail.</p>}
      {save.isError && <p role="alert" className="text-over">{errorMessage(save.error)}</p>}
    </form>
  );
}
