"use client";

import { useEffect, useRef, useState } from "react";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";
import type { PlainIssue } from "@/lib/messages";
import type { Evaluation } from "@/components/budget/types";
import type { JsonObject } from "./design-state";

export type PreviewAnswer =
  | { buildId: string; unsaved: true; valid: true; evaluation: Evaluation }
  | { buildId: string; unsaved: true; valid: false; issues: PlainIssue[] };

export type PreviewState = { status: "idle" | "checking" | "done" | "error"; answer: PreviewAnswer | null; error: string | null };

/** How long the editor waits after the last change before it checks the draft. */
export const PREVIEW_DEBOUNCE_MS = 150;

/**
 * The live check of an unsaved design: after each change (debounced) the draft goes to the
 * preview route, which evaluates it and writes nothing. Older answers are dropped when a
 * newer change has been sent. `enabled` is false while the draft equals the saved revision.
 */
export function useDesignPreview(buildId: string, design: JsonObject, enabled: boolean): PreviewState {
  const [state, setState] = useState<PreviewState>({ status: "idle", answer: null, error: null });
  const serial = useRef(0);
  const body = JSON.stringify(design);
  useEffect(() => {
    if (!enabled) {
      serial.current++;
      setState({ status: "idle", answer: null, error: null });
      return;
    }
    const mine = ++serial.current;
    setState((s) => ({ ...s, status: "checking" }));
    const timer = setTimeout(() => {
      fetchJson<PreviewAnswer>(`/api/v1/builds/${buildId}/preview`, { method: "POST", body: { design: JSON.parse(body) as unknown } })
        .then((answer) => {
          if (mine === serial.current) setState({ status: "done", answer, error: null });
        })
        .catch((e: unknown) => {
          if (mine === serial.current) setState((s) => ({ status: "error", answer: s.answer, error: e instanceof ApiClientError ? e.message : "The check did not answer." }));
        });
    }, PREVIEW_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [buildId, body, enabled]);
  return state;
}
