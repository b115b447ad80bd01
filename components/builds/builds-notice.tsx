"use client";

import { useEffect, useState } from "react";

const EVENT = "sinkwise:builds-notice";

/** Tells the Builds list's notice line what just happened to a row (the row itself may move away). */
export function announceBuildsNotice(text: string): void {
  window.dispatchEvent(new CustomEvent<string>(EVENT, { detail: text }));
}

/**
 * One line above the Builds list saying what the last action did when the row it was done on
 * has moved (a build that could not be deleted is archived and leaves "Mine").
 */
export function BuildsNotice() {
  const [text, setText] = useState<string | null>(null);
  useEffect(() => {
    const on = (e: Event) => setText((e as CustomEvent<string>).detail);
    window.addEventListener(EVENT, on);
    return () => window.removeEventListener(EVENT, on);
  }, []);
  if (!text) return null;
  return (
    <p role="status" className="flex items-center gap-3 rounded border border-line bg-white px-3 py-2 text-sm" data-testid="builds-notice">
      <span>{text}</span>
      <button type="button" onClick={() => setText(null)} className="ml-auto text-ink-soft hover:text-ember">Dismiss</button>
    </p>
  );
}
