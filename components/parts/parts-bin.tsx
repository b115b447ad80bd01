"use client";

import { type ColumnDef, flexRender, getCoreRowModel, type SortingState, useReactTable } from "@tanstack/react-table";
import Link from "next/link";
import { useEffect, useMemo, useState } from "react";
import { formatFieldValue, KIND_DEFINITIONS, mainFigureColumns, PROVENANCES, type PartKind, type Provenance } from "@/lib/parts";
import type { UnitPreferences } from "@/lib/units";
import { KIND_OPTIONS, PROVENANCE_LABELS, inputClass, quietButtonClass } from "./labels";
import { type PartSummaryDto, type PartsQuery, queryString } from "./types";
import { useParts } from "./use-parts";

const PAGE_SIZES = [10, 25, 50, 100];
const INITIAL: PartsQuery = { kind: "", provenance: "", owner: "everyone", q: "", sort: "name", dir: "asc", page: 1, pageSize: 25 };

/** Two figures summarise a part when the table mixes kinds. */
function figuresSummary(part: PartSummaryDto, prefs: UnitPreferences): string {
  return mainFigureColumns(part.kind)
    .slice(0, 2)
    .map((c) => `${c.label}: ${formatFieldValue(c.field, part.specs[c.key], prefs)}`)
    .join(" · ");
}

function columnsFor(kind: PartKind | "", prefs: UnitPreferences): ColumnDef<PartSummaryDto>[] {
  const name: ColumnDef<PartSummaryDto> = {
    id: "name",
    header: "Name",
    // An accessor makes a column sortable in TanStack Table; the sorting itself is done in SQL.
    accessorFn: (row) => row.name,
    cell: ({ row }) => (
      <Link href={`/parts/${row.original.id}`} className="font-medium text-ink hover:text-ember">
        {row.original.name}
      </Link>
    ),
  };
  const kindColumn: ColumnDef<PartSummaryDto> = { id: "kind", header: "Kind", accessorFn: (row) => row.kind, cell: ({ row }) => KIND_DEFINITIONS[row.original.kind].label };
  // With one kind chosen, its main figures get columns of their own (sortable in SQL).
  const figures: ColumnDef<PartSummaryDto>[] = kind
    ? mainFigureColumns(kind).map((c) => ({
        id: `spec:${c.key}`,
        header: c.label,
        accessorFn: (row: PartSummaryDto) => String(row.specs[c.key] ?? ""),
        cell: ({ row }) => <span className="tabular-nums">{formatFieldValue(c.field, row.original.specs[c.key], prefs)}</span>,
      }))
    : [{ id: "figures", header: "Main figures", enableSorting: false, cell: ({ row }) => <span className="text-ink-soft">{figuresSummary(row.original, prefs)}</span> }];
  return [
    name,
    ...(kind ? [] : [kindColumn]),
    ...figures,
    { id: "provenance", header: "Provenance", accessorFn: (row) => row.provenance, cell: ({ row }) => PROVENANCE_LABELS[row.original.provenance] },
    {
      id: "owner",
      header: "Owner",
      accessorFn: (row) => row.owner.displayName,
      cell: ({ row }) => (
        <span>
          {row.original.owner.displayName}
          {row.original.verified && <span className="ml-2 rounded bg-ok/10 px-1.5 py-0.5 text-xs text-ok" title="Checked against a cited datasheet or measurement: the part page says by whom, when and against what">verified</span>}
        </span>
      ),
    },
  ];
}

