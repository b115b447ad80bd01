import { STEFAN_BOLTZMANN } from "./constants";
import { finnedHeatsinkConductance } from "./elements/heatsink";
import { NaturalConvectionLink } from "./solver/convection-kernel";
import type { NetworkLink } from "./schema";
import type { LinkModel } from "./solver/link-model";

export type { LinkKind, LinkModel } from "./solver/link-model";

export class LinearLink implements LinkModel {
  readonly linear = true;
  readonly kind = "linear";
  constructor(readonly conductance: number) {}
  evaluate(ti: number, tj: number, out: Float64Array): void {
    out[0] = this.conductance * (ti - tj);
    out[1] = this.conductance;
    out[2] = -this.conductance;
  }
}

export class RadiationLink implements LinkModel {
  readonly linear = false;
  readonly kind = "radiation";
  /** ε·σ·A, W/K⁴. */
  constructor(readonly c: number) {}
  evaluate(ti: number, tj: number, out: Float64Array): void {
    const ti2 = ti * ti;
    const tj2 = tj * tj;
    out[0] = this.c * (ti2 * ti2 - tj2 * tj2);
    out[1] = 4 * this.c * ti2 * ti;
    out[2] = -4 * this.c * tj2 * tj;
  }
}

/**
 * Derivative step for links whose coefficient comes from a correlation: a thousandth of
 * the link's temperature difference (so the slope stays accurate as ΔT → 0, where
 * h ∝ ΔT^¼ bends sharply), never below where round-off of T ≈ 300 K would dominate.
 */
const derivativeStep = (ti: number, tj: number) => Math.max(1e-7, 1e-3 * Math.abs(ti - tj));

/** q = G(ti, tj)·(ti − tj) with G from a correlation; derivatives by forward difference. */
export class CorrelationLink implements LinkModel {
  readonly linear = false;
  readonly kind = "correlation";
  constructor(private readonly conductance: (ti: number, tj: number) => number) {}
  evaluate(ti: number, tj: number, out: Float64Array, derivatives: boolean): void {
    const q = this.conductance(ti, tj) * (ti - tj);
    out[0] = q;
    if (!derivatives) return;
    const d = derivativeStep(ti, tj);
    out[1] = (this.conductance(ti + d, tj) * (ti + d - tj) - q) / d;
    out[2] = (this.conductance(ti, tj + d) * (ti - tj - d) - q) / d;
  }
}

/** Every model `linkModel` builds; `kind` tells them apart. */
export type AnyLinkModel = LinearLink | RadiationLink | NaturalConvectionLink | CorrelationLink;

export function linkModel(link: NetworkLink): AnyLinkModel {
  switch (link.type) {
    case "resistance":
      return new LinearLink(1 / link.kelvinPerWatt);
    case "conduction":
      return new LinearLink((link.conductivityWPerMK * link.areaM2) / link.lengthM);
    case "convection":
      return new LinearLink(link.coefficientWPerM2K * link.areaM2);
    case "natural-convection":
      return new NaturalConvectionLink(link.areaM2, link.surface, link.characteristicLengthM);
    case "radiation":
      return new RadiationLink(link.emissivity * STEFAN_BOLTZMANN * link.areaM2);
    case "finned-heatsink":
      return new CorrelationLink((ti, tj) => finnedHeatsinkConductance(link, ti, tj));
  }
}
