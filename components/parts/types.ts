import type { PartKind, Provenance } from "@/lib/parts";
import type { PartJson, PartSummaryJson } from "@/server/parts/api";
import type { AttachmentJson } from "@/server/parts/attachments";
import type { ImportResultJson } from "@/server/parts/import";

/** What the parts API answers, typed from the functions that build the answers (dates are ISO strings). */
export type PartSummaryDto = PartSummaryJson;
export type PartDto = PartJson;

export interface PartPageDto {
  items: PartSummaryDto[];
  total: number;
  page: number;
  pageSize: number;
}

export type AttachmentDto = AttachmentJson;

export type ImportResultDto = ImportResultJson;
export type ImportRowDto = ImportResultJson["rows"][number];

/** The Parts bin's filters, sort and page: the same names as the API's query string. */
export interface PartsQuery {
  kind: PartKind | "";
  provenance: Provenance | "";
  owner: "mine" | "everyone";
  q: string;
  sort: string;
  dir: "asc" | "desc";
  page: number;
  pageSize: number;
}

export function queryString(query: PartsQuery): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== "" && value !== undefined) params.set(key, String(value));
  }
  return params.toString();
}
