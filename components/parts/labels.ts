import { KIND_DEFINITIONS, PART_KINDS, type PartKind, type Provenance, type Visibility } from "@/lib/parts";

export const KIND_OPTIONS: { value: PartKind; label: string }[] = PART_KINDS.map((kind) => ({ value: kind, label: KIND_DEFINITIONS[kind].label }));

export const PROVENANCE_LABELS: Record<Provenance, string> = { datasheet: "Datasheet", measured: "Measured", estimate: "Estimate" };

export const VISIBILITY_LABELS: Record<Visibility, string> = { private: "Private", shared: "Shared", public: "Public" };

export const inputClass = "rounded border border-line bg-white px-2 py-1 text-sm focus:border-ember focus:outline-none";
export const buttonClass = "rounded bg-ember px-3 py-1.5 text-sm font-medium text-white hover:opacity-90 disabled:opacity-50";
export const quietButtonClass = "rounded border border-line bg-white px-3 py-1.5 text-sm hover:border-ember hover:text-ember disabled:opacity-50";
