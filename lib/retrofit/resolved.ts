import type { Curve } from "@/lib/curves";
import type { KIND_DEFINITIONS, PartKind, SpecsOfKind } from "@/lib/parts";
import type { BoardDesign, BuildDesign, Calibration, Costs, Environment, HousingShape, ReflectorDesign } from "./design-schema";

/** The curves a kind carries, each optional (the part schema's own inferred type is `{}`). */
export type ResolvedCurves<K extends PartKind> = Partial<Record<(typeof KIND_DEFINITIONS)[K]["curveKinds"][number], Curve>>;

/** A slot after resolution: the part's specs and curves, its name, and where it came from. */
export interface ResolvedPart<K extends PartKind> {
  name: string;
  /** The Parts bin id; absent for an inline part. */
  partId?: string;
  specs: SpecsOfKind<K>;
  curves: ResolvedCurves<K>;
  costEur?: number;
}

export type ResolvedMount =
  | { kind: "in-housing-air" }
  | { kind: "pressed-to-wall"; interface?: ResolvedPart<"interface">; contactAreaM2?: number }
  | { kind: "through-reflector"; reflector: ReflectorDesign; interface?: ResolvedPart<"interface"> };

export type ResolvedCooling =
  | { kind: "floating" }
  | { kind: "ground-plane-to-wall"; interface?: ResolvedPart<"interface"> }
  | { kind: "strapped"; spreader: ResolvedPart<"spreader">; adhesive?: ResolvedPart<"interface">; overlapM?: number };

/**
 * What the compiler takes: every slot replaced by its part. A slot that could not be
 * resolved is absent, and resolveBuild said why; the evaluation works with what is left.
 */
export interface ResolvedBuild {
  housing?: ResolvedPart<"housing">;
  housingShape: HousingShape;
  lightEngine: Omit<BuildDesign["lightEngine"], "emitter" | "interface" | "heatsink" | "mount" | "board"> & {
    emitter?: ResolvedPart<"emitter">;
    board?: BoardDesign;
    interface?: ResolvedPart<"interface">;
    heatsink?: ResolvedPart<"heatsink">;
    mount: ResolvedMount;
  };
  driver: Omit<BuildDesign["driver"], "part" | "cooling"> & { part?: ResolvedPart<"driver">; cooling: ResolvedCooling };
  pack: Omit<BuildDesign["pack"], "cell" | "protection" | "charger"> & {
    cell?: ResolvedPart<"cell">;
    protection?: ResolvedPart<"protection">;
    charger?: ResolvedPart<"charger">;
  };
  environment: Environment;
  costs: Costs;
  /** A correction from a bench run of the finished build, applied when the network is compiled. */
  calibration?: Calibration;
}
