import type { Part, PartKind, PartOfKind, SpecsOfKind } from "@/lib/parts";
import type { BuildDesign, Slot } from "./design-schema";
import { problem, type Problem } from "./problems";
import type { ResolvedBuild, ResolvedCooling, ResolvedCurves, ResolvedMount, ResolvedPart } from "./resolved";

/** A slot with the kind erased: the schema already checked the inline specs against their kind. */
type AnySlot = { partId: string } | { inline: unknown; name?: string; curves?: unknown; costEur?: number };

export type PartLookup = (partId: string) => Part | undefined;

export type ResolveOutcome = { ok: true; build: ResolvedBuild; problems: [] } | { ok: false; build: ResolvedBuild; problems: Problem[] };

const isKind = <K extends PartKind>(part: Part, kind: K): part is PartOfKind<K> => part.kind === kind;

/**
 * Replaces every slot of a parsed design with its part. Returns the build with whatever
 * resolved; when a referenced part is missing or of the wrong kind, `ok` is false and each
 * problem names the slot (the caller may still evaluate the partial build).
 */
export function resolveBuild(design: BuildDesign, lookup: PartLookup): ResolveOutcome {
  const problems: Problem[] = [];
  function one<K extends PartKind>(kind: K, slot: Slot<K> | undefined, field: string): ResolvedPart<K> | undefined {
    if (slot === undefined) return undefined;
    const s = slot as AnySlot;
    if ("partId" in s) {
      const part = lookup(s.partId);
      if (!part) {
        problems.push(problem(field, `part "${s.partId}" was not found (deleted, or not visible to you)`));
        return undefined;
      }
      if (!isKind(part, kind)) {
        problems.push(problem(field, `part "${part.name}" is a ${part.kind}, this slot needs a ${kind}`));
        return undefined;
      }
      return { name: part.name, partId: s.partId, specs: part.specs as SpecsOfKind<K>, curves: part.curves as ResolvedCurves<K>, ...(part.costEur !== undefined ? { costEur: part.costEur } : {}) };
    }
    // Inline specs were validated by the design schema; curves default to none like a stored part.
    const curves = (s.curves ?? {}) as ResolvedCurves<K>;
    return { name: s.name ?? `inline ${kind}`, specs: s.inline as SpecsOfKind<K>, curves, ...(s.costEur !== undefined ? { costEur: s.costEur } : {}) };
  }

  const le = design.lightEngine;
  const m = le.mount;
  const mount: ResolvedMount =
    m.kind === "in-housing-air"
      ? m
      : m.kind === "pressed-to-wall"
        ? { kind: m.kind, interface: one("interface", m.interface, "lightEngine.mount.interface"), contactAreaM2: m.contactAreaM2 }
        : { kind: m.kind, reflector: m.reflector, interface: one("interface", m.interface, "lightEngine.mount.interface") };

  const c = design.driver.cooling;
  let cooling: ResolvedCooling = { kind: "floating" };
  if (c.kind === "ground-plane-to-wall") cooling = { kind: c.kind, interface: one("interface", c.interface, "driver.cooling.interface") };
  if (c.kind === "strapped") {
    const spreader = one("spreader", c.spreader, "driver.cooling.spreader");
    // Without its strap the driver is, thermally, floating; the problem above says so.
    cooling = spreader ? { kind: c.kind, spreader, adhesive: one("interface", c.adhesive, "driver.cooling.adhesive"), overlapM: c.overlapM } : { kind: "floating" };
  }

  const build: ResolvedBuild = {
    housing: one("housing", design.housing, "housing"),
    housingShape: design.housingShape,
    lightEngine: {
      ...le,
      emitter: one("emitter", le.emitter, "lightEngine.emitter"),
      interface: one("interface", le.interface, "lightEngine.interface"),
      heatsink: one("heatsink", le.heatsink, "lightEngine.heatsink"),
      mount,
    },
    driver: { ...design.driver, part: one("driver", design.driver.part, "driver.part"), cooling },
    pack: {
      ...design.pack,
      cell: one("cell", design.pack.cell, "pack.cell"),
      protection: one("protection", design.pack.protection, "pack.protection"),
      charger: one("charger", design.pack.charger, "pack.charger"),
    },
    environment: design.environment,
    costs: design.costs,
    ...(design.calibration ? { calibration: design.calibration } : {}),
  };
  return problems.length === 0 ? { ok: true, build, problems: [] } : { ok: false, build, problems };
}

