"use client";

import Link from "next/link";
import { useState } from "react";
import { csvHeaders, type PartKind } from "@/lib/parts";
import { buttonClass, inputClass, KIND_OPTIONS, quietButtonClass } from "./labels";
import type { ImportResultDto } from "./types";
import { useImportCsv } from "./use-import";

/** CSV import: preview which rows would be created and which are refused, then import all at once. */
export function ImportPanel() {
  const [kind, setKind] = useState<PartKind>("heatsink");
  const [csv, setCsv] = useState("");
  const [preview, setPreview] = useState<ImportResultDto | null>(null);
  const [done, setDone] = useState<ImportResultDto | null>(null);
  const importCsv = useImportCsv();
  const reset = () => {
    setPreview(null);
    setDone(null);
    importCsv.reset();
  };

  const onFile = async (file: File | undefined) => {
    if (!file) return;
    setCsv(await file.text());
    reset();
  };
  const run = (mode: "preview" | "commit") =>
    importCsv.mutate({ kind, csv, mode }, { onSuccess: (result) => (mode === "preview" ? setPreview(result) : setDone(result)) });

  const canCommit = preview !== null && preview.headerErrors.length === 0 && preview.rejected === 0 && preview.accepted > 0;

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1 text-xs text-ink-soft">
          Kind of part
          <select className={inputClass} value={kind} onChange={(e) => { setKind(e.target.value as PartKind); reset(); }}>
            {KIND_OPTIONS.map((o) => (
              <option key={o.value} value={o.value}>{o.label}</option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-xs text-ink-soft">
          CSV file
          <input type="file" accept=".csv,text/csv" className={inputClass} onChange={(e) => void onFile(e.target.files?.[0])} />
        </label>
      </div>
      <p className="text-xs text-ink-soft">
        Expected header for this kind: <code className="break-all font-mono">{csvHeaders(kind).join(",")}</code>. The unit in brackets is what a bare number means;
        change it (e.g. [in]) or write the unit in the cell. A cell that starts with ' followed by =, +, −, @ or a tab (as our exports
        write them, so a spreadsheet never runs them as a formula) is read without that quote.
      </p>
      <label className="block space-y-1 text-sm">
        <span className="font-medium">CSV text</span>
        <textarea className={`${inputClass} h-40 w-full font-mono text-xs`} value={csv} onChange={(e) => { setCsv(e.target.value); reset(); }} />
      </label>
      <div className="flex gap-3">
        <button type="button" className={quietButtonClass} disabled={csv.trim() === "" || importCsv.isPending} onClick={() => run("preview")}>Preview</button>
        <button type="button" className={buttonClass} disabled={!canCommit || importCsv.isPending || done !== null} onClick={() => run("commit")}>
          Import {preview?.accepted ?? 0} {preview?.accepted === 1 ? "part" : "parts"}
        </button>
      </div>
      {importCsv.isError && <p role="alert" className="text-sm text-over">{importCsv.error.message}</p>}
      {done && (
        <p role="status" className="text-sm text-ok">
          Imported {done.created} {done.created === 1 ? "part" : "parts"}. <Link href="/parts" className="underline">Back to the Parts bin</Link>
        </p>
      )}
      {preview && <PreviewTable result={preview} />}
    </div>
  );
}

function PreviewTable({ result }: { result: ImportResultDto }) {
  if (result.headerErrors.length > 0) {
    return (
      <div role="alert" className="rounded border border-over/40 bg-over/5 p-3 text-sm text-over">
        <p className="font-medium">The header does not fit this kind; nothing can be imported.</p>
        <ul className="list-disc pl-5">
          {result.headerErrors.map((e, i) => (
            <li key={i}>{e.message}</li>
          ))}
        </ul>
      </div>
    );
  }
  return (
    <div className="space-y-2">
      <p className="text-sm">
        <span className="text-ok">{result.accepted} will be created</span> · <span className={result.rejected ? "text-over" : "text-ink-soft"}>{result.rejected} rejected</span>
        {result.rejected > 0 && <span className="text-ink-soft"> — fix or remove the rejected rows, then preview again (imports are all or nothing).</span>}
      </p>
      <table className="w-full border-collapse text-sm" aria-label="Import preview">
        <thead>
          <tr className="border-b border-line text-left text-ink-soft">
            <th className="px-2 py-1 font-medium">Line</th>
            <th className="px-2 py-1 font-medium">Outcome</th>
            <th className="px-2 py-1 font-medium">Part or reason</th>
          </tr>
        </thead>
        <tbody>
          {result.rows.map((row) => (
            <tr key={row.line} className="border-b border-line/60 align-top">
              <td className="px-2 py-1 tabular-nums">{row.line}</td>
              <td className={`px-2 py-1 ${row.ok ? "text-ok" : "text-over"}`}>{row.ok ? "created" : "rejected"}</td>
              <td className="px-2 py-1">
                {row.ok ? (
                  row.name
                ) : (
                  <ul>
                    {row.errors.map((e, i) => (
                      <li key={i}>{e.column ? <span className="font-mono text-xs">{e.column}: </span> : null}{e.message}</li>
                    ))}
                  </ul>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
