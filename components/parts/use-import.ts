"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/components/ui/fetch-json";
import type { PartKind } from "@/lib/parts";
import type { ImportResultDto } from "./types";

/** Preview (nothing written) or commit (all rows in one transaction, or none). */
export function useImportCsv() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { kind: PartKind; csv: string; mode: "preview" | "commit" }) =>
      fetchJson<ImportResultDto>("/api/v1/parts/import", { method: "POST", body: input }),
    onSuccess: (result) => {
      if (result.mode === "commit") void client.invalidateQueries({ queryKey: ["parts"] });
    },
  });
}
