import type { BuildDesign } from "@/lib/retrofit";
import { FIN_DIRECTION_CHOICES, finDirectionOf } from "@/lib/retrofit/design-schema";
import { formatDecimal } from "@/lib/units/figures";

/**
 * The parts and mounting of two to four designs, slot by slot, so Side by side can say
 * *why* the numbers differ before it shows them. Pure: part names come in as a lookup.
 */
export interface DiffRow {
  slot: string;
  label: string;
  values: string[];
  /** True when any column differs from the first. */
  differs: boolean;
  /** A few words per column for sentences ("driver floating free"), when the slot has them. */
  short?: string[];
}

/** Name of a Parts bin part by id; undefined when the viewer may not see it. */
export type PartNames = (partId: string) => string | undefined;

type AnySlot = { partId: string } | { inline: unknown; name?: string } | undefined;

function slotText(slot: AnySlot, names: PartNames, none = "—"): string {
  if (!slot) return none;
  if ("partId" in slot) return names(slot.partId) ?? `part ${slot.partId} (not visible)`;
  return `${slot.name ?? "unnamed part"} (typed in)`;
}

const MOUNTS: Record<BuildDesign["lightEngine"]["mount"]["kind"], string> = {
  "in-housing-air": "in the housing's air",
  "pressed-to-wall": "pressed to the housing",
  "through-reflector": "through the reflector",
};

const CONTACT: Record<BuildDesign["environment"]["contact"], string> = {
  "touch-1s": "touched (1 s)",
  "grip-10s": "gripped (10 s)",
  "hold-1min": "held (1 min)",
  "hold-10min": "held (10 min)",
  "hold-8h": "held all day (8 h)",
};

function cooling(d: BuildDesign, names: PartNames): string {
  const c = d.driver.cooling;
  if (c.kind === "floating") return "floating free in the housing's air";
  if (c.kind === "ground-plane-to-wall") return `ground plane pressed to the housing${c.interface ? ` through ${slotText(c.interface, names)}` : ""}`;
  return `strapped to the housing with ${slotText(c.spreader, names)}${c.adhesive ? ` and ${slotText(c.adhesive, names)}` : ""}`;
}

function mount(d: BuildDesign, names: PartNames): string {
  const m = d.lightEngine.mount;
  const through = m.kind !== "in-housing-air" && m.interface ? ` through ${slotText(m.interface, names)}` : "";
  return `${MOUNTS[m.kind]}${through}`;
}

const fmt = (x: number, digits = 1): string => formatDecimal(x, digits);

const COOLING_SHORT: Record<BuildDesign["driver"]["cooling"]["kind"], string> = {
  floating: "driver floating free",
  "ground-plane-to-wall": "driver pressed to the wall",
  strapped: "driver strapped to the housing",
};
const MOUNT_SHORT: Record<BuildDesign["lightEngine"]["mount"]["kind"], string> = {
  "in-housing-air": "sink in the housing's air",
  "pressed-to-wall": "sink pressed to the housing",
  "through-reflector": "sink through the reflector",
};

const ROWS: { slot: string; label: string; text: (d: BuildDesign, n: PartNames) => string; short?: (d: BuildDesign) => string }[] = [
  { slot: "driver.cooling", label: "Driver cooling", text: cooling, short: (d) => COOLING_SHORT[d.driver.cooling.kind] },
  { slot: "lightEngine.mount", label: "Heatsink mounted", text: mount, short: (d) => MOUNT_SHORT[d.lightEngine.mount.kind] },
  { slot: "driver.part", label: "Driver", text: (d, n) => slotText(d.driver.part, n) },
  { slot: "driver.selectedModes", label: "Modes evaluated", text: (d) => (d.driver.selectedModes?.length ? d.driver.selectedModes.join(", ") : "all of the driver's modes") },
  { slot: "lightEngine.emitter", label: "Emitter", text: (d, n) => `${slotText(d.lightEngine.emitter, n)} × ${d.lightEngine.count} (${d.lightEngine.wiring})` },
  { slot: "lightEngine.board", label: "Emitter board", text: (d) => (d.lightEngine.board ? `${d.lightEngine.board.material}, ${fmt(d.lightEngine.board.thicknessM * 1000, 2)} mm` : "none") },
  { slot: "lightEngine.interface", label: "Interface under the emitter", text: (d, n) => slotText(d.lightEngine.interface, n, "none") },
  { slot: "lightEngine.heatsink", label: "Heatsink", text: (d, n) => slotText(d.lightEngine.heatsink, n, "none") },
  { slot: "lightEngine.finDirection", label: "Fin direction", text: (d) => FIN_DIRECTION_CHOICES.find(([v]) => v === finDirectionOf(d.lightEngine, d.environment))![1] },
  { slot: "housing", label: "Housing", text: (d, n) => `${slotText(d.housing, n)} (${d.housingShape.form})` },
  { slot: "pack.cell", label: "Cells", text: (d, n) => (d.pack.cell ? `${slotText(d.pack.cell, n)}, ${d.pack.series}S${d.pack.parallel}P` : "none") },
  { slot: "pack.protection", label: "Protection", text: (d, n) => slotText(d.pack.protection, n, "none") },
  { slot: "pack.charger", label: "Charger", text: (d, n) => (d.pack.charger ? `${slotText(d.pack.charger, n)}${d.pack.chargerCount ? ` × ${d.pack.chargerCount}` : ""}` : "none") },
  { slot: "environment.ambientC", label: "Ambient", text: (d) => `${fmt(d.environment.ambientC)} °C` },
  { slot: "environment.air", label: "Air", text: (d) => (d.environment.air.kind === "still" ? "still air" : `breeze ${fmt(d.environment.air.speedMPerS)} m/s`) },
  { slot: "environment.orientation", label: "Orientation", text: (d) => (d.environment.orientation === "upright" ? "held upright" : "lying") },
  { slot: "environment.contact", label: "How it is held", text: (d) => CONTACT[d.environment.contact] },
  { slot: "costs.comparableNewLightEur", label: "Comparable new light", text: (d) => (d.costs.comparableNewLightEur === undefined ? "—" : `€${fmt(d.costs.comparableNewLightEur, 2)}`) },
];

/** Every slot row; the ones that differ come first, in the order of ROWS. */
export function designDiff(designs: readonly BuildDesign[], names: PartNames): DiffRow[] {
  const rows = ROWS.map((r) => {
    const values = designs.map((d) => r.text(d, names));
    const row: DiffRow = { slot: r.slot, label: r.label, values, differs: values.some((v) => v !== values[0]) };
    if (r.short) row.short = designs.map((d) => r.short!(d));
    return row;
  });
  return [...rows.filter((r) => r.differs), ...rows.filter((r) => !r.differs)];
}

/**
 * How each column is called in sentences: by what sets it apart when the first differing slot
 * tells every column apart (its few words, else its full text: "driver floating free"); else
 * by the fallback (variant note or title), numbered if those repeat.
 */
export function columnNamesFor(differing: readonly DiffRow[], fallback: readonly string[]): string[] {
  const distinct = (xs: readonly string[] | undefined): xs is string[] => Boolean(xs) && new Set(xs).size === xs!.length;
  const first = differing[0];
  if (first && distinct(first.short)) return [...first.short];
  if (first && distinct(first.values)) return [...first.values];
  return distinct(fallback) ? [...fallback] : fallback.map((f, i) => `${f} (column ${i + 1})`);
}