export function PartsBin({ prefs }: { prefs: UnitPreferences }) {
  const [query, setQuery] = useState<PartsQuery>(INITIAL);
  const [search, setSearch] = useState("");
  // Typing settles for 250 ms before it becomes a query, so each keystroke is not a request.
  useEffect(() => {
    const timer = setTimeout(() => setQuery((q) => (q.q === search ? q : { ...q, q: search, page: 1 })), 250);
    return () => clearTimeout(timer);
  }, [search]);

  const parts = useParts(query);
  const columns = useMemo(() => columnsFor(query.kind, prefs), [query.kind, prefs]);
  const sorting: SortingState = [{ id: query.sort, desc: query.dir === "desc" }];
  const table = useReactTable({
    data: parts.data?.items ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (row) => row.id,
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    rowCount: parts.data?.total ?? 0,
    state: { sorting, pagination: { pageIndex: query.page - 1, pageSize: query.pageSize } },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const first = next[0];
      setQuery((q) => ({ ...q, sort: first?.id ?? "name", dir: first?.desc ? "desc" : "asc", page: 1 }));
    },
  });

  const set = (patch: Partial<PartsQuery>) => setQuery((q) => ({ ...q, ...patch, page: 1 }));
  const total = parts.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / query.pageSize));

  return (
    <div className="space-y-4">
      <form role="search" aria-label="Filter parts" className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-white/60 p-3" onSubmit={(e) => e.preventDefault()}>
        <label className="flex flex-col gap-1 text-xs text-ink-soft">
          Kind
          <select
            className={inputClass}
            value={query.kind}
            onChange={(e) => {
              const kind = e.target.value as PartKind | "";
              // A figure column belongs to one kind; sorting by it makes no sense for another.
              set({ kind, ...(query.sort.startsWith("spec:") ? { sort: "name", dir: "asc" } : {}) });
            }}
          >
            <option value="">All kinds</option>
            {KIND_OPTIONS.map((o) => (
              <option key={o.value} value={o.value}>{o.label}</option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-xs text-ink-soft">
          Provenance
          <select className={inputClass} value={query.provenance} onChange={(e) => set({ provenance: e.target.value as Provenance | "" })}>
            <option value="">Any</option>
            {PROVENANCES.map((p) => (
              <option key={p} value={p}>{PROVENANCE_LABELS[p]}</option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-xs text-ink-soft">
          Owner
          <select className={inputClass} value={query.owner} onChange={(e) => set({ owner: e.target.value === "mine" ? "mine" : "everyone" })}>
            <option value="everyone">Everyone</option>
            <option value="mine">Mine</option>
          </select>
        </label>
        <label className="flex min-w-48 flex-1 flex-col gap-1 text-xs text-ink-soft">
          Search
          <input type="search" className={inputClass} placeholder="Name or source note" value={search} onChange={(e) => setSearch(e.target.value)} />
        </label>
        {query.kind ? (
          <a className={quietButtonClass} href={`/api/v1/parts/export?${queryString({ ...query, page: 1 })}`} download>
            Export CSV
          </a>
        ) : (
          <span className="text-xs text-ink-soft">Choose a kind to export CSV</span>
        )}
      </form>

      {parts.isError && <p role="alert" className="text-sm text-over">{parts.error.message}</p>}

      <div className="overflow-x-auto rounded-lg border border-line bg-white/70">
        <table className="w-full border-collapse text-sm" aria-label="Parts" aria-busy={parts.isFetching}>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-line text-left text-ink-soft">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const canSort = header.column.getCanSort();
                  return (
                    <th key={header.id} className="px-3 py-2 font-medium" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}>
                      {canSort ? (
                        <button type="button" className="hover:text-ember" onClick={header.column.getToggleSortingHandler()}>
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden className="ml-1 text-ember">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}</span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-line/60 hover:bg-ember-soft/40">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-top">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                ))}
              </tr>
            ))}
            {parts.isSuccess && total === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-soft">No parts match these filters.</td>
              </tr>
            )}
            {parts.isPending && (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-soft">Loading parts…</td>
              </tr>
            )}
          </tbody>
        </table>
      </div>

      <nav aria-label="Pages" className="flex flex-wrap items-center gap-3 text-sm text-ink-soft">
        <button type="button" className={quietButtonClass} disabled={query.page <= 1} onClick={() => setQuery((q) => ({ ...q, page: q.page - 1 }))}>
          Previous
        </button>
        <span data-testid="parts-page">
          Page {Math.min(query.page, pages)} of {pages} · {total} {total === 1 ? "part" : "parts"}
        </span>
        <button type="button" className={quietButtonClass} disabled={query.page >= pages} onClick={() => setQuery((q) => ({ ...q, page: q.page + 1 }))}>
          Next
        </button>
        <label className="ml-auto flex items-center gap-2">
          Rows per page
          <select className={inputClass} value={query.pageSize} onChange={(e) => set({ pageSize: Number(e.target.value) })}>
            {PAGE_SIZES.map((n) => (
              <option key={n} value={n}>{n}</option>
            ))}
          </select>
        </label>
      </nav>
    </div>
  );
}
