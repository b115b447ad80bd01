import "server-only";
import { and, eq } from "drizzle-orm";
import { collectPartIds } from "@/lib/builds/part-ids";
import type { z } from "zod";
import { buildDesignSchema, type BuildDesignInput, type driverCoolingSchema } from "@/lib/retrofit";
import { db } from "@/db/client";
import { createBuild } from "@/db/queries/builds";
import { builds } from "@/db/schema";
import type { CatalogueKey } from "./catalogue";

/**
 * The demo workshop's retrofits for the coastal hiking club, each with heat-path variants:
 * a square 6 V lantern turned 2-cell Li-ion light (three ways to cool its driver), a brass
 * bicycle headlamp and a workshop inspection lamp. Parts come from the demo catalogue.
 */
type Ids = Record<CatalogueKey, string>;
const p = (ids: Ids, key: CatalogueKey) => ({ partId: ids[key] });

function lantern(ids: Ids, cooling: z.input<typeof driverCoolingSchema>): BuildDesignInput {
  return {
    housing: p(ids, "housing-steel-lantern"),
    housingShape: { form: "box" },
    lightEngine: { emitter: p(ids, "emitter-6v-cob"), count: 1, interface: p(ids, "interface-paste"), heatsink: p(ids, "heatsink-salvaged-finned"), mount: { kind: "in-housing-air" } },
    driver: { part: p(ids, "driver-buck-3mode"), cooling },
    pack: { cell: p(ids, "cell-18650-3000"), series: 2, parallel: 1, charger: p(ids, "charger-switching-2s") },
    environment: { ambientC: 20, orientation: "upright", air: { kind: "still" }, contact: "hold-1min" },
    costs: { extras: [{ label: "wiring, switch, nickel strip", costEur: 6 }], comparableNewLightEur: 65 },
  };
}

function headlamp(ids: Ids, pressed: boolean): BuildDesignInput {
  return {
    housing: p(ids, "housing-brass-headlamp"),
    housingShape: { form: "tube" },
    lightEngine: {
      emitter: p(ids, "emitter-3v-star"),
      count: 1,
      interface: p(ids, "interface-paste"),
      heatsink: p(ids, "heatsink-declared-star"),
      mount: pressed ? { kind: "pressed-to-wall", interface: p(ids, "interface-pad"), contactAreaM2: "6 cm^2" } : { kind: "in-housing-air" },
    },
    driver: { part: p(ids, "driver-linear-1cell"), cooling: { kind: "ground-plane-to-wall", interface: p(ids, "interface-pad") } },
    pack: { cell: p(ids, "cell-18650-2500-hp"), series: 1, parallel: 1, protection: p(ids, "protection-1s"), charger: p(ids, "charger-linear-usb") },
    environment: { ambientC: 15, orientation: "lying", air: { kind: "breeze", speedMPerS: 4 }, contact: "touch-1s" },
    costs: { extras: [{ label: "bracket and glass", costEur: 4 }], comparableNewLightEur: 45 },
  };
}

function inspectionLamp(ids: Ids, strapped: boolean): BuildDesignInput {
  return {
    housing: p(ids, "housing-aluminium-tube"),
    housingShape: { form: "tube" },
    lightEngine: { emitter: p(ids, "emitter-3v-star"), count: 2, wiring: "parallel", interface: p(ids, "interface-paste"), heatsink: p(ids, "heatsink-declared-star"), mount: { kind: "pressed-to-wall", interface: p(ids, "interface-pad") } },
    driver: {
      part: p(ids, "driver-linear-1cell"),
      cooling: strapped ? { kind: "strapped", spreader: p(ids, "spreader-aluminium-plate"), adhesive: p(ids, "interface-adhesive-tape") } : { kind: "floating" },
    },
    pack: { cell: p(ids, "cell-18650-3000"), series: 1, parallel: 2, protection: p(ids, "protection-1s"), charger: p(ids, "charger-linear-usb") },
    environment: { ambientC: 25, orientation: "lying", air: { kind: "still" }, contact: "hold-10min" },
    costs: { extras: [{ label: "magnet base and hook", costEur: 3 }], comparableNewLightEur: 35 },
  };
}

type DemoBuild = { key: string; title: string; summary: string; design: BuildDesignInput; variantOf?: string; variantNote?: string };

export function demoBuilds(ids: Ids): DemoBuild[] {
  return [
    { key: "lantern-strap", title: "Square lantern, 2-cell Li-ion", summary: "A 6 V square lantern rebuilt around a 6 V COB emitter, a 2S buck driver and two 18650-size cells, for the club's hut.", design: lantern(ids, { kind: "strapped", spreader: p(ids, "spreader-copper-tape"), adhesive: p(ids, "interface-adhesive-tape") }) },
    { key: "lantern-pressed", title: "Square lantern — driver pressed to the wall", summary: "Same lantern; the driver's ground plane clamped to the case wall through a gap pad.", design: lantern(ids, { kind: "ground-plane-to-wall", interface: p(ids, "interface-pad") }), variantOf: "lantern-strap", variantNote: "driver ground plane pressed to the case wall" },
    { key: "lantern-floating", title: "Square lantern — driver floating free", summary: "Same lantern; the driver hangs free in the box on its wires.", design: lantern(ids, { kind: "floating" }), variantOf: "lantern-strap", variantNote: "driver floating free inside the housing" },
    { key: "headlamp-air", title: "Brass bicycle headlamp", summary: "A brass carbide-style headlamp with a star emitter on a small pin sink, a linear driver and one high-drain cell.", design: headlamp(ids, false) },
    { key: "headlamp-pressed", title: "Brass headlamp — sink pressed to the shell", summary: "Same headlamp; the pin sink bears on the brass shell through a gap pad.", design: headlamp(ids, true), variantOf: "headlamp-air", variantNote: "heatsink pressed to the shell" },
    { key: "inspection-floating", title: "Workshop inspection lamp", summary: "An aluminium tube inspection lamp with two star emitters and two cells in parallel; the driver floats in the tube.", design: inspectionLamp(ids, false) },
    { key: "inspection-strapped", title: "Inspection lamp — driver on an aluminium plate", summary: "Same lamp; the driver is taped to an aluminium plate bearing on the tube.", design: inspectionLamp(ids, true), variantOf: "inspection-floating", variantNote: "driver strapped to an aluminium plate" },
  ];
}

/** Creates the demo builds for the maker (idempotent: found again by owner and title). */
export async function seedBuilds({ makerId, ids }: { makerId: string; ids: Ids }): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for (const b of demoBuilds(ids)) {
    const found = await db().select({ id: builds.id }).from(builds).where(and(eq(builds.ownerId, makerId), eq(builds.title, b.title))).limit(1);
    if (found[0]) {
      out[b.key] = found[0].id;
      continue;
    }
    const design = buildDesignSchema.parse(b.design);
    const created = await createBuild({
      ownerId: makerId,
      title: b.title,
      summary: b.summary,
      visibility: "shared",
      design,
      partIds: collectPartIds(design),
      note: "First revision",
      variantOf: b.variantOf ? (out[b.variantOf] ?? null) : null,
      variantNote: b.variantNote ?? null,
    });
    out[b.key] = created.id;
  }
  return out;
}
