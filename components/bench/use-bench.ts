"use client";

import { useMutation } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import type { FitResult } from "@/lib/bench/fit";
import type { CalibrationJson } from "@/server/bench/calibrate";

export function useFit() {
  return useMutation({ mutationFn: (body: unknown) => fetchJson<FitResult>("/api/v1/bench/fit", { method: "POST", body }) });
}

export function useSaveRun() {
  return useMutation({ mutationFn: (body: unknown) => fetchJson<{ run: { id: string; url: string }; fit: FitResult | null }>("/api/v1/bench/runs", { method: "POST", body }) });
}

export function useKeepPart(runId: string) {
  return useMutation({ mutationFn: (body: { name: string; visibility: string }) => fetchJson<{ part: { id: string; url: string } }>(`/api/v1/bench/runs/${runId}/part`, { method: "POST", body }) });
}

export function useCalibration(runId: string) {
  return useMutation({
    mutationFn: (body: { save: boolean }) => fetchJson<{ calibration: CalibrationJson; revision?: { number: number; url: string } }>(`/api/v1/bench/runs/${runId}/calibration`, { method: "POST", body }),
  });
}
