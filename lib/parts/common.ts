import type { FieldDef } from "./fields";

export const PART_KINDS = ["emitter", "driver", "heatsink", "interface", "spreader", "housing", "cell", "charger", "protection"] as const;
export type PartKind = (typeof PART_KINDS)[number];

export const PROVENANCES = ["datasheet", "measured", "estimate"] as const;
export type Provenance = (typeof PROVENANCES)[number];

/** private: the owner (and admins); shared: any signed-in user; public: also on share links. */
export const VISIBILITIES = ["private", "shared", "public"] as const;
export type Visibility = (typeof VISIBILITIES)[number];

/**
 * Fields every part has. These become real columns in the database (filter and sort by
 * them); the kind-specific `specs` and `curves` go in validated JSON.
 */
export const COMMON_FIELDS = [
  { key: "name", label: "Name", type: "text", maxLength: 120, required: true, help: "What you call this part, e.g. \"salvaged finned sink from a projector\"." },
  { key: "provenance", label: "Provenance", type: "choice", options: PROVENANCES, required: true, help: "Where the numbers come from: a datasheet, your own measurement, or an estimate." },
  { key: "provenanceNote", label: "Source note", type: "text", maxLength: 1000, required: false, help: "Which datasheet and page, how it was measured, or what the estimate rests on." },
  { key: "visibility", label: "Visibility", type: "choice", options: VISIBILITIES, required: false, help: "private (default), shared with signed-in users, or public (also on share links)." },
  // Money is not a physical quantity; one currency keeps build totals summable.
  { key: "costEur", label: "Cost (EUR)", type: "quantity", quantity: "dimensionless", required: false, min: 0, max: 1e6, help: "What the part cost or costs, in euros." },
] as const satisfies readonly FieldDef[];
