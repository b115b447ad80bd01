"use client";

export function PrintButton() {
  return (
    <button type="button" onClick={() => window.print()} className="rounded bg-ember px-3 py-1 text-white">
      Print
    </button>
  );
}
