import { formatAgainstLimit, formatFigure, formatInUnit } from "@/lib/units/figures";

/**
 * What a newer solver moved in a revision's figures, in words: the overall verdict, every
 * limit's temperature and verdict, runtime and charge time. Both evaluations are read
 * defensively — the older one was written by an older solver and may lack fields.
 */
type Loose = Record<string, unknown>;
const obj = (v: unknown): Loose => (v && typeof v === "object" && !Array.isArray(v) ? (v as Loose) : {});
const arr = (v: unknown): unknown[] => (Array.isArray(v) ? v : []);
const num = (v: unknown): number | null => (typeof v === "number" && Number.isFinite(v) ? v : null);
const str = (v: unknown): string | null => (typeof v === "string" ? v : null);

/** A temperature moved when the rounding shown on the Budget would show it: half a kelvin. */
const TEMPERATURE_STEP_K = 0.5;
const MAX_LINES = 12;

function scenarioName(s: Loose): string {
  return s.kind === "charging" ? "Charging" : `Mode ${str(s.name) ?? "?"}`;
}

export function figureChanges(before: unknown, after: unknown): string[] {
  const out: string[] = [];
  const b = obj(before);
  const a = obj(after);
  if (str(b.verdict) !== str(a.verdict)) out.push(`Overall verdict: ${str(b.verdict) ?? "not worked out"} → ${str(a.verdict) ?? "not worked out"}`);
  const oldScenarios = new Map(arr(b.scenarios).map((s) => [str(obj(s).id), obj(s)]));
  for (const sv of arr(a.scenarios)) {
    const s = obj(sv);
    const old = oldScenarios.get(str(s.id));
    if (!old) {
      out.push(`${scenarioName(s)}: new in this solver`);
      continue;
    }
    const oldLimits = new Map(arr(obj(old.thermal).limits).map((l) => [str(obj(l).id), obj(l)]));
    for (const lv of arr(obj(s.thermal).limits)) {
      const l = obj(lv);
      const o = oldLimits.get(str(l.id));
      const t = num(l.temperatureC);
      const ot = o ? num(o.temperatureC) : null;
      const limit = num(l.limitC);
      const dir = l.kind === "min" ? "min" : "max";
      if (t !== null && ot !== null && Math.abs(t - ot) >= TEMPERATURE_STEP_K) {
        const fmt = (x: number) => (limit === null ? formatFigure(x, "temperature") : formatAgainstLimit(x, limit, dir, "temperature").value);
        out.push(`${scenarioName(s)}, ${str(l.place) ?? "a limit"}: ${fmt(ot)} → ${fmt(t)}`);
      } else if (o && str(o.verdict) !== str(l.verdict)) {
        out.push(`${scenarioName(s)}, ${str(l.place) ?? "a limit"}: ${str(o.verdict) ?? "–"} → ${str(l.verdict) ?? "–"}`);
      }
    }
    const rt = obj(obj(s.mode).runtime);
    const ort = obj(obj(old.mode).runtime);
    const r1 = num(rt.value);
    const r0 = num(ort.value);
    if (r1 !== null && r0 !== null) {
      const shown = (v: number, u: unknown) => formatInUnit(v, str(u) ?? "h");
      if (shown(r0, ort.unit) !== shown(r1, rt.unit)) out.push(`${scenarioName(s)}, runtime: ${shown(r0, ort.unit)} → ${shown(r1, rt.unit)}`);
    }
  }
  const ch1 = obj(obj(obj(a.electrical).charge).totalHours);
  const ch0 = obj(obj(obj(b.electrical).charge).totalHours);
  if (num(ch1.value) !== null && num(ch0.value) !== null) {
    const s0 = formatInUnit(num(ch0.value), str(ch0.unit) ?? "h");
    const s1 = formatInUnit(num(ch1.value), str(ch1.unit) ?? "h");
    if (s0 !== s1) out.push(`Charge time to full: ${s0} → ${s1}`);
  }
  return out.length > MAX_LINES ? [...out.slice(0, MAX_LINES), `and ${out.length - MAX_LINES} more`] : out;
}

/** The solver version a cache key was written by ("e1.5" from "e1.5:3fa…"). */
export const solverVersionOf = (key: string): string => key.split(":")[0] ?? key;
