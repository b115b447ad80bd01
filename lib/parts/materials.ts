import { MATERIALS, type Finish } from "@/lib/thermal";

/**
 * The materials a part may name, from the engine's handbook table so a part's "aluminium
 * 6063-T5" is the same row the solver takes conductivity and emissivity from. Parts store
 * only the id; properties are looked up when a build is compiled.
 */
export const MATERIAL_IDS: readonly string[] = MATERIALS.map((m) => m.id);

const IDS = new Set(MATERIAL_IDS);

export function isMaterialId(id: string): boolean {
  return IDS.has(id);
}

export interface MaterialOption {
  readonly value: string;
  readonly label: string;
  /** The handbook table the properties come from, shown beside the choice. */
  readonly source: string;
}

/** For a <select>: id, human name and the named handbook source. */
export function materialOptions(): MaterialOption[] {
  return MATERIALS.map((m) => ({ value: m.id, label: m.name, source: m.source }));
}

/** Surface finishes a heatsink or housing may be described by (emissivity follows from material + finish). */
export const FINISHES = ["polished", "as-supplied", "oxidised", "anodised", "black-anodised", "painted"] as const satisfies readonly Finish[];
