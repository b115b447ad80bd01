"use client";

import { useState } from "react";
import { CsvProblem, guessMapping, headerTempUnit, headerTimeUnit, parseLoggerCsv, readingsFromTable, type ColumnMapping, type LoggerTable, type TempUnit, type TimeUnit } from "@/lib/bench/csv";

export type ImportedReading = { tS: number; tempC: number; place?: string };

const select = "rounded border border-line bg-white px-2 py-1 text-sm";

/**
 * Readings typed or pasted (one "time, temperature" per line) or imported from a logger's
 * CSV: the maker maps the columns, the units are read from the headers (and can be
 * changed), and a preview shows what will be used before anything is fitted or saved.
 */
export function ReadingsImport({ onReadings }: { onReadings: (readings: ImportedReading[] | null) => void }) {
  const [text, setText] = useState("");
  const [table, setTable] = useState<LoggerTable | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping | null>(null);
  const [units, setUnits] = useState<{ time: TimeUnit; temperature: TempUnit }>({ time: "s", temperature: "C" });
  const [problem, setProblem] = useState<string | null>(null);
  const [preview, setPreview] = useState<ImportedReading[] | null>(null);

  function apply(t: LoggerTable, m: ColumnMapping, u: { time: TimeUnit; temperature: TempUnit }) {
    try {
      const readings = readingsFromTable(t, m, u);
      setPreview(readings);
      setProblem(null);
      onReadings(readings);
    } catch (e) {
      setPreview(null);
      onReadings(null);
      setProblem(e instanceof CsvProblem ? e.message : "The readings could not be read.");
    }
  }

  function read(source: string) {
    setText(source);
    try {
      const t = parseLoggerCsv(source);
      const m = guessMapping(t);
      const u = { time: headerTimeUnit(t.header[m.time] ?? ""), temperature: headerTempUnit(t.header[m.temperature] ?? "") };
      setTable(t);
      setMapping(m);
      setUnits(u);
      apply(t, m, u);
    } catch (e) {
      setTable(null);
      setMapping(null);
      setPreview(null);
      onReadings(null);
      setProblem(e instanceof CsvProblem ? e.message : "The readings could not be read.");
    }
  }

  const columnSelect = (label: string, key: "time" | "temperature" | "place", options: number[], optional = false) =>
    table && mapping ? (
      <label className="text-sm">
        <span className="mr-1">{label}</span>
        <select
          aria-label={label}
          className={select}
          value={mapping[key] ?? ""}
          onChange={(e) => {
            const v = e.target.value === "" ? undefined : Number(e.target.value);
            const next = { ...mapping, [key]: v } as ColumnMapping;
            if (key !== "place" && v === undefined) return;
            setMapping(next);
            apply(table, next, units);
          }}
        >
          {optional && <option value="">none</option>}
          {options.map((c) => <option key={c} value={c}>{table.header[c]}</option>)}
        </select>
      </label>
    ) : null;

  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-medium">Readings</legend>
      <label className="block text-sm">
        <span className="mb-1 block">Type or paste readings: one “time, temperature” per line, or a whole logger file</span>
        <textarea aria-label="Readings" rows={6} value={text} onChange={(e) => read(e.target.value)} placeholder={"0, 24.8\n120, 33.1\n240, 39.6"} className="w-full rounded border border-line bg-white px-2 py-1.5 font-mono text-xs" />
      </label>
      <label className="block text-sm">
        <span className="mr-2">or import a logger CSV</span>
        <input
          type="file"
          accept=".csv,.txt,text/csv,text/plain"
          aria-label="Logger CSV"
          onChange={async (e) => {
            const file = e.target.files?.[0];
            if (!file) return;
            if (file.size > 8_000_000) {
              setProblem("The file is over 8 MB; a run takes at most 99,999 rows.");
              return;
            }
            read(await file.text());
          }}
        />
      </label>
      {table && mapping && (
        <div className="flex flex-wrap items-center gap-3 rounded border border-line bg-white/60 p-2" data-testid="csv-mapping">
          {columnSelect("Time column", "time", table.numericColumns)}
          <label className="text-sm">
            <span className="mr-1">in</span>
            <select aria-label="Time unit" className={select} value={units.time} onChange={(e) => { const u = { ...units, time: e.target.value as TimeUnit }; setUnits(u); apply(table, mapping, u); }}>
              <option value="s">seconds</option><option value="min">minutes</option><option value="h">hours</option>
            </select>
          </label>
          {columnSelect("Temperature column", "temperature", table.numericColumns)}
          <label className="text-sm">
            <span className="mr-1">in</span>
            <select aria-label="Temperature unit" className={select} value={units.temperature} onChange={(e) => { const u = { ...units, temperature: e.target.value as TempUnit }; setUnits(u); apply(table, mapping, u); }}>
              <option value="C">°C</option><option value="F">°F</option><option value="K">K</option>
            </select>
          </label>
          {columnSelect("Place column", "place", table.header.map((_, i) => i), true)}
        </div>
      )}
      {problem && <p role="alert" className="text-sm text-over" data-testid="csv-problem">{problem}</p>}
      {preview && (
        <div className="text-xs" data-testid="csv-preview">
          <p className="mb-1 text-ink-soft">Preview: {preview.length} reading{preview.length === 1 ? "" : "s"}, times counted from the first row. Nothing is saved until you press “Save run”.</p>
          <table className="border-collapse">
            <thead><tr><th className="pr-4 text-left font-medium">time</th><th className="pr-4 text-left font-medium">temperature</th><th className="text-left font-medium">place</th></tr></thead>
            <tbody>
              {preview.slice(0, 6).map((r, i) => (
                <tr key={i}><td className="pr-4">{r.tS >= 120 ? `${(r.tS / 60).toFixed(2)} min` : `${r.tS} s`}</td><td className="pr-4">{r.tempC.toFixed(1)} °C</td><td>{r.place ?? "heatsink"}</td></tr>
              ))}
              {preview.length > 6 && <tr><td colSpan={3} className="text-ink-soft">… {preview.length - 6} more</td></tr>}
            </tbody>
          </table>
        </div>
      )}
    </fieldset>
  );
}
