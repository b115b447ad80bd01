import type { Network } from "../schema";
import type { AnyLinkModel } from "../link-models";
import type { LinkModel } from "./link-model";
import type { NaturalConvectionLink } from "./convection-kernel";
import type { FillPattern } from "./ordering";

/** The compiled form of a network, shared by the compiler and the loops (types only, so nothing here imports code). */
export interface CompiledLink {
  /** Solver index of the `from` node, or −1 for ambient. */
  a: number;
  /** Solver index of the `to` node, or −1 for ambient. */
  b: number;
  model: AnyLinkModel;
}

/**
 * A network turned into what the loops need: nodes renumbered in elimination order,
 * capacities and sources in typed arrays (solver order), kelvin throughout. Sources are
 * folded into P_i(T) = p0_i + p1_i·T.
 */
export interface CompiledNetwork {
  n: number;
  /** Node ids in solver order. */
  ids: string[];
  /** Solver index of each node in the order of `network.nodes`. */
  solverIndex: Int32Array;
  ambientK: number;
  capacity: Float64Array;
  p0: Float64Array;
  p1: Float64Array;
  links: CompiledLink[];
  /** Where the LU factors of the network's matrix can be non-zero (the factor visits only these). */
  pattern: FillPattern;
  /** The same links by kind, in flat arrays for the assembly loops. */
  groups: LinkGroups;
  linear: boolean;
  network: Network;
}

/**
 * The links sorted by kind into flat arrays, so assembly runs one tight loop per kind:
 * linear and radiation links become plain numbers (no call at all), natural convection
 * one monomorphic call, and only the rare remaining models a general one.
 */
export interface LinkGroups {
  linA: Int32Array;
  linB: Int32Array;
  linG: Float64Array;
  radA: Int32Array;
  radB: Int32Array;
  /** ε·σ·A of each radiation link, W/K⁴. */
  radC: Float64Array;
  natA: Int32Array;
  natB: Int32Array;
  nat: NaturalConvectionLink[];
  othA: Int32Array;
  othB: Int32Array;
  oth: LinkModel[];
}

