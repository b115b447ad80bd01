/** How the Classroom shows a derivation's quantities: never NaN, never "−0", units as the engine gives them. */
export function fmtValue(value: number | null | undefined, unit: string): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "–";
  const v = Object.is(value, -0) || Math.abs(value) < 1e-12 ? 0 : value;
  const a = Math.abs(v);
  let text: string;
  if (unit === "°C" || unit === "K") text = v.toFixed(1);
  else if (a !== 0 && (a < 1e-3 || a >= 1e6)) text = v.toExponential(2);
  else text = a >= 100 ? v.toFixed(0) : Number(v.toPrecision(3)).toString();
  if (/^-0(\.0*)?$/.test(text)) text = text.slice(1);
  return unit ? `${text} ${unit}` : text;
}

export function fmtDate(d: Date | string | null | undefined): string {
  if (!d) return "–";
  const x = typeof d === "string" ? new Date(d) : d;
  return `${x.toISOString().slice(0, 10)} ${x.toISOString().slice(11, 16)} UTC`;
}
